// Slope classes for the per-field shares. Default breaks: SSM ch. 3 class names with limits
// 0–2, 2–6, 6–12, 12–18, 18–25, > 25 % (USDA Soil Survey Manual, Handbook 18 [memory]; survey
// areas choose their own limits within ranges, so farms may pass their own).
import { SlopeClassList, type SlopeClass } from '../../../shared/schemas/terrain';

export type { SlopeClass };

export const DEFAULT_SLOPE_CLASSES: ReadonlyArray<SlopeClass> = Object.freeze([
  { name: 'nearly level', minPct: 0, maxPct: 2 },
  { name: 'gently sloping', minPct: 2, maxPct: 6 },
  { name: 'strongly sloping', minPct: 6, maxPct: 12 },
  { name: 'moderately steep', minPct: 12, maxPct: 18 },
  { name: 'steep', minPct: 18, maxPct: 25 },
  { name: 'very steep', minPct: 25, maxPct: null },
]);

export type ParseResult = { ok: true; classes: SlopeClass[] } | { ok: false; reason: string };

/** Checks a stored or shipped class list (an array, or { classes: [...] }) with the shared schema. */
export function parseSlopeClasses(input: unknown): ParseResult {
  const list = Array.isArray(input) ? input : (input as { classes?: unknown } | null)?.classes;
  const parsed = SlopeClassList.safeParse(list);
  if (parsed.success) return { ok: true, classes: parsed.data };
  const [index, property] = parsed.error.issues[0].path;
  const { message } = parsed.error.issues[0];
  if (index === undefined) return { ok: false, reason: `slope classes ${message}` };
  return { ok: false, reason: `class ${String(index)}: ${property === undefined ? '' : `${String(property)} `}${message}` };
}
