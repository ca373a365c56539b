// RUSLE average annual sheet and rill soil loss A = R·K·LS·C·P (AH-703 eq. 1-1).
import { assertNonNegative } from './assert';
import { tPerHaToTonPerAc } from './units';

export type Factors = {
  /** R, MJ·mm/(ha·h·yr) */
  r: number;
  /** K, t·ha·h/(ha·MJ·mm) */
  k: number;
  ls: number;
  c: number;
  p: number;
};

/** Entry point: A in t/ha/yr from SI R and K. Throws on misuse (NaN, negative). */
export function soilLoss(f: Factors): number {
  for (const key of ['r', 'k', 'ls', 'c', 'p'] as const) assertNonNegative(key, f[key]);
  // AH-703 eq. 1-1: A = R · K · L · S · C · P
  return f.r * f.k * f.ls * f.c * f.p;
}

export type SoilLossResult = { soilLossTPerHaYr: number; soilLossTonPerAcYr: number; factors: Factors };

/** A in t/ha/yr and short t/ac/yr, with the factors it came from. */
export function soilLossDetailed(f: Factors): SoilLossResult {
  const a = soilLoss(f);
  return { soilLossTPerHaYr: a, soilLossTonPerAcYr: tPerHaToTonPerAc(a), factors: { ...f } };
}

/** Tonnes lost per year from a field of areaHa at A t/ha/yr. */
export function soilLossTonnesPerYr(soilLossTPerHaYr: number, areaHa: number): number {
  assertNonNegative('soilLossTPerHaYr', soilLossTPerHaYr);
  assertNonNegative('areaHa', areaHa);
  return soilLossTPerHaYr * areaHa;
}
