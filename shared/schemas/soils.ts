// Payloads of the soils API: soil samples (lab results or a feel test), photos, the soil map's
// attribute mapping, and the answers the server gives. Shared by the client forms and the
// server's validate() middleware. Percentages are of the fine earth (< 2 mm).
import { z } from 'zod';
import { checkedText } from './plain-text';
import { tryClassifyTexture } from '../erosion/texture';
import type { Origin } from './provenance';
import type { LastChange } from './season';

/** A number with limits and a message that names the field. */
const num = (field: string, min: number, max: number, unit = '') =>
  z
    .number({ error: `${field} must be a number` })
    .refine(Number.isFinite, `${field} must be a finite number`)
    .pipe(z.number().min(min, `${field} must be at least ${min}${unit}`).max(max, `${field} must be at most ${max}${unit}`));
/** Optional on create; null clears it on change. */
const opt = <S extends z.ZodType>(s: S) => s.nullable().optional();

/** How far sand + silt + clay may be from 100 % and still be renormalised. */
export const SEPARATES_TOLERANCE_PCT = 2;

export const FeelGrit = z.enum(['gritty', 'smooth', 'neither'], { error: "feel must be 'gritty', 'smooth' or 'neither'" });
export type FeelGrit = z.infer<typeof FeelGrit>;

/** Buffer-pH methods the lime calculation knows: SMP (starts at pH 7.5) and Mehlich (starts at 6.6). */
export const BufferMethod = z.enum(['smp', 'mehlich'], { error: "bufferMethod must be 'smp' or 'mehlich'" });
export const BUFFER_METHOD_NAMES: Record<z.infer<typeof BufferMethod>, string> = { smp: 'SMP buffer', mehlich: 'Mehlich buffer' };

/** A GPS point in WGS84 degrees with the accuracy the device reported (radius, m). */
export const FieldPosition = z.object(
  {
    lng: num('position.lng', -180, 180, '°'),
    lat: num('position.lat', -90, 90, '°'),
    accuracyM: num('position.accuracyM', 0, 100_000, ' m'),
  },
  { error: 'position must be { lng, lat, accuracyM }' },
);
export type FieldPosition = z.infer<typeof FieldPosition>;

/**
 * A key the browser makes once per soil check (a UUID): a check sent again, after an answer that
 * never arrived, is stored once and the stored one is answered.
 */
export const ClientKey = z.uuid({ error: 'clientKey must be a UUID' });

const common = {
  label: opt(z.string().trim().max(120, 'label must be at most 120 characters').superRefine(checkedText('label'))),
  sampledOn: opt(z.iso.date({ error: 'sampledOn must be a date written YYYY-MM-DD' })),
  depthTopCm: opt(num('depthTopCm', 0, 500, ' cm')),
  depthBottomCm: opt(num('depthBottomCm', 0, 500, ' cm')),
  organicMatterPct: opt(num('organicMatterPct', 0, 100, ' %')),
  ph: opt(num('ph', 2, 11)),
  bufferPh: opt(num('bufferPh', 2, 11)),
  /** Which buffer the lab used for bufferPh: each has its own starting pH and calibration. */
  bufferMethod: opt(BufferMethod),
  /** Depth to gray (chroma ≤ 2) or mottled (redoximorphic) colours, cm; null when none was seen. */
  depthToGrayCm: opt(num('depthToGrayCm', 0, 500, ' cm')),
  /** How deep the profile was looked at, cm; lets "no gray seen" give a drainage class. */
  describedToCm: opt(num('describedToCm', 0, 500, ' cm')),
  /** Bulk density, Mg/m³. */
  bulkDensity: opt(num('bulkDensity', 0.1, 2.65, ' Mg/m³')),
  /** Cation exchange capacity, cmolc/kg. */
  cecCmolPerKg: opt(num('cecCmolPerKg', 0, 300, ' cmolc/kg')),
  /** Exchangeable sodium percentage. */
  espPct: opt(num('espPct', 0, 100, ' %')),
  /** Where the check was taken: a GPS point ([lng, lat] order as GeoJSON) and how sure the phone was of it. */
  position: opt(FieldPosition),
};

const separates = {
  sandPct: opt(num('sandPct', 0, 100, ' %')),
  siltPct: opt(num('siltPct', 0, 100, ' %')),
  clayPct: opt(num('clayPct', 0, 100, ' %')),
};

const feel = {
  /** Does moist soil form a ball when squeezed? */
  balls: z.boolean({ error: 'balls must be true or false' }),
  /** Ribbon length pushed out before it breaks, cm (0 when it will not ribbon). */
  ribbonCm: opt(num('ribbonCm', 0, 30, ' cm')),
  /** A wet-rubbed pinch feels gritty, smooth or neither. */
  feel: opt(FeelGrit),
};

type Checked = {
  depthTopCm?: number | null;
  depthBottomCm?: number | null;
  sandPct?: number | null;
  siltPct?: number | null;
  clayPct?: number | null;
};

/** Cross-field checks: depth range order, and sand/silt/clay all-or-none adding up to about 100 %. */
function checkSample(s: Checked, ctx: z.RefinementCtx): void {
  if (s.depthTopCm != null && s.depthBottomCm != null && s.depthBottomCm <= s.depthTopCm) {
    ctx.addIssue({ code: 'custom', path: ['depthBottomCm'], message: 'depthBottomCm must be deeper than depthTopCm' });
  }
  const given = (['sandPct', 'siltPct', 'clayPct'] as const).filter((k) => s[k] != null);
  if (given.length > 0 && given.length < 3) {
    const missing = (['sandPct', 'siltPct', 'clayPct'] as const).find((k) => s[k] == null)!;
    ctx.addIssue({ code: 'custom', path: [missing], message: `${missing} is needed too: give sand, silt and clay together, or none of them` });
    return;
  }
  if (given.length === 3) {
    const r = tryClassifyTexture({ sand: s.sandPct!, silt: s.siltPct!, clay: s.clayPct! }, { toleranceSumPct: SEPARATES_TOLERANCE_PCT });
    if (!r.ok) ctx.addIssue({ code: 'custom', path: ['sandPct'], message: r.reason });
  }
}

function checkFeel(s: { balls?: boolean; ribbonCm?: number | null; feel?: FeelGrit | null }, ctx: z.RefinementCtx): void {
  if (!s.balls) return;
  if (s.ribbonCm == null) ctx.addIssue({ code: 'custom', path: ['ribbonCm'], message: 'ribbonCm is needed when the soil balls (0 when it will not ribbon)' });
  else if (s.ribbonCm > 0 && s.feel == null) ctx.addIssue({ code: 'custom', path: ['feel'], message: "feel is needed when the soil ribbons: 'gritty', 'smooth' or 'neither'" });
}

const createOnly = { clientKey: ClientKey.optional() };
export const LabSampleInput = z.object({ kind: z.literal('lab'), ...common, ...separates, ...createOnly });
export const FeelSampleInput = z.object({ kind: z.literal('feel'), ...common, ...feel, ...createOnly });

/** POST /api/fields/:fieldId/soil-samples: lab results or a feel test. */
export const SoilSampleCreate = z
  .discriminatedUnion('kind', [LabSampleInput, FeelSampleInput], { error: "kind must be 'lab' or 'feel'" })
  .superRefine((s, ctx) => {
    checkSample(s.kind === 'lab' ? s : { depthTopCm: s.depthTopCm, depthBottomCm: s.depthBottomCm }, ctx);
    if (s.kind === 'feel') checkFeel(s, ctx);
  });
export type SoilSampleCreate = z.infer<typeof SoilSampleCreate>;

/** PATCH /api/soil-samples/:sampleId: any fields (null clears one), always the version read. */
export const SoilSampleUpdate = z.object({
  version: z.number({ error: 'version must be the number you read' }).int().nonnegative('version must be the number you read'),
  kind: z.enum(['lab', 'feel'], { error: "kind must be 'lab' or 'feel'" }).optional(),
  ...common,
  ...separates,
  balls: z.boolean({ error: 'balls must be true or false' }).optional(),
  ribbonCm: feel.ribbonCm,
  feel: feel.feel,
});
export type SoilSampleUpdate = z.infer<typeof SoilSampleUpdate>;

/** A stored sample as the API answers it. */
export type SoilSample = {
  id: number;
  fieldId: number;
  kind: 'lab' | 'feel';
  label: string | null;
  sampledOn: string | null;
  depthTopCm: number | null;
  depthBottomCm: number | null;
  /** Renormalised to 100 %. */
  sandPct: number | null;
  siltPct: number | null;
  clayPct: number | null;
  /** sand + silt + clay as typed, before renormalising. */
  separatesSumPct: number | null;
  organicMatterPct: number | null;
  ph: number | null;
  bufferPh: number | null;
  bufferMethod: 'smp' | 'mehlich' | null;
  depthToGrayCm: number | null;
  describedToCm: number | null;
  bulkDensity: number | null;
  cecCmolPerKg: number | null;
  espPct: number | null;
  position: FieldPosition | null;
  feelTest: { balls: boolean; ribbonCm: number | null; feel: FeelGrit | null; ribbonClass: string | null } | null;
  textureClass: string | null;
  textureSource: string | null;
  drainageClass: string | null;
  notWorthAmending: boolean | null;
  drainageSource: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  /** Who last changed it and when (by is null when not known). */
  lastChange: LastChange;
};

/** POST /api/fields/:fieldId/soil-samples/import answer (201). */
export type SoilCsvImportResult = { created: SoilSample[]; rejected: { row: number; reason: string }[] };

/** The soil sample CSV columns, in the documented order. */
export const SOIL_CSV_COLUMNS = [
  'label',
  'sampled_on',
  'depth_top_cm',
  'depth_bottom_cm',
  'sand_pct',
  'silt_pct',
  'clay_pct',
  'organic_matter_pct',
  'ph',
  'buffer_ph',
  'buffer_method',
  'depth_to_gray_cm',
  'bulk_density',
  'cec',
  'esp',
  'described_to_cm',
] as const;

/** A profile photo as listed. */
export type SoilPhoto = {
  id: number;
  fieldId: number;
  sampleId: number | null;
  caption: string | null;
  contentType: string;
  byteSize: number;
  width: number;
  height: number;
  thumbnailWidth: number;
  thumbnailHeight: number;
  url: string;
  thumbnailUrl: string;
  createdAt: string;
};

// ------------------------------------------------------------------ soil map

export const SOIL_MAP_MEANINGS = ['texture', 'k', 'hsg', 't', 'drainage'] as const;
export type SoilMapMeaning = (typeof SOIL_MAP_MEANINGS)[number];

const attributeName = (meaning: string) =>
  z
    .string({ error: `${meaning} must be an attribute name` })
    .trim()
    .min(1, `${meaning} must not be empty`)
    .max(200, `${meaning} is too long`)
    .superRefine(checkedText(meaning))
    .nullable()
    .optional();

/** PUT /api/farms/:farmId/soil-map/mapping: which attribute means what (null unsets one). */
export const SoilMapMapping = z.object({
  texture: attributeName('texture'),
  k: attributeName('k'),
  hsg: attributeName('hsg'),
  t: attributeName('t'),
  drainage: attributeName('drainage'),
  /** Units of the K attribute: US customary (soil surveys, 0.02–0.69) by default, or SI. */
  kUnits: z.enum(['us', 'si'], { error: "kUnits must be 'us' or 'si'" }).optional(),
});
export type SoilMapMapping = z.infer<typeof SoilMapMapping>;

/** How many map units a mapped attribute gives a usable value for. */
export type MappingCheck = { attribute: string; understood: number; notUnderstood: number; examples: string[] };

/** GET /api/farms/:farmId/soil-map answer (also the upload's and the mapping's). */
export type SoilMapInfo = {
  map: { id: number; originalName: string; unitCount: number; uploadedAt: string; warnings: string[] } | null;
  attributes: { name: string; sampleValues: string[]; distinctValues: number }[];
  mapping: { texture: string | null; k: string | null; hsg: string | null; t: string | null; drainage: string | null; kUnits: 'us' | 'si' };
  checks: Partial<Record<SoilMapMeaning, MappingCheck>>;
};

/** GET /api/fields/:fieldId/soil-map-units: the map units under one field. */
export type FieldSoilMapUnits = {
  fieldAreaM2: number;
  mappedAreaM2: number;
  units: {
    unitId: number;
    featureIndex: number;
    areaM2: number;
    share: number;
    textureClass: string | null;
    kUs: number | null;
    tTonPerAcYr: number | null;
    hsg: string | null;
    drainageClass: string | null;
    attributes: Record<string, unknown>;
  }[];
};

/** GET /api/fields/:fieldId/soil-summary answer (the same as the server's fieldSoilSummary()). */
export type FieldSoilSummary = {
  sampleCount: number;
  sandPct: number | null;
  siltPct: number | null;
  clayPct: number | null;
  organicMatterPct: number | null;
  textureClass: string | null;
  ph: number | null;
  bufferPh: number | null;
  bufferMethod: 'smp' | 'mehlich' | null;
  depthToGrayCm: number | null;
  drainageClass: string | null;
  notWorthAmending: boolean;
  kUs: number | null;
  /** Where K came from (soil map, equation or table), with the work it cites. */
  kSource: Origin | null;
  tTonPerAcYr: number | null;
  /** Where T came from: the soil map, or the deep-soil default. */
  tSource: Origin | null;
  hsg: string | null;
  hsgShares: { group: string; share: number }[];
  bulkDensity: number | null;
  cecCmolPerKg: number | null;
  espPct: number | null;
  problemClay: boolean;
  problemClayReasons: string[];
};
