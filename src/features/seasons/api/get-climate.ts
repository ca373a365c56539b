// GET /api/farms/:farmId/climate — R and the design storm; null when not set yet (404).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { Climate } from '../../../../shared/schemas/season';

export async function getClimate(farmId: number): Promise<Climate | null> {
  try {
    return await api.get<Climate>(`/api/farms/${farmId}/climate`);
  } catch (error) {
    // The route answers 404 for "not set yet" as for "not a member"; only the first is a value.
    if (isApiError(error, 404) && /^This farm's climate/.test(error.message)) return null;
    throw error;
  }
}

export const getClimateQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'climate'], queryFn: () => getClimate(farmId) });

export const useClimate = (farmId: number) => useQuery(getClimateQueryOptions(farmId));
