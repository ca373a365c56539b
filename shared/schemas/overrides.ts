// Per-field overrides of the RUSLE factors R, K, C and P: a value someone typed for this field,
// with a note saying why. The override replaces the worked-out figure wherever it is shown.
// Units: R in MJ·mm/(ha·h·yr) (SI, as the farm climate), K in US units
// (ton·ac·h/(hundreds ac·ft·tonf·in), as soil surveys print it); C and P have no unit.
import { z } from 'zod';
import { plainText } from './plain-text';

export const OVERRIDE_FACTORS = ['r', 'k', 'c', 'p'] as const;
export type OverrideFactor = (typeof OVERRIDE_FACTORS)[number];
export const OverrideFactor = z.enum(OVERRIDE_FACTORS, { error: 'factor must be one of r, k, c, p' });

/** What each factor's override is typed in, and the range it may take. */
export const OVERRIDE_SPECS: Record<OverrideFactor, { name: string; unit: string; min: number; max: number }> = {
  r: { name: 'R, rainfall erosivity', unit: 'MJ·mm/(ha·h·yr)', min: 0, max: 100_000 },
  k: { name: 'K, soil erodibility', unit: 'US units, ton·ac·h/(hundreds ac·ft·tonf·in)', min: 0, max: 1 },
  c: { name: 'C, cover and management', unit: '', min: 0, max: 1 },
  p: { name: 'P, support practice', unit: '', min: 0, max: 1 },
};

export const FactorOverrideUpdate = z
  .object({
    factor: OverrideFactor,
    value: z.number({ error: 'value must be a number' }).refine(Number.isFinite, 'value must be a finite number'),
    /** Why the figure is overridden, in plain words; required. */
    note: plainText('note', 500, 'note is required: say why this figure is overridden'),
  })
  .superRefine((o, ctx) => {
    const spec = OVERRIDE_SPECS[o.factor];
    if (o.value < spec.min || o.value > spec.max) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: `value for ${o.factor.toUpperCase()} must be from ${spec.min} to ${spec.max}${spec.unit ? ` (${spec.unit})` : ''}` });
    }
  });
export type FactorOverrideUpdate = z.input<typeof FactorOverrideUpdate>;

/** One override as the API shows it. */
export type FactorOverride = {
  factor: OverrideFactor;
  value: number;
  unit: string;
  note: string;
  /** The name of the person who set it, where known. */
  setBy: string | null;
  updatedAt: string;
};
