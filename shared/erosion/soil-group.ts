// Hydrologic soil group from NEH 630 ch. 7, Table 7-1 rules, and a default from texture.
import { fail, succeed, type Result } from './assert';
import type { HydrologicSoilGroup, SingleGroup } from './runoff';
import type { TextureClass } from './texture';

export type SoilGroupInput = {
  /** Depth to an impermeable layer, cm; omit when none within 100 cm. */
  depthToImpermeableCm?: number;
  /** Depth to the seasonal high water table, cm; omit when none within 100 cm. */
  depthToWaterTableCm?: number;
  /** Least saturated hydraulic conductivity within 0–50 cm, µm/s. */
  leastKsatUmPerS0to50?: number;
  /** Least saturated hydraulic conductivity within 0–100 cm, µm/s. */
  leastKsatUmPerS0to100?: number;
  /** Can the high water table be drained? Gives a dual group (A/D, B/D, C/D). */
  canBeDrained?: boolean;
};

const SOURCE = 'NEH 630 ch. 7, Table 7-1';

function shallowGroup(ksat: number): SingleGroup {
  // NEH 630 Table 7-1, impermeable layer 50–100 cm or water table 60–100 cm: least Ksat 0–50 cm
  if (ksat > 40) return 'A';
  if (ksat > 10) return 'B';
  if (ksat > 1) return 'C';
  return 'D';
}

function deepGroup(ksat: number): SingleGroup {
  // NEH 630 Table 7-1, both deeper than 100 cm: least Ksat 0–100 cm
  if (ksat > 10) return 'A';
  if (ksat > 4) return 'B';
  if (ksat > 0.4) return 'C';
  return 'D';
}

/** Hydrologic soil group by NEH 630 Table 7-1. Missing Ksat fails with what is needed. */
export function hydrologicSoilGroup(input: SoilGroupInput): Result<{ hsg: HydrologicSoilGroup; source: string; method: string }> {
  const imp = input.depthToImpermeableCm ?? Infinity;
  const wt = input.depthToWaterTableCm ?? Infinity;
  if (imp < 50) return succeed({ hsg: 'D', source: SOURCE, method: 'impermeable layer within 50 cm' });
  const groupFor = (asIfWaterTableCm: number): Result<SingleGroup> => {
    if (imp <= 100 || asIfWaterTableCm <= 100) {
      if (input.leastKsatUmPerS0to50 === undefined) return fail('leastKsatUmPerS0to50 is needed (least Ksat within 0–50 cm, µm/s)');
      return succeed(shallowGroup(input.leastKsatUmPerS0to50));
    }
    if (input.leastKsatUmPerS0to100 === undefined) return fail('leastKsatUmPerS0to100 is needed (least Ksat within 0–100 cm, µm/s)');
    return succeed(deepGroup(input.leastKsatUmPerS0to100));
  };
  if (wt < 60) {
    if (!input.canBeDrained) return succeed({ hsg: 'D', source: SOURCE, method: 'water table within 60 cm, not drained' });
    // NEH 630 Table 7-1: a drainable water table < 60 cm gives a dual group, the first letter as if drained
    const drained = groupFor(Infinity);
    if (!drained.ok) return drained;
    const hsg: HydrologicSoilGroup = drained.value === 'D' ? 'D' : (`${drained.value}/D` as HydrologicSoilGroup);
    return succeed({ hsg, source: SOURCE, method: 'water table within 60 cm that can be drained: dual group' });
  }
  const g = groupFor(wt);
  if (!g.ok) return g;
  const method = imp <= 100 || wt <= 100 ? 'impermeable layer 50–100 cm or water table 60–100 cm: least Ksat 0–50 cm' : 'no restriction within 100 cm: least Ksat 0–100 cm';
  return succeed({ hsg: g.value, source: SOURCE, method });
}

/**
 * Hydrologic soil group from texture alone [practice]. Where the rule of thumb gives two
 * groups the one with more runoff is returned, the other in `alternatives`. The survey's group
 * always wins over this.
 */
export const TEXTURE_SOIL_GROUPS: Record<TextureClass, SingleGroup[]> = {
  sand: ['A'],
  'loamy sand': ['A'],
  'sandy loam': ['B', 'A'],
  loam: ['B'],
  'silt loam': ['B'],
  silt: ['C', 'B'],
  'sandy clay loam': ['C'],
  'clay loam': ['D', 'C'],
  'silty clay loam': ['D', 'C'],
  'sandy clay': ['D'],
  'silty clay': ['D'],
  clay: ['D'],
};

export function soilGroupFromTexture(textureClass: TextureClass): { hsg: SingleGroup; alternatives: SingleGroup[]; source: string; flag: 'practice' } {
  const groups = TEXTURE_SOIL_GROUPS[textureClass];
  if (!groups) throw new Error(`unknown texture class '${String(textureClass)}'`);
  return { hsg: groups[0], alternatives: groups.slice(1), source: 'hydrologic soil group by texture (common practice, no single source)', flag: 'practice' };
}
