// Slope classes for the per-field shares. Default breaks: SSM ch. 3 class names with limits
// 0–2, 2–6, 6–12, 12–18, 18–25, > 25 % (USDA Soil Survey Manual, Handbook 18 [memory]; survey
// areas choose their own limits within ranges, so farms may pass their own).

export type SlopeClass = { name: string; minPct: number; maxPct: number | null };

export const DEFAULT_SLOPE_CLASSES: ReadonlyArray<SlopeClass> = Object.freeze([
  { name: 'nearly level', minPct: 0, maxPct: 2 },
  { name: 'gently sloping', minPct: 2, maxPct: 6 },
  { name: 'strongly sloping', minPct: 6, maxPct: 12 },
  { name: 'moderately steep', minPct: 12, maxPct: 18 },
  { name: 'steep', minPct: 18, maxPct: 25 },
  { name: 'very steep', minPct: 25, maxPct: null },
]);

export type ParseResult = { ok: true; classes: SlopeClass[] } | { ok: false; reason: string };

/**
 * Checks a class list: an array (or { classes: [...] }) of { name, minPct, maxPct }, contiguous
 * and increasing, the last one open-ended (maxPct null) or closed.
 */
export function parseSlopeClasses(input: unknown): ParseResult {
  const list = Array.isArray(input) ? input : (input as { classes?: unknown } | null)?.classes;
  if (!Array.isArray(list) || list.length === 0) return { ok: false, reason: 'slope classes must be a non-empty list' };
  const classes: SlopeClass[] = [];
  for (const [i, item] of list.entries()) {
    const { name, minPct, maxPct } = (item ?? {}) as Record<string, unknown>;
    if (typeof name !== 'string' || name === '') return { ok: false, reason: `class ${i}: name must be a non-empty string` };
    if (typeof minPct !== 'number' || !(minPct >= 0)) return { ok: false, reason: `class ${i}: minPct must be a number >= 0` };
    if (maxPct !== null && maxPct !== undefined && (typeof maxPct !== 'number' || !(maxPct > minPct))) {
      return { ok: false, reason: `class ${i}: maxPct must be greater than minPct or null` };
    }
    const prev = classes[i - 1];
    if (prev && prev.maxPct !== minPct) return { ok: false, reason: `class ${i}: minPct must equal the previous class's maxPct` };
    classes.push({ name, minPct, maxPct: typeof maxPct === 'number' ? maxPct : null });
  }
  return { ok: true, classes };
}
