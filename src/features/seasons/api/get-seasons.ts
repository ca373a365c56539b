// GET /api/farms/:farmId/seasons — the farm's seasons, newest first.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Season } from '../../../../shared/schemas/season';

export const getSeasons = (farmId: number) => api.get<Season[]>(`/api/farms/${farmId}/seasons`);

export const getSeasonsQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'seasons'], queryFn: () => getSeasons(farmId) });

export const useSeasons = (farmId: number) => useQuery(getSeasonsQueryOptions(farmId));
