// POST /api/auth/login
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Login, User } from '../../../../shared/schemas/auth';
import { getMeQueryOptions } from './get-me';

export async function login(input: Login): Promise<User> {
  const { user } = await api.post<{ user: User }>('/api/auth/login', input);
  return user;
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(getMeQueryOptions().queryKey, user);
    },
  });
}
