// POST /api/estimate — the server's answer for the same inputs the page works out locally.
// 200 EstimateSuccess; 400 (message names the field) or 422 cannot_estimate.
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { EstimateInput, EstimateSuccess } from '../../../../shared/schemas/estimate';

export const runEstimate = (input: EstimateInput) => api.post<EstimateSuccess>('/api/estimate', input);

export const getEstimateQueryOptions = (input: EstimateInput) =>
  queryOptions({
    queryKey: ['estimate', input],
    queryFn: () => runEstimate(input),
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });

/** The server's estimate for `input`; null asks nothing (the inputs are not complete yet). */
export const useServerEstimate = (input: EstimateInput | null) =>
  useQuery({ ...getEstimateQueryOptions(input ?? ({} as EstimateInput)), enabled: input !== null });
