// POST /api/farms/:farmId/budget-plan: which fields get which option for the money there is.
// The choice itself is the engine's planBudget (exact, one option per field); this service
// gathers the options, explains the answer in sentences and draws soil saved against money.
import type { Sequelize } from 'sequelize';
import { planBudget } from '../../../shared/erosion';
import type { BudgetField } from '../../../shared/erosion/treatments/types';
import type { BudgetPlan, BudgetPlanRequest, FarmTreatmentsAnswer } from '../../../shared/schemas/treatments';
import type { Units } from '../../../shared/schemas/auth';
import { tonnesFigure } from '../../../shared/format/loss-units';
import { formatMoney } from '../../../shared/format/money';
import { farmTreatments } from './farm-treatments.service';

type Goal = BudgetPlan['goal'];

/** Points on the soil-saved-against-money curve. */
const CURVE_POINTS = 16;


/** Every field still above T with options that save soil, as planBudget takes them. */
function budgetFields(farm: FarmTreatmentsAnswer): BudgetField[] {
  const out: BudgetField[] = [];
  for (const f of farm.fields) {
    if (!f.answer.ok || f.answer.current.aOverT <= 1) continue;
    const options = f.answer.options.filter((o) => o.tonnesSavedPerYr > 0);
    if (options.length) out.push({ fieldId: f.fieldId, options: options.map((o) => ({ id: o.id, cost: o.cost.total, tonnesSaved: o.tonnesSavedPerYr, reachesT: o.reachesT })) });
  }
  return out;
}

function explain(farm: FarmTreatmentsAnswer, plan: BudgetPlan, candidates: BudgetField[], units: Units): string[] {
  const money = (x: number) => formatMoney(x, plan.currency);
  const lines: string[] = [];
  lines.push(
    plan.goal === 'most-soil'
      ? 'The plan saves the most soil a year the budget allows, with at most one option per field (worked out exactly over whole units of money).'
      : 'The plan brings the most fields under their tolerance T the budget allows, then saves the most soil among such plans, with at most one option per field.',
  );
  const under = farm.fields.filter((f) => f.answer.ok && f.answer.current.aOverT <= 1);
  if (under.length) lines.push(`${under.map((f) => f.name).join(', ')} already ${under.length === 1 ? 'loses' : 'lose'} less soil than T: left as ${under.length === 1 ? 'it is' : 'they are'}.`);
  const unassessed = farm.fields.filter((f) => !f.answer.ok);
  if (unassessed.length) lines.push(`${unassessed.map((f) => f.name).join(', ')} cannot be planned yet: ${unassessed.length === 1 ? 'its' : 'their'} assessment is missing inputs.`);
  const chosen = plan.choices.filter((c) => c.optionId);
  if (chosen.length) {
    lines.push(`It spends ${money(plan.spent)} of ${money(plan.budget)} and saves ${tonnesFigure(plan.tonnesSavedPerYr, units).main} of soil; ${plan.fieldsUnderT} ${plan.fieldsUnderT === 1 ? 'field ends' : 'fields end'} under T.`);
  } else if (candidates.length) {
    const cheapest = Math.min(...candidates.flatMap((f) => f.options.map((o) => o.cost)));
    lines.push(`No option fits the budget: the cheapest that saves soil costs ${money(cheapest)}.`);
  } else lines.push('No field above T has an option that saves soil.');
  const left = candidates.filter((c) => !plan.choices.find((p) => p.fieldId === c.fieldId && p.optionId));
  for (const c of left) {
    const name = farm.fields.find((f) => f.fieldId === c.fieldId)?.name ?? `field ${c.fieldId}`;
    const cheapest = Math.min(...c.options.map((o) => o.cost));
    if (chosen.length) lines.push(`${name} gets nothing this time: its cheapest option costs ${money(cheapest)}, and the money did more on other fields.`);
  }
  return lines;
}

/**
 * Soil saved at budgets from the cheapest option to what every field's dearest option costs,
 * spaced by equal ratios so the cheap end (where most soil is saved per money) shows, and the
 * asked budget among them.
 */
function curveOf(candidates: BudgetField[], goal: Goal, asked: number): BudgetPlan['curve'] {
  const costs = candidates.flatMap((f) => f.options.map((o) => o.cost)).filter((c) => c > 0);
  const top = candidates.reduce((s, f) => s + Math.max(...f.options.map((o) => o.cost)), 0);
  const budgets = new Set<number>([0]);
  if (costs.length && top > 0) {
    const low = Math.max(1, Math.min(...costs));
    for (let i = 0; i < CURVE_POINTS; i++) budgets.add(Math.round(low * (top / low) ** (i / (CURVE_POINTS - 1))));
    if (asked <= top) budgets.add(Math.round(asked));
  }
  return [...budgets].sort((a, b) => a - b).map((budget) => ({ budget, tonnesSavedPerYr: planBudget({ budget, fields: candidates, goal }).tonnesSaved }));
}

export async function budgetPlan(sequelize: Sequelize, farmId: number, request: BudgetPlanRequest, units: Units): Promise<BudgetPlan> {
  const goal: Goal = request.goal ?? 'most-soil';
  const farm = await farmTreatments(sequelize, { farmId, seasonLabel: request.season, units });
  const candidates = budgetFields(farm);
  const answer = planBudget({ budget: request.budget, fields: candidates, goal });
  const optionOf = (fieldId: number, optionId: string | null) => {
    const f = farm.fields.find((x) => x.fieldId === fieldId);
    return f?.answer.ok && optionId ? (f.answer.options.find((o) => o.id === optionId) ?? null) : null;
  };
  const plan: BudgetPlan = {
    season: farm.season,
    goal,
    currency: farm.currency,
    budget: request.budget,
    spent: answer.cost,
    tonnesSavedPerYr: answer.tonnesSaved,
    fieldsUnderT: answer.fieldsUnderT,
    choices: answer.choices.map((c) => {
      const o = optionOf(c.fieldId, c.optionId);
      return {
        fieldId: c.fieldId,
        fieldName: farm.fields.find((f) => f.fieldId === c.fieldId)?.name ?? '',
        optionId: o ? o.id : null,
        title: o ? o.title : null,
        cost: o ? o.cost.total : 0,
        tonnesSavedPerYr: o ? o.tonnesSavedPerYr : 0,
        reachesT: o ? o.reachesT : false,
      };
    }),
    explanation: [],
    curve: curveOf(candidates, goal, request.budget),
  };
  plan.explanation = explain(farm, plan, candidates, units);
  return plan;
}
