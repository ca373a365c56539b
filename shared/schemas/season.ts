// Seasons, cropping and practices per field per season, farm climate and typed ground.
import { z } from 'zod';
import { Crop, Tillage, Practice, StripRotation } from './estimate';
import { plainText } from './plain-text';

export const SeasonLabel = plainText('season', 40);
/** POST /api/farms/:farmId/seasons: a label, and optionally the season whose cropping it starts with. */
export const SeasonCreate = z.object({ label: SeasonLabel, copyCroppingFrom: plainText('copyCroppingFrom', 40).optional() });
/**
 * A season. The seasons list adds what it holds: fields with cropping, whether it has a plan,
 * empty (neither; it may be deleted) and current (the one screens open on).
 */
/** Who last changed a record (null: a person since removed) and when. */
export type LastChange = { by: string | null; at: string };

export type Season = { id: number; label: string; croppedFields?: number; hasPlan?: boolean; empty?: boolean; current?: boolean };

const pct = (f: string) => z.number({ error: `${f} must be a number` }).min(0, `${f} must be at least 0 %`).max(100, `${f} must be at most 100 %`);
const isoDate = (f: string) => z.string().regex(/^\d{4}-\d{2}-\d{2}$/, `${f} must be a date like 2027-09-15`);

export const CoverCropInput = z.object({
  species: plainText('coverCrop.species', 80, 'coverCrop.species is required'),
  seededOn: isoDate('coverCrop.seededOn').nullable().optional(),
  terminatedOn: isoDate('coverCrop.terminatedOn').nullable().optional(),
});

export const CroppingUpdate = z
  .object({
    season: SeasonLabel,
    /** The version read; omit when creating the season's first record for the field. */
    version: z.number().int().nonnegative().optional(),
    crop: Crop,
    tillage: Tillage.nullable().optional(),
    residuePct: pct('residuePct').nullable().optional(),
    /** Pasture and hay: living and dead ground cover. */
    groundCoverPct: pct('groundCoverPct').nullable().optional(),
    coverCrop: CoverCropInput.nullable().optional(),
    practice: Practice.default('none'),
    terraceIntervalM: z.number().min(1, 'terraceIntervalM must be at least 1 m').max(1000).nullable().optional(),
    /** Strip cropping: the rotation in the strips, a column of AH-537 table 14; required with strip cropping. */
    stripRotation: StripRotation.nullable().optional(),
    /** Strip cropping: width of each strip, m. */
    stripWidthM: z.number({ error: 'stripWidthM must be a number' }).min(1, 'stripWidthM must be at least 1 m').max(500, 'stripWidthM must be at most 500 m').nullable().optional(),
  })
  .refine((c) => c.crop === 'pasture' || c.crop === 'hay or meadow' || c.tillage != null, { message: 'tillage is required for this crop', path: ['tillage'] })
  .refine((c) => c.crop !== 'pasture' || c.groundCoverPct != null, { message: 'groundCoverPct is required for pasture', path: ['groundCoverPct'] })
  .refine((c) => c.practice !== 'terraces' || c.terraceIntervalM != null, { message: 'terraceIntervalM is required with terraces', path: ['terraceIntervalM'] })
  .refine((c) => c.practice !== 'strip cropping' || c.stripRotation != null, {
    message: 'stripRotation is required with strip cropping (A, B or C: the rotation in the strips)',
    path: ['stripRotation'],
  });
export type CroppingUpdate = z.input<typeof CroppingUpdate>;

export type Cropping = {
  fieldId: number;
  season: string;
  crop: z.infer<typeof Crop>;
  tillage: z.infer<typeof Tillage> | null;
  residuePct: number | null;
  groundCoverPct: number | null;
  coverCrop: z.infer<typeof CoverCropInput> | null;
  practice: z.infer<typeof Practice>;
  terraceIntervalM: number | null;
  stripRotation: z.infer<typeof StripRotation> | null;
  stripWidthM: number | null;
  version: number;
  updatedAt: string;
  lastChange: LastChange;
};

export const ClimateUpdate = z
  .object({
    version: z.number().int().nonnegative().optional(),
    rFrom: z.enum(['value', 'precipitation'], { error: "rFrom must be 'value' or 'precipitation'" }),
    /** R in MJ·mm/(ha·h·yr) when rFrom is 'value'. */
    rValue: z.number().min(0, 'rValue must be at least 0').max(100_000, 'rValue must be at most 100000').nullable().optional(),
    annualPrecipitationMm: z.number().min(0).max(12_000, 'annualPrecipitationMm must be at most 12000 mm').nullable().optional(),
    /** Design storm depth (e.g. the 24-h, 10-year rainfall), mm. */
    designStormMm: z.number({ error: 'designStormMm must be a number' }).min(1, 'designStormMm must be at least 1 mm').max(1000, 'designStormMm must be at most 1000 mm'),
  })
  .refine((c) => c.rFrom !== 'value' || c.rValue != null, { message: 'rValue is required when rFrom is value', path: ['rValue'] })
  .refine((c) => c.rFrom !== 'precipitation' || c.annualPrecipitationMm != null, { message: 'annualPrecipitationMm is required when rFrom is precipitation', path: ['annualPrecipitationMm'] });
export type ClimateUpdate = z.input<typeof ClimateUpdate>;
/** What an uploaded rainfall record gave: R (MJ·mm/(ha·h·yr)) and the record's extent. */
export type RainfallRecordSummary = { r: number; years: number; from: string; to: string; breakpoints: number; storms: number; erosiveStorms: number };
export type Climate = {
  rFrom: 'value' | 'precipitation' | 'record';
  rValue: number | null;
  annualPrecipitationMm: number | null;
  designStormMm: number;
  /** When rFrom is 'record'. */
  record: RainfallRecordSummary | null;
  version: number;
  lastChange: LastChange;
};

export const GroundUpdate = z
  .object({
    version: z.number().int().nonnegative().optional(),
    slopePct: z.number().min(0, 'slopePct must be at least 0 %').max(100, 'slopePct must be at most 100 %').nullable(),
    slopeLengthM: z.number().min(1, 'slopeLengthM must be at least 1 m').max(2000, 'slopeLengthM must be at most 2000 m').nullable(),
    /** Is the field drained (tile or ditches)? */
    drained: z.boolean({ error: 'drained must be true or false' }).default(false),
    /** How deep the drainage keeps the seasonal high water table, cm (NEH 630 ch. 7 reads dual groups by it). */
    drainedWaterTableDepthCm: z
      .number({ error: 'drainedWaterTableDepthCm must be a number' })
      .min(0, 'drainedWaterTableDepthCm must be at least 0 cm')
      .max(500, 'drainedWaterTableDepthCm must be at most 500 cm')
      .nullable()
      .optional(),
  })
  .refine((g) => g.drained || g.drainedWaterTableDepthCm == null, {
    message: 'drainedWaterTableDepthCm is only for a drained field (set drained to true)',
    path: ['drainedWaterTableDepthCm'],
  });
export type GroundUpdate = z.input<typeof GroundUpdate>;
export type Ground = { slopePct: number | null; slopeLengthM: number | null; drained: boolean; drainedWaterTableDepthCm: number | null; version: number; lastChange: LastChange };

/** The text parts of a rainfall-record upload (multipart): both optional, numbers as text. */
const formNumber = (min: number, max: number) => {
  const message = `must be a number from ${min} to ${max}`;
  return z.preprocess((v) => (v === undefined || v === '' ? undefined : Number(v)), z.number({ error: message }).min(min, message).max(max, message).optional());
};
export const RainfallRecordFields = z.object({
  /** Years the record spans, when its dates do not say it plainly. */
  years: formNumber(0.1, 200),
  designStormMm: formNumber(1, 1000),
});
export type RainfallRecordFields = z.output<typeof RainfallRecordFields>;
