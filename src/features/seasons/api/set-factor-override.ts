// PUT /api/fields/:fieldId/overrides (farmer, advisor) — R, K, C or P typed for the field with
// a note; the stored assessments take it at once.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FactorOverride, FactorOverrideUpdate } from '../../../../shared/schemas/overrides';
import { getFactorOverridesQueryOptions } from './get-factor-overrides';
import { invalidateAssessments } from './query-keys';

export const setFactorOverride = (fieldId: number, input: FactorOverrideUpdate) => api.put<FactorOverride>(`/api/fields/${fieldId}/overrides`, input);

export function useSetFactorOverride(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: FactorOverrideUpdate) => setFactorOverride(fieldId, input),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getFactorOverridesQueryOptions(fieldId).queryKey });
      invalidateAssessments(queryClient);
    },
  });
}
