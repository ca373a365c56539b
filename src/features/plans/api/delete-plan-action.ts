// DELETE /api/plan-actions/:actionId?version= (farmer, advisor) — answers with the plan.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanActionAnswer } from './add-plan-action';
import { planChanged, refetchPlan } from './query-keys';

export const deletePlanAction = (actionId: number, version: number) => api.delete<PlanActionAnswer>(`/api/plan-actions/${actionId}?version=${version}`);

export function useDeletePlanAction(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ actionId, version }: { actionId: number; version: number }) => deletePlanAction(actionId, version),
    onSuccess: ({ plan }) => planChanged(queryClient, plan),
    onError: () => refetchPlan(queryClient, planId),
  });
}
