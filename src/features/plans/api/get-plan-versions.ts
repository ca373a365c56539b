// GET /api/plans/:planId/versions — every approved revision with what changed from the one
// before, then the revision being worked on (farmer and advisor).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanVersion } from '../../../../shared/schemas/plans';
import { planKey } from './query-keys';

export const getPlanVersions = (planId: number) => api.get<PlanVersion[]>(`/api/plans/${planId}/versions`);

export const getPlanVersionsQueryOptions = (planId: number) =>
  queryOptions({ queryKey: [...planKey(planId), 'versions'], queryFn: () => getPlanVersions(planId) });

export const usePlanVersions = (planId: number) => useQuery(getPlanVersionsQueryOptions(planId));
