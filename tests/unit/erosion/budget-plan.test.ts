// The budget planner against brute force: every way of choosing at most one option per field
// (a multiple-choice knapsack; Dudziński & Walukiewicz 1987) on small random farms.
import { describe, expect, it } from 'vitest';
import { planBudget, type BudgetField } from '../../../shared/erosion';

/** Mulberry32, a small seeded generator, so every run checks the same cases. */
function prng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Best = { under: number; tonnes: number; cost: number };

/** Every combination, costs rounded up to whole units as the planner counts them. */
function bruteForce(fields: BudgetField[], budget: number, goal: 'most-soil' | 'most-fields-under-t'): Best {
  let best: Best = { under: 0, tonnes: 0, cost: 0 };
  const walk = (i: number, cost: number, under: number, tonnes: number, real: number) => {
    if (cost > budget) return;
    if (i === fields.length) {
      const better = goal === 'most-soil' ? tonnes > best.tonnes + 1e-9 : under > best.under || (under === best.under && tonnes > best.tonnes + 1e-9);
      if (better) best = { under, tonnes, cost: real };
      return;
    }
    walk(i + 1, cost, under, tonnes, real);
    for (const o of fields[i].options) walk(i + 1, cost + Math.ceil(o.cost), under + (o.reachesT ? 1 : 0), tonnes + o.tonnesSaved, real + o.cost);
  };
  walk(0, 0, 0, 0, 0);
  return best;
}

function randomFarm(rand: () => number): { fields: BudgetField[]; budget: number } {
  const n = 1 + Math.floor(rand() * 4);
  const fields: BudgetField[] = [];
  for (let f = 0; f < n; f++) {
    const m = Math.floor(rand() * 4);
    const options = [];
    for (let k = 0; k < m; k++) {
      const fractional = rand() < 0.3;
      const cost = rand() < 0.1 ? 0 : Math.round(rand() * 60 * (fractional ? 100 : 1)) / (fractional ? 100 : 1);
      options.push({ id: `f${f}o${k}`, cost, tonnesSaved: Math.round(rand() * 500) / 10, reachesT: rand() < 0.4 });
    }
    fields.push({ fieldId: f + 1, options });
  }
  return { fields, budget: Math.floor(rand() * 120) };
}

describe('planBudget against brute force (300 seeded random farms per goal)', () => {
  for (const goal of ['most-soil', 'most-fields-under-t'] as const) {
    it(`finds the best plan for ${goal}, within the budget`, () => {
      const rand = prng(goal === 'most-soil' ? 20270101 : 20270202);
      for (let c = 0; c < 300; c++) {
        const { fields, budget } = randomFarm(rand);
        const got = planBudget({ budget, fields, goal });
        const want = bruteForce(fields, budget, goal);
        expect(got.cost).toBeLessThanOrEqual(budget + 1e-9);
        expect(got.tonnesSaved).toBeCloseTo(want.tonnes, 6);
        if (goal === 'most-fields-under-t') expect(got.fieldsUnderT).toBe(want.under);
        expect(got.choices.map((x) => x.fieldId)).toEqual(fields.map((f) => f.fieldId));
        expect(got.moneyStep).toBe(1);
      }
    });
  }
});

describe('planBudget edge cases', () => {
  const fields: BudgetField[] = [
    { fieldId: 1, options: [{ id: 'a', cost: 100, tonnesSaved: 50, reachesT: true }, { id: 'b', cost: 300, tonnesSaved: 120 }] },
    { fieldId: 2, options: [{ id: 'c', cost: 0, tonnesSaved: 5 }] },
  ];
  it('with no money takes only the free options', () => {
    expect(planBudget({ budget: 0, fields })).toMatchObject({ choices: [{ fieldId: 1, optionId: null }, { fieldId: 2, optionId: 'c' }], cost: 0, tonnesSaved: 5, fieldsUnderT: 0 });
  });
  it('chooses nothing when nothing is affordable', () => {
    const r = planBudget({ budget: 50, fields: [fields[0]] });
    expect(r).toMatchObject({ choices: [{ fieldId: 1, optionId: null }], cost: 0, tonnesSaved: 0, fieldsUnderT: 0 });
  });
  it('rounds costs up so the budget is never exceeded', () => {
    const r = planBudget({ budget: 2.5, fields: [{ fieldId: 1, options: [{ id: 'x', cost: 1.2, tonnesSaved: 1 }] }, { fieldId: 2, options: [{ id: 'y', cost: 1.2, tonnesSaved: 1 }] }] });
    expect(r.cost).toBeCloseTo(1.2, 10);
    expect(r.tonnesSaved).toBe(1);
  });
  it('under the second goal prefers a field brought under T to more tonnes', () => {
    const r = planBudget({ budget: 300, fields, goal: 'most-fields-under-t' });
    expect(r.choices[0].optionId).toBe('a');
    expect(planBudget({ budget: 300, fields }).choices[0].optionId).toBe('b');
  });
  it('stays exact for a farm-sized problem (40 fields × 20 options, budget 200 000)', () => {
    const rand = prng(7);
    const big: BudgetField[] = Array.from({ length: 40 }, (_, f) => ({
      fieldId: f,
      options: Array.from({ length: 20 }, (_, k) => ({ id: `${f}-${k}`, cost: Math.round(rand() * 20000), tonnesSaved: rand() * 300 })),
    }));
    const r = planBudget({ budget: 200_000, fields: big });
    expect(r.moneyStep).toBe(1);
    expect(r.note).toBeUndefined();
    expect(r.cost).toBeLessThanOrEqual(200_000);
  });
  it('counts money in larger steps for an outsized budget, and says so', () => {
    const r = planBudget({ budget: 1e9, fields: Array.from({ length: 40 }, (_, f) => ({ fieldId: f, options: [{ id: 'x', cost: 5e7, tonnesSaved: 1 }] })) });
    expect(r.moneyStep).toBeGreaterThan(1);
    expect(r.note).toMatch(/steps of/);
    expect(r.cost).toBeLessThanOrEqual(1e9);
  });
  it('throws on misuse', () => {
    expect(() => planBudget({ budget: -1, fields: [] })).toThrow('budget must be a finite number >= 0, got -1');
    expect(() => planBudget({ budget: 1, fields: [{ fieldId: 1, options: [] }, { fieldId: 1, options: [] }] })).toThrow('field 1 is listed twice');
  });
});
