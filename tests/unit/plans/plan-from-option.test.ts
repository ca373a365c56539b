// A treatment option split into plan actions: one per treatment, each with the cost lines of its
// own price-list items (spreading with the amendment it spreads). Hand-made options; the split is
// bookkeeping, not science, so no published source applies.
import { describe, expect, it } from 'vitest';
import { actionsFromOption } from '../../../shared/plan-from-option';
import type { CostLine, TreatmentOption } from '../../../shared/erosion/treatments/types';

const line = (priceKey: CostLine['priceKey'], quantity: number, unit: string, unitPrice: number): CostLine => ({ priceKey, quantity, unit, unitPrice, total: Math.round(quantity * unitPrice * 100) / 100 });

const option = (treatments: TreatmentOption['treatments'], lines: CostLine[], title: string): TreatmentOption => ({
  id: treatments.join('+'),
  treatments,
  title,
  soilLossTPerHaYr: 5,
  aOverT: 0.5,
  runoffMm: null,
  tonnesSavedPerYr: 40,
  quantities: [],
  cost: { total: lines.reduce((s, l) => s + l.total, 0), currency: 'USD', lines },
  tonnesSavedPerMoney: 0.01,
  reachesT: true,
  cheapestUnderT: false,
  changes: [],
  effects: [],
  cautions: [],
});

describe('a treatment option as plan actions', () => {
  it('splits a combined option into one action per treatment with its own cost lines', () => {
    const o = option(['contour-farming', 'no-till', 'cover-crop'], [line('contour-layout-per-ha', 12.5, 'ha', 20), line('no-till-per-ha', 12.5, 'ha', 45), line('cover-crop-per-ha', 12.5, 'ha', 80)], 'Contour farming + no-till + cover crop');
    const actions = actionsFromOption(7, o);
    expect(actions).toEqual([
      { fieldId: 7, treatment: 'contour-farming', quantity: 12.5, unit: 'ha', cost: 250, notes: 'Part of “Contour farming + no-till + cover crop”.' },
      { fieldId: 7, treatment: 'no-till', quantity: 12.5, unit: 'ha', cost: 562.5, notes: 'Part of “Contour farming + no-till + cover crop”.' },
      { fieldId: 7, treatment: 'cover-crop', quantity: 12.5, unit: 'ha', cost: 1000, notes: 'Part of “Contour farming + no-till + cover crop”.' },
    ]);
    expect(actions.reduce((s, a) => s + a.cost, 0)).toBeCloseTo(o.cost.total, 6);
  });

  it('gives spreading to the amendment, and the amendment’s own amount to order', () => {
    const o = option(['gypsum'], [line('gypsum-per-t', 8.4, 't', 60), line('spreading-per-ha', 4.2, 'ha', 25)], 'Gypsum');
    expect(actionsFromOption(3, o)).toEqual([{ fieldId: 3, treatment: 'gypsum', quantity: 8.4, unit: 't', cost: 609, notes: null }]);
  });

  it('leaves amount and cost empty for a treatment with no cost line', () => {
    const o = option(['no-till', 'cover-crop'], [line('cover-crop-per-ha', 2, 'ha', 80)], 'No-till + cover crop');
    expect(actionsFromOption(1, o)[0]).toMatchObject({ treatment: 'no-till', quantity: null, unit: null, cost: 0 });
  });
});
