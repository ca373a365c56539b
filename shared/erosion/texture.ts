// USDA soil texture classes (Soil Survey Manual ch. 3) and the texture-by-feel key (Thien 1979).
import feelKeyJson from '../../data/reference/feel-key.json';
import { assertNonNegative, fail, succeed, type Result } from './assert';

export const TEXTURE_CLASSES = [
  'sand',
  'loamy sand',
  'sandy loam',
  'loam',
  'silt loam',
  'silt',
  'sandy clay loam',
  'clay loam',
  'silty clay loam',
  'sandy clay',
  'silty clay',
  'clay',
] as const;
export type TextureClass = (typeof TEXTURE_CLASSES)[number];

/** Fine-earth fractions in percent (sand 0.05–2 mm, silt 0.002–0.05 mm, clay < 0.002 mm). */
export type Separates = { sand: number; silt: number; clay: number };

/** Scales sand, silt and clay so they sum to 100 % (after > 2 mm material was removed). */
export function renormalise(sample: Separates): Separates {
  assertNonNegative('sand', sample.sand);
  assertNonNegative('silt', sample.silt);
  assertNonNegative('clay', sample.clay);
  const total = sample.sand + sample.silt + sample.clay;
  if (total <= 0) throw new Error('sand + silt + clay must be > 0');
  const f = 100 / total;
  return { sand: sample.sand * f, silt: sample.silt * f, clay: sample.clay * f };
}

/** The SSM ch. 3 inequalities for each class; on 100 % data exactly one holds. */
export const TEXTURE_RULES: Record<TextureClass, (s: Separates) => boolean> = {
  // SSM ch. 3 texture triangle
  sand: ({ silt, clay }) => silt + 1.5 * clay < 15,
  'loamy sand': ({ silt, clay }) => silt + 1.5 * clay >= 15 && silt + 2 * clay < 30,
  'sandy loam': ({ sand, silt, clay }) =>
    (clay >= 7 && clay < 20 && sand > 52 && silt + 2 * clay >= 30) || (clay < 7 && silt < 50 && silt + 2 * clay >= 30),
  loam: ({ sand, silt, clay }) => clay >= 7 && clay < 27 && silt >= 28 && silt < 50 && sand <= 52,
  'silt loam': ({ silt, clay }) => (silt >= 50 && clay >= 12 && clay < 27) || (silt >= 50 && silt < 80 && clay < 12),
  silt: ({ silt, clay }) => silt >= 80 && clay < 12,
  'sandy clay loam': ({ sand, silt, clay }) => clay >= 20 && clay < 35 && silt < 28 && sand > 45,
  'clay loam': ({ sand, clay }) => clay >= 27 && clay < 40 && sand > 20 && sand <= 45,
  'silty clay loam': ({ sand, clay }) => clay >= 27 && clay < 40 && sand <= 20,
  'sandy clay': ({ sand, clay }) => clay >= 35 && sand > 45,
  'silty clay': ({ silt, clay }) => clay >= 40 && silt >= 40,
  clay: ({ sand, silt, clay }) => clay >= 40 && sand <= 45 && silt < 40,
};

/**
 * USDA texture class (lower case) of a sample. The fractions are renormalised to 100 %.
 * Entry point. Throws only on misuse (NaN, negative, all zero).
 */
export function classifyTexture(sample: Separates): TextureClass {
  const s = renormalise(sample);
  for (const name of TEXTURE_CLASSES) if (TEXTURE_RULES[name](s)) return name;
  // Unreachable on renormalised data: the rules partition the triangle (tested on a 0.5 % grid).
  throw new Error(`no texture class for sand ${s.sand}, silt ${s.silt}, clay ${s.clay}`);
}

/**
 * Texture class with a check that the fractions add up to about 100 % (± toleranceSumPct).
 * Returns { ok:false, reason } for data that does not, so a person can fix it.
 */
export function tryClassifyTexture(
  sample: Separates,
  options: { toleranceSumPct?: number } = {},
): Result<{ textureClass: TextureClass; normalised: Separates }> {
  const tol = options.toleranceSumPct ?? 2;
  for (const key of ['sand', 'silt', 'clay'] as const) {
    const v = sample[key];
    if (typeof v !== 'number' || !Number.isFinite(v)) return fail(`${key} is missing or not a number`);
    if (v < 0 || v > 100) return fail(`${key} must be between 0 and 100 %, got ${v}`);
  }
  const total = sample.sand + sample.silt + sample.clay;
  if (Math.abs(total - 100) > tol) {
    return fail(
      `sand + silt + clay add up to ${round1(total)} %, not about 100 % (±${tol}); check the numbers or renormalise the fine earth`,
    );
  }
  const normalised = renormalise(sample);
  return succeed({ textureClass: classifyTexture(normalised), normalised });
}

const round1 = (x: number) => Math.round(x * 10) / 10;

// ---------------------------------------------------------------- texture by feel

export type RibbonClass = 'none' | 'weak' | 'medium' | 'strong';
export type FeelClass = 'very gritty' | 'very smooth' | 'neither';
export type FeelKey = {
  ribbonThresholdsCm: { weakBelowCm: number; strongAboveCm: number };
  noBall: { textureClass: string };
  noRibbon: { textureClass: string };
  rows: { ribbon: string; feel: string; textureClass: string; source: string; flag: string }[];
};
/** The default key (data/reference/feel-key.json, Thien 1979). */
export const DEFAULT_FEEL_KEY = feelKeyJson as FeelKey;

export type FeelTest = {
  /** Does moist soil form a ball when squeezed? */
  balls: boolean;
  /** Length of the ribbon pushed out between thumb and finger before it breaks, cm (0 = none). */
  ribbonCm?: number;
  /** A wet-rubbed pinch feels very gritty, very smooth or neither. */
  feel?: FeelClass;
};

/** Ribbon class from length: < weakBelowCm weak, weakBelowCm..strongAboveCm medium, > strongAboveCm strong. */
export function ribbonClass(ribbonCm: number, key: FeelKey = DEFAULT_FEEL_KEY): RibbonClass {
  assertNonNegative('ribbonCm', ribbonCm);
  const { weakBelowCm, strongAboveCm } = key.ribbonThresholdsCm;
  if (ribbonCm === 0) return 'none';
  // Thien 1979 key: ribbon < 2.5 cm weak, 2.5–5 cm medium, > 5 cm strong (thresholds configurable)
  if (ribbonCm < weakBelowCm) return 'weak';
  if (ribbonCm <= strongAboveCm) return 'medium';
  return 'strong';
}

/** Texture class from a feel test, by the key (default Thien 1979; pass another for other thresholds). */
export function textureByFeel(
  test: FeelTest,
  key: FeelKey = DEFAULT_FEEL_KEY,
): Result<{ textureClass: TextureClass; ribbon: RibbonClass; source: string }> {
  const source = 'Thien (1979) texture-by-feel key';
  if (typeof test.balls !== 'boolean') return fail('balls must say whether the soil forms a ball (true or false)');
  if (!test.balls) return succeed({ textureClass: key.noBall.textureClass as TextureClass, ribbon: 'none', source });
  if (test.ribbonCm === undefined || !Number.isFinite(test.ribbonCm) || test.ribbonCm < 0) {
    return fail('ribbonCm is needed when the soil balls (0 when it will not ribbon)');
  }
  const ribbon = ribbonClass(test.ribbonCm, key);
  if (ribbon === 'none') return succeed({ textureClass: key.noRibbon.textureClass as TextureClass, ribbon, source });
  if (!test.feel) return fail('feel is needed when the soil ribbons: very gritty, very smooth or neither');
  const row = key.rows.find((r) => r.ribbon === ribbon && r.feel === test.feel);
  if (!row) return fail(`the feel key has no row for a ${ribbon} ribbon that feels ${test.feel}`);
  return succeed({ textureClass: row.textureClass as TextureClass, ribbon, source });
}
