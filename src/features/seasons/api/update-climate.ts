// PUT /api/farms/:farmId/climate (farmer, advisor) — with the version read; 409 carries the
// record the server holds now, which the cache takes.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { Climate, ClimateUpdate } from '../../../../shared/schemas/season';
import { getClimateQueryOptions } from './get-climate';
import { currentFromConflict, invalidateAssessments } from './query-keys';

export const updateClimate = (farmId: number, input: ClimateUpdate) => api.put<Climate>(`/api/farms/${farmId}/climate`, input);

export function useUpdateClimate(farmId: number) {
  const queryClient = useQueryClient();
  const key = getClimateQueryOptions(farmId).queryKey;
  return useMutation({
    mutationFn: (input: ClimateUpdate) => updateClimate(farmId, input),
    onSuccess: (climate) => {
      queryClient.setQueryData(key, climate);
      invalidateAssessments(queryClient);
    },
    onError: (error) => {
      const current = currentFromConflict<Climate>(error);
      if (current) queryClient.setQueryData(key, current);
      else void queryClient.invalidateQueries({ queryKey: key });
      // The other person's change is an input too.
      if (isApiError(error, 409)) invalidateAssessments(queryClient);
    },
  });
}
