// Drainage class from depth to gray (redoximorphic depletion) colours, by a configurable field
// key (data/reference/drainage-key.json), and the verdict that ground is not worth amending.
import drainageJson from '../../data/reference/drainage-key.json';
import { fail, succeed, type Result } from './assert';
import type { Flag } from './cover';

/** The seven SSM drainage classes. */
export const DRAINAGE_CLASSES = [
  'excessively drained',
  'somewhat excessively drained',
  'well drained',
  'moderately well drained',
  'somewhat poorly drained',
  'poorly drained',
  'very poorly drained',
] as const;
export type DrainageClass = (typeof DRAINAGE_CLASSES)[number];

export type DrainageKey = {
  source: string;
  flag: Flag;
  /** Gray at or below this depth (or none found) → well drained. */
  wellDrainedFromCm: number;
  moderatelyWellFromCm: number;
  somewhatPoorlyFromCm: number;
  notWorthAmendingClasses: string[];
  notWorthAmendingSource: string;
  notWorthAmendingFlag: Flag;
};
type DrainageFile = { defaultKey: string; keys: Record<string, DrainageKey>; recommendation: { text: string; source: string; flag: Flag } };
const FILE = drainageJson as unknown as DrainageFile;
export const DRAINAGE_KEYS = FILE.keys;
export const DEFAULT_DRAINAGE_KEY: DrainageKey = FILE.keys[FILE.defaultKey];

export const NOT_WORTH_AMENDING_RECOMMENDATION = ['raised or no-dig beds', 'designed drainage', 'permanent cover'] as const;

export type DrainageInput = {
  /** Depth to gray (chroma ≤ 2, value ≥ 4) or redox features, cm; null when none seen. */
  depthToGrayCm: number | null;
  /** How deep the profile was looked at, cm (needed to call it well drained when no gray was seen). */
  describedToCm?: number;
  /** Gray dominant near the surface and saturated most of the year. */
  grayDominantNearSurface?: boolean;
};

export type DrainageVerdict = {
  drainageClass: DrainageClass;
  notWorthAmending: boolean;
  /** When notWorthAmending: raised/no-dig beds, designed drainage or permanent cover. */
  recommendation: string | null;
  options: string[];
  source: string;
  flag: Flag;
  notes: string[];
};

/** Drainage class and amending verdict. Expected failures (too shallow a description) as values. */
export function drainageVerdict(input: DrainageInput, key: DrainageKey = DEFAULT_DRAINAGE_KEY): Result<DrainageVerdict> {
  const notes: string[] = [];
  let cls: DrainageClass;
  const d = input.depthToGrayCm;
  if (input.grayDominantNearSurface) {
    cls = 'very poorly drained';
  } else if (d === null || d === undefined) {
    const described = input.describedToCm;
    if (described === undefined || !Number.isFinite(described)) {
      return fail('describedToCm is needed when no gray was seen: how deep was the profile looked at?');
    }
    if (described < key.wellDrainedFromCm) {
      if (described < key.moderatelyWellFromCm) {
        return fail(`no gray within ${described} cm says too little; look to at least ${key.moderatelyWellFromCm} cm (${key.wellDrainedFromCm} cm to call it well drained)`);
      }
      cls = 'moderately well drained';
      notes.push(`no gray within ${described} cm: at least moderately well drained; look to ${key.wellDrainedFromCm} cm to call it well drained`);
    } else cls = 'well drained';
  } else {
    if (!Number.isFinite(d) || d < 0) return fail('depthToGrayCm must be a depth in cm >= 0, or null when none was seen');
    // field key: gray ≥ well → well; ≥ mod. well → moderately well; ≥ somewhat poorly → somewhat poorly; shallower → poorly
    if (d >= key.wellDrainedFromCm) cls = 'well drained';
    else if (d >= key.moderatelyWellFromCm) cls = 'moderately well drained';
    else if (d >= key.somewhatPoorlyFromCm) cls = 'somewhat poorly drained';
    else cls = 'poorly drained';
  }
  if (cls === 'well drained') notes.push('excessively and somewhat excessively drained soils cannot be told from gray depth');
  const notWorthAmending = key.notWorthAmendingClasses.includes(cls);
  return succeed({
    drainageClass: cls,
    notWorthAmending,
    recommendation: notWorthAmending ? FILE.recommendation.text : null,
    options: notWorthAmending ? [...NOT_WORTH_AMENDING_RECOMMENDATION] : [],
    source: key.source,
    flag: notWorthAmending ? key.notWorthAmendingFlag : key.flag,
    notes,
  });
}
