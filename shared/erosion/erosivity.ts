// Rainfall erosivity R, SI units MJ·mm/(ha·h·yr): typed, from mean annual precipitation
// (Renard & Freimund 1994), or from a breakpoint rainfall record (AH-703 ch. 2).
import { assertFinite, assertNonNegative, fail, succeed, type Result } from './assert';
import { rUsToSi } from './units';

/** R typed by the user, in SI or US units, returned in SI. */
export function rFromValue(value: number, units: 'si' | 'us' = 'si'): number {
  assertNonNegative('r', value);
  return units === 'us' ? rUsToSi(value) : value;
}

/**
 * Entry point: R from mean annual precipitation P in mm (Renard & Freimund 1994,
 * J. Hydrol. 157:287) [memory]. Says nothing about where the fit holds: see
 * rFromAnnualPrecipitationChecked.
 */
export function rFromAnnualPrecipitation(annualPrecipitationMm: number): number {
  assertNonNegative('annualPrecipitationMm', annualPrecipitationMm);
  const p = annualPrecipitationMm;
  // Renard & Freimund 1994 eq. 13: R = 0.04830 P^1.610, P < 850 mm
  if (p < 850) return 0.0483 * Math.pow(p, 1.61);
  // Renard & Freimund 1994 eq. 14: R = 587.8 − 1.219 P + 0.004105 P², P ≥ 850 mm
  return 587.8 - 1.219 * p + 0.004105 * p * p;
}

/**
 * Mean annual precipitation of the stations the Renard & Freimund (1994) regression was fitted
 * to: weather stations of the conterminous United States. The limits are recalled, not re-read
 * in the paper [memory]: about 200 mm (the dry western stations) to about 1700 mm (the wettest
 * Gulf Coast stations). Outside them the fit is an extrapolation.
 */
export const R_PRECIPITATION_FITTED_RANGE_MM = { min: 200, max: 1700, flag: 'memory' } as const;

/** Beside the box where annual precipitation is typed. */
export const R_PRECIPITATION_HINT =
  `A regional fit to US stations with about ${R_PRECIPITATION_FITTED_RANGE_MM.min}–${R_PRECIPITATION_FITTED_RANGE_MM.max} mm a year; ` +
  'outside that range, or where most rain falls in winter, type the local R instead.';

/** Said wherever R comes from annual precipitation, inside the fitted range or not. */
export const R_FROM_PRECIPITATION_NOTE =
  'R from annual precipitation is a regional fit to US stations; in winter-rain (Mediterranean) climates, where gentle winter rain ' +
  'carries little erosive energy, it can be several times too high. A published local R, or one from a rainfall record, is better.';

export type CheckedR = {
  /** R, MJ·mm/(ha·h·yr). */
  r: number;
  withinFittedRange: boolean;
  /** Why this R is doubtful, for a person; only outside the fitted range. */
  warning?: string;
};

/**
 * R from mean annual precipitation, with whether P lies in the range the regression was fitted
 * to (Renard & Freimund 1994). Outside it the figure comes with a warning rather than a refusal:
 * it may be all a person has, and the warning says that a local R is preferred.
 */
export function rFromAnnualPrecipitationChecked(annualPrecipitationMm: number): CheckedR {
  const r = rFromAnnualPrecipitation(annualPrecipitationMm);
  const { min, max } = R_PRECIPITATION_FITTED_RANGE_MM;
  if (annualPrecipitationMm >= min && annualPrecipitationMm <= max) return { r, withinFittedRange: true };
  const side = annualPrecipitationMm < min ? 'below' : 'above';
  const warning =
    `${Math.round(annualPrecipitationMm)} mm a year is ${side} the ${min}–${max} mm of the US stations the Renard & Freimund (1994) ` +
    'fit was made from: R here is an extrapolation and can be several times off (in winter-rain climates too). Type the local R ' +
    '(published, or from a rainfall record) instead.';
  return { r, withinFittedRange: false, warning };
}

/** Unit rainfall energy e, MJ/(ha·mm), at intensity i mm/h (Brown & Foster 1987; AH-703 eq. 2-3 SI). */
export function unitEnergy(intensityMmPerH: number): number {
  assertNonNegative('intensityMmPerH', intensityMmPerH);
  // Brown & Foster 1987: e = 0.29 [1 − 0.72 exp(−0.05 i)]
  return 0.29 * (1 - 0.72 * Math.exp(-0.05 * intensityMmPerH));
}

/** One breakpoint: time since the record started (minutes) and cumulative rainfall (mm). */
export type Breakpoint = { timeMin: number; cumulativeMm: number };

/** A rainfall interval of uniform intensity between two breakpoints. */
type Interval = { startMin: number; endMin: number; depthMm: number };

export type StormRules = {
  /** Storms are split by at least this many hours with less than splitMaxMm (6 h, 1.27 mm) [memory]. */
  splitHours: number;
  splitMaxMm: number;
  /** Storms below this depth are left out (12.7 mm) … */
  minStormMm: number;
  /** … unless this much fell in 15 minutes (6.35 mm) [memory]. */
  minBurstMm: number;
};
export const DEFAULT_STORM_RULES: StormRules = { splitHours: 6, splitMaxMm: 1.27, minStormMm: 12.7, minBurstMm: 6.35 };

export type Storm = {
  startMin: number;
  endMin: number;
  depthMm: number;
  energyMjPerHa: number;
  i30MmPerH: number;
  ei30: number;
  max15MinMm: number;
  erosive: boolean;
};

function toIntervals(record: Breakpoint[]): Result<Interval[]> {
  if (record.length < 2) return fail('a rainfall record needs at least two breakpoints');
  const out: Interval[] = [];
  for (let i = 1; i < record.length; i++) {
    const a = record[i - 1];
    const b = record[i];
    if (![a.timeMin, a.cumulativeMm, b.timeMin, b.cumulativeMm].every(Number.isFinite)) {
      return fail(`breakpoint ${i} is not a number`);
    }
    if (b.timeMin <= a.timeMin) return fail(`breakpoint times must increase (breakpoint ${i})`);
    if (b.cumulativeMm < a.cumulativeMm) return fail(`cumulative rainfall must not decrease (breakpoint ${i})`);
    if (b.cumulativeMm > a.cumulativeMm) out.push({ startMin: a.timeMin, endMin: b.timeMin, depthMm: b.cumulativeMm - a.cumulativeMm });
  }
  return succeed(out);
}

/** Rainfall in [fromMin, toMin], uniform intensity within each interval. */
function depthBetween(intervals: Interval[], fromMin: number, toMin: number): number {
  let d = 0;
  for (const iv of intervals) {
    const lo = Math.max(iv.startMin, fromMin);
    const hi = Math.min(iv.endMin, toMin);
    if (hi > lo) d += (iv.depthMm * (hi - lo)) / (iv.endMin - iv.startMin);
  }
  return d;
}

/** Largest depth in any window of windowMin minutes (attained with a window edge on a breakpoint). */
function maxWindowDepth(intervals: Interval[], windowMin: number): number {
  let best = 0;
  for (const iv of intervals) {
    for (const t of [iv.startMin, iv.endMin]) {
      best = Math.max(best, depthBetween(intervals, t, t + windowMin), depthBetween(intervals, t - windowMin, t));
    }
  }
  return best;
}

function stormOf(intervals: Interval[], rules: StormRules): Storm {
  const depthMm = intervals.reduce((s, iv) => s + iv.depthMm, 0);
  let energy = 0;
  for (const iv of intervals) {
    const i = (iv.depthMm / (iv.endMin - iv.startMin)) * 60;
    // AH-703 eq. 2-2: E = Σ e_r ΔV_r
    energy += unitEnergy(i) * iv.depthMm;
  }
  // AH-703 ch. 2: I30 = 2 × the largest 30-minute depth (the whole depth for storms under 30 min)
  const i30 = 2 * maxWindowDepth(intervals, 30);
  const max15 = maxWindowDepth(intervals, 15);
  return {
    startMin: intervals[0].startMin,
    endMin: intervals[intervals.length - 1].endMin,
    depthMm,
    energyMjPerHa: energy,
    i30MmPerH: i30,
    // AH-703 eq. 2-1: EI30 = E · I30
    ei30: energy * i30,
    max15MinMm: max15,
    erosive: depthMm >= rules.minStormMm || max15 >= rules.minBurstMm,
  };
}

/**
 * Splits a breakpoint record into storms and computes each storm's EI30 (AH-703 ch. 2).
 * A storm ends when the splitHours after its last significant rain bring less than splitMaxMm;
 * drizzle inside that window stays with the storm, rain after it starts the next one. Storms failing the 12.7 mm / 6.35 mm-in-15-min rule are kept but marked
 * erosive: false.
 */
export function stormsFromBreakpoints(record: Breakpoint[], rules: StormRules = DEFAULT_STORM_RULES): Result<Storm[]> {
  const ivs = toIntervals(record);
  if (!ivs.ok) return ivs;
  const intervals = ivs.value;
  const storms: Storm[] = [];
  let current: Interval[] = [];
  const splitMin = rules.splitHours * 60;
  // anchor: end of the storm's last interval that was followed by ≥ splitMaxMm within splitHours
  let anchor = -Infinity;
  for (const iv of intervals) {
    if (current.length > 0 && iv.startMin >= anchor + splitMin) {
      // AH-703 ch. 2: ≥ 6 h with < 1.27 mm ends the storm [memory]
      storms.push(stormOf(current, rules));
      current = [];
    }
    if (current.length === 0 || depthBetween(intervals, anchor, anchor + splitMin) >= rules.splitMaxMm) anchor = iv.endMin;
    current.push(iv);
  }
  if (current.length > 0) storms.push(stormOf(current, rules));
  return succeed(storms);
}

/** Mean annual R = Σ EI30 of erosive storms / years of record (AH-703 ch. 2). */
export function rFromBreakpointRecord(
  record: Breakpoint[],
  years: number,
  rules: StormRules = DEFAULT_STORM_RULES,
): Result<{ r: number; storms: Storm[]; erosiveStorms: number }> {
  assertFinite('years', years);
  if (years <= 0) return fail('years of record must be > 0');
  const storms = stormsFromBreakpoints(record, rules);
  if (!storms.ok) return storms;
  const erosive = storms.value.filter((s) => s.erosive);
  const total = erosive.reduce((s, st) => s + st.ei30, 0);
  return succeed({ r: total / years, storms: storms.value, erosiveStorms: erosive.length });
}
