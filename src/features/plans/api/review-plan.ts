// The review steps, each with the plan version read (409 with details.current when stale):
// POST /api/plans/:planId/submit (farmer), /return { comment } and /approve { comment? } (advisor).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Plan } from '../../../../shared/schemas/plans';
import { planChanged, refetchPlan } from './query-keys';

export type ReviewStep = { step: 'submit'; version: number } | { step: 'return'; version: number; comment: string } | { step: 'approve'; version: number; comment?: string | null };

export const reviewPlan = (planId: number, { step, ...body }: ReviewStep) => api.post<Plan>(`/api/plans/${planId}/${step}`, body);

export function useReviewPlan(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (step: ReviewStep) => reviewPlan(planId, step),
    onSuccess: (plan) => planChanged(queryClient, plan),
    onError: () => refetchPlan(queryClient, planId),
  });
}
