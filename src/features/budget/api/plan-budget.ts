// POST /api/farms/:farmId/budget-plan — which treatment each field gets for a budget and a goal,
// what it costs, the soil it saves, why, and soil saved against money for every budget. It
// changes nothing on the server, so it is read like a query, keyed by what was asked.
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { treatmentsRootKey } from '../../../lib/query-keys';
import type { BudgetPlan, BudgetPlanRequest } from '../../../../shared/schemas/treatments';

export const planBudget = (farmId: number, request: BudgetPlanRequest) =>
  api.post<BudgetPlan>(`/api/farms/${farmId}/budget-plan`, request);

export const getBudgetPlanQueryOptions = (farmId: number, request: BudgetPlanRequest) =>
  queryOptions({
    queryKey: [...treatmentsRootKey, 'budget-plan', farmId, request.season, request.budget, request.goal ?? 'most-soil'],
    queryFn: () => planBudget(farmId, request),
  });

export const useBudgetPlan = (farmId: number, request: BudgetPlanRequest | null) =>
  useQuery({
    ...getBudgetPlanQueryOptions(farmId, request ?? { season: '', budget: 0 }),
    enabled: request !== null,
    placeholderData: keepPreviousData,
  });
