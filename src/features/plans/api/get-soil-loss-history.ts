// GET /api/farms/:farmId/soil-loss-history — each field's stored A and A/T per season (farmer, advisor).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilLossHistory } from '../../../../shared/schemas/changes';
import { plansRootKey } from './query-keys';

export const getSoilLossHistory = (farmId: number) => api.get<SoilLossHistory>(`/api/farms/${farmId}/soil-loss-history`);

export const getSoilLossHistoryQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: [...plansRootKey, 'history', farmId], queryFn: () => getSoilLossHistory(farmId) });

export const useSoilLossHistory = (farmId: number) => useQuery(getSoilLossHistoryQueryOptions(farmId));
