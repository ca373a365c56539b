// K after organic matter rises, through the organic-matter term of the nomograph equation
// (AH-537; AH-703 eq. 3-1): K_new = K_now × K_nomo(OM + rise) / K_nomo(OM), using the field's
// texture. The ratio carries the nomograph's OM effect onto whatever K the field has now.
import { fail, succeed, type Result } from './assert';
import { NOMOGRAPH_OM_CAP_PCT, tryKFactorNomograph, type PermeabilityCode, type StructureCode } from './k-factor';
import { formatContent } from '../format/quantities';

/** Organic-matter rise assumed after several years of compost, % (rule of thumb). */
export const ASSUMED_OM_RISE_PCT = 0.5;

export type OmKInput = {
  kNowUs: number;
  organicMatterPct: number;
  /** USDA sand (0.05–2 mm), silt and clay of the fine earth, %. */
  sandPct: number;
  siltPct: number;
  clayPct: number;
  risePct?: number;
  /** Nomograph codes; default fine granular (2) and moderate (3), where those terms add nothing. */
  structure?: StructureCode;
  permeability?: PermeabilityCode;
};

export type OmKResult = { kNewUs: number; ratio: number; omFromPct: number; omToPct: number; risePct: number; assumptions: string[] };

/** K after an organic-matter rise; fails when the nomograph cannot show a change (OM at its cap, texture missing). */
export function kAfterOrganicMatterRise(input: OmKInput): Result<OmKResult> {
  const rise = input.risePct ?? ASSUMED_OM_RISE_PCT;
  const { organicMatterPct: om, sandPct, siltPct, clayPct, kNowUs } = input;
  for (const [k, v] of Object.entries({ om, sandPct, siltPct, clayPct, kNowUs, rise })) {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0) return fail(`${k} must be a number >= 0`);
  }
  if (Math.abs(sandPct + siltPct + clayPct - 100) > 2) return fail(`sand, silt and clay add up to ${sandPct + siltPct + clayPct} %, not 100 %`);
  if (om >= NOMOGRAPH_OM_CAP_PCT) {
    return fail(`organic matter is already ${formatContent(om)}, at or above the nomograph's ${NOMOGRAPH_OM_CAP_PCT} % limit: more organic matter shows no lower K`);
  }
  const structure = input.structure ?? 2;
  const permeability = input.permeability ?? 3;
  // The nomograph's silt + very fine sand: very fine sand is not in a routine soil check, so
  // silt alone stands for it, and the nomograph's sand (0.1–2 mm) is taken as all the sand.
  const nomo = (omPct: number) => tryKFactorNomograph({ siltVfsPct: siltPct, sandPct: 100 - siltPct - clayPct, organicMatterPct: omPct, structure, permeability });
  const before = nomo(om);
  const after = nomo(om + rise);
  if (!before.ok) return before;
  if (!after.ok) return after;
  if (before.value.us <= 0) return fail('the nomograph gives no K for this texture, so no change can be shown');
  // AH-703 eq. 3-1 ratio: K_new = K_now × K_nomo(OM + rise) / K_nomo(OM)
  const ratio = after.value.us / before.value.us;
  const assumptions = [
    `organic matter ${formatContent(om)} → ${formatContent(Math.min(om + rise, NOMOGRAPH_OM_CAP_PCT))} (an assumed +${formatContent(rise)} after years of compost; rule of thumb)`,
    'silt stands for silt + very fine sand in the nomograph (very fine sand not measured)',
  ];
  if (input.structure === undefined || input.permeability === undefined) assumptions.push('structure and permeability taken as fine granular and moderate, where their terms add nothing');
  return succeed({ kNewUs: kNowUs * ratio, ratio, omFromPct: om, omToPct: Math.min(om + rise, NOMOGRAPH_OM_CAP_PCT), risePct: rise, assumptions });
}
