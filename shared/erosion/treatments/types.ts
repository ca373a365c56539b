// The treatment engine's types: what a field is (its current estimate inputs and what the soil
// checks and terrain say), what a treatment changes, and the options a field gets. Pure data.
import type { Units } from '../../schemas/auth';
import type { EstimateInput } from '../../schemas/estimate';
import type { Origin } from '../../schemas/provenance';
import type { PriceKey, Prices } from '../../schemas/treatments';
import type { BufferMethod, LimeProduct } from '../lime';

/** Every treatment the engine knows. NRCS practice standard codes in comments where they apply. */
export const TREATMENT_KEYS = [
  'cover-crop', // NRCS 340
  'no-till', // NRCS 329
  'reduced-till', // NRCS 345
  'contour-farming', // NRCS 330
  'strip-cropping', // NRCS 585
  'terraces', // NRCS 600
  'grassed-waterway', // NRCS 412
  'filter-strip', // NRCS 393
  'gypsum', // NRCS 333
  'lime',
  'organic-matter',
  'raised-beds',
  'drainage', // NRCS 606
  'permanent-cover', // NRCS 327
] as const;
export type TreatmentKey = (typeof TREATMENT_KEYS)[number];


/** One field as the treatment engine sees it. Numbers in SI unless named otherwise. */
export type TreatmentSite = {
  /** The field's current estimate inputs (the stored assessment's input). */
  input: EstimateInput;
  areaHa: number;
  soil: {
    ph: number | null;
    bufferPh: number | null;
    bufferMethod: BufferMethod | null;
    organicMatterPct: number | null;
    sandPct: number | null;
    siltPct: number | null;
    clayPct: number | null;
    cecCmolPerKg: number | null;
    espPct: number | null;
    bulkDensityMgPerM3: number | null;
    /** Shallow gray or mottled subsoil: amendments will not fix the ground. */
    notWorthAmending: boolean;
    problemClay: boolean;
  };
  water: {
    /** Length of the concentrated-flow path across the field, m (from the terrain's flow cells); null without terrain. */
    concentratedFlowLengthM: number | null;
    /** Length of the field's edge on its downslope side, toward water, m (an estimate). */
    downslopeEdgeLengthM: number | null;
  };
  prices: Prices;
  currency: string;
  /** The reader's units: the options' notes are written in them (hectares and metres, or acres and feet). */
  units: Units;
  /** The farm's own choices for amendments; the engine's stated example values when left out. */
  amendments?: {
    /** Target soil pH for lime, within the buffer method's calibration. */
    limeTargetPh?: number;
    /** The lime product's label: CCE and sieve analysis. */
    limeProduct?: LimeProduct;
    /** Gypsum (CaSO4·2H2O) in the product, %. */
    gypsumPurityPct?: number;
    /** Extra gypsum for incomplete exchange on sodic soils, 1.1–1.3 in practice. */
    gypsumExchangeEfficiency?: number;
  };
};

/** A factor a treatment can change. */
export type FactorKey = 'C' | 'P' | 'slope length' | 'K' | 'curve number';

/** How a treatment changes one factor. */
export type FactorChange = { factor: FactorKey; from: number; to: number; why: string };

/** An amount to order or build, e.g. { item: 'gypsum', amount: 12.4, unit: 't' }. */
export type TreatmentQuantity = { item: string; amount: number; unit: string; origin?: Origin; note?: string };

/** One cost line: quantity × price of a price-list item. */
export type CostLine = { priceKey: PriceKey; quantity: number; unit: string; unitPrice: number; total: number };

/** A treatment that cannot be offered on this field, and what is needed for it. */
export type Unavailable = { key: TreatmentKey; reason: string; needs?: 'soil-check' | 'terrain' | 'buffer-method' | 'texture' };

/** One option for a field: a single treatment or a combination. */
export type TreatmentOption = {
  id: string;
  treatments: TreatmentKey[];
  title: string;
  soilLossTPerHaYr: number;
  aOverT: number;
  runoffMm: number | null;
  tonnesSavedPerYr: number;
  quantities: TreatmentQuantity[];
  cost: { total: number; currency: string; lines: CostLine[] };
  /** Tonnes a year saved per unit of money spent; null when the option costs nothing. */
  tonnesSavedPerMoney: number | null;
  reachesT: boolean;
  /** The cheapest option that brings A under T. */
  cheapestUnderT: boolean;
  changes: FactorChange[];
  /** What the treatment does that RUSLE A does not show (gully control, sediment trapping …), and what it does not change. */
  effects: string[];
  cautions: string[];
};

export type CurrentFigures = { soilLossTPerHaYr: number; aOverT: number; runoffMm: number | null; tonnesPerYr: number };

export type FieldTreatments = { current: CurrentFigures; options: TreatmentOption[]; unavailable: Unavailable[] };

/** planBudget's input and answer. */
export type BudgetField = { fieldId: number; options: { id: string; cost: number; tonnesSaved: number; reachesT?: boolean }[] };
export type BudgetInput = { budget: number; fields: BudgetField[]; goal?: 'most-soil' | 'most-fields-under-t' };
export type BudgetAnswer = { choices: { fieldId: number; optionId: string | null }[]; cost: number; tonnesSaved: number; fieldsUnderT: number };
