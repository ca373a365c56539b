// What the server says about one field in one season, and the priority board.
import type { EstimateSuccess } from './estimate';
import type { RiskClass } from '../erosion/risk-class';
import type { Origin } from './provenance';

export type InputKey = 'r' | 'k' | 'slope' | 'length' | 'crop' | 'practice' | 'c' | 'p' | 't' | 'storm' | 'hsg' | 'drainage';
/** The figure of an input that has a unit, kept as a number so each reader sees it in their units. */
export type InputQuantity =
  | { kind: 'erosivity'; rSi: number }
  | { kind: 'annual-rain'; mmPerYr: number }
  | { kind: 'storm'; mm: number }
  | { kind: 'length'; m: number }
  | { kind: 'tolerance'; tonPerAcYr: number };
/**
 * One input of an assessment: its value in words (SI; written again in the reader's units from
 * `quantity` when there is one) and where it came from.
 */
export type AssessmentInput = { key: InputKey; label: string; value: string; quantity?: InputQuantity; origin: Origin; note?: string };

export type GapKey = 'erosivity' | 'erodibility' | 'slope' | 'slope-length' | 'cropping' | 'soil-group';
/** Where a gap is filled: a tab of the Field screen, or the farm's climate panel. */
export type GapTab = 'ground' | 'soil' | 'cropping' | 'farm-climate';
/** An input the estimate still waits for. */
export type Gap = { key: GapKey; tab: GapTab; message: string };

export type FieldAssessment = {
  fieldId: number;
  farmId: number;
  name: string;
  season: string;
  areaHa: number;
  /** Every input and where it came from, for "every figure explains itself". */
  inputs: AssessmentInput[];
  /** Inputs that are still missing; the estimate waits for them. */
  gaps: Gap[];
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

/** What an assessment stores for the board; the field's name and area are read live. */
export type StoredBoardFigures = {
  soilLossTPerHaYr: number | null;
  toleranceTPerHaYr: number | null;
  aOverT: number | null;
  tonnesPerYr: number | null;
  runoffMm: number | null;
  riskClass: RiskClass | null;
  problemClay: boolean;
  gaps: Gap[];
  /** What drives the rank, as values; the board writes them in the reader's units. */
  reasons: BoardReason[];
};

/** One driver of a field's rank (rules of thumb, common practice); words by shared/format/board-reasons. */
export type BoardReason =
  | { kind: 'steep-slope'; ls: number }
  | { kind: 'little-cover'; c: number }
  | { kind: 'erodible-soil'; kUs: number }
  | { kind: 'much-runoff'; runoffMm: number; stormMm: number }
  /** flowAreaHa: the ground of the elevation model's concentrated-flow cells. */
  | { kind: 'concentrated-flow'; cells: number; flowAreaHa: number | null }
  | { kind: 'problem-clay'; clayPct: number | null; textureClass: string | null }
  | { kind: 'wet-ground'; depthToGrayCm: number | null; drainageClass: string | null };

/** A board row: the field as it is now, with its stored figures; the farm's name on the advisor's board. */
export type BoardRow = { fieldId: number; farmId: number; farmName?: string; name: string; areaHa: number } & Omit<StoredBoardFigures, 'reasons'> & {
  /** The drivers of the rank in the reader's units, e.g. "steep or long slope (LS 3.1)". */
  reasons: string[];
};
export type Board = { season: string; rows: BoardRow[] };
