// PUT /api/fields/:fieldId/ground (farmer, advisor) — typed slope, with the version read; 409
// carries the current record.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { z } from 'zod';
import type { GroundUpdate } from '../../../../shared/schemas/season';
import { getGroundQueryOptions, type GroundRecord } from './get-ground';
import { currentFromConflict, invalidateAssessments } from './query-keys';

export type GroundInput = z.input<typeof GroundUpdate>;

export const updateGround = (fieldId: number, input: GroundInput) => api.put<GroundRecord>(`/api/fields/${fieldId}/ground`, input);

export function useUpdateGround(fieldId: number) {
  const queryClient = useQueryClient();
  const key = getGroundQueryOptions(fieldId).queryKey;
  return useMutation({
    mutationFn: (input: GroundInput) => updateGround(fieldId, input),
    onSuccess: (ground) => {
      queryClient.setQueryData(key, ground);
      invalidateAssessments(queryClient);
    },
    onError: (error) => {
      const current = currentFromConflict<GroundRecord>(error);
      if (current) queryClient.setQueryData(key, current);
      else void queryClient.invalidateQueries({ queryKey: key });
      // The other person's change is an input too.
      if (isApiError(error, 409)) invalidateAssessments(queryClient);
    },
  });
}
