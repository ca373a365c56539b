// Soil erodibility K: the nomograph equation (AH-537; AH-703 eq. 3-1), the Williams/EPIC
// equation (Sharpley & Williams 1990, eq. 2.96) and a table by texture class and organic matter.
// US K unit: ton·acre·h/(hundreds of acre·ft·tonf·in); SI = US × 0.1317 t·ha·h/(ha·MJ·mm).
import kByTextureJson from '../../data/reference/k-by-texture.json';
import { assertFinite, assertNonNegative, fail, succeed, type Result } from './assert';
import type { TextureClass } from './texture';
import { kUsToSi } from './units';

export type KValue = { us: number; si: number };

/** Soil structure code of the nomograph: 1 very fine granular, 2 fine granular, 3 medium/coarse granular, 4 blocky, platy or massive [memory]. */
export type StructureCode = 1 | 2 | 3 | 4;
/** Profile permeability class of the nomograph: 1 rapid … 6 very slow. */
export type PermeabilityCode = 1 | 2 | 3 | 4 | 5 | 6;

/** Organic matter above this is taken as this in the nomograph (AH-537) [memory]. */
export const NOMOGRAPH_OM_CAP_PCT = 4;

export type NomographInput = {
  /** silt (0.002–0.05 mm) + very fine sand (0.05–0.10 mm), % */
  siltVfsPct: number;
  /** sand 0.10–2 mm, %; clay = 100 − siltVfsPct − sandPct */
  sandPct: number;
  organicMatterPct: number;
  structure: StructureCode;
  permeability: PermeabilityCode;
};

/** Checks the nomograph inputs; expected failures as values. */
export function tryKFactorNomograph(input: NomographInput): Result<KValue & { clayPct: number; omUsedPct: number; warnings: string[] }> {
  const { siltVfsPct, sandPct, organicMatterPct, structure, permeability } = input;
  for (const [name, v] of Object.entries({ siltVfsPct, sandPct, organicMatterPct })) {
    if (typeof v !== 'number' || !Number.isFinite(v)) return fail(`${name} is missing or not a number`);
    if (v < 0 || v > 100) return fail(`${name} must be between 0 and 100 %, got ${v}`);
  }
  if (siltVfsPct + sandPct > 100) return fail(`siltVfsPct + sandPct must not exceed 100 %, got ${siltVfsPct + sandPct}`);
  if (![1, 2, 3, 4].includes(structure)) return fail(`structure must be a code 1–4, got ${String(structure)}`);
  if (![1, 2, 3, 4, 5, 6].includes(permeability)) return fail(`permeability must be a class 1–6, got ${String(permeability)}`);
  const clayPct = 100 - siltVfsPct - sandPct;
  const omUsedPct = Math.min(organicMatterPct, NOMOGRAPH_OM_CAP_PCT);
  // AH-537 nomograph; AH-703 eq. 3-1: M = (% silt + % very fine sand) × (100 − % clay)
  const m = siltVfsPct * (100 - clayPct);
  // AH-703 eq. 3-1: 100K = 2.1e-4 M^1.14 (12 − OM) + 3.25 (s − 2) + 2.5 (p − 3)
  const hundredK = 2.1e-4 * Math.pow(m, 1.14) * (12 - omUsedPct) + 3.25 * (structure - 2) + 2.5 * (permeability - 3);
  const us = Math.max(hundredK / 100, 0);
  const warnings: string[] = [];
  if (organicMatterPct > NOMOGRAPH_OM_CAP_PCT) warnings.push(`organic matter ${organicMatterPct} % taken as 4 % (the nomograph's limit)`);
  if (siltVfsPct > 70) warnings.push('silt + very fine sand above 70 %: the equation departs from the nomograph there; K may be overestimated');
  if (hundredK < 0) warnings.push('the equation gave a negative K; taken as 0');
  return succeed({ us, si: kUsToSi(us), clayPct, omUsedPct, warnings });
}

/** Entry point: nomograph K in US and SI units. Throws on misuse. */
export function kFactorNomograph(input: NomographInput): KValue {
  assertFinite('siltVfsPct', input.siltVfsPct);
  assertFinite('sandPct', input.sandPct);
  assertFinite('organicMatterPct', input.organicMatterPct);
  const r = tryKFactorNomograph(input);
  if (!r.ok) throw new Error(r.reason);
  return { us: r.value.us, si: r.value.si };
}

/**
 * Nomograph permeability class from saturated hydraulic conductivity in mm/h (AH-537) [pub, class 1 memory]:
 * > 150 rapid (1); > 50 moderate–rapid (2); > 15 moderate (3); > 5 slow–moderate (4);
 * ≥ 1.524 slow (5); < 1.524 very slow (6). 1.524 mm/h = 0.06 in/h.
 */
export function permeabilityClassFromKsat(ksatMmPerH: number): PermeabilityCode {
  assertNonNegative('ksatMmPerH', ksatMmPerH);
  if (ksatMmPerH > 150) return 1;
  if (ksatMmPerH > 50) return 2;
  if (ksatMmPerH > 15) return 3;
  if (ksatMmPerH > 5) return 4;
  if (ksatMmPerH >= 1.524) return 5;
  return 6;
}

export type WilliamsInput = { sandPct: number; siltPct: number; clayPct: number; organicCarbonPct: number };

/** Williams (EPIC) K, US units (Sharpley & Williams 1990, eq. 2.96). Throws on misuse. */
export function kFactorWilliams(input: WilliamsInput): KValue {
  const { sandPct: san, siltPct: sil, clayPct: cla, organicCarbonPct: c } = input;
  assertNonNegative('sandPct', san);
  assertNonNegative('siltPct', sil);
  assertNonNegative('clayPct', cla);
  assertNonNegative('organicCarbonPct', c);
  if (cla + sil <= 0) throw new Error('siltPct + clayPct must be > 0');
  const sn1 = 1 - san / 100;
  // Sharpley & Williams 1990 eq. 2.96 (0.0256, not the misprinted 0.256)
  const fCsand = 0.2 + 0.3 * Math.exp(-0.0256 * san * (1 - sil / 100));
  const fClSi = Math.pow(sil / (cla + sil), 0.3);
  const fOrgC = 1 - (0.25 * c) / (c + Math.exp(3.72 - 2.95 * c));
  const fHiSand = 1 - (0.7 * sn1) / (sn1 + Math.exp(-5.51 + 22.9 * sn1));
  const us = fCsand * fClSi * fOrgC * fHiSand;
  return { us, si: kUsToSi(us) };
}

/** Organic carbon from organic matter by the van Bemmelen factor 1.724 [practice]. */
export const organicCarbonFromOm = (organicMatterPct: number): number => organicMatterPct / 1.724;

export type KTextureRow = {
  textureClass: string;
  kUsAtOm: Record<string, number> | null;
  kUsRange?: [number, number];
  source: string;
  flag: string;
};
export type KTextureTable = { omPointsPct: number[]; rows: KTextureRow[] };
export const DEFAULT_K_TEXTURE_TABLE = kByTextureJson as unknown as KTextureTable;

/**
 * K (US) by texture class, interpolated linearly in organic matter between the table's
 * 0.5, 2 and 4 % columns and held flat outside them (after Stewart et al. 1975).
 */
export function kFromTextureTable(
  textureClass: TextureClass,
  organicMatterPct: number,
  table: KTextureTable = DEFAULT_K_TEXTURE_TABLE,
): Result<KValue & { source: string; flag: string; note?: string }> {
  if (!Number.isFinite(organicMatterPct) || organicMatterPct < 0) return fail('organicMatterPct must be a number >= 0');
  const row = table.rows.find((r) => r.textureClass === textureClass);
  if (!row) return fail(`the K table has no row for texture class '${textureClass}'`);
  if (!row.kUsAtOm) {
    const [lo, hi] = row.kUsRange ?? [NaN, NaN];
    const us = (lo + hi) / 2;
    return succeed({ us, si: kUsToSi(us), source: row.source, flag: 'practice', note: `${textureClass}: the table gives only a range ${lo}–${hi}; the midpoint is used` });
  }
  const pts = table.omPointsPct.map((om) => ({ om, k: row.kUsAtOm![String(om)] }));
  let us: number;
  if (organicMatterPct <= pts[0].om) us = pts[0].k;
  else if (organicMatterPct >= pts[pts.length - 1].om) us = pts[pts.length - 1].k;
  else {
    const i = pts.findIndex((p) => p.om >= organicMatterPct);
    const a = pts[i - 1];
    const b = pts[i];
    // linear interpolation between table columns
    us = a.k + ((b.k - a.k) * (organicMatterPct - a.om)) / (b.om - a.om);
  }
  return succeed({ us, si: kUsToSi(us), source: row.source, flag: row.flag });
}
