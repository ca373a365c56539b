// A field's soil loss now and after its planned treatments: A and A/T with the risk class (in
// words beside its colour), the tonnes a year saved, and what the work does that A does not show.
import { riskClassOf } from '../../../../shared/erosion/risk-class';
import type { Units } from '../../../../shared/schemas/auth';
import type { PlanFieldPrediction } from '../../../../shared/schemas/plans';
import { RiskBadge } from '../../../components/risk/risk-badge';
import { formatFigure } from '../../../lib/format-figure';
import { lossFigure, tonnesFigure } from '../../../lib/loss-units';

export function FieldPrediction({ p, units }: { p: PlanFieldPrediction | undefined; units: Units }) {
  if (!p) return null;
  if (!p.ok)
    return (
      <p className="text-sm text-ink-soft" data-testid="field-prediction">
        No prediction: {p.reason}
      </p>
    );
  const changed = p.tonnesSavedPerYr > 0;
  return (
    <div className="grid gap-2 text-sm sm:grid-cols-2" data-testid="field-prediction">
      <div className="flex flex-col items-start gap-1">
        <span className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Now</span>
        <RiskBadge riskClass={riskClassOf(p.current.aOverT)} />
        <span className="num">
          A {lossFigure(p.current.soilLossTPerHaYr, units).main}, A/T {formatFigure(p.current.aOverT)}
        </span>
      </div>
      <div className="flex flex-col items-start gap-1">
        <span className="text-xs font-semibold uppercase tracking-wide text-ink-soft">After the planned work</span>
        <RiskBadge riskClass={riskClassOf(p.planned.aOverT)} />
        <span className="num" data-testid="field-prediction-after">
          A {lossFigure(p.planned.soilLossTPerHaYr, units).main}, A/T {formatFigure(p.planned.aOverT)}
          {p.reachesT ? ', under T' : ''}
        </span>
      </div>
      <p className="num sm:col-span-2">
        {changed ? (
          <>
            Saves <span className="font-semibold">{tonnesFigure(p.tonnesSavedPerYr, units).main}</span> of soil.
          </>
        ) : (
          <span className="text-ink-soft">
            {p.treatments.length ? 'The planned work changes no RUSLE factor here, so A stays as it is.' : 'Typed work is not modelled, so A stays as it is.'}
            {p.effects.length ? ' What it does instead:' : ''}
          </span>
        )}
      </p>
      {p.effects.length ? (
        <ul className="list-inside list-disc text-ink-soft sm:col-span-2">
          {p.effects.map((e) => (
            <li key={e}>{e}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
