// Cover-management factor C: table values by crop and tillage (data/reference/cover-c.json),
// pasture by ground cover (AH-537 Table 10), and the RUSLE subfactor method (AH-703 ch. 5)
// weighted by an EI distribution over the year.
import coverJson from '../../data/reference/cover-c.json';
import eiJson from '../../data/reference/ei-distribution.json';
import { assertFinite, assertNonNegative, fail, succeed, type Result } from './assert';

export type Flag = 'pub' | 'memory' | 'practice';

export type CoverRow = {
  id: string;
  crop: string;
  tillage: string;
  c: number;
  cRange: [number, number];
  typicalResiduePct: number | null;
  note: string;
  source: string;
  flag: Flag;
};
export type CoverTable = {
  rows: CoverRow[];
  pasture: { source: string; flag: Flag; rows: { groundCoverPct: number; c: number; source?: string; flag?: Flag }[] };
  coverCrop: { factor: number; source: string; flag: Flag };
  residueAdjustment: { b: number; source: string; flag: Flag };
};
export const DEFAULT_COVER_TABLE = coverJson as unknown as CoverTable;

/** Crops and tillage systems the default table knows. */
export const COVER_CROPS = ['corn', 'soybean', 'small grain', 'hay or meadow', 'pasture'] as const;
export const TILLAGE_SYSTEMS = ['moldboard plough', 'chisel or mulch-till', 'no-till', 'any', 'none'] as const;

export type CoverLookup = {
  crop: string;
  /** Not needed for small grain, hay or pasture. */
  tillage?: string;
  /** Residue cover after planting, %; adjusts a row through the surface-cover subfactor. */
  residuePct?: number;
  coverCrop?: boolean;
  /** Pasture only: ground cover in contact with the soil, %. */
  groundCoverPct?: number;
};

export type CoverResult = { c: number; source: string; method: string; flag: Flag; notes: string[] };

/** C for a pasture by ground cover, log-linear between AH-537 Table 10 rows (grass, no canopy). */
export function pastureC(groundCoverPct: number, table: CoverTable = DEFAULT_COVER_TABLE): Result<CoverResult> {
  const rows = table.pasture.rows;
  if (!Number.isFinite(groundCoverPct)) return fail('groundCoverPct is missing or not a number');
  const lo = rows[0].groundCoverPct;
  const hi = rows[rows.length - 1].groundCoverPct;
  if (groundCoverPct < lo || groundCoverPct > hi) {
    return fail(`groundCoverPct ${groundCoverPct} % is outside the pasture table's range ${lo}–${hi} %`);
  }
  const i = Math.max(1, rows.findIndex((r) => r.groundCoverPct >= groundCoverPct));
  const a = rows[i - 1];
  const b = rows[i];
  const t = (groundCoverPct - a.groundCoverPct) / (b.groundCoverPct - a.groundCoverPct);
  // AH-537 Table 10, interpolated log-linearly between rows
  const c = Math.exp(Math.log(a.c) + t * (Math.log(b.c) - Math.log(a.c)));
  const exact = rows.find((r) => r.groundCoverPct === groundCoverPct);
  // A figure is only as sure as the least sure row it comes from.
  const used = exact ? [exact] : [a, b];
  const recalled = used.find((r) => r.flag === 'memory');
  return succeed({
    c,
    source: recalled?.source ?? table.pasture.source,
    method: exact ? `table row, ground cover ${groundCoverPct} %` : 'table, log-linear between ground-cover rows',
    flag: recalled ? 'memory' : table.pasture.flag,
    notes: [],
  });
}

/** C from the table by crop, tillage, residue and cover crop. Unknown combinations fail as values. */
export function coverFromTable(lookup: CoverLookup, table: CoverTable = DEFAULT_COVER_TABLE): Result<CoverResult> {
  if (lookup.crop === 'pasture') {
    if (lookup.groundCoverPct === undefined) return fail('groundCoverPct is needed for pasture');
    return pastureC(lookup.groundCoverPct, table);
  }
  const candidates = table.rows.filter((r) => r.crop === lookup.crop);
  if (candidates.length === 0) return fail(`the C table has no crop '${lookup.crop}'`);
  const row =
    candidates.length === 1 && (lookup.tillage === undefined || candidates[0].tillage === 'any' || candidates[0].tillage === 'none')
      ? candidates[0]
      : candidates.find((r) => r.tillage === lookup.tillage);
  if (!row) {
    return fail(`the C table has no row for ${lookup.crop} with tillage '${lookup.tillage ?? '(none given)'}'; choose one of: ${candidates.map((r) => r.tillage).join(', ')}`);
  }
  let c = row.c;
  let flag: Flag = row.flag;
  const notes: string[] = [`${row.note}; typical range ${row.cRange[0]}–${row.cRange[1]}`];
  let method = `table row '${row.id}'`;
  if (lookup.residuePct !== undefined && row.typicalResiduePct !== null) {
    assertNonNegative('residuePct', lookup.residuePct);
    const b = table.residueAdjustment.b;
    // AH-703 ch. 5 surface-cover subfactor as a ratio: SC(Sp)/SC(Sp_row) = exp(−b (Sp − Sp_row)) at Ru 6.096 mm
    c *= Math.exp(-b * (lookup.residuePct - row.typicalResiduePct));
    method += `, scaled for ${lookup.residuePct} % residue (row assumes ${row.typicalResiduePct} %)`;
    flag = 'practice';
  }
  if (lookup.coverCrop) {
    // cover crop factor: common practice, no single source
    c *= table.coverCrop.factor;
    method += `, × ${table.coverCrop.factor} for a cover crop`;
    flag = 'practice';
    notes.push('cover crop effect is a rule of thumb; the subfactor method with its canopy and cover is better');
  }
  c = Math.min(Math.max(c, 0), 1);
  return succeed({ c, source: row.source, method, flag, notes });
}

// ---------------------------------------------------------------- subfactor method (AH-703 ch. 5)

/** Canopy cover subfactor; fc canopy cover fraction 0–1, fall height in m. */
export function canopyCoverSubfactor(args: { canopyFraction: number; fallHeightM: number }): number {
  const { canopyFraction: fc, fallHeightM: h } = args;
  assertNonNegative('canopyFraction', fc);
  assertNonNegative('fallHeightM', h);
  if (fc > 1) throw new Error(`canopyFraction must be <= 1, got ${fc}`);
  // AH-703 eq. 5-5: CC = 1 − Fc·exp(−0.328 H), H in m (0.1 per ft)
  return 1 - fc * Math.exp(-0.328 * h);
}

/** b of the surface-cover subfactor: 0.035 typical cropland [memory], 0.05 rill-dominated, 0.025 interrill-dominated. */
export const SURFACE_COVER_B = { typical: 0.035, rill: 0.05, interrill: 0.025 } as const;

/** Surface cover subfactor; coverPct ground cover %, roughness Ru mm (6.096 mm = 0.24 in, the smooth baseline). */
export function surfaceCoverSubfactor(args: { coverPct: number; roughnessMm?: number; b?: number }): number {
  const { coverPct, roughnessMm = 6.096, b = SURFACE_COVER_B.typical } = args;
  assertNonNegative('coverPct', coverPct);
  assertFinite('b', b);
  if (!(roughnessMm > 0)) throw new Error(`roughnessMm must be > 0, got ${roughnessMm}`);
  // AH-703 eq. 5-6: SC = exp[−b·Sp·(6.096/Ru)^0.08]
  return Math.exp(-b * coverPct * Math.pow(6.096 / roughnessMm, 0.08));
}

/** Surface roughness subfactor; Ru random roughness in mm. */
export function roughnessSubfactor(roughnessMm: number): number {
  assertNonNegative('roughnessMm', roughnessMm);
  // AH-703 eq. 5-7 (SI): SR = exp[−0.026 (Ru − 6.096)]
  return Math.exp(-0.026 * (roughnessMm - 6.096));
}

/** Residue cover fraction from residue mass (Gregory 1982); alpha per unit of massPerArea. */
export function residueCoverFromMass(args: { massPerArea: number; alpha: number }): number {
  assertNonNegative('massPerArea', args.massPerArea);
  assertNonNegative('alpha', args.alpha);
  // Gregory 1982: cover = 1 − exp(−α·M)
  return 1 - Math.exp(-args.alpha * args.massPerArea);
}

export type SubfactorPeriod = {
  label?: string;
  /** Calendar months 1–12 this period covers. */
  months: number[];
  /** Either the soil-loss ratio itself, or its subfactors (each defaults to 1). */
  slr?: number;
  plu?: number;
  cc?: number;
  sc?: number;
  sr?: number;
  sm?: number;
};

/** Soil-loss ratio of a period: SLR = PLU·CC·SC·SR·SM (AH-703 eq. 5-2). */
export function soilLossRatio(p: SubfactorPeriod): number {
  if (p.slr !== undefined) {
    assertNonNegative('slr', p.slr);
    return p.slr;
  }
  // AH-703 eq. 5-2: SLR = PLU · CC · SC · SR · SM
  return (p.plu ?? 1) * (p.cc ?? 1) * (p.sc ?? 1) * (p.sr ?? 1) * (p.sm ?? 1);
}

export type EiDistribution = { monthlySharePct: number[]; source: string; flag: Flag };
/** Default monthly EI shares (a placeholder, flagged practice): replace with the local one. */
export const DEFAULT_EI_DISTRIBUTION = eiJson as unknown as EiDistribution;

/**
 * Annual C = Σ SLRᵢ·EIᵢ / Σ EIᵢ (AH-703 eq. 5-1), EIᵢ the share of annual EI in period i's months.
 * Months may not be claimed twice; months not covered are left out of both sums (warned).
 */
export function annualCFromSubfactors(
  periods: SubfactorPeriod[],
  distribution: EiDistribution = DEFAULT_EI_DISTRIBUTION,
): Result<{ c: number; periods: { label?: string; slr: number; eiSharePct: number }[]; warnings: string[] }> {
  const shares = distribution.monthlySharePct;
  if (shares.length !== 12 || shares.some((s) => !Number.isFinite(s) || s < 0)) {
    return fail('the EI distribution must have 12 monthly shares >= 0');
  }
  if (periods.length === 0) return fail('at least one period is needed');
  const seen = new Set<number>();
  const out: { label?: string; slr: number; eiSharePct: number }[] = [];
  let num = 0;
  let den = 0;
  for (const p of periods) {
    for (const m of p.months) {
      if (!Number.isInteger(m) || m < 1 || m > 12) return fail(`months must be whole numbers 1–12, got ${m}`);
      if (seen.has(m)) return fail(`month ${m} is in more than one period`);
      seen.add(m);
    }
    const slr = soilLossRatio(p);
    const ei = p.months.reduce((s, m) => s + shares[m - 1], 0);
    // AH-703 eq. 5-1: C = Σ SLRᵢ EIᵢ / Σ EIᵢ
    num += slr * ei;
    den += ei;
    out.push({ label: p.label, slr, eiSharePct: ei });
  }
  if (den <= 0) return fail('the periods carry no erosivity under this EI distribution');
  const warnings = seen.size < 12 ? [`only ${seen.size} of 12 months are covered; C is weighted over those`] : [];
  return succeed({ c: num / den, periods: out, warnings });
}
