// POST /api/plans/:planId/actions (farmer, advisor) — from a treatment option or typed. Changing
// an approved plan starts a new revision; a plan in review answers 422 plan_submitted.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Plan, PlanAction, PlanActionCreate } from '../../../../shared/schemas/plans';
import { planChanged, refetchPlan } from './query-keys';

export type PlanActionAnswer = { action: PlanAction | null; plan: Plan };

export const addPlanAction = (planId: number, input: PlanActionCreate) => api.post<PlanActionAnswer>(`/api/plans/${planId}/actions`, input);

export function useAddPlanAction(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanActionCreate) => addPlanAction(planId, input),
    onSuccess: ({ plan }) => planChanged(queryClient, plan),
    onError: () => refetchPlan(queryClient, planId),
  });
}
