// Query keys of season plans, and what a change to a plan makes stale. Every mutation answers
// with the whole plan, which the cache takes; the season's plan and the versions list refetch.
import type { QueryClient } from '@tanstack/react-query';
import type { Plan } from '../../../../shared/schemas/plans';

export const plansRootKey = ['plans'] as const;
export const planKey = (planId: number) => [...plansRootKey, planId] as const;
export const seasonPlansKey = [...plansRootKey, 'season'] as const;

/** After a plan changed: keep the answer, read the season's plan and the versions again. */
export function planChanged(queryClient: QueryClient, plan: Plan) {
  queryClient.setQueryData(planKey(plan.id), plan);
  void queryClient.invalidateQueries({ queryKey: seasonPlansKey });
  void queryClient.invalidateQueries({ queryKey: [...planKey(plan.id), 'versions'] });
}

/** After a 409 or a refused change: read the plan, its versions and the season's plan again. */
export function refetchPlan(queryClient: QueryClient, planId: number) {
  void queryClient.invalidateQueries({ queryKey: planKey(planId) });
  void queryClient.invalidateQueries({ queryKey: seasonPlansKey });
}
