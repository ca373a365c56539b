// A farm's records over time: its recent changes (GET /api/farms/:farmId/changes, newest first)
// and each field's soil loss across seasons, for the farmer and the advisor.
import { z } from 'zod';

export const ChangesQuery = z.object({
  limit: z.coerce.number({ error: 'limit must be a number' }).int('limit must be a whole number').min(1, 'limit must be at least 1').max(200, 'limit must be at most 200').default(50),
});

export type FarmChange = {
  id: number;
  at: string;
  /** Who made the change (null: a person since removed, or the system). */
  by: { id: number; name: string } | null;
  /** What kind of record: cropping, ground, soil_sample, plan_action … */
  entity: string;
  action: string;
  /** The change in words, without the person ("changed the cropping of Long Slope for 2027"). */
  summary: string;
  fieldId: number | null;
};

/** GET /api/farms/:farmId/soil-loss-history: each field's stored A and A/T per season, oldest season first. */
export type SoilLossHistory = {
  seasons: string[];
  fields: { fieldId: number; fieldName: string; points: { season: string; soilLossTPerHaYr: number | null; aOverT: number | null }[] }[];
};
