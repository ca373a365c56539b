// One field's soil figures for other services (assessment, board): lab samples averaged,
// feel tests as a fallback, the soil map's area-weighted K, T and soil groups where mapped.
import type { Sequelize } from 'sequelize';

export type FieldSoilSummary = {
  sampleCount: number;
  sandPct: number | null;
  siltPct: number | null;
  clayPct: number | null;
  organicMatterPct: number | null;
  textureClass: string | null;
  ph: number | null;
  bufferPh: number | null;
  depthToGrayCm: number | null;
  drainageClass: string | null;
  notWorthAmending: boolean;
  kUs: number | null;
  kSource: string | null;
  tTonPerAcYr: number | null;
  tSource: string | null;
  hsg: string | null;
  hsgShares: { group: string; share: number }[];
  bulkDensity: number | null;
  cecCmolPerKg: number | null;
  espPct: number | null;
  problemClay: boolean;
  problemClayReasons: string[];
};

/** The soil summary of one field (work in progress: samples and soil map follow). */
export async function fieldSoilSummary(_sequelize: Sequelize, _fieldId: number): Promise<FieldSoilSummary> {
  return {
    sampleCount: 0,
    sandPct: null,
    siltPct: null,
    clayPct: null,
    organicMatterPct: null,
    textureClass: null,
    ph: null,
    bufferPh: null,
    depthToGrayCm: null,
    drainageClass: null,
    notWorthAmending: false,
    kUs: null,
    kSource: null,
    tTonPerAcYr: 5,
    tSource: 'deep soil default [practice]',
    hsg: null,
    hsgShares: [],
    bulkDensity: null,
    cecCmolPerKg: null,
    espPct: null,
    problemClay: false,
    problemClayReasons: [],
  };
}
