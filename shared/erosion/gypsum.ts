// Gypsum: the structural rate for clay structure and infiltration (NRCS conservation practice
// standard 333, Amending Soil Properties with Gypsum Products) and the requirement of a sodic
// soil from its exchangeable sodium, raised for incomplete exchange and the product's purity.
import { amendmentQuantity, type Quantity } from './amendments';
import { assertNonNegative, fail, succeed, type Result } from './assert';
import { tonPerAcToTPerHa } from './units';

/** Typical gypsum rates for structure and infiltration, t/ha (1–2 t/ac): a rule of thumb, not read from the standard's own text. */
export const GYPSUM_TYPICAL_T_PER_HA = { low: 2.2, high: 4.5 } as const;

/** Gypsum for structure: rate × area, default 1 t/ac (the low end of the 1–2 t/ac rule of thumb met with NRCS 333). */
export function gypsumQuantity(args: { areaHa: number; rateTPerHa?: number; truckCapacityT?: number }): Quantity {
  const rate = args.rateTPerHa ?? tonPerAcToTPerHa(1);
  assertNonNegative('rateTPerHa', rate);
  return amendmentQuantity(rate, args.areaHa, 'structural rate 1–2 t/ac met with NRCS conservation practice standard 333 (rule of thumb)', 'practice', args.truckCapacityT);
}

/** ESP at and above which a soil is sodic (USDA Handbook 60). */
export const SODIC_ESP_PCT = 15;
/** Gypsum in a typical agricultural gypsum product, % (example value — replace with the product's label). */
export const GYPSUM_EXAMPLE_PURITY_PCT = 90;
/** Exchange efficiency: field exchange is incomplete, so more gypsum than the stoichiometry (1.1–1.3 used in practice). */
export const GYPSUM_EXCHANGE_EFFICIENCY = { default: 1.2, low: 1.1, high: 1.3 } as const;
/** Bulk density behind USDA Handbook 60's "acre-foot", Mg/m³ (about 4 million lb per acre-foot). */
export const HANDBOOK_60_BULK_DENSITY = 1.47;

/** Pure gypsum a sodic soil needs, Mg/ha (= t/ha), by stoichiometry. Throws on misuse. */
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
  // CaSO4·2H2O, 172.17 g/mol, 86.09 g per mol of charge: 0.8609 g gypsum per kg soil per cmolc/kg, and
  // 100·BD Mg of soil per ha per cm of depth → G (Mg/ha) = 0.0861 × ΔNa × depth (cm) × BD (Mg/m³).
  // Same stoichiometry as USDA Handbook 60: 1.72 short t of pure gypsum per acre-foot per meq/100 g.
  return 0.0861 * dNa * depthCm * bulkDensityMgPerM3;
}

export type SodicGypsumInput = {
  cecCmolPerKg: number;
  espInitialPct: number;
  /** ESP to bring the soil to, default 5 % (common practice). */
  espTargetPct?: number;
  /** Depth to reclaim, cm, default 15 (common practice: the worked layer). */
  depthCm?: number;
  /** Default 1.47 Mg/m³ (the acre-foot of USDA Handbook 60). */
  bulkDensityMgPerM3?: number;
  /** Default 1.2; 1.1–1.3 in practice. */
  exchangeEfficiency?: number;
  /** Gypsum (CaSO4·2H2O) in the product, %; default 90 (example value — replace with the product's label). */
  purityPct?: number;
  areaHa: number;
  truckCapacityT?: number;
};

export type SodicGypsumResult = Quantity & {
  pureGypsumTPerHa: number;
  exchangeEfficiency: number;
  purityPct: number;
  espTargetPct: number;
  depthCm: number;
  bulkDensityMgPerM3: number;
};

/** Gypsum product for a sodic soil: pure requirement × exchange efficiency ÷ (purity/100), × area. */
export function sodicGypsumOrder(input: SodicGypsumInput): Result<SodicGypsumResult> {
  const espTargetPct = input.espTargetPct ?? 5;
  const depthCm = input.depthCm ?? 15;
  const bulkDensityMgPerM3 = input.bulkDensityMgPerM3 ?? HANDBOOK_60_BULK_DENSITY;
  const exchangeEfficiency = input.exchangeEfficiency ?? GYPSUM_EXCHANGE_EFFICIENCY.default;
  const purityPct = input.purityPct ?? GYPSUM_EXAMPLE_PURITY_PCT;
  const checks: [string, number, number, number][] = [
    ['CEC (cmolc/kg)', input.cecCmolPerKg, 0, 200],
    ['ESP (%)', input.espInitialPct, 0, 100],
    ['target ESP (%)', espTargetPct, 0, 100],
    ['depth (cm)', depthCm, 1, 100],
    ['bulk density (Mg/m³)', bulkDensityMgPerM3, 0.5, 2.2],
    ['exchange efficiency', exchangeEfficiency, 1, 2],
    ['gypsum purity (%)', purityPct, 1, 100],
    ['area (ha)', input.areaHa, 0, 100000],
  ];
  for (const [name, v, lo, hi] of checks) {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < lo || v > hi) return fail(`${name} must be a number from ${lo} to ${hi}, got ${String(v)}`);
  }
  if (input.espInitialPct <= espTargetPct) return fail(`ESP ${input.espInitialPct} % is already at or below the target ${espTargetPct} %: no gypsum is needed for sodium`);
  const pure = sodicGypsumRequirement({ cecCmolPerKg: input.cecCmolPerKg, espInitialPct: input.espInitialPct, espTargetPct, depthCm, bulkDensityMgPerM3 });
  // product = pure × exchange efficiency ÷ (purity/100)
  const productTPerHa = (pure * exchangeEfficiency) / (purityPct / 100);
  const q = amendmentQuantity(productTPerHa, input.areaHa, 'sodic-soil gypsum requirement by stoichiometry (USDA Handbook 60), × exchange efficiency ÷ purity', 'pub', input.truckCapacityT);
  return succeed({ ...q, pureGypsumTPerHa: pure, exchangeEfficiency, purityPct, espTargetPct, depthCm, bulkDensityMgPerM3 });
}
