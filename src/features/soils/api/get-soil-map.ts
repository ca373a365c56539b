// GET /api/farms/:farmId/soil-map — the farm's soil map: the file, its attributes with sample
// values, which attribute means what, and how many map units each mapped attribute is
// understood for. Farmer and advisor only (403 for a landowner).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilMapInfo } from '../../../../shared/schemas/soils';

export const getSoilMap = (farmId: number) => api.get<SoilMapInfo>(`/api/farms/${farmId}/soil-map`);

export const getSoilMapQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'soil-map'], queryFn: () => getSoilMap(farmId) });

export const useSoilMap = (farmId: number, enabled = true) => useQuery({ ...getSoilMapQueryOptions(farmId), enabled });
