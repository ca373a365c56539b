// Per-cell RUSLE soil loss A = R·K·LS·C·P (AH-703 eq. 1-1) in t/ha/yr, with R in
// MJ·mm/(ha·h·yr) and K in t·ha·h/(ha·MJ·mm), both scalar for the field or farm.

export type SoilLossFactors = { r: number; k: number; c: number; p: number };

/** A of every cell (NaN where LS is nodata). Throws on a negative or non-finite factor. */
export function soilLossGrid(ls: Float32Array, factors: SoilLossFactors): Float32Array {
  for (const name of ['r', 'k', 'c', 'p'] as const) {
    const v = factors[name];
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0) throw new Error(`${name} must be a finite number >= 0, got ${String(v)}`);
  }
  // AH-703 eq. 1-1: A = R·K·L·S·C·P
  const scale = factors.r * factors.k * factors.c * factors.p;
  const out = new Float32Array(ls.length);
  for (let i = 0; i < ls.length; i++) out[i] = ls[i] * scale;
  return out;
}
