// POST /api/plan-actions/:actionId/done (farmer, advisor): the day the work was done, the amount
// actually applied and an optional photo (multipart). A follow-up record: the plan keeps its
// state, version and revision; the action's own version moves.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanActionAnswer } from './add-plan-action';
import { planChanged, refetchPlan } from './query-keys';

export type DoneInput = { version: number; doneOn: string; appliedQuantity?: number | null; note?: string | null; photo?: File | null };

export function markActionDone(actionId: number, input: DoneInput): Promise<PlanActionAnswer> {
  const form = new FormData();
  form.set('version', String(input.version));
  form.set('doneOn', input.doneOn);
  if (input.appliedQuantity != null) form.set('appliedQuantity', String(input.appliedQuantity));
  if (input.note) form.set('note', input.note);
  if (input.photo) form.set('file', input.photo);
  return api.post<PlanActionAnswer>(`/api/plan-actions/${actionId}/done`, form);
}

export function useMarkActionDone(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ actionId, input }: { actionId: number; input: DoneInput }) => markActionDone(actionId, input),
    onSuccess: ({ plan }) => planChanged(queryClient, plan),
    onError: () => refetchPlan(queryClient, planId),
  });
}

/** The photo of the work (or its thumbnail), for an <img>. */
export const actionPhotoUrl = (actionId: number, thumbnail = false) => `/api/plan-actions/${actionId}/photo${thumbnail ? '/thumbnail' : ''}`;
