// POST /api/plan-actions/:actionId/check (advisor): the work recorded done was seen and is right.
// A follow-up record, like marking it done: no new revision, no new approval.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanActionAnswer } from './add-plan-action';
import { planChanged, refetchPlan } from './query-keys';

export const checkAction = (actionId: number, version: number) => api.post<PlanActionAnswer>(`/api/plan-actions/${actionId}/check`, { version });

export function useCheckAction(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ actionId, version }: { actionId: number; version: number }) => checkAction(actionId, version),
    onSuccess: ({ plan }) => planChanged(queryClient, plan),
    onError: () => refetchPlan(queryClient, planId),
  });
}
