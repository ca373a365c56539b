// SCS curve-number runoff (TR-55 ch. 2; NEH 630 ch. 9, 10): CN from TR-55 Tables 2-2b/2-2c,
// composite CN by area, antecedent condition (Hawkins et al. 1985), runoff depth and volume.
import cnJson from '../../data/reference/curve-numbers.json';
import { assertFinite, assertNonNegative, fail, succeed, type Result } from './assert';
import type { Flag } from './cover';

export type SingleGroup = 'A' | 'B' | 'C' | 'D';
export type HydrologicSoilGroup = SingleGroup | 'A/D' | 'B/D' | 'C/D';
export const HYDROLOGIC_SOIL_GROUPS: readonly HydrologicSoilGroup[] = ['A', 'B', 'C', 'D', 'A/D', 'B/D', 'C/D'];

export type CnRow = {
  table: '2-2b' | '2-2c';
  cover: string;
  treatment: string | null;
  condition: string | null;
  cn: Record<SingleGroup, number>;
  source: string;
  flag: Flag;
};
export type CnTable = { rows: CnRow[] };
export const DEFAULT_CN_TABLE = cnJson as unknown as CnTable;

export type CnLookup = {
  cover: string;
  treatment?: string | null;
  /** Hydrologic condition: poor, fair or good (not all rows have one). */
  condition?: string | null;
  hsg: HydrologicSoilGroup;
  /** Is the field drained (tile or ditches)? Default false. */
  drained?: boolean;
  /** Depth the drainage keeps the seasonal high water table at, cm, where known. */
  drainedWaterTableDepthCm?: number;
};

/**
 * NEH 630 ch. 7: a soil counts as adequately drained when the seasonal high water table is kept
 * at least 60 cm below the surface [memory for the wording].
 */
export const ADEQUATELY_DRAINED_MIN_DEPTH_CM = 60;

/**
 * The single group a dual group (A/D, B/D, C/D) stands for. NEH 630 ch. 7: the first letter is
 * for the adequately drained soil, D for the undrained one. A drained soil whose water-table depth
 * is not known takes the conservative D; so does drainage that leaves the water table shallower
 * than 60 cm. Single groups pass through.
 */
export function effectiveGroup(hsg: HydrologicSoilGroup, drainage: { drained?: boolean; drainedWaterTableDepthCm?: number } = {}): SingleGroup {
  if (!hsg.includes('/')) return hsg as SingleGroup;
  const depth = drainage.drainedWaterTableDepthCm;
  // NEH 630 ch. 7: dual groups, first letter when drained to ≥ 60 cm, else D
  return drainage.drained && depth !== undefined && depth >= ADEQUATELY_DRAINED_MIN_DEPTH_CM ? (hsg[0] as SingleGroup) : 'D';
}

/** CN (antecedent condition II) from the tables. Unknown combinations fail with the choices. */
export function curveNumberFromTable(
  lookup: CnLookup,
  table: CnTable = DEFAULT_CN_TABLE,
): Result<{ cn: number; row: CnRow; group: SingleGroup; source: string; flag: Flag }> {
  if (!HYDROLOGIC_SOIL_GROUPS.includes(lookup.hsg)) return fail(`hsg must be one of ${HYDROLOGIC_SOIL_GROUPS.join(', ')}`);
  const byCover = table.rows.filter((r) => r.cover === lookup.cover);
  if (byCover.length === 0) return fail(`no curve number for cover '${lookup.cover}'; choose one of: ${[...new Set(table.rows.map((r) => r.cover))].join(', ')}`);
  const byTreatment = byCover.filter((r) => r.treatment === (lookup.treatment ?? null));
  if (byTreatment.length === 0) {
    return fail(`no curve number for ${lookup.cover} with treatment '${lookup.treatment ?? '(none)'}'; choose one of: ${[...new Set(byCover.map((r) => r.treatment ?? '(none)'))].join(', ')}`);
  }
  const row = byTreatment.find((r) => r.condition === (lookup.condition ?? null)) ?? (byTreatment.length === 1 && byTreatment[0].condition === null ? byTreatment[0] : undefined);
  if (!row) {
    return fail(`no curve number for ${lookup.cover}${lookup.treatment ? `, ${lookup.treatment}` : ''} in condition '${lookup.condition ?? '(none)'}'; choose one of: ${byTreatment.map((r) => r.condition ?? '(none)').join(', ')}`);
  }
  const group = effectiveGroup(lookup.hsg, { drained: lookup.drained, drainedWaterTableDepthCm: lookup.drainedWaterTableDepthCm });
  return succeed({ cn: row.cn[group], row, group, source: row.source, flag: row.flag });
}

/** Area-weighted composite CN (TR-55 ch. 2). */
export function compositeCurveNumber(parts: { cn: number; areaHa: number }[]): number {
  if (parts.length === 0) throw new Error('compositeCurveNumber needs at least one part');
  let num = 0;
  let den = 0;
  for (const p of parts) {
    assertCn(p.cn);
    assertNonNegative('areaHa', p.areaHa);
    // TR-55 ch. 2: CN_c = Σ CNᵢ Aᵢ / Σ Aᵢ
    num += p.cn * p.areaHa;
    den += p.areaHa;
  }
  if (den <= 0) throw new Error('compositeCurveNumber needs a total area > 0');
  return num / den;
}

export type AntecedentCondition = 'I' | 'II' | 'III';

/** CN for dry (I) or wet (III) antecedent condition from CN II (Hawkins et al. 1985). */
export function antecedentCurveNumber(cnII: number, condition: AntecedentCondition): number {
  assertCn(cnII);
  if (condition === 'II') return cnII;
  // Hawkins et al. 1985: CN_I = CN/(2.281 − 0.01281 CN)
  if (condition === 'I') return cnII / (2.281 - 0.01281 * cnII);
  // Hawkins et al. 1985: CN_III = CN/(0.427 + 0.00573 CN)
  if (condition === 'III') return Math.min(100, cnII / (0.427 + 0.00573 * cnII));
  throw new Error(`condition must be 'I', 'II' or 'III', got ${String(condition)}`);
}

function assertCn(cn: number): void {
  assertFinite('cn', cn);
  if (cn <= 0 || cn > 100) throw new Error(`cn must be in (0, 100], got ${cn}`);
}

/** Potential maximum retention S in mm (TR-55 eq. 2-4, SI). */
export function retentionMm(cn: number): number {
  assertCn(cn);
  // TR-55 eq. 2-4 (SI): S = 25400/CN − 254
  return 25400 / cn - 254;
}

/** Entry point: runoff depth in mm, Ia = 0.2 S (TR-55 eq. 2-3). */
export function curveNumberRunoff(args: { rainfallMm: number; cn: number }): number {
  assertNonNegative('rainfallMm', args.rainfallMm);
  const s = retentionMm(args.cn);
  const ia = 0.2 * s;
  const p = args.rainfallMm;
  if (p <= ia) return 0;
  // TR-55 eq. 2-3: Q = (P − Ia)² / (P − Ia + S)
  return ((p - ia) * (p - ia)) / (p - ia + s);
}

/** Runoff volume in m³ from a depth in mm over areaHa (1 mm on 1 ha = 10 m³). */
export function runoffVolumeM3(runoffMm: number, areaHa: number): number {
  assertNonNegative('runoffMm', runoffMm);
  assertNonNegative('areaHa', areaHa);
  return runoffMm * areaHa * 10;
}

/** The cover / treatment / condition choices of a CN table, for building a form. */
export function curveNumberChoices(table: CnTable = DEFAULT_CN_TABLE): { cover: string; treatment: string | null; condition: string | null; table: string }[] {
  return table.rows.map((r) => ({ cover: r.cover, treatment: r.treatment, condition: r.condition, table: r.table }));
}
