// GET /api/farms/:farmId/treatments?season= — every field's treatment options and its best one
// (the cheapest under T, else the most soil saved per money), for the board's treatments view.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { treatmentsRootKey } from '../../../lib/query-keys';
import type { FarmTreatmentsAnswer } from '../../../../shared/schemas/treatments';

export const getFarmTreatments = (farmId: number, season: string) =>
  api.get<FarmTreatmentsAnswer>(`/api/farms/${farmId}/treatments?season=${encodeURIComponent(season)}`);

export const getFarmTreatmentsQueryOptions = (farmId: number, season: string) =>
  queryOptions({ queryKey: [...treatmentsRootKey, 'farm', farmId, season], queryFn: () => getFarmTreatments(farmId, season) });

export const useFarmTreatments = (farmId: number, season: string | null, enabled = true) =>
  useQuery({ ...getFarmTreatmentsQueryOptions(farmId, season ?? ''), enabled: enabled && season !== null });
