// The top of the Soil tab: the field's soil in one block — texture class and mean separates,
// K with where it came from, T, the hydrologic soil group mix, drainage, pH, and why the field
// counts as problem clay. Ground that amendments will not fix gets a calm notice.
import { Notice } from '../../../components/ui/notice';
import type { Units } from '../../../../shared/schemas/auth';
import { BUFFER_METHOD_NAMES, type FieldSoilSummary } from '../../../../shared/schemas/soils';
import { originWords, type Origin } from '../../../../shared/schemas/provenance';
import { useSoilSummary } from '../api/get-soil-summary';
import { fmt, fmtCm, fmtPct, fmtPh, fmtShare, formatK, formatT } from './format-soil';
import { NotWorthAmendingNotice } from './not-worth-amending-notice';

function Row({ term, children, testId }: { term: string; children: React.ReactNode; testId?: string }) {
  return (
    <>
      <dt className="text-ink-soft">{term}</dt>
      <dd className="min-w-0" data-testid={testId}>{children}</dd>
    </>
  );
}

const Source = ({ children }: { children: React.ReactNode }) => <span className="block text-xs text-ink-soft">{children}</span>;

/** Where K or T came from, in words: "Williams (EPIC) equation, …; from the mean of 2 lab samples". */
const OriginLine = ({ origin }: { origin: Origin }) => <Source>from {[originWords(origin), origin.detail].filter(Boolean).join('; ')}</Source>;

function HsgMix({ shares }: { shares: FieldSoilSummary['hsgShares'] }) {
  if (shares.length === 0) return <span className="text-ink-soft">not known yet</span>;
  return (
    <span className="num flex flex-wrap gap-x-3">
      {shares.map((s) => (
        <span key={s.group}>
          group <strong>{s.group}</strong> {fmtShare(s.share)}
        </span>
      ))}
    </span>
  );
}

function Figures({ s, units }: { s: FieldSoilSummary; units: Units }) {
  const k = s.kUs !== null ? formatK(s.kUs, units) : null;
  const t = s.tTonPerAcYr !== null ? formatT(s.tTonPerAcYr, units) : null;
  const unknown = <span className="text-ink-soft">not known yet</span>;
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 text-sm">
      <Row term="Texture class" testId="soil-summary-texture">
        {s.textureClass ? <strong className="font-semibold">{s.textureClass}</strong> : unknown}
        {s.sandPct !== null && s.siltPct !== null && s.clayPct !== null ? (
          <Source>
            <span className="num">
              mean of the lab samples: sand {fmtPct(s.sandPct)}, silt {fmtPct(s.siltPct)}, clay {fmtPct(s.clayPct)}
            </span>
          </Source>
        ) : null}
      </Row>
      <Row term="Organic matter">{s.organicMatterPct !== null ? <span className="num">{fmtPct(s.organicMatterPct, 1)}</span> : unknown}</Row>
      <Row term="Erodibility K" testId="soil-summary-k">
        {k ? (
          <>
            <span className="num">{k.main}</span> <span className="num text-ink-soft">({k.other})</span>
            {s.kSource ? <OriginLine origin={s.kSource} /> : null}
          </>
        ) : (
          <>
            {unknown}
            <Source>needs a texture class: add lab results or a feel test</Source>
          </>
        )}
      </Row>
      <Row term="Soil loss tolerance T" testId="soil-summary-t">
        {t ? (
          <>
            <span className="num">{t.main}</span> <span className="num text-ink-soft">({t.other})</span>
            {s.tSource ? <OriginLine origin={s.tSource} /> : null}
          </>
        ) : (
          unknown
        )}
      </Row>
      <Row term="Hydrologic soil group" testId="soil-summary-hsg">
        <HsgMix shares={s.hsgShares} />
      </Row>
      <Row term="Drainage" testId="soil-summary-drainage">
        {s.drainageClass ?? unknown}
        {s.depthToGrayCm !== null ? (
          <Source>
            gray or mottled colours from <span className="num">{fmtCm(s.depthToGrayCm)}</span> (the shallowest seen)
          </Source>
        ) : null}
      </Row>
      <Row term="pH">
        {s.ph !== null ? <span className="num">{fmtPh(s.ph)}</span> : unknown}
        {s.bufferPh !== null ? <span className="num text-ink-soft"> · {s.bufferMethod ? `${BUFFER_METHOD_NAMES[s.bufferMethod]} pH` : 'buffer pH'} {fmtPh(s.bufferPh)}</span> : null}
      </Row>
      {s.cecCmolPerKg !== null || s.espPct !== null || s.bulkDensity !== null ? (
        <Row term="Also measured">
          <span className="num flex flex-wrap gap-x-3">
            {s.bulkDensity !== null ? <span>bulk density {fmt(s.bulkDensity, 2)} Mg/m³</span> : null}
            {s.cecCmolPerKg !== null ? <span>CEC {fmt(s.cecCmolPerKg, 1)} cmolc/kg</span> : null}
            {s.espPct !== null ? <span>ESP {fmtPct(s.espPct, 1)}</span> : null}
          </span>
        </Row>
      ) : null}
    </dl>
  );
}

export function SoilSummaryCard({ fieldId, units }: { fieldId: number; units: Units }) {
  const summary = useSoilSummary(fieldId);
  return (
    <section aria-labelledby="soil-summary-heading" data-testid="soil-summary" className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="soil-summary-heading" className="text-lg font-semibold">
          Soil of this field
        </h2>
        {summary.data ? (
          <p className="num text-sm text-ink-soft">
            from {summary.data.sampleCount} {summary.data.sampleCount === 1 ? 'sample' : 'samples'}
          </p>
        ) : null}
      </div>
      {summary.isPending ? (
        <p className="text-sm text-ink-soft">Loading…</p>
      ) : summary.isError ? (
        <Notice tone="error">{summary.error.message}</Notice>
      ) : (
        <>
          <Figures s={summary.data} units={units} />
          {summary.data.problemClay ? (
            <Notice tone="caution" title="Problem clay" testId="problem-clay">
              <ul className="list-inside list-disc">
                {summary.data.problemClayReasons.map((r) => (
                  <li key={r} className="num">{r}</li>
                ))}
              </ul>
            </Notice>
          ) : null}
          {summary.data.notWorthAmending ? (
            <NotWorthAmendingNotice depthToGrayCm={summary.data.depthToGrayCm} drainageClass={summary.data.drainageClass} />
          ) : null}
        </>
      )}
    </section>
  );
}
