// POST /api/farms/:farmId/plans (farmer, advisor) — the season's plan; 200 with the existing one
// when the season has a plan already.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Plan } from '../../../../shared/schemas/plans';
import { planChanged } from './query-keys';

export const createPlan = (farmId: number, season: string) => api.post<Plan>(`/api/farms/${farmId}/plans`, { season });

export function useCreatePlan(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (season: string) => createPlan(farmId, season),
    onSuccess: (plan) => {
      planChanged(queryClient, plan);
      // A new season may have come with it.
      void queryClient.invalidateQueries({ queryKey: ['farms', farmId, 'seasons'] });
    },
  });
}
