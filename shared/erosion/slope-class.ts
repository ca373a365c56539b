// Slope classes (Soil Survey Manual ch. 3) [memory], breaks configurable per farm.
import slopeClassesJson from '../../data/reference/slope-classes.json';
import { assertNonNegative } from './assert';

export type SlopeClassRow = { minPct: number; maxPct: number | null; simple: string; complex: string };
export const DEFAULT_SLOPE_CLASSES = (slopeClassesJson as unknown as { rows: SlopeClassRow[] }).rows;

/** Builds classes from breaks (e.g. [2, 6, 12, 18, 25]) reusing the default names in order. */
export function slopeClassesFromBreaks(breaksPct: number[]): SlopeClassRow[] {
  if (breaksPct.length !== DEFAULT_SLOPE_CLASSES.length - 1) {
    throw new Error(`slope class breaks must have ${DEFAULT_SLOPE_CLASSES.length - 1} values, got ${breaksPct.length}`);
  }
  for (let i = 1; i < breaksPct.length; i++) {
    if (!(breaksPct[i] > breaksPct[i - 1])) throw new Error('slope class breaks must increase');
  }
  const edges = [0, ...breaksPct];
  return DEFAULT_SLOPE_CLASSES.map((r, i) => ({ ...r, minPct: edges[i], maxPct: i + 1 < edges.length ? edges[i + 1] : null }));
}

/** The class a slope falls in (lower limit inclusive, upper exclusive). */
export function slopeClass(slopePct: number, classes: SlopeClassRow[] = DEFAULT_SLOPE_CLASSES): SlopeClassRow {
  assertNonNegative('slopePct', slopePct);
  const row = classes.find((c) => slopePct >= c.minPct && (c.maxPct === null || slopePct < c.maxPct));
  if (!row) throw new Error(`no slope class for ${slopePct} %`);
  return row;
}
