// What the server says about one field in one season, and the priority board.
import type { EstimateSuccess } from './estimate';
import type { RiskClass } from '../erosion/risk-class';

export type InputOrigin = 'typed' | 'derived' | 'default' | 'missing';

export type FieldAssessment = {
  fieldId: number;
  farmId: number;
  name: string;
  season: string;
  areaHa: number;
  /** What each input came from, in words, for "every figure explains itself". */
  inputs: { key: string; label: string; value: string; origin: InputOrigin; note?: string }[];
  /** Inputs that are still missing, in words; the estimate waits for them. */
  gaps: string[];
  estimate: EstimateSuccess | null;
  /** The reason the engine gave when it could not estimate. */
  failure: string | null;
  soilLossTPerHaYr: number | null;
  toleranceTPerHaYr: number | null;
  aOverT: number | null;
  tonnesPerYr: number | null;
  runoffMm: number | null;
  runoffM3: number | null;
  riskClass: RiskClass | null;
  problemClay: boolean;
  problemClayReasons: string[];
  drainageClass: string | null;
  /** When the ground is not worth amending: what to do instead, with the caution. */
  groundAdvice: string | null;
  lsSource: 'elevation model' | 'typed slope' | null;
  /** Cells of the field where flow from over 1 ha gathers (grassed waterway candidates); null without a DEM. */
  concentratedFlowCells: number | null;
  engineVersion: string;
  computedAt: string;
};

export type BoardRow = {
  fieldId: number;
  farmId: number;
  farmName?: string;
  name: string;
  areaHa: number;
  soilLossTPerHaYr: number | null;
  toleranceTPerHaYr: number | null;
  aOverT: number | null;
  tonnesPerYr: number | null;
  runoffMm: number | null;
  riskClass: RiskClass | null;
  problemClay: boolean;
  gaps: string[];
  /** Short reasons for the rank, e.g. "steep (LS 3.1)", "bare after soybean". */
  reasons: string[];
};
export type Board = { season: string; rows: BoardRow[] };
