// PATCH /api/plan-actions/:actionId (farmer, advisor) — with the version read. A 409 carries the
// action as it is now (details.current); actionChanges (shared/plan-changes) says what differs.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanActionUpdate } from '../../../../shared/schemas/plans';
import type { PlanActionAnswer } from './add-plan-action';
import { planChanged, refetchPlan } from './query-keys';

export const updatePlanAction = (actionId: number, patch: PlanActionUpdate) => api.patch<PlanActionAnswer>(`/api/plan-actions/${actionId}`, patch);

export function useUpdatePlanAction(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ actionId, patch }: { actionId: number; patch: PlanActionUpdate }) => updatePlanAction(actionId, patch),
    onSuccess: ({ plan }) => planChanged(queryClient, plan),
    onError: () => refetchPlan(queryClient, planId),
  });
}
