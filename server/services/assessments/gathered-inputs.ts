// What one field's assessment for one season is made from, as gathered for a whole scope at
// once by gather-inputs.ts. Plain data: the pure steps (build-estimate-input, assess-field) read it.
import type { Climate, Cropping, Ground } from '../../../shared/schemas/season';
import type { FactorOverride, OverrideFactor } from '../../../shared/schemas/overrides';
import type { FieldSoilSummary } from '../../../shared/schemas/soils';

export type TerrainFigures = { meanSlopePct: number; meanLS: number | null; cellCount: number; cellSizeM?: number; upToDate: boolean; stale: boolean; concentratedFlowCells: number };

/** A typed record and the person who last typed it, where known. */
export type Typed<T> = T & { typedBy: string | null };

export type GatheredInputs = {
  field: { id: number; farmId: number; name: string; areaHa: number; version: number };
  season: { id: number; label: string };
  climate: Typed<Climate> | null;
  ground: Typed<Ground> | null;
  terrain: TerrainFigures | null;
  soil: FieldSoilSummary;
  cropping: Typed<Cropping> | null;
  /** Figures typed for this field in place of the worked-out R, K, C or P. */
  overrides: Partial<Record<OverrideFactor, FactorOverride>>;
};
