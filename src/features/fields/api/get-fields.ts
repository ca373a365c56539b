// GET /api/farms/:farmId/fields — the farm's fields as a GeoJSON FeatureCollection
// (a landowner gets only the fields they own).
import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FieldCollection, FieldFeature } from '../../../../shared/schemas/field';

export const getFields = (farmId: number) => api.get<FieldCollection>(`/api/farms/${farmId}/fields`);

export const getFieldsQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'fields'], queryFn: () => getFields(farmId) });

export const useFields = (farmId: number) => useQuery(getFieldsQueryOptions(farmId));

/** Put one field into the cached collection (added, or replaced by id) so the map redraws at once. */
export function upsertCachedField(queryClient: QueryClient, farmId: number, field: FieldFeature) {
  queryClient.setQueryData(getFieldsQueryOptions(farmId).queryKey, (old) => {
    if (!old) return old;
    const exists = old.features.some((f) => f.id === field.id);
    return {
      ...old,
      features: exists ? old.features.map((f) => (f.id === field.id ? field : f)) : [...old.features, field],
    };
  });
}

/** Take one field out of the cached collection. */
export function removeCachedField(queryClient: QueryClient, farmId: number, fieldId: number) {
  queryClient.setQueryData(getFieldsQueryOptions(farmId).queryKey, (old) =>
    old ? { ...old, features: old.features.filter((f) => f.id !== fieldId) } : old,
  );
}
