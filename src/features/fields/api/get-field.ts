// GET /api/fields/:fieldId — one field, fresh from the server.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FieldFeature } from '../../../../shared/schemas/field';

export const getField = (fieldId: number) => api.get<FieldFeature>(`/api/fields/${fieldId}`);

export const getFieldQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId], queryFn: () => getField(fieldId) });

export const useField = (fieldId: number | null) =>
  useQuery({ ...getFieldQueryOptions(fieldId ?? 0), enabled: fieldId !== null });
