// POST /api/farms/:farmId/fields — a drawn boundary becomes a field.
// 422 invalid_geometry carries details.repaired: the client offers it for the user to confirm.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FieldCreate, FieldFeature } from '../../../../shared/schemas/field';
import { getFieldsQueryOptions, upsertCachedField } from './get-fields';

export const createField = (farmId: number, input: FieldCreate) =>
  api.post<FieldFeature>(`/api/farms/${farmId}/fields`, input);

export function useCreateField(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: FieldCreate) => createField(farmId, input),
    onSuccess: (field) => {
      upsertCachedField(queryClient, farmId, field);
      // Other fields' overlap lists may have changed.
      void queryClient.invalidateQueries({ queryKey: getFieldsQueryOptions(farmId).queryKey });
    },
  });
}
