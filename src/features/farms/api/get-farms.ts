// GET /api/farms — the caller's farms and their role on each.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FarmSummary } from '../../../../shared/schemas/auth';

export const getFarms = () => api.get<FarmSummary[]>('/api/farms');

export const getFarmsQueryOptions = () => queryOptions({ queryKey: ['farms'], queryFn: getFarms });

export const useFarms = () => useQuery(getFarmsQueryOptions());
