// GET /api/farms/:farmId/plans?season= — the farm's plan for a season; null when there is none
// (for a landowner: none approved yet). A landowner gets the approved revision of their fields.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { Plan } from '../../../../shared/schemas/plans';
import { seasonPlansKey } from './query-keys';

export async function getSeasonPlan(farmId: number, season: string): Promise<Plan | null> {
  try {
    return await api.get<Plan>(`/api/farms/${farmId}/plans?season=${encodeURIComponent(season)}`);
  } catch (error) {
    // 404 no_plan: none yet (a value); any other 404 means no access or no such season.
    if (isApiError(error, 404) && error.code === 'no_plan') return null;
    throw error;
  }
}

export const getSeasonPlanQueryOptions = (farmId: number, season: string) =>
  queryOptions({ queryKey: [...seasonPlansKey, farmId, season], queryFn: () => getSeasonPlan(farmId, season) });

export const useSeasonPlan = (farmId: number, season: string | null) =>
  useQuery({ ...getSeasonPlanQueryOptions(farmId, season ?? ''), enabled: season !== null });
