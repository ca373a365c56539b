// DELETE /api/fields/:fieldId
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getFieldQueryOptions } from './get-field';
import { getFieldsQueryOptions, removeCachedField } from './get-fields';

export const deleteField = (fieldId: number) => api.delete(`/api/fields/${fieldId}`);

export function useDeleteField(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fieldId: number) => deleteField(fieldId),
    onSuccess: (_void, fieldId) => {
      removeCachedField(queryClient, farmId, fieldId);
      queryClient.removeQueries({ queryKey: getFieldQueryOptions(fieldId).queryKey });
      void queryClient.invalidateQueries({ queryKey: getFieldsQueryOptions(farmId).queryKey });
    },
  });
}
