// POST /api/auth/reset — the new password from a mailed link; signs in and ends every other session.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { User } from '../../../../shared/schemas/auth';
import { getMeQueryOptions } from './get-me';

export const resetPassword = async (input: { token: string; password: string }) => (await api.post<{ user: User }>('/api/auth/reset', input)).user;

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(getMeQueryOptions().queryKey, user);
    },
  });
}
