// A treatment option turned into a season plan's actions: one action per treatment it combines,
// each with the cost lines that belong to that treatment (its own price-list items; spreading
// goes with the amendment it spreads) and the amount of its main line. Pure.
import type { PriceKey } from './schemas/treatments';
import type { TreatmentKey, TreatmentOption } from './erosion/treatments/types';
import { round2 } from './erosion/treatments/plan';

/** Which treatment each price-list item pays for; spreading belongs to the amendment beside it. */
const ITEM_TREATMENT: Record<Exclude<PriceKey, 'spreading-per-ha'>, TreatmentKey> = {
  'lime-per-t': 'lime',
  'gypsum-per-t': 'gypsum',
  'compost-per-t': 'organic-matter',
  'cover-crop-per-ha': 'cover-crop',
  'no-till-per-ha': 'no-till',
  'reduced-till-per-ha': 'reduced-till',
  'contour-layout-per-ha': 'contour-farming',
  'strip-layout-per-ha': 'strip-cropping',
  'terrace-per-m': 'terraces',
  'waterway-per-m': 'grassed-waterway',
  'filter-strip-per-ha': 'filter-strip',
  'drainage-per-ha': 'drainage',
  'raised-beds-per-ha': 'raised-beds',
  'permanent-cover-per-ha': 'permanent-cover',
};
const AMENDMENTS: TreatmentKey[] = ['lime', 'gypsum', 'organic-matter'];

export type ActionFromOption = { fieldId: number; treatment: TreatmentKey; quantity: number | null; unit: string | null; cost: number; notes: string | null };

export function actionsFromOption(fieldId: number, option: TreatmentOption): ActionFromOption[] {
  const owner = (key: PriceKey): TreatmentKey => {
    if (key !== 'spreading-per-ha') return ITEM_TREATMENT[key];
    return option.treatments.find((t) => AMENDMENTS.includes(t)) ?? option.treatments[0];
  };
  const combined = option.treatments.length > 1;
  return option.treatments.map((treatment) => {
    const lines = option.cost.lines.filter((l) => owner(l.priceKey) === treatment);
    // The treatment's own item (not the spreading) gives the amount to order or do.
    const main = lines.find((l) => l.priceKey !== 'spreading-per-ha') ?? lines[0];
    return {
      fieldId,
      treatment,
      quantity: main ? main.quantity : null,
      unit: main ? main.unit : null,
      cost: round2(lines.reduce((s, l) => s + l.total, 0)),
      notes: combined ? `Part of “${option.title}”.` : null,
    };
  });
}
