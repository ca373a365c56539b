// GET /api/fields/:fieldId/soil-summary — the field's soils in one answer: mean separates,
// texture class, pH, drainage, K and T with their sources, soil-group mix, problem-clay reasons.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FieldSoilSummary } from '../../../../shared/schemas/soils';

export const getSoilSummary = (fieldId: number) => api.get<FieldSoilSummary>(`/api/fields/${fieldId}/soil-summary`);

export const getSoilSummaryQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId, 'soil-summary'], queryFn: () => getSoilSummary(fieldId) });

export const useSoilSummary = (fieldId: number) => useQuery(getSoilSummaryQueryOptions(fieldId));
