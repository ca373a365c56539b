// GET /api/farms/:farmId/people — the farm's people and roles; open invitations for the farmer.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { People } from '../../../../shared/schemas/people';

export const getPeople = (farmId: number) => api.get<People>(`/api/farms/${farmId}/people`);

export const getPeopleQueryOptions = (farmId: number) => queryOptions({ queryKey: ['farms', farmId, 'people'], queryFn: () => getPeople(farmId) });

export const usePeople = (farmId: number, enabled = true) => useQuery({ ...getPeopleQueryOptions(farmId), enabled });
