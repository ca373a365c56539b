// PUT /api/fields/:fieldId/cropping (farmer, advisor) — the season's crop, tillage, residue,
// cover crop and support practice, with the version read; 409 carries the current record.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { z } from 'zod';
import type { Cropping, CroppingUpdate } from '../../../../shared/schemas/season';
import { getCroppingQueryOptions } from './get-cropping';
import { currentFromConflict, invalidateAssessments } from './query-keys';

export type CroppingPayload = z.output<typeof CroppingUpdate>;

export const updateCropping = (fieldId: number, input: CroppingPayload) => api.put<Cropping>(`/api/fields/${fieldId}/cropping`, input);

export function useUpdateCropping(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CroppingPayload) => updateCropping(fieldId, input),
    onSuccess: (cropping) => {
      queryClient.setQueryData(getCroppingQueryOptions(fieldId, cropping.season).queryKey, cropping);
      invalidateAssessments(queryClient);
    },
    onError: (error, input) => {
      const key = getCroppingQueryOptions(fieldId, input.season).queryKey;
      const current = currentFromConflict<Cropping>(error);
      if (current) queryClient.setQueryData(key, current);
      else void queryClient.invalidateQueries({ queryKey: key });
      // The other person's change is an input too.
      if (isApiError(error, 409)) invalidateAssessments(queryClient);
    },
  });
}
