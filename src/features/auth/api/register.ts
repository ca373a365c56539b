// POST /api/auth/register — asks for an account: the answer is always "check your mail".
// POST /api/auth/register/confirm — the mailed link's token: the account and its farm, signed in.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Register, User } from '../../../../shared/schemas/auth';
import { getMeQueryOptions } from './get-me';

export const register = (input: Register) => api.post<{ ok: true; message: string }>('/api/auth/register', input);

export function useRegister() {
  return useMutation({ mutationFn: register });
}

export const confirmRegistration = async (token: string) => (await api.post<{ user: User }>('/api/auth/register/confirm', { token })).user;

export function useConfirmRegistration() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmRegistration,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(getMeQueryOptions().queryKey, user);
    },
  });
}
