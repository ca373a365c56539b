// GET /api/farms/:farmId/climate — R and the design storm; null when not set yet (404).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { Climate } from '../../../../shared/schemas/season';

export async function getClimate(farmId: number): Promise<Climate | null> {
  try {
    return await api.get<Climate>(`/api/farms/${farmId}/climate`);
  } catch (error) {
    // 404 no_climate: not set yet (a value); any other 404 means no access.
    if (isApiError(error, 404) && error.code === 'no_climate') return null;
    throw error;
  }
}

export const getClimateQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'climate'], queryFn: () => getClimate(farmId) });

export const useClimate = (farmId: number) => useQuery(getClimateQueryOptions(farmId));
