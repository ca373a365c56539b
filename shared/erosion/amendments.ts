// Amendment quantities: rate × area for any amendment, and compost. Gypsum is in gypsum.ts,
// lime in lime.ts. Results in tonnes and t/ha.
import { assertNonNegative, assertPositive } from './assert';
import type { Flag } from './cover';
import { tPerHaToTonPerAc, tToShortTon } from './units';

export type Quantity = {
  /** Rate, t/ha */
  tPerHa: number;
  /** Rate, short t/ac */
  tonPerAc: number;
  /** Total for the area, metric tonnes */
  tonnes: number;
  /** Total for the area, short tons */
  shortTons: number;
  /** Loads of truckCapacityT, rounded up, when a capacity was given */
  truckloads?: number;
  source: string;
  flag: Flag;
};

/** Rate × area as a quantity (metric and US), with truckloads when a capacity is given. */
export function amendmentQuantity(tPerHa: number, areaHa: number, source: string, flag: Flag, truckCapacityT?: number): Quantity {
  assertNonNegative('areaHa', areaHa);
  // quantity for a field = rate × area
  const tonnes = tPerHa * areaHa;
  const q: Quantity = { tPerHa, tonPerAc: tPerHaToTonPerAc(tPerHa), tonnes, shortTons: tToShortTon(tonnes), source, flag };
  if (truckCapacityT !== undefined) {
    assertPositive('truckCapacityT', truckCapacityT);
    q.truckloads = Math.ceil(tonnes / truckCapacityT - 1e-9);
  }
  return q;
}

/** Compost rates, t/ha [memory]: once to build 10–50, yearly to maintain 5–10; bound by NRCS 590 nutrient budgets. */
export const COMPOST_RATES_T_PER_HA = { build: { low: 10, high: 50, typical: 25 }, maintain: { low: 5, high: 10, typical: 7.5 } } as const;

/** Organic matter (compost) quantity; default rate the typical one for the purpose. */
export function compostQuantity(args: { areaHa: number; purpose: 'build' | 'maintain'; rateTPerHa?: number; truckCapacityT?: number }): Quantity & { rangeTPerHa: [number, number]; note: string } {
  const r = COMPOST_RATES_T_PER_HA[args.purpose];
  if (!r) throw new Error(`purpose must be 'build' or 'maintain', got ${String(args.purpose)}`);
  const rate = args.rateTPerHa ?? r.typical;
  assertNonNegative('rateTPerHa', rate);
  return {
    ...amendmentQuantity(rate, args.areaHa, 'compost rates; bound by nutrient budgets (NRCS practice 590)', 'memory', args.truckCapacityT),
    rangeTPerHa: [r.low, r.high],
    note: 'check the compost\'s nutrients against the field\'s nutrient budget (NRCS 590) before spreading',
  };
}
