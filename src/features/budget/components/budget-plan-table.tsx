// Which field gets what under the plan: the treatment, what it costs, the soil it saves a year,
// and whether it brings the field under T. Fields the money does not reach say so.
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Units } from '../../../../shared/schemas/auth';
import type { BudgetPlan } from '../../../../shared/schemas/treatments';
import { tonnesFigure } from '../../../lib/loss-units';
import { formatMoney } from '../../../lib/money';
import { paths } from '../../../lib/paths';

/** A slot in each row the budget gives a treatment (the page puts "Add to the plan" there). */
export type ChoiceExtra = (ctx: { season: string; fieldId: number; optionId: string }) => ReactNode;

type Props = { plan: BudgetPlan; farmId: number; units: Units; choiceExtra?: ChoiceExtra };

export function BudgetPlanTable({ plan, farmId, units, choiceExtra }: Props) {
  const tonnesUnit = units === 'ac' ? 'US tons/yr' : 't/yr';
  const rows = [...plan.choices].sort((a, b) => Number(b.optionId !== null) - Number(a.optionId !== null) || b.tonnesSavedPerYr - a.tonnesSavedPerYr);
  return (
    <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/50">
      <table className="w-full text-sm" data-testid="budget-plan-table">
        <caption className="sr-only">Treatments the plan gives each field</caption>
        <thead className="border-b border-paper-edge text-left text-ink-soft">
          <tr>
            <th scope="col" className="px-2 py-1.5 font-medium">Field</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Treatment</th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">Cost</th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">Soil saved ({tonnesUnit})</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Under T after</th>
            {choiceExtra ? (
              <th scope="col" className="px-2 py-1.5 font-medium">
                <span className="sr-only">Season plan</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {rows.map((c) => (
            <tr key={c.fieldId} className="border-b border-paper-edge last:border-b-0 align-top" data-testid="budget-plan-row" data-field-id={c.fieldId}>
              <td className="px-2 py-1.5">
                <Link
                  to={paths.field.getHref(farmId, c.fieldId, { tab: 'risk', season: plan.season })}
                  className="font-semibold text-clay-dark underline-offset-2 hover:underline"
                >
                  {c.fieldName}
                </Link>
              </td>
              <td className="px-2 py-1.5">{c.title ?? <span className="text-ink-soft">nothing this time</span>}</td>
              <td className="num px-2 py-1.5 text-right whitespace-nowrap">{c.optionId ? formatMoney(c.cost, plan.currency) : '—'}</td>
              <td className="num px-2 py-1.5 text-right whitespace-nowrap" title={c.optionId ? tonnesFigure(c.tonnesSavedPerYr, units).alt : undefined}>
                {c.optionId ? tonnesFigure(c.tonnesSavedPerYr, units).main : '—'}
              </td>
              <td className="px-2 py-1.5">{c.optionId ? (c.reachesT ? <span className="font-semibold">yes</span> : <span className="text-ink-soft">not yet</span>) : ''}</td>
              {choiceExtra ? <td className="px-2 py-1.5">{c.optionId ? choiceExtra({ season: plan.season, fieldId: c.fieldId, optionId: c.optionId }) : null}</td> : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
