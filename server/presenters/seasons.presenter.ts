// Seasons, cropping, climate and typed ground as the API shows them. Pure: rows in, shapes out.
import type { Climate, Cropping, Ground, Season as SeasonShape } from '../../shared/schemas/season';
import type { FarmClimate, FieldCropping, FieldGround, Season } from '../models';
import { lastChangeOf } from './last-change.presenter';

/** A season; with what it holds when the caller counted it (the seasons list). */
export const presentSeason = (s: Season, holds?: { croppedFields: number; hasPlan: boolean; current: boolean }): SeasonShape =>
  holds ? { id: s.id, label: s.label, croppedFields: holds.croppedFields, hasPlan: holds.hasPlan, empty: holds.croppedFields === 0 && !holds.hasPlan, current: holds.current } : { id: s.id, label: s.label };

export const presentCropping = (c: FieldCropping, seasonLabel: string): Cropping => ({
  fieldId: c.fieldId,
  season: seasonLabel,
  crop: c.crop,
  tillage: c.tillage,
  residuePct: c.residuePct,
  groundCoverPct: c.groundCoverPct,
  coverCrop: c.coverCrop,
  practice: c.practice,
  terraceIntervalM: c.terraceIntervalM,
  stripRotation: c.stripRotation,
  stripWidthM: c.stripWidthM,
  version: c.version,
  updatedAt: new Date(c.updatedAt).toISOString(),
  lastChange: lastChangeOf(c),
});

export const presentClimate = (c: FarmClimate): Climate => ({
  rFrom: c.rFrom,
  rValue: c.rValue,
  annualPrecipitationMm: c.annualPrecipitationMm,
  designStormMm: c.designStormMm,
  record: c.rRecord,
  version: c.version,
  lastChange: lastChangeOf(c),
});

export const presentGround = (g: FieldGround): Ground => ({
  slopePct: g.slopePct,
  slopeLengthM: g.slopeLengthM,
  drained: g.drained,
  drainedWaterTableDepthCm: g.drainedWaterTableDepthCm,
  version: g.version,
  lastChange: lastChangeOf(g),
});

/** GET ground of a field nobody has typed a slope for yet. */
export const NO_GROUND = { slopePct: null, slopeLengthM: null, drained: false, drainedWaterTableDepthCm: null, version: null, lastChange: null } as const;
