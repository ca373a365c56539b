// POST /api/farms/:farmId/seasons — add a season (farmer); 200 with the existing one when the
// label is taken.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Season } from '../../../../shared/schemas/season';
import { getSeasonsQueryOptions } from './get-seasons';
import { invalidateAssessments } from './query-keys';

export const createSeason = (farmId: number, label: string) => api.post<Season>(`/api/farms/${farmId}/seasons`, { label });

export function useCreateSeason(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (label: string) => createSeason(farmId, label),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getSeasonsQueryOptions(farmId).queryKey });
      invalidateAssessments(queryClient);
    },
  });
}
