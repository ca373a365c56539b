// Payloads of the treatments, prices and budget-plan API, shared by the client and the server's
// validate() middleware. Money is in the farm's currency; soil in metric tonnes.
import { z } from 'zod';
import type { FieldTreatments, TreatmentOption, TreatmentSite } from '../erosion/treatments/types';
import { SeasonLabel } from './season';

/** What a farm pays for, one price per item, each in its own unit. */
export const PRICE_ITEMS = {
  'lime-per-t': { label: 'Agricultural lime, delivered', unit: 'per tonne' },
  'gypsum-per-t': { label: 'Gypsum, delivered', unit: 'per tonne' },
  'compost-per-t': { label: 'Compost, delivered', unit: 'per tonne' },
  'spreading-per-ha': { label: 'Spreading lime, gypsum or compost', unit: 'per hectare' },
  'cover-crop-per-ha': { label: 'Cover crop seed and planting', unit: 'per hectare' },
  'no-till-per-ha': { label: 'Changing to no-till (drill hire, first year)', unit: 'per hectare' },
  'reduced-till-per-ha': { label: 'Changing to reduced tillage', unit: 'per hectare' },
  'contour-layout-per-ha': { label: 'Laying out contour lines', unit: 'per hectare' },
  'strip-layout-per-ha': { label: 'Laying out contour strips', unit: 'per hectare' },
  'terrace-per-m': { label: 'Terrace, built', unit: 'per metre' },
  'waterway-per-m': { label: 'Grassed waterway, shaped and seeded', unit: 'per metre' },
  'filter-strip-per-ha': { label: 'Filter strip seeding', unit: 'per hectare of strip' },
  'drainage-per-ha': { label: 'Subsurface drainage, designed and installed', unit: 'per hectare' },
  'raised-beds-per-ha': { label: 'Raised or no-dig beds', unit: 'per hectare' },
  'permanent-cover-per-ha': { label: 'Permanent cover seeding', unit: 'per hectare' },
} as const;
export type PriceKey = keyof typeof PRICE_ITEMS;
export const PRICE_KEYS = Object.keys(PRICE_ITEMS) as PriceKey[];

const money = (key: string) =>
  z
    .number({ error: `${key} must be a number` })
    .refine(Number.isFinite, `${key} must be a finite number`)
    .pipe(z.number().min(0, `${key} must be at least 0`).max(1_000_000, `${key} must be at most 1000000`));

/** Every item's price, in the farm's currency. */
export const Prices = z.object(Object.fromEntries(PRICE_KEYS.map((k) => [k, money(k)])) as Record<PriceKey, ReturnType<typeof money>>);
export type Prices = z.infer<typeof Prices>;

export const Currency = z.string().regex(/^[A-Z]{3}$/, 'currency must be a three-letter code such as USD');

const bounded = (key: string, min: number, max: number, unit = '') =>
  z
    .number({ error: `${key} must be a number` })
    .refine(Number.isFinite, `${key} must be a finite number`)
    .pipe(z.number().min(min, `${key} must be at least ${min}${unit}`).max(max, `${key} must be at most ${max}${unit}`));

/**
 * The farm's lime and gypsum products and aims: the lime's label (CCE and sieve analysis), the
 * target pH (null: the buffer method's usual target), the gypsum's purity and the extra allowed
 * for incomplete exchange on sodic soils.
 */
export const AmendmentChoices = z
  .object({
    limeTargetPh: bounded('limeTargetPh', 5, 7.5).nullable(),
    limeCcePct: bounded('limeCcePct', 40, 120, ' %'),
    limePassing20MeshPct: bounded('limePassing20MeshPct', 0, 100, ' %'),
    limePassing60MeshPct: bounded('limePassing60MeshPct', 0, 100, ' %'),
    limePassing100MeshPct: bounded('limePassing100MeshPct', 0, 100, ' %'),
    gypsumPurityPct: bounded('gypsumPurityPct', 30, 100, ' %'),
    gypsumExchangeEfficiency: bounded('gypsumExchangeEfficiency', 1, 2),
  })
  .refine((a) => a.limePassing20MeshPct >= a.limePassing60MeshPct && a.limePassing60MeshPct >= a.limePassing100MeshPct, {
    message: 'a finer sieve cannot pass more than a coarser one: % passing 20 mesh ≥ 60 mesh ≥ 100 mesh',
    path: ['limePassing60MeshPct'],
  });
export type AmendmentChoices = z.infer<typeof AmendmentChoices>;

/** PUT /api/farms/:farmId/prices */
export const PricesUpdate = z.object({
  /** The version read (0 when the farm still has the example list). */
  version: z.number().int().nonnegative(),
  currency: Currency,
  prices: Prices,
  /** Left out: the ones stored stay (the examples for a new list). */
  amendments: AmendmentChoices.optional(),
});
export type PricesUpdate = z.input<typeof PricesUpdate>;

/** GET /api/farms/:farmId/prices answer. */
export type PriceList = {
  currency: string;
  prices: Prices;
  /** True while the farm still has the example list: the figures are examples to replace. */
  examples: boolean;
  /** Items still at their example figure. */
  exampleKeys: PriceKey[];
  amendments: AmendmentChoices;
  /** True while the amendment products are the example ones. */
  amendmentExamples: boolean;
  version: number;
  updatedBy: string | null;
  updatedAt: string | null;
};

/** GET /api/fields/:fieldId/treatments?season=YYYY */
export const TreatmentsQuery = z.object({ season: SeasonLabel.optional() });

/** POST /api/farms/:farmId/budget-plan */
export const BudgetPlanRequest = z.object({
  season: SeasonLabel,
  budget: money('budget'),
  /** most-soil: the most tonnes saved; most-fields-under-t: the most fields brought under T (then the most tonnes). */
  goal: z.enum(['most-soil', 'most-fields-under-t'], { error: "goal must be 'most-soil' or 'most-fields-under-t'" }).default('most-soil'),
});
export type BudgetPlanRequest = z.input<typeof BudgetPlanRequest>;

// ------------------------------------------------------------------ answers

/** GET /api/fields/:fieldId/treatments answer. `site` lets the browser's what-if rerun the engine. */
export type FieldTreatmentsAnswer =
  | ({ ok: true; fieldId: number; season: string; site: TreatmentSite } & FieldTreatments)
  | { ok: false; fieldId: number; season: string; reason: string; gaps: { key: string; tab: string; message: string }[] };

/** GET /api/farms/:farmId/treatments answer: every field's options and its best one. */
export type FarmTreatmentsAnswer = {
  season: string;
  currency: string;
  fields: {
    fieldId: number;
    name: string;
    areaHa: number;
    /** The cheapest option under T, else the one saving the most soil per money; null when there is none. */
    best: TreatmentOption | null;
    answer: FieldTreatmentsAnswer;
  }[];
};

/** POST /api/farms/:farmId/budget-plan answer. */
export type BudgetPlan = {
  season: string;
  goal: 'most-soil' | 'most-fields-under-t';
  currency: string;
  budget: number;
  spent: number;
  tonnesSavedPerYr: number;
  fieldsUnderT: number;
  choices: {
    fieldId: number;
    fieldName: string;
    optionId: string | null;
    title: string | null;
    cost: number;
    tonnesSavedPerYr: number;
    reachesT: boolean;
  }[];
  /** Why the plan is what it is, in sentences for a person. */
  explanation: string[];
  /** Soil saved against money for budgets from 0 to a little past what every field's best option costs. */
  curve: { budget: number; tonnesSavedPerYr: number }[];
};
