// The budget planner: type what there is to spend this season and choose what matters most (the
// most soil saved, or the most fields brought under T); the server picks one treatment per field
// within the money and says why. Shown beside it: which field gets what, the total spent and
// saved, and soil saved against money for every budget.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup } from '../../../components/ui/choice-group';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';
import { tonnesFigure } from '../../../lib/loss-units';
import { currencySign, formatMoney } from '../../../lib/money';
import type { Units } from '../../../../shared/schemas/auth';
import { BudgetPlanRequest, type BudgetPlan } from '../../../../shared/schemas/treatments';
import { usePrices } from '../api/get-prices';
import { useBudgetPlan } from '../api/plan-budget';
import { BudgetPlanTable, type ChoiceExtra } from './budget-plan-table';
import { SoilMoneyChart } from './soil-money-chart';

const BudgetForm = BudgetPlanRequest.pick({ budget: true, goal: true });
type Values = { budget: number | null; goal: 'most-soil' | 'most-fields-under-t' };
type Output = z.output<typeof BudgetForm>;

const GOALS = [
  { value: 'most-soil', label: 'Save the most soil' },
  { value: 'most-fields-under-t', label: 'Bring the most fields under T' },
] as const;

function Summary({ plan, units }: { plan: BudgetPlan; units: Units }) {
  const saved = tonnesFigure(plan.tonnesSavedPerYr, units);
  const assessed = plan.choices.length;
  return (
    <dl className="grid gap-3 rounded-md border border-clay bg-white/60 p-3 sm:grid-cols-3" data-testid="budget-summary">
      <div className="flex flex-col">
        <dt className="text-sm text-ink-soft">Spent</dt>
        <dd>
          <span className="num text-2xl font-semibold" data-testid="budget-spent">
            {formatMoney(plan.spent, plan.currency)}
          </span>
          <span className="num block text-sm text-ink-soft">of {formatMoney(plan.budget, plan.currency)}</span>
        </dd>
      </div>
      <div className="flex flex-col">
        <dt className="text-sm text-ink-soft">Soil saved</dt>
        <dd>
          <span className="num text-2xl font-semibold" data-testid="budget-saved">
            {saved.main}
          </span>
          <span className="num block text-sm text-ink-soft">{saved.alt}</span>
        </dd>
      </div>
      <div className="flex flex-col">
        <dt className="text-sm text-ink-soft">Fields under T after</dt>
        <dd>
          <span className="num text-2xl font-semibold" data-testid="budget-fields-under-t">
            {plan.fieldsUnderT}
          </span>
          <span className="num block text-sm text-ink-soft">of {assessed} with options</span>
        </dd>
      </div>
    </dl>
  );
}

type Props = { farmId: number; season: string; units: Units; choiceExtra?: ChoiceExtra };

export function BudgetPlanner({ farmId, season, units, choiceExtra }: Props) {
  const currency = usePrices(farmId).data?.currency;
  const [asked, setAsked] = useState<Output | null>(null);
  const plan = useBudgetPlan(farmId, asked ? { season, ...asked } : null);
  const form = useForm<Values, unknown, Output>({
    resolver: zodResolver(BudgetForm) as unknown as Resolver<Values, unknown, Output>,
    defaultValues: { budget: null, goal: 'most-soil' },
  });
  const { register, handleSubmit, formState } = form;
  const shown = plan.data && plan.data.season === season ? plan.data : null;

  return (
    <section aria-labelledby="budget-heading" className="flex flex-col gap-4" data-testid="budget-planner">
      <h2 id="budget-heading" className="text-lg font-semibold">
        What the money is best spent on
      </h2>
      <form className="flex flex-wrap items-end gap-4" onSubmit={handleSubmit(setAsked)} noValidate data-testid="budget-form">
        <TextField
          label={currency ? `Budget for ${season} (${currency}, ${currencySign(currency)})` : `Budget for ${season}`}
          inputMode="decimal"
          className="num w-56"
          error={plainMessage(formState.errors.budget?.message)}
          data-testid="budget-amount"
          {...register('budget', { setValueAs: toNumberOrNull })}
        />
        <ChoiceGroup label="What matters most" choices={GOALS} inputProps={register('goal')} testId="budget-goal" />
        <Button type="submit" disabled={plan.isFetching} data-testid="budget-submit">
          {plan.isFetching ? 'Working out…' : 'Work out the plan'}
        </Button>
      </form>

      {plan.isError ? (
        <Notice tone="error" title="The plan could not be worked out">
          {plan.error.message}
        </Notice>
      ) : null}
      {shown ? (
        <div className={`flex flex-col gap-4 ${plan.isPlaceholderData ? 'opacity-60' : ''}`} aria-busy={plan.isFetching} data-testid="budget-plan">
          <Summary plan={shown} units={units} />
          {shown.explanation.length ? (
            <div className="flex flex-col gap-1 text-sm" data-testid="budget-explanation">
              <h3 className="font-serif text-base font-semibold">Why this plan</h3>
              <ul className="list-inside list-disc">
                {shown.explanation.map((s) => (
                  <li key={s}>{s}</li>
                ))}
              </ul>
            </div>
          ) : null}
          <BudgetPlanTable plan={shown} farmId={farmId} units={units} choiceExtra={choiceExtra} />
          <SoilMoneyChart plan={shown} units={units} />
        </div>
      ) : !asked ? (
        <p className="text-sm text-ink-soft">Type a budget and choose what matters most to see which fields get what.</p>
      ) : null}
    </section>
  );
}
