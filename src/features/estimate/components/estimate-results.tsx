// The estimate's answer beside the form: A in t/ha/yr and t/ac/yr, A/T with its risk class,
// tonnes a year, storm runoff, every factor with its source, and the cautions.
import { Notice } from '../../../components/ui/notice';
import { M3_PER_ACRE_FT } from '../../../../shared/erosion/units';
import { mmToIn, riskClassOf, tToShortTon } from '../../../../shared/erosion';
import type { EstimateSuccess } from '../../../../shared/schemas/estimate';
import { FactorTable } from './factor-table';
import { formatFigure } from '../../../lib/format-figure';
import { RiskClassScale, RiskSwatch } from './risk-class-scale';

export type DisplayUnits = 'si' | 'us';

function Figure({ label, value, unit, sub, testId }: { label: string; value: string; unit: string; sub?: string; testId?: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd data-testid={testId}>
        <span className="num text-2xl font-semibold">{value}</span> <span className="text-sm">{unit}</span>
        {sub ? <span className="num block text-sm text-ink-soft">{sub}</span> : null}
      </dd>
    </div>
  );
}

export function EstimateResults({ result, units }: { result: EstimateSuccess; units: DisplayUnits }) {
  const a = result.soilLoss;
  const risk = riskClassOf(result.aOverT);
  const t = result.factors.t;
  const us = units === 'us';
  const ro = result.runoff;

  return (
    <div className="flex flex-col gap-4" data-testid="estimate-results">
      <section aria-labelledby="soil-loss-heading" className="flex flex-col gap-3 rounded-md border border-clay bg-white/60 p-3">
        <h2 id="soil-loss-heading" className="text-xs font-semibold uppercase tracking-wide text-clay-dark">
          Estimated soil loss, RUSLE
        </h2>
        <dl className="grid gap-3 sm:grid-cols-2">
          <Figure
            label="A, average yearly loss"
            value={formatFigure(us ? a.tonPerAcYr : a.tPerHaYr)}
            unit={us ? 't/ac/yr (short tons)' : 't/ha/yr'}
            sub={us ? `${formatFigure(a.tPerHaYr)} t/ha/yr` : `${formatFigure(a.tonPerAcYr)} t/ac/yr (short tons)`}
            testId="result-a"
          />
          {a.tonnesPerYr !== undefined ? (
            <Figure
              label="From the whole field"
              value={formatFigure(us ? tToShortTon(a.tonnesPerYr) : a.tonnesPerYr)}
              unit={us ? 'short tons a year' : 'tonnes a year'}
              testId="result-tonnes"
            />
          ) : null}
        </dl>
        <div className="flex flex-col gap-2 border-t border-paper-edge pt-2">
          <p className="flex flex-wrap items-center gap-2" data-testid="result-risk">
            <span className="text-sm text-ink-soft">A/T</span>
            <span className="num text-xl font-semibold" data-testid="result-a-over-t">{formatFigure(result.aOverT)}</span>
            <span className="flex items-center gap-1.5 rounded border border-ink-faint bg-paper px-2 py-0.5 font-semibold" data-risk={risk.key}>
              <RiskSwatch colour={risk.colour} />
              {risk.label}
            </span>
          </p>
          <p className="text-sm text-ink-soft">
            Against a tolerance T of{' '}
            <span className="num">
              {us && t.us ? `${formatFigure(t.us.value)} ${t.us.unit}` : `${formatFigure(t.value)} ${t.unit}`}
            </span>
            {result.textureClass ? `; soil texture ${result.textureClass}` : ''}.
          </p>
          <RiskClassScale current={risk} />
        </div>
      </section>

      {ro ? (
        <section aria-labelledby="runoff-heading" className="flex flex-col gap-2 rounded-md border border-paper-edge bg-white/40 p-3" data-testid="result-runoff">
          <h2 id="runoff-heading" className="text-xs font-semibold uppercase tracking-wide text-clay-dark">
            Runoff from the design storm
          </h2>
          <dl className="grid gap-3 sm:grid-cols-2">
            <Figure
              label={`Runoff depth from ${us ? `${formatFigure(mmToIn(ro.rainfallMm))} in` : `${formatFigure(ro.rainfallMm)} mm`} of rain`}
              value={formatFigure(us ? ro.runoffIn : ro.runoffMm)}
              unit={us ? 'in' : 'mm'}
              sub={us ? `${formatFigure(ro.runoffMm)} mm` : `${formatFigure(ro.runoffIn)} in`}
              testId="result-runoff-depth"
            />
            {ro.volumeM3 !== undefined ? (
              <Figure
                label="Runoff volume from the field"
                value={formatFigure(us ? ro.volumeM3 / M3_PER_ACRE_FT : ro.volumeM3)}
                unit={us ? 'acre-ft' : 'm³'}
                sub={us ? `${formatFigure(ro.volumeM3)} m³` : `${formatFigure(ro.volumeM3 / M3_PER_ACRE_FT)} acre-ft`}
                testId="result-runoff-volume"
              />
            ) : null}
          </dl>
          <p className="text-sm text-ink-soft">
            Curve number <span className="num">{formatFigure(ro.cn.value)}</span>
            {ro.hsg ? `, hydrologic soil group ${ro.hsg}` : ''}.
          </p>
        </section>
      ) : null}

      <FactorTable factors={result.factors} units={units} extra={ro ? [{ name: 'CN, curve number', p: ro.cn }] : undefined} />

      {result.practice && result.practice.notes.length > 0 ? (
        <Notice title="About the practice">
          <ul className="list-inside list-disc">
            {result.practice.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      {result.warnings.length > 0 ? (
        <Notice title="Points to check" testId="estimate-warnings">
          <ul className="list-inside list-disc">
            {result.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      <Notice title="Before you act on these figures" testId="estimate-cautions">
        <ul className="list-inside list-disc">
          {result.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </Notice>
    </div>
  );
}
