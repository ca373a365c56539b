// A field's factor override as the API shows it. Pure: a row (with its setter's name) in, a shape out.
import { OVERRIDE_SPECS, type FactorOverride } from '../../shared/schemas/overrides';
import type { FieldFactorOverride, User } from '../models';

export const presentFactorOverride = (o: FieldFactorOverride & { setter?: User | null }): FactorOverride => ({
  factor: o.factor,
  value: o.value,
  unit: OVERRIDE_SPECS[o.factor].unit,
  note: o.note,
  setBy: o.setter?.name ?? null,
  updatedAt: new Date(o.updatedAt).toISOString(),
});
