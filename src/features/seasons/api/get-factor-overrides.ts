// GET /api/fields/:fieldId/overrides — R, K, C and P typed for the field, with their notes.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FactorOverride } from '../../../../shared/schemas/overrides';

export const getFactorOverrides = (fieldId: number) => api.get<FactorOverride[]>(`/api/fields/${fieldId}/overrides`);

export const getFactorOverridesQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId, 'overrides'], queryFn: () => getFactorOverrides(fieldId) });

export const useFactorOverrides = (fieldId: number) => useQuery(getFactorOverridesQueryOptions(fieldId));
