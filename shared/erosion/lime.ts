// Lime from soil pH and buffer pH. The buffer method travels with the reading: each buffer
// starts at its own pH and has its own calibration, so a reading is read only by its method,
// inside that method's range. Product rate from the lime's CCE and fineness.
import smpJson from '../../data/reference/lime-smp.json';
import { fail, succeed, type Result } from './assert';
import type { Flag } from './cover';
import { amendmentQuantity, type Quantity } from './amendments';
import { tonPerAcToTPerHa } from './units';

export type BufferMethod = 'smp' | 'mehlich';
export const BUFFER_METHODS: readonly BufferMethod[] = ['smp', 'mehlich'];

export type SmpTable = {
  source: string;
  flag: Flag;
  note: string;
  targetsPh: number[];
  rows: { bufferPh: number; tonPerAc: Record<string, number>; flag: Flag }[];
};
export const DEFAULT_SMP_TABLE = smpJson as unknown as SmpTable;

/** What each method accepts: buffer pH range, target pH range, and where its figures come from. */
export const BUFFER_METHOD_INFO: Record<BufferMethod, { name: string; bufferPh: [number, number]; targetPh: [number, number]; source: string; flag: Flag }> = {
  // The Mehlich buffer starts at pH 6.6: no reading can lie above it. Below 4.0 is taken as a
  // misreading (common practice, no published limit).
  mehlich: { name: 'Mehlich buffer (NCDA&CS method)', bufferPh: [4.0, 6.6], targetPh: [5.0, 6.5], source: 'NCDA&CS Agronomic Division, lime requirement from buffer acidity', flag: 'pub' },
  smp: {
    name: 'SMP buffer',
    bufferPh: [DEFAULT_SMP_TABLE.rows[DEFAULT_SMP_TABLE.rows.length - 1].bufferPh, DEFAULT_SMP_TABLE.rows[0].bufferPh],
    targetPh: [Math.min(...DEFAULT_SMP_TABLE.targetsPh), Math.max(...DEFAULT_SMP_TABLE.targetsPh)],
    source: DEFAULT_SMP_TABLE.source,
    flag: DEFAULT_SMP_TABLE.flag,
  },
};

/** Target pH used when none is given: NCDA&CS's 6.0 for mineral soils; 6.5 from the SMP table's middle column (common practice for corn and soybean). */
export const DEFAULT_TARGET_PH: Record<BufferMethod, number> = { mehlich: 6.0, smp: 6.5 };

export type PureLime = {
  /** Pure CaCO3-equivalent lime, short t/ac. */
  pureTonPerAc: number;
  method: BufferMethod;
  targetPh: number;
  /** Why the rate is what it is, for a person (e.g. already at target). */
  reason: string;
  source: string;
  flag: Flag;
  acidityMeqPer100Cm3?: number;
};

/**
 * Pure lime (CaCO3 equivalent, short t/ac) from soil pH and a buffer pH read by a named method.
 * Unknown method, a reading outside the method's range or a target outside its calibration fail in words.
 */
export function pureLimeRequirement(args: { method: string; soilPh: number; bufferPh: number; targetPh?: number }): Result<PureLime> {
  const { method, soilPh, bufferPh } = args;
  if (!BUFFER_METHODS.includes(method as BufferMethod)) {
    return fail(`buffer method '${method}' is not known: the lime rate needs the buffer the lab used (${BUFFER_METHODS.join(' or ')})`);
  }
  const m = method as BufferMethod;
  const info = BUFFER_METHOD_INFO[m];
  const targetPh = args.targetPh ?? DEFAULT_TARGET_PH[m];
  for (const [k, v] of Object.entries({ soilPh, bufferPh, targetPh })) {
    if (typeof v !== 'number' || !Number.isFinite(v)) return fail(`${k} is missing or not a number`);
  }
  if (soilPh < 3 || soilPh > 9) return fail(`soil pH must be between 3 and 9, got ${soilPh}`);
  if (bufferPh < info.bufferPh[0] || bufferPh > info.bufferPh[1]) {
    return fail(`${info.name} pH ${bufferPh} is outside the method's range ${info.bufferPh[0]}–${info.bufferPh[1]}: check the reading and the buffer the lab used; no lime rate can be read from it`);
  }
  if (targetPh < info.targetPh[0] || targetPh > info.targetPh[1]) {
    return fail(`target pH ${targetPh} is outside the ${info.name} calibration (${info.targetPh[0]}–${info.targetPh[1]})`);
  }
  const base = { method: m, targetPh, source: info.source, flag: info.flag };
  if (soilPh >= targetPh) {
    return succeed({ ...base, pureTonPerAc: 0, reason: `soil pH ${soilPh} is already at or above the target ${targetPh}: no lime is needed` });
  }
  if (m === 'mehlich') {
    // NCDA&CS: acidity (meq/100 cm³) = (6.6 − buffer pH) × 4
    const acidity = (6.6 - bufferPh) * 4;
    // NCDA&CS: LR (t/ac) = acidity × (target pH − soil pH)/(6.6 − soil pH)
    const pure = (acidity * (targetPh - soilPh)) / (6.6 - soilPh);
    return succeed({ ...base, pureTonPerAc: pure, acidityMeqPer100Cm3: acidity, reason: `buffer acidity ${round2(acidity)} meq/100 cm³, soil pH ${soilPh} → ${targetPh}` });
  }
  return succeed({ ...base, pureTonPerAc: smpTableRate(bufferPh, targetPh), reason: `SMP buffer pH ${bufferPh}, soil pH ${soilPh} → ${targetPh} (table, interpolated)` });
}

/** SMP table rate, short t/ac, linear between rows and between target columns. Range checked by the caller. */
function smpTableRate(bufferPh: number, targetPh: number, table: SmpTable = DEFAULT_SMP_TABLE): number {
  const targets = [...table.targetsPh].sort((a, b) => a - b);
  const at = (row: SmpTable['rows'][number]): number => {
    const j = Math.max(1, targets.findIndex((t) => t >= targetPh));
    const [t0, t1] = [targets[j - 1], targets[j]];
    const [v0, v1] = [row.tonPerAc[t0.toFixed(1)], row.tonPerAc[t1.toFixed(1)]];
    // linear between the table's target-pH columns
    return v0 + ((v1 - v0) * (targetPh - t0)) / (t1 - t0);
  };
  const rows = [...table.rows].sort((a, b) => a.bufferPh - b.bufferPh);
  const i = Math.max(1, rows.findIndex((r) => r.bufferPh >= bufferPh - 1e-9));
  const [a, b] = [rows[i - 1], rows[i]];
  // linear between the table's buffer-pH rows
  return at(a) + ((at(b) - at(a)) * (bufferPh - a.bufferPh)) / (b.bufferPh - a.bufferPh);
}

/** Sieve analysis of a liming material: % by weight passing each sieve (US standard mesh). */
export type LimeFineness = { passing20MeshPct: number; passing60MeshPct: number; passing100MeshPct: number };

export const FINENESS_RULE = 'New York effective neutralizing value rule (Cornell University soil fertility guidelines): 20–60 mesh × 0.4, 60–100 mesh × 0.8, finer than 100 mesh × 1.0, coarser than 20 mesh × 0';

/** Fineness efficiency 0–1 from a sieve analysis, by the New York rule (FINENESS_RULE). */
export function limeFinenessEfficiency(f: LimeFineness): Result<number> {
  const { passing20MeshPct: p20, passing60MeshPct: p60, passing100MeshPct: p100 } = f;
  for (const [k, v] of Object.entries(f)) {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0 || v > 100) return fail(`${k} must be a number between 0 and 100 %`);
  }
  if (!(p20 >= p60 && p60 >= p100)) return fail('a finer sieve cannot pass more than a coarser one: % passing 20 mesh ≥ 60 mesh ≥ 100 mesh');
  // New York ENV rule: (p20 − p60)·0.4 + (p60 − p100)·0.8 + p100·1.0
  return succeed(((p20 - p60) * 0.4 + (p60 - p100) * 0.8 + p100) / 100);
}

/** A liming product as its label gives it. */
export type LimeProduct = { ccePct: number; fineness: LimeFineness };

/** Example product when the farm has given none: CCE 90 %, a typical agricultural-lime grind (example value — replace with the product's label). */
export const EXAMPLE_LIME_PRODUCT: LimeProduct = { ccePct: 90, fineness: { passing20MeshPct: 95, passing60MeshPct: 60, passing100MeshPct: 45 } };

export type LimeInput = {
  method: string;
  soilPh: number;
  bufferPh: number;
  targetPh?: number;
  product?: LimeProduct;
  areaHa?: number;
  truckCapacityT?: number;
};

export type LimeResult = Quantity &
  PureLime & {
    product: LimeProduct;
    finenessEfficiency: number;
    effectiveCcePct: number;
    /** Product rate, short t/ac. */
    productTonPerAc: number;
    finenessRule: string;
  };

/** Lime product to spread: pure rate ÷ (effective CCE/100), effective CCE = CCE × fineness efficiency. */
export function limeRequirement(input: LimeInput): Result<LimeResult> {
  const pure = pureLimeRequirement(input);
  if (!pure.ok) return pure;
  const product = input.product ?? EXAMPLE_LIME_PRODUCT;
  if (!Number.isFinite(product.ccePct) || product.ccePct <= 0 || product.ccePct > 200) return fail(`lime CCE must be between 0 and 200 %, got ${product.ccePct}`);
  const eff = limeFinenessEfficiency(product.fineness);
  if (!eff.ok) return eff;
  if (eff.value <= 0) return fail('the lime is too coarse to react: nothing passes the 20-mesh sieve');
  // effective CCE = CCE × fineness efficiency (state lime-law practice; FINENESS_RULE)
  const effectiveCcePct = product.ccePct * eff.value;
  // product rate = pure rate ÷ (effective CCE/100)
  const productTonPerAc = pure.value.pureTonPerAc / (effectiveCcePct / 100);
  const areaHa = input.areaHa ?? 1;
  if (!Number.isFinite(areaHa) || areaHa < 0) return fail('areaHa must be a number >= 0');
  const q = amendmentQuantity(tonPerAcToTPerHa(productTonPerAc), areaHa, pure.value.source, pure.value.flag, input.truckCapacityT);
  return succeed({ ...pure.value, ...q, product, finenessEfficiency: eff.value, effectiveCcePct, productTonPerAc, finenessRule: FINENESS_RULE });
}

const round2 = (x: number) => Math.round(x * 100) / 100;
