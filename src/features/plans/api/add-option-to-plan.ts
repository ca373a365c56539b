// POST /api/plans/:planId/actions/from-option (farmer, advisor): a field's treatment option as
// plan actions, one per treatment it combines, its cost split by the option's cost lines. The
// season's plan is made first when it has none (POST /api/farms/:farmId/plans answers the
// existing one otherwise).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanActionAnswer } from './add-plan-action';
import { createPlan } from './create-plan';
import { planChanged } from './query-keys';

export type OptionForPlan = { fieldId: number; optionId: string };

export async function addOptionToPlan(farmId: number, season: string, input: OptionForPlan): Promise<PlanActionAnswer> {
  const plan = await createPlan(farmId, season);
  return api.post<PlanActionAnswer>(`/api/plans/${plan.id}/actions/from-option`, input);
}

export function useAddOptionToPlan(farmId: number, season: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OptionForPlan) => addOptionToPlan(farmId, season, input),
    onSuccess: ({ plan }) => planChanged(queryClient, plan),
  });
}
