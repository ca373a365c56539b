// The plan in three figures: what it costs, the soil it saves a year over the farm, and how many
// of its fields it brings under T.
import type { Units } from '../../../../shared/schemas/auth';
import type { Plan } from '../../../../shared/schemas/plans';
import { tonnesFigure } from '../../../lib/loss-units';
import { formatMoney } from '../../../lib/money';

function Figure({ label, value, testId, note }: { label: string; value: string; testId: string; note?: string }) {
  return (
    <div className="flex flex-col rounded-md border border-paper-edge bg-white/50 px-3 py-2">
      <span className="text-xs font-semibold uppercase tracking-wide text-ink-soft">{label}</span>
      <span className="num font-serif text-2xl font-semibold" data-testid={testId}>
        {value}
      </span>
      {note ? <span className="text-xs text-ink-soft">{note}</span> : null}
    </div>
  );
}

export function PlanSummary({ plan, units }: { plan: Plan; units: Units }) {
  const predicted = plan.prediction.fields.filter((f) => f.ok);
  const underT = predicted.filter((f) => f.ok && f.reachesT).length;
  const saved = tonnesFigure(plan.prediction.tonnesSavedPerYr, units);
  return (
    <div className="grid gap-2 sm:grid-cols-3" data-testid="plan-summary">
      <Figure label="Cost of the work" value={formatMoney(plan.totals.cost, plan.currency)} testId="plan-total-cost" note={`${plan.actions.length} piece${plan.actions.length === 1 ? '' : 's'} of work on ${plan.totals.fields.length} field${plan.totals.fields.length === 1 ? '' : 's'}`} />
      <Figure label="Soil saved a year" value={saved.main} testId="plan-tonnes-saved" note={saved.alt} />
      <Figure label="Fields under T after" value={`${underT} of ${predicted.length}`} testId="plan-fields-under-t" note="of the fields with work planned" />
    </div>
  );
}
