// What the server works out for a stored sample: sand/silt/clay renormalised, its texture class
// (SSM ch. 3 triangle or the Thien 1979 feel key) and its drainage class from depth to gray,
// all by the engine in shared/erosion.
import { drainageVerdict, textureByFeel, tryClassifyTexture, type FeelClass } from '../../../shared/erosion';
import { SEPARATES_TOLERANCE_PCT, type FeelGrit, type SoilSampleCreate } from '../../../shared/schemas/soils';

export type DerivedSample = {
  sandPct: number | null;
  siltPct: number | null;
  clayPct: number | null;
  separatesSumPct: number | null;
  ribbonClass: string | null;
  textureClass: string | null;
  textureSource: string | null;
  drainageClass: string | null;
  notWorthAmending: boolean | null;
  drainageSource: string | null;
};

/** Expected failures (fractions that do not add up) come back as values. */
export type DeriveResult = { ok: true; value: DerivedSample } | { ok: false; path: string; reason: string };

const ENGINE_FEEL: Record<FeelGrit, FeelClass> = { gritty: 'very gritty', smooth: 'very smooth', neither: 'neither' };

export const TRIANGLE_SOURCE = 'USDA texture triangle (Soil Survey Manual ch. 3)';

export function deriveSample(s: SoilSampleCreate): DeriveResult {
  const out: DerivedSample = {
    sandPct: null,
    siltPct: null,
    clayPct: null,
    separatesSumPct: null,
    ribbonClass: null,
    textureClass: null,
    textureSource: null,
    drainageClass: null,
    notWorthAmending: null,
    drainageSource: null,
  };
  if (s.kind === 'lab') {
    if (s.sandPct != null && s.siltPct != null && s.clayPct != null) {
      const r = tryClassifyTexture({ sand: s.sandPct, silt: s.siltPct, clay: s.clayPct }, { toleranceSumPct: SEPARATES_TOLERANCE_PCT });
      if (!r.ok) return { ok: false, path: 'sandPct', reason: r.reason };
      Object.assign(out, {
        sandPct: r.value.normalised.sand,
        siltPct: r.value.normalised.silt,
        clayPct: r.value.normalised.clay,
        separatesSumPct: s.sandPct + s.siltPct + s.clayPct,
        textureClass: r.value.textureClass,
        textureSource: TRIANGLE_SOURCE,
      });
    }
  } else {
    const r = textureByFeel({ balls: s.balls, ribbonCm: s.ribbonCm ?? undefined, feel: s.feel ? ENGINE_FEEL[s.feel] : undefined });
    if (!r.ok) return { ok: false, path: 'ribbonCm', reason: r.reason };
    Object.assign(out, { ribbonClass: r.value.ribbon, textureClass: r.value.textureClass, textureSource: r.value.source });
  }
  if (s.depthToGrayCm != null || s.describedToCm != null) {
    const v = drainageVerdict({ depthToGrayCm: s.depthToGrayCm ?? null, describedToCm: s.describedToCm ?? undefined });
    // A profile looked at too shallowly says nothing about drainage: no class, not an error.
    if (v.ok) Object.assign(out, { drainageClass: v.value.drainageClass, notWorthAmending: v.value.notWorthAmending, drainageSource: v.value.source });
  }
  return { ok: true, value: out };
}
