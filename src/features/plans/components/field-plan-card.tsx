// One field in the season plan: its soil loss now and after the planned work, the work itself,
// and what it all costs on this field.
import { Link } from 'react-router-dom';
import type { Units } from '../../../../shared/schemas/auth';
import type { Plan, PlanFieldTotal } from '../../../../shared/schemas/plans';
import { formatMoney } from '../../../lib/money';
import { paths } from '../../../lib/paths';
import { ActionItem, type ActionHandlers } from './action-item';
import { FieldPrediction } from './field-prediction';

type Props = {
  plan: Plan;
  total: PlanFieldTotal;
  fields: { id: number; name: string }[];
  units: Units;
  canChange: boolean;
  canFollowUp: boolean;
  canCheck: boolean;
  handlers: ActionHandlers;
};

export function FieldPlanCard({ plan, total, fields, units, canChange, canFollowUp, canCheck, handlers }: Props) {
  const actions = plan.actions.filter((a) => a.fieldId === total.fieldId);
  return (
    <section aria-label={`${total.fieldName}: planned work`} className="flex flex-col gap-2 rounded-lg border border-paper-edge bg-paper p-3 shadow-sm" data-testid="plan-field" data-field-id={total.fieldId}>
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-serif text-lg font-semibold">
          <Link to={paths.field.getHref(plan.farmId, total.fieldId, { tab: 'risk', season: plan.season })} className="underline-offset-2 hover:underline">
            {total.fieldName}
          </Link>
        </h3>
        <span className="num text-sm" data-testid="plan-field-cost">
          {formatMoney(total.cost, plan.currency)} on this field
        </span>
      </header>
      <FieldPrediction p={plan.prediction.fields.find((f) => f.fieldId === total.fieldId)} units={units} />
      <div className="hidden border-b border-paper-edge pb-1 text-xs font-medium text-ink-soft md:grid md:grid-cols-[minmax(0,2fr)_minmax(0,1.1fr)_minmax(0,0.8fr)_minmax(0,1.3fr)_minmax(0,1.1fr)] md:gap-x-3" aria-hidden="true">
        <span>Work</span>
        <span>Amount</span>
        <span className="text-right">Cost</span>
        <span>When</span>
        <span>Status</span>
      </div>
      <ul>
        {actions.map((a) => (
          <ActionItem
            key={a.id}
            action={a}
            comments={plan.comments.filter((c) => c.actionId === a.id)}
            fields={fields}
            units={units}
            canChange={canChange}
            canFollowUp={canFollowUp}
            canCheck={canCheck}
            handlers={handlers}
          />
        ))}
      </ul>
    </section>
  );
}
