// DELETE /api/fields/:fieldId/overrides/:factor (farmer, advisor) — the worked-out figure comes back.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { OverrideFactor } from '../../../../shared/schemas/overrides';
import { getFactorOverridesQueryOptions } from './get-factor-overrides';
import { invalidateAssessments } from './query-keys';

export const removeFactorOverride = (fieldId: number, factor: OverrideFactor) => api.delete(`/api/fields/${fieldId}/overrides/${factor}`);

export function useRemoveFactorOverride(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (factor: OverrideFactor) => removeFactorOverride(fieldId, factor),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getFactorOverridesQueryOptions(fieldId).queryKey });
      invalidateAssessments(queryClient);
    },
  });
}
