// Topographic factors L and S: RUSLE (AH-703 ch. 4, McCool et al. 1987, 1989), USLE (AH-537)
// and the Desmet & Govers (1996) grid-cell L. Slope in percent (rise/run × 100), lengths in
// horizontal metres. Pure functions; misuse (NaN, negative values) throws.
import { assertFinite, assertNonNegative, assertPositive } from './assert';

/** Length of the RUSLE/USLE unit plot in metres (72.6 ft). */
export const UNIT_PLOT_LENGTH_M = 22.13;
/**
 * 15 ft in metres: the shortest length of AH-703's LS table (Table 4-3) with its own L. Shorter
 * slopes keep L at its 15-ft value, so LS never falls as a slope grows at a fixed steepness.
 */
export const SHORT_SLOPE_LENGTH_M = 15 * 0.3048;

export type RillRatio = 'low' | 'moderate' | 'high';

function sinTheta(slopePct: number): number {
  // θ = atan(s/100)
  return Math.sin(Math.atan(slopePct / 100));
}

/**
 * RUSLE slope steepness factor S (dimensionless).
 * @param slopePct slope steepness in percent (>= 0)
 * @param lengthM horizontal slope length in metres. Below 15 ft (4.572 m) and from 9 % up, S
 *   moves from the short-slope S toward the ordinary S as the slope grows (see below); omit it
 *   for the ordinary (long-slope) form.
 */
export function rusleSlopeFactor(slopePct: number, lengthM?: number): number {
  assertNonNegative('slopePct', slopePct);
  if (lengthM !== undefined) assertNonNegative('lengthM', lengthM);
  const sin = sinTheta(slopePct);
  // AH-703 eq. 4-4, McCool et al. 1987: S = 10.8 sin θ + 0.03 (s < 9 %), 16.8 sin θ − 0.50 (s ≥ 9 %)
  const ordinary = slopePct < 9 ? 10.8 * sin + 0.03 : 16.8 * sin - 0.5;
  // AH-703 Table 4-3: below 9 % every column shorter than 15 ft repeats the 15-ft value.
  if (lengthM === undefined || lengthM >= SHORT_SLOPE_LENGTH_M || slopePct < 9) return ordinary;
  // AH-703 eq. 4-5, McCool et al. 1987: S = 3.0 (sin θ)^0.8 + 0.56 for interrill erosion alone,
  // which is the table's "< 3 ft" column. Its 6, 9 and 12 ft columns lie between that and the
  // ordinary S by a rule we have not read; blending linearly in length from 0 to 15 ft is our
  // reading, and matches the printed 10, 12 and 14 % rows within 0.012.
  const interrillOnly = 3.0 * Math.pow(sin, 0.8) + 0.56;
  return interrillOnly + (lengthM / SHORT_SLOPE_LENGTH_M) * (ordinary - interrillOnly);
}

/**
 * RUSLE slope-length exponent m = β/(1+β).
 * @param rillRatio rill-to-interrill erosion ratio class: 'low' (β/2), 'moderate' (β, default),
 *   'high' (2β). [memory for the class labels]
 */
export function rusleLengthExponent(slopePct: number, rillRatio: RillRatio = 'moderate'): number {
  assertNonNegative('slopePct', slopePct);
  if (rillRatio !== 'low' && rillRatio !== 'moderate' && rillRatio !== 'high') {
    throw new Error(`rillRatio must be 'low', 'moderate' or 'high', got ${String(rillRatio)}`);
  }
  const sin = sinTheta(slopePct);
  if (sin === 0) return 0;
  // AH-703 eq. 4-3, McCool et al. 1989: β = (sin θ/0.0896)/(3.0 sin^0.8 θ + 0.56)
  const betaModerate = sin / 0.0896 / (3.0 * Math.pow(sin, 0.8) + 0.56);
  const beta = rillRatio === 'low' ? betaModerate / 2 : rillRatio === 'high' ? betaModerate * 2 : betaModerate;
  // AH-703 eq. 4-2: m = β/(1 + β)
  return beta / (1 + beta);
}

/** RUSLE slope-length factor L = (λ/22.13)^m for a uniform slope (AH-703 eq. 4-1). */
export function rusleLengthFactor(lengthM: number, m: number): number {
  assertNonNegative('lengthM', lengthM);
  assertNonNegative('m', m);
  // AH-703 eq. 4-1: L = (λ/22.13)^m
  return Math.pow(lengthM / UNIT_PLOT_LENGTH_M, m);
}

export type LsResult = { l: number; s: number; ls: number; m: number };

/**
 * RUSLE LS for a uniform slope. Moderate rill/interrill ratio unless told otherwise.
 * Entry point: rusleLS({ slopePct, lengthM }) -> { l, s, ls }.
 */
export function rusleLS(args: { slopePct: number; lengthM: number; rillRatio?: RillRatio }): LsResult {
  const { slopePct, lengthM, rillRatio = 'moderate' } = args;
  assertNonNegative('slopePct', slopePct);
  assertNonNegative('lengthM', lengthM);
  const m = rusleLengthExponent(slopePct, rillRatio);
  // AH-703 Table 4-3: below 15 ft, L stays at its 15-ft value.
  const l = rusleLengthFactor(Math.max(lengthM, SHORT_SLOPE_LENGTH_M), m);
  const s = rusleSlopeFactor(slopePct, lengthM);
  return { l, s, ls: l * s, m };
}

/**
 * USLE slope-length exponent (AH-537 p. 12) [memory]. Gaps between the printed ranges are
 * closed downward: s ≥ 5 % → 0.5; 3.5 ≤ s < 5 % → 0.4; 1 ≤ s < 3.5 % → 0.3; s < 1 % → 0.2.
 */
export function usleLengthExponent(slopePct: number): number {
  assertNonNegative('slopePct', slopePct);
  if (slopePct >= 5) return 0.5;
  if (slopePct >= 3.5) return 0.4;
  if (slopePct >= 1) return 0.3;
  return 0.2;
}

/** USLE LS (AH-537 eq. 4), an option beside RUSLE. */
export function usleLS(args: { slopePct: number; lengthM: number }): LsResult {
  const { slopePct, lengthM } = args;
  assertNonNegative('slopePct', slopePct);
  assertNonNegative('lengthM', lengthM);
  const m = usleLengthExponent(slopePct);
  const sin = sinTheta(slopePct);
  const l = Math.pow(lengthM / UNIT_PLOT_LENGTH_M, m);
  // AH-537 eq. 4: LS = (λ/22.13)^m (65.41 sin²θ + 4.56 sin θ + 0.065)
  const s = 65.41 * sin * sin + 4.56 * sin + 0.065;
  return { l, s, ls: l * s, m };
}

/**
 * L of one segment of a slope between upper and lower horizontal distances from the top
 * (AH-703 eq. 4-6, Foster & Wischmeier 1974): L = (λₒ^(m+1) − λᵢ^(m+1)) / ((λₒ − λᵢ)·22.13^m).
 */
export function segmentL(args: { upperM: number; lowerM: number; m: number }): number {
  const { upperM, lowerM, m } = args;
  assertNonNegative('upperM', upperM);
  assertNonNegative('m', m);
  assertFinite('lowerM', lowerM);
  if (!(lowerM > upperM)) throw new Error(`lowerM must be greater than upperM, got ${lowerM} <= ${upperM}`);
  // AH-703 eq. 4-6
  return (
    (Math.pow(lowerM, m + 1) - Math.pow(upperM, m + 1)) /
    ((lowerM - upperM) * Math.pow(UNIT_PLOT_LENGTH_M, m))
  );
}

/**
 * Desmet & Govers (1996, J. Soil Water Conserv. 51:427) L of a grid cell.
 * @param upslopeAreaM2 contributing area at the cell's inlet, m² (0 for a ridge cell)
 * @param cellSizeM cell size D in metres
 * @param flowDirFactor x = |sin α| + |cos α| of the flow direction (1 cardinal, √2 diagonal)
 * @param m the RUSLE exponent for the cell's slope (see rusleLengthExponent)
 */
export function desmetGoversL(args: {
  upslopeAreaM2: number;
  cellSizeM: number;
  flowDirFactor: number;
  m: number;
}): number {
  const { upslopeAreaM2: a, cellSizeM: d, flowDirFactor: x, m } = args;
  assertNonNegative('upslopeAreaM2', a);
  assertPositive('cellSizeM', d);
  assertPositive('flowDirFactor', x);
  assertNonNegative('m', m);
  // Desmet & Govers 1996 eq. 6: L = [(A + D²)^(m+1) − A^(m+1)] / [D^(m+2) · x^m · 22.13^m]
  return (
    (Math.pow(a + d * d, m + 1) - Math.pow(a, m + 1)) /
    (Math.pow(d, m + 2) * Math.pow(x, m) * Math.pow(UNIT_PLOT_LENGTH_M, m))
  );
}

/** Longest slope RUSLE's LS tables cover: 1000 ft (AH-703 ch. 4) [memory]. */
export const MAX_RUSLE_SLOPE_LENGTH_M = 305;

/**
 * rusleLS with the expected failures as values: a slope length beyond the LS tables' range
 * (305 m / 1000 ft), or inputs that are not numbers.
 */
export function tryRusleLS(args: {
  slopePct: number;
  lengthM: number;
  rillRatio?: RillRatio;
  maxLengthM?: number;
}): { ok: true; value: LsResult } | { ok: false; reason: string } {
  const { slopePct, lengthM, maxLengthM = MAX_RUSLE_SLOPE_LENGTH_M } = args;
  if (!Number.isFinite(slopePct) || slopePct < 0) return { ok: false, reason: 'slopePct must be a number >= 0' };
  if (!Number.isFinite(lengthM) || lengthM <= 0) return { ok: false, reason: 'slopeLengthM must be a number > 0' };
  if (lengthM > maxLengthM) {
    return {
      ok: false,
      reason: `slopeLengthM ${lengthM} m is beyond the ${maxLengthM} m (1000 ft) the RUSLE LS tables cover; split the slope where it changes or flow concentrates, or use the elevation model`,
    };
  }
  return { ok: true, value: rusleLS(args) };
}
