// Soil-loss tolerance T (NRCS National Soil Survey Handbook part 618) and the ratio A/T.
import { assertNonNegative, assertPositive } from './assert';
import type { Flag } from './cover';
import { tonPerAcToTPerHa } from './units';
import type { SourceRef } from '../schemas/provenance';

/** T for deep soils when the survey gives none, t/ac/yr: common practice, the top of NSSH part 618's 1–5 range. */
export const DEFAULT_T_TON_PER_AC_YR = 5;
/** Where the default T comes from, for people: common practice, no single published source. */
export const DEFAULT_T_SOURCE: SourceRef = { title: 'deep-soil T, common practice (the top of the 1–5 t/ac/yr range of NSSH part 618)' };

export type ToleranceResult = { tonPerAcYr: number; tPerHaYr: number; source: string; method: string; flag?: Flag };

/**
 * T per soil: the soil survey's T (1–5 t/ac/yr) wins; else from rooting depth to a restrictive
 * layer (< 25 cm 1, 25–50 2, 50–100 3, 100–150 4, ≥ 150 5 t/ac/yr [memory, NSSH 618 favourable
 * subsoil]); else 5 t/ac/yr for a deep soil [practice].
 */
export function soilLossTolerance(args: { surveyTTonPerAcYr?: number; rootingDepthCm?: number } = {}): ToleranceResult {
  const { surveyTTonPerAcYr, rootingDepthCm } = args;
  if (surveyTTonPerAcYr !== undefined) {
    assertPositive('surveyTTonPerAcYr', surveyTTonPerAcYr);
    return { tonPerAcYr: surveyTTonPerAcYr, tPerHaYr: tonPerAcToTPerHa(surveyTTonPerAcYr), source: 'soil survey T (NSSH part 618)', method: 'survey value' };
  }
  if (rootingDepthCm !== undefined) {
    assertNonNegative('rootingDepthCm', rootingDepthCm);
    // NSSH part 618 T by rooting depth, favourable subsoil [memory]
    const t = rootingDepthCm < 25 ? 1 : rootingDepthCm < 50 ? 2 : rootingDepthCm < 100 ? 3 : rootingDepthCm < 150 ? 4 : 5;
    return { tonPerAcYr: t, tPerHaYr: tonPerAcToTPerHa(t), source: 'NSSH part 618, T by rooting depth', method: `rooting depth ${rootingDepthCm} cm`, flag: 'memory' };
  }
  return {
    tonPerAcYr: DEFAULT_T_TON_PER_AC_YR,
    tPerHaYr: tonPerAcToTPerHa(DEFAULT_T_TON_PER_AC_YR),
    source: 'default T for a deep soil (common practice, no single source)',
    method: 'default 5 t/ac/yr',
    flag: 'practice',
  };
}

/** A/T, both in the same units; > 1 means soil is lost faster than tolerated. */
export function lossToToleranceRatio(soilLossTPerHaYr: number, toleranceTPerHaYr: number): number {
  assertNonNegative('soilLossTPerHaYr', soilLossTPerHaYr);
  assertPositive('toleranceTPerHaYr', toleranceTPerHaYr);
  return soilLossTPerHaYr / toleranceTPerHaYr;
}
