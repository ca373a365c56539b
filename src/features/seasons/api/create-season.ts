// POST /api/farms/:farmId/seasons — add a season (farmer), optionally starting with another
// season's cropping; 200 with the existing one when the label is taken.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Season } from '../../../../shared/schemas/season';
import { getSeasonsQueryOptions } from './get-seasons';
import { invalidateAssessments } from './query-keys';

export type NewSeason = { label: string; copyCroppingFrom?: string };

export const createSeason = (farmId: number, input: NewSeason) => api.post<Season>(`/api/farms/${farmId}/seasons`, input);

export function useCreateSeason(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewSeason) => createSeason(farmId, input),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getSeasonsQueryOptions(farmId).queryKey });
      invalidateAssessments(queryClient);
    },
  });
}
