// Budget planner: at most one option per field, the most soil saved (or the most fields brought
// under T, then the most soil) within a budget. A multiple-choice knapsack, solved exactly by
// dynamic programming over money in whole currency units (costs rounded up, so the plan never
// spends more than the budget). Dudziński & Walukiewicz 1987, Eur. J. Oper. Res. 28:3, on the
// multiple-choice knapsack problem.
import type { BudgetAnswer, BudgetInput } from './treatments/types';

/** Money steps × fields kept in the table; past this the money unit grows (and the answer says so). */
export const BUDGET_TABLE_LIMIT = 16_000_000;

export type BudgetPlanAnswer = BudgetAnswer & {
  /** Whole currency units per step of the table: 1 unless the budget was too large for the table. */
  moneyStep: number;
  /** Why the answer is not exact in whole units, when it is not. */
  note?: string;
};

const EPS = 1e-9;

/** Is (aUnder, aTonnes) better than (bUnder, bTonnes)? Fields under T first when countFields, else tonnes first. */
function better(aUnder: number, aTonnes: number, bUnder: number, bTonnes: number, countFields: boolean): boolean {
  if (countFields && aUnder !== bUnder) return aUnder > bUnder;
  if (Math.abs(aTonnes - bTonnes) > EPS) return aTonnes > bTonnes;
  return !countFields && aUnder > bUnder;
}

/** Throws on misuse: a negative or non-finite budget or cost, a field listed twice. */
export function planBudget(input: BudgetInput): BudgetPlanAnswer {
  const goal = input.goal ?? 'most-soil';
  if (goal !== 'most-soil' && goal !== 'most-fields-under-t') throw new Error(`goal must be 'most-soil' or 'most-fields-under-t', got ${String(goal)}`);
  if (!Number.isFinite(input.budget) || input.budget < 0) throw new Error(`budget must be a finite number >= 0, got ${input.budget}`);
  const seen = new Set<number>();
  for (const f of input.fields) {
    if (seen.has(f.fieldId)) throw new Error(`field ${f.fieldId} is listed twice`);
    seen.add(f.fieldId);
    for (const o of f.options) {
      if (!Number.isFinite(o.cost) || o.cost < 0) throw new Error(`option ${o.id} of field ${f.fieldId}: cost must be a finite number >= 0, got ${o.cost}`);
      if (!Number.isFinite(o.tonnesSaved)) throw new Error(`option ${o.id} of field ${f.fieldId}: tonnesSaved must be a finite number`);
    }
  }
  const n = input.fields.length;
  const countFields = goal === 'most-fields-under-t';
  // Whole units, costs rounded up; the table needs no more money than every field's dearest option.
  const wholeBudget = Math.floor(input.budget + EPS);
  const dearest = input.fields.reduce((s, f) => s + Math.max(0, ...f.options.map((o) => Math.ceil(o.cost - EPS))), 0);
  const reach = Math.min(wholeBudget, dearest);
  const step = Math.max(1, Math.ceil(((reach + 1) * Math.max(n, 1)) / BUDGET_TABLE_LIMIT));
  const width = Math.floor(reach / step) + 1;
  const costSteps = input.fields.map((f) => f.options.map((o) => Math.ceil(Math.ceil(o.cost - EPS) / step)));

  // best[b]: the best value of the fields so far spending at most b steps.
  let under = new Int32Array(width);
  let tonnes = new Float64Array(width);
  const choice: Int16Array[] = [];
  for (let i = 0; i < n; i++) {
    const opts = input.fields[i].options;
    const nextUnder = new Int32Array(under);
    const nextTonnes = new Float64Array(tonnes);
    const pick = new Int16Array(width);
    for (let k = 0; k < opts.length; k++) {
      const c = costSteps[i][k];
      const du = opts[k].reachesT ? 1 : 0;
      const dt = opts[k].tonnesSaved;
      for (let b = c; b < width; b++) {
        const cu = under[b - c] + du;
        const ct = tonnes[b - c] + dt;
        if (better(cu, ct, nextUnder[b], nextTonnes[b], countFields)) {
          nextUnder[b] = cu;
          nextTonnes[b] = ct;
          pick[b] = k + 1;
        }
      }
    }
    under = nextUnder;
    tonnes = nextTonnes;
    choice.push(pick);
  }

  const picks: (number | null)[] = new Array(n).fill(null);
  let b = width - 1;
  for (let i = n - 1; i >= 0; i--) {
    const k = choice[i][b];
    if (k > 0) {
      picks[i] = k - 1;
      b -= costSteps[i][k - 1];
    }
  }
  let cost = 0;
  let saved = 0;
  let fieldsUnderT = 0;
  const choices = input.fields.map((f, i) => {
    const k = picks[i];
    if (k === null) return { fieldId: f.fieldId, optionId: null };
    const o = f.options[k];
    cost += o.cost;
    saved += o.tonnesSaved;
    if (o.reachesT) fieldsUnderT++;
    return { fieldId: f.fieldId, optionId: o.id };
  });
  return {
    choices,
    cost,
    tonnesSaved: saved,
    fieldsUnderT,
    moneyStep: step,
    ...(step > 1 ? { note: `the budget is large for an exact table: money is counted in steps of ${step} (costs rounded up to a step), so the plan may leave up to a few steps unspent` } : {}),
  };
}
