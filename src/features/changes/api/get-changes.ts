// GET /api/farms/:farmId/changes — who changed what on the farm, newest first (farmer, advisor).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FarmChange } from '../../../../shared/schemas/changes';

export const getChanges = (farmId: number, limit = 30) => api.get<FarmChange[]>(`/api/farms/${farmId}/changes?limit=${limit}`);

export const getChangesQueryOptions = (farmId: number, limit = 30) =>
  queryOptions({ queryKey: ['farms', farmId, 'changes', limit], queryFn: () => getChanges(farmId, limit), staleTime: 0 });

export const useChanges = (farmId: number, limit = 30) => useQuery(getChangesQueryOptions(farmId, limit));
