// POST /api/plans/:planId/comments (farmer, advisor) — on the plan, or on one action (actionId).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanComment } from '../../../../shared/schemas/plans';
import { planKey } from './query-keys';

export type PlanCommentInput = { body: string; actionId?: number | null };

export const addPlanComment = (planId: number, input: PlanCommentInput) => api.post<PlanComment>(`/api/plans/${planId}/comments`, input);

export function useAddPlanComment(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanCommentInput) => addPlanComment(planId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: planKey(planId) }),
  });
}
