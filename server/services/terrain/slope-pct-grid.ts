// Slope % kept in 2 bytes per cell (half the Float32 grid). Each cell holds the code
// floor(200·s) — the 0.005 % step the Float32 slope falls in — so that:
//   - reading a cell back gives s rounded to 0.01 % (within 0.005 % of the Float32 slope);
//   - a class test s ≥ b done on the code (code ≥ 200·b) gives exactly the Float32 answer for
//     every break b on a 0.005 % grid (all the defaults and any break typed to 2 decimals);
//     a finer break may put cells within 0.005 % above it in the class below.
// Why exact: s is a Float32 (24-bit significand), so 200·s is exact in a double and
// floor(200·s) ≥ 200·b ⟺ s ≥ b when 200·b is a whole number.
// 65535 = nodata; slopes at or above 327.67 % (73°, cliffs) saturate at code 65534.

export const SLOPE_CODE_NODATA = 65535;
export const SLOPE_CODE_MAX = 65534;
/** Steepest slope a code can tell apart, %. */
export const SLOPE_CODE_MAX_PCT = SLOPE_CODE_MAX / 200;

/** Code of a slope % (NaN or negative → nodata). */
export function encodeSlopePct(slopePct: number): number {
  if (!(slopePct >= 0)) return SLOPE_CODE_NODATA;
  const c = Math.floor(slopePct * 200);
  return c < SLOPE_CODE_MAX ? c : SLOPE_CODE_MAX;
}

/** Slope % of a code, rounded to 0.01 % (NaN for nodata). */
export function decodeSlopePct(code: number): number {
  // floor((floor(200 s) + 1) / 2) = round(100 s), ties up
  return code === SLOPE_CODE_NODATA ? NaN : ((code + 1) >> 1) / 100;
}

/** Smallest code whose slope counts as ≥ breakPct (exact for breaks on a 0.005 % grid). */
export function slopeCodeAtLeast(breakPct: number): number {
  const t = breakPct * 200;
  const whole = Math.round(t);
  // 2.345 · 200 = 469.00000000000006 in doubles: a break typed to 3 decimals is on the grid.
  return Math.abs(t - whole) < 1e-6 ? whole : Math.ceil(t);
}

/** A slope grid in codes; `at(i)` reads slope % back (0.01 % steps). */
export class SlopePctGrid {
  readonly codes: Uint16Array;

  constructor(codes: Uint16Array) {
    this.codes = codes;
  }

  get length(): number {
    return this.codes.length;
  }

  /** Slope % of cell i, rounded to 0.01 % (NaN = nodata). */
  at(i: number): number {
    return decodeSlopePct(this.codes[i]);
  }

  /** Codes a Float32 slope grid (e.g. slopeHorn's). */
  static fromFloat32(slopePct: Float32Array): SlopePctGrid {
    const codes = new Uint16Array(slopePct.length);
    for (let i = 0; i < codes.length; i++) codes[i] = encodeSlopePct(slopePct[i]);
    return new SlopePctGrid(codes);
  }
}
