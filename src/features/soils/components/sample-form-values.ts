// The soil sample form's values and how they become the shared payloads. Validation is the
// shared SoilSampleCreate schema, so its paths (sandPct, ph, …) are the form's own names and
// errors land beside the inputs; messages are re-worded with the inputs' labels.
import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldErrors, Resolver } from 'react-hook-form';
import { SoilSampleCreate, type FeelGrit, type SoilSample, type SoilSampleUpdate } from '../../../../shared/schemas/soils';

export type SampleFormValues = {
  kind: 'lab' | 'feel';
  label?: string;
  sampledOn?: string;
  depthTopCm?: number;
  depthBottomCm?: number;
  sandPct?: number;
  siltPct?: number;
  clayPct?: number;
  organicMatterPct?: number;
  ph?: number;
  bufferPh?: number;
  bufferMethod?: 'smp' | 'mehlich';
  depthToGrayCm?: number;
  describedToCm?: number;
  bulkDensity?: number;
  cecCmolPerKg?: number;
  espPct?: number;
  balls?: boolean;
  ribbonCm?: number;
  feel?: FeelGrit;
};

export type SampleField = Exclude<keyof SampleFormValues, 'kind'>;

/** Every input's label in words (units go beside, in the label). */
export const FIELD_LABELS: Record<SampleField, string> = {
  label: 'Label',
  sampledOn: 'Sampled on',
  depthTopCm: 'Top of the sample',
  depthBottomCm: 'Bottom of the sample',
  sandPct: 'Sand',
  siltPct: 'Silt',
  clayPct: 'Clay',
  organicMatterPct: 'Organic matter',
  ph: 'pH',
  bufferPh: 'Buffer pH',
  bufferMethod: 'Buffer method',
  depthToGrayCm: 'Depth to gray or mottled colours',
  describedToCm: 'Profile looked at down to',
  bulkDensity: 'Bulk density',
  cecCmolPerKg: 'CEC',
  espPct: 'ESP',
  balls: 'Forms a ball',
  ribbonCm: 'Ribbon length',
  feel: 'Feel of a wet pinch',
};

/** The schema's messages name the payload keys ("sandPct must be …"): say the label instead. */
export function plainMessage(message: string | undefined): string | undefined {
  if (!message) return message;
  return message.replace(/\b(sandPct|siltPct|clayPct|organicMatterPct|bufferPh|bufferMethod|ph|depthTopCm|depthBottomCm|depthToGrayCm|describedToCm|bulkDensity|cecCmolPerKg|espPct|ribbonCm|sampledOn|label|feel|balls)\b/g, (k) =>
    FIELD_LABELS[k as SampleField],
  );
}

/** '' → undefined; "12,5" → 12.5; anything else Number() (NaN is reported by the schema). */
export const toNumber = (v: unknown): number | undefined => {
  if (typeof v === 'number') return Number.isNaN(v) ? undefined : v;
  if (typeof v !== 'string' || v.trim() === '') return undefined;
  return Number(v.trim().replace(/^(-?\d+),(\d+)$/, '$1.$2'));
};
export const toText = (v: unknown): string | undefined => (typeof v === 'string' && v.trim() !== '' ? v.trim() : undefined);

const schemaResolver = zodResolver(SoilSampleCreate) as unknown as Resolver<SampleFormValues, unknown, SoilSampleCreate>;

/** The shared schema on the form's values; errors keep the schema's paths, in plain words. */
export const sampleResolver: Resolver<SampleFormValues, unknown, SoilSampleCreate> = async (values, ctx, options) => {
  const result = await schemaResolver(values, ctx, options);
  const errors = result.errors as FieldErrors<SampleFormValues>;
  for (const e of Object.values(errors)) if (e && typeof e.message === 'string') e.message = plainMessage(e.message);
  return result;
};

const orUndefined = <T,>(v: T | null | undefined): T | undefined => (v === null ? undefined : v);

/** A stored sample as form values (null → empty). */
export function valuesOfSample(s: SoilSample): SampleFormValues {
  return {
    kind: s.kind,
    label: orUndefined(s.label),
    sampledOn: orUndefined(s.sampledOn),
    depthTopCm: orUndefined(s.depthTopCm),
    depthBottomCm: orUndefined(s.depthBottomCm),
    // The typed fractions are not kept apart from the renormalised ones; the renormalised are shown.
    sandPct: orUndefined(s.sandPct),
    siltPct: orUndefined(s.siltPct),
    clayPct: orUndefined(s.clayPct),
    organicMatterPct: orUndefined(s.organicMatterPct),
    ph: orUndefined(s.ph),
    bufferPh: orUndefined(s.bufferPh),
    bufferMethod: orUndefined(s.bufferMethod),
    depthToGrayCm: orUndefined(s.depthToGrayCm),
    describedToCm: orUndefined(s.describedToCm),
    bulkDensity: orUndefined(s.bulkDensity),
    cecCmolPerKg: orUndefined(s.cecCmolPerKg),
    espPct: orUndefined(s.espPct),
    balls: s.feelTest?.balls,
    ribbonCm: orUndefined(s.feelTest?.ribbonCm),
    feel: orUndefined(s.feelTest?.feel),
  };
}

const COMMON_KEYS = [
  'label',
  'sampledOn',
  'depthTopCm',
  'depthBottomCm',
  'organicMatterPct',
  'ph',
  'bufferPh',
  'bufferMethod',
  'depthToGrayCm',
  'describedToCm',
  'bulkDensity',
  'cecCmolPerKg',
  'espPct',
] as const;
const SEPARATE_KEYS = ['sandPct', 'siltPct', 'clayPct'] as const;

/** A PATCH of every input the form shows: an emptied input clears the stored value. */
export function updateOf(checked: SoilSampleCreate, version: number): SoilSampleUpdate {
  const keys = checked.kind === 'lab' ? [...COMMON_KEYS, ...SEPARATE_KEYS] : COMMON_KEYS;
  const source = checked as Record<string, unknown>;
  const patch: Record<string, unknown> = { version };
  for (const k of keys) patch[k] = source[k] ?? null;
  return patch as SoilSampleUpdate;
}
