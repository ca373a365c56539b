// PATCH /api/fields/:fieldId — rename or reshape, always with the version that was read.
// 409 stale_version carries details.current: the cache takes it so the user sees the latest field.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { FieldFeature, FieldUpdate } from '../../../../shared/schemas/field';
import { getFieldQueryOptions } from './get-field';
import { getFieldsQueryOptions, upsertCachedField } from './get-fields';

export const updateField = (fieldId: number, input: FieldUpdate) =>
  api.patch<FieldFeature>(`/api/fields/${fieldId}`, input);

/** The field the server holds now, from a 409 answer, if it sent one. */
export function currentFromConflict(error: unknown): FieldFeature | null {
  if (!isApiError(error, 409)) return null;
  const current = (error.details as { current?: FieldFeature } | undefined)?.current;
  return current && current.type === 'Feature' ? current : null;
}

export function useUpdateField(farmId: number) {
  const queryClient = useQueryClient();
  const fieldsKey = getFieldsQueryOptions(farmId).queryKey;
  return useMutation({
    mutationFn: ({ fieldId, input }: { fieldId: number; input: FieldUpdate }) => updateField(fieldId, input),
    onSuccess: (field) => {
      queryClient.setQueryData(getFieldQueryOptions(field.id).queryKey, field);
      upsertCachedField(queryClient, farmId, field);
      // Other fields' overlap lists may have changed.
      void queryClient.invalidateQueries({ queryKey: fieldsKey });
    },
    onError: async (error, { fieldId }) => {
      const current = currentFromConflict(error);
      if (current) {
        queryClient.setQueryData(getFieldQueryOptions(fieldId).queryKey, current);
        upsertCachedField(queryClient, farmId, current);
      } else if (isApiError(error, 409)) {
        // No copy in the answer: reload the field from the server.
        const fresh = await queryClient.fetchQuery({ ...getFieldQueryOptions(fieldId), staleTime: 0 });
        upsertCachedField(queryClient, farmId, fresh);
      }
      void queryClient.invalidateQueries({ queryKey: fieldsKey });
    },
  });
}
