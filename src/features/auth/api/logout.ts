// POST /api/auth/logout
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { forgetCachedAnswers } from '../../../lib/service-worker';
import { getMeQueryOptions } from './get-me';

export async function logout(): Promise<void> {
  await api.post<void>('/api/auth/logout');
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      void forgetCachedAnswers();
      queryClient.clear();
      queryClient.setQueryData(getMeQueryOptions().queryKey, null);
    },
  });
}
