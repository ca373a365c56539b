// DELETE /api/farms/:farmId/seasons/:label — remove an empty season (farmer); 409 when it holds
// cropping or a plan, with what it holds in the message.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getSeasonsQueryOptions } from './get-seasons';
import { invalidateAssessments } from './query-keys';

export const deleteSeason = (farmId: number, label: string) => api.delete(`/api/farms/${farmId}/seasons/${encodeURIComponent(label)}`);

export function useDeleteSeason(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (label: string) => deleteSeason(farmId, label),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getSeasonsQueryOptions(farmId).queryKey });
      invalidateAssessments(queryClient);
    },
  });
}
