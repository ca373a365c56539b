// POST /api/auth/register — a new account and its first farm, with the user as farmer.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Register, User } from '../../../../shared/schemas/auth';
import { getMeQueryOptions } from './get-me';

export async function register(input: Register): Promise<User> {
  const { user } = await api.post<{ user: User }>('/api/auth/register', input);
  return user;
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: register,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(getMeQueryOptions().queryKey, user);
    },
  });
}
