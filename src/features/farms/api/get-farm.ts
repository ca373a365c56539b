// GET /api/farms/:farmId — one farm with the caller's role, its bbox and members.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Farm } from '../../../../shared/schemas/auth';

export const getFarm = (farmId: number) => api.get<Farm>(`/api/farms/${farmId}`);

export const getFarmQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId], queryFn: () => getFarm(farmId) });

export const useFarm = (farmId: number) => useQuery(getFarmQueryOptions(farmId));
