// Amendment quantities: gypsum (NRCS practice standard 333; sodic requirement), lime from buffer
// pH (NCDA&CS method) and compost. Results in tonnes and t/ha.
import { assertFinite, assertNonNegative, assertPositive, fail, succeed, type Result } from './assert';
import type { Flag } from './cover';
import { tPerHaToTonPerAc, tonPerAcToTPerHa, tToShortTon } from './units';

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

function quantity(tPerHa: number, areaHa: number, source: string, flag: Flag, truckCapacityT?: number): Quantity {
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

/** Typical gypsum rates for structure and infiltration, t/ha (NRCS 333: 1–2 t/ac). */
export const GYPSUM_TYPICAL_T_PER_HA = { low: 2.2, high: 4.5 } as const;

/** Gypsum for a field: rate × area (NRCS practice standard 333). Default rate 1 t/ac. */
export function gypsumQuantity(args: { areaHa: number; rateTPerHa?: number; truckCapacityT?: number }): Quantity {
  const rate = args.rateTPerHa ?? tonPerAcToTPerHa(1);
  assertNonNegative('rateTPerHa', rate);
  return quantity(rate, args.areaHa, 'NRCS conservation practice standard 333 (gypsum), rate × area', 'pub', args.truckCapacityT);
}

/** Gypsum requirement of a sodic soil, Mg/ha (= t/ha) [memory]. */
export function sodicGypsumRequirement(args: {
  cecCmolPerKg: number;
  espInitialPct: number;
  espTargetPct: number;
  depthCm: number;
  bulkDensityMgPerM3: number;
}): number {
  const { cecCmolPerKg, espInitialPct, espTargetPct, depthCm, bulkDensityMgPerM3 } = args;
  for (const [k, v] of Object.entries(args)) assertNonNegative(k, v);
  // ΔNa = CEC × (ESPᵢ − ESPₜ)/100, cmolc/kg
  const dNa = Math.max(0, (cecCmolPerKg * (espInitialPct - espTargetPct)) / 100);
  // gypsum requirement G (Mg/ha) = 0.0861 × ΔNa × depth (cm) × bulk density (Mg/m³) [memory]
  return 0.0861 * dNa * depthCm * bulkDensityMgPerM3;
}

/** Sodic-soil gypsum as a quantity for an area. */
export function sodicGypsumQuantity(args: Parameters<typeof sodicGypsumRequirement>[0] & { areaHa: number; truckCapacityT?: number }): Quantity {
  return quantity(sodicGypsumRequirement(args), args.areaHa, 'sodic-soil gypsum requirement 0.0861·ΔNa·depth·BD', 'memory', args.truckCapacityT);
}

export type LimeInput = { soilPh: number; bufferPh: number; targetPh: number; ccePct?: number; areaHa?: number; truckCapacityT?: number };

/**
 * Lime from buffer pH by the NCDA&CS method. Returns product t/ac and t/ha (÷ CCE/100).
 * Expected failures (pH out of range) are values.
 */
export function limeRequirement(input: LimeInput): Result<Quantity & { acidityMeqPer100Cm3: number; pureLimeTonPerAc: number; ccePct: number }> {
  const { soilPh, bufferPh, targetPh, ccePct = 100, areaHa = 1 } = input;
  for (const [k, v] of Object.entries({ soilPh, bufferPh, targetPh, ccePct })) {
    if (!Number.isFinite(v)) return fail(`${k} is missing or not a number`);
  }
  if (soilPh < 3 || soilPh > 9) return fail(`soilPh must be between 3 and 9, got ${soilPh}`);
  if (bufferPh < 3 || bufferPh > 8) return fail(`bufferPh must be between 3 and 8, got ${bufferPh}`);
  if (ccePct <= 0 || ccePct > 200) return fail(`ccePct must be between 0 and 200 %, got ${ccePct}`);
  assertFinite('areaHa', areaHa);
  // NCDA&CS: acidity (meq/100 cm³) = (6.6 − buffer pH) × 4
  const acidity = Math.max(0, (6.6 - bufferPh) * 4);
  // NCDA&CS: LR (t/ac) = acidity × (target pH − soil pH)/(6.6 − soil pH)
  const pure = soilPh >= 6.6 || targetPh <= soilPh ? 0 : (acidity * (targetPh - soilPh)) / (6.6 - soilPh);
  // product rate = pure rate ÷ (CCE/100)
  const productTonPerAc = pure / (ccePct / 100);
  const q = quantity(tonPerAcToTPerHa(productTonPerAc), areaHa, 'NCDA&CS buffer-pH lime method', 'pub', input.truckCapacityT);
  return succeed({ ...q, acidityMeqPer100Cm3: acidity, pureLimeTonPerAc: pure, ccePct });
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
    ...quantity(rate, args.areaHa, 'compost rates; bound by nutrient budgets (NRCS practice 590)', 'memory', args.truckCapacityT),
    rangeTPerHa: [r.low, r.high],
    note: 'check the compost\'s nutrients against the field\'s nutrient budget (NRCS 590) before spreading',
  };
}
