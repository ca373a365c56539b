// GET /api/fields/:fieldId/soil-samples — the field's samples (lab results and feel tests).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilSample } from '../../../../shared/schemas/soils';

export const getSoilSamples = (fieldId: number) => api.get<SoilSample[]>(`/api/fields/${fieldId}/soil-samples`);

export const getSoilSamplesQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId, 'soil-samples'], queryFn: () => getSoilSamples(fieldId) });

export const useSoilSamples = (fieldId: number) => useQuery(getSoilSamplesQueryOptions(fieldId));
