// GET /api/auth/me — who is signed in; null when nobody is (the 401 is not an error here).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { User } from '../../../../shared/schemas/auth';

export async function getMe(): Promise<User | null> {
  try {
    const { user } = await api.get<{ user: User }>('/api/auth/me');
    return user;
  } catch (error) {
    if (isApiError(error, 401)) return null;
    throw error;
  }
}

export const getMeQueryOptions = () => queryOptions({ queryKey: ['auth', 'me'], queryFn: getMe, staleTime: Infinity });

export const useMe = () => useQuery(getMeQueryOptions());
