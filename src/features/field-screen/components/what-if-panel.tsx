// The what-if: the field's figures now beside the figures with the treatments switched on, worked
// out in the browser by the same engine the server uses (applyTreatments), so they change at
// once. Under them: what the chosen treatments take, cost, do beyond A, and the cautions.
import { useMemo } from 'react';
import { applyTreatments } from '../../../../shared/erosion';
import { riskClassOf } from '../../../../shared/erosion/risk-class';
import type { CurrentFigures, TreatmentKey, TreatmentSite, Unavailable } from '../../../../shared/erosion/treatments/types';
import type { Units } from '../../../../shared/schemas/auth';
import { Notice } from '../../../components/ui/notice';
import { formatFigure } from '../../../lib/format-figure';
import { lossFigure, runoffFigure, tonnesFigure } from '../../../lib/loss-units';
import { formatMoney } from '../../../lib/money';
import { RiskBadge } from '../../../components/risk/risk-badge';
import { TreatmentChoices } from './treatment-choices';
import { Cautions, CostLines, Effects, Quantities } from './treatment-details';

type Figures = { a: number; aOverT: number; runoffMm: number | null; tonnesPerYr: number };

const pctChange = (now: number, next: number) => (now > 0 ? Math.round(((next - now) / now) * 100) : 0);

function Column({ title, f, units, testId, now }: { title: string; f: Figures; units: Units; testId: string; now?: Figures }) {
  const a = lossFigure(f.a, units);
  const change = now ? pctChange(now.a, f.a) : 0;
  return (
    <div className="flex min-w-0 flex-col gap-2" data-testid={testId}>
      <p className="text-xs font-semibold uppercase tracking-wide text-clay-dark">{title}</p>
      <dl className="flex flex-col gap-2">
        <div>
          <dt className="text-sm text-ink-soft">A, average yearly loss</dt>
          <dd>
            <span className="num text-2xl font-semibold" data-testid={`${testId}-a`}>
              {a.main}
            </span>
            <span className="num block text-sm text-ink-soft">
              {a.alt}
              {now && change !== 0 ? <span className="font-semibold text-ink"> · {change > 0 ? '+' : '−'}{Math.abs(change)} %</span> : null}
            </span>
          </dd>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <dt className="text-sm text-ink-soft">A/T</dt>
          <dd className="flex flex-wrap items-center gap-2">
            <span className="num text-lg font-semibold" data-testid={`${testId}-a-over-t`}>
              {formatFigure(f.aOverT)}
            </span>
            <RiskBadge riskClass={riskClassOf(f.aOverT)} />
          </dd>
        </div>
        <div>
          <dt className="text-sm text-ink-soft">From the whole field</dt>
          <dd className="num">{tonnesFigure(f.tonnesPerYr, units).main}</dd>
        </div>
        <div>
          <dt className="text-sm text-ink-soft">Design-storm runoff</dt>
          <dd className="num" data-testid={`${testId}-runoff`}>
            {f.runoffMm === null ? <span className="text-ink-faint">not worked out</span> : runoffFigure(f.runoffMm, units).main}
          </dd>
        </div>
      </dl>
    </div>
  );
}

type Props = {
  site: TreatmentSite;
  current: CurrentFigures;
  titles: Record<TreatmentKey, string>;
  unavailable: Unavailable[];
  chosen: TreatmentKey[];
  onChange: (keys: TreatmentKey[]) => void;
  units: Units;
};

export function WhatIfPanel({ site, current, titles, unavailable, chosen, onChange, units }: Props) {
  const applied = useMemo(() => (chosen.length ? applyTreatments(site, chosen) : null), [site, chosen]);
  const now: Figures = { a: current.soilLossTPerHaYr, aOverT: current.aOverT, runoffMm: current.runoffMm, tonnesPerYr: current.tonnesPerYr };
  const next: Figures | null =
    applied?.ok === true
      ? {
          a: applied.value.estimate.soilLoss.tPerHaYr,
          aOverT: applied.value.estimate.aOverT,
          runoffMm: applied.value.estimate.runoff?.runoffMm ?? null,
          tonnesPerYr: applied.value.estimate.soilLoss.tPerHaYr * site.areaHa,
        }
      : null;

  return (
    <section aria-labelledby="whatif-heading" className="flex flex-col gap-3 rounded-md border border-clay bg-white/60 p-3" data-testid="whatif">
      <div className="flex flex-col gap-0.5">
        <h4 id="whatif-heading" className="font-serif text-lg font-semibold">
          Try treatments on this field
        </h4>
        <p className="text-sm text-ink-soft">Switch treatments on and off; the figures under “With the treatments ticked” follow at once. Nothing is saved.</p>
      </div>
      <TreatmentChoices site={site} titles={titles} unavailable={unavailable} chosen={chosen} onChange={onChange} />
      <div className="grid gap-4 border-t border-paper-edge pt-3 sm:grid-cols-2" aria-live="polite">
        <Column title="Now" f={now} units={units} testId="whatif-now" />
        {next ? (
          <Column title="With the treatments ticked" f={next} units={units} testId="whatif-with" now={now} />
        ) : applied && !applied.ok ? (
          <Notice tone="caution" title="These treatments cannot be worked out together" testId="whatif-failure">
            {applied.reason}
          </Notice>
        ) : (
          <p className="self-center text-sm text-ink-soft" data-testid="whatif-none">
            Tick a treatment to see what it would change.
          </p>
        )}
      </div>
      {applied?.ok ? (
        <div className="grid gap-3 border-t border-paper-edge pt-3 text-sm md:grid-cols-2" data-testid="whatif-details">
          <div className="flex flex-col gap-1">
            <p className="font-semibold">What it takes</p>
            <Quantities quantities={applied.value.quantities} units={units} />
            <p className="mt-1 font-semibold">
              Cost at the farm’s prices: <span className="num" data-testid="whatif-cost">{formatMoney(applied.value.cost.total, applied.value.cost.currency)}</span>
            </p>
            <CostLines lines={applied.value.cost.lines} currency={applied.value.cost.currency} />
          </div>
          <div className="flex flex-col gap-2">
            {applied.value.effects.length ? (
              <div>
                <p className="font-semibold">Beyond A</p>
                <Effects effects={applied.value.effects} />
              </div>
            ) : null}
            {applied.value.changes.length ? (
              <div>
                <p className="font-semibold">What changes in the estimate</p>
                <ul className="list-inside list-disc">
                  {applied.value.changes.map((c) => (
                    <li key={`${c.factor}-${c.why}`}>
                      <span className="num">
                        {c.factor} {formatFigure(c.from)} → {formatFigure(c.to)}
                      </span>
                      : {c.why}
                    </li>
                  ))}
                </ul>
              </div>
            ) : null}
            <Cautions cautions={applied.value.cautions} />
          </div>
        </div>
      ) : null}
    </section>
  );
}
