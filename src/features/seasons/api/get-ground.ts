// GET /api/fields/:fieldId/ground — typed slope % and slope length m (version and lastChange null when never saved).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LastChange } from '../../../../shared/schemas/season';

export type GroundRecord = { slopePct: number | null; slopeLengthM: number | null; drained: boolean; drainedWaterTableDepthCm: number | null; version: number | null; lastChange: LastChange | null };

export const getGround = (fieldId: number) => api.get<GroundRecord>(`/api/fields/${fieldId}/ground`);

export const getGroundQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId, 'ground'], queryFn: () => getGround(fieldId) });

export const useGround = (fieldId: number) => useQuery(getGroundQueryOptions(fieldId));
