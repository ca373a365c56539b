// GET /api/plans/:planId — the live plan (farmer, advisor) or the newest approved revision of
// the caller's own fields (landowner).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Plan } from '../../../../shared/schemas/plans';
import { planKey } from './query-keys';

export const getPlan = (planId: number) => api.get<Plan>(`/api/plans/${planId}`);

export const getPlanQueryOptions = (planId: number) => queryOptions({ queryKey: planKey(planId), queryFn: () => getPlan(planId) });

export const usePlan = (planId: number) => useQuery(getPlanQueryOptions(planId));
