// PATCH /api/auth/me — the user's own settings (display units, name).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { UpdateMe, User } from '../../../../shared/schemas/auth';
import { getMeQueryOptions } from './get-me';

export type UpdateMeInput = z.infer<typeof UpdateMe>;

export async function updateMe(input: UpdateMeInput): Promise<User> {
  const { user } = await api.patch<{ user: User }>('/api/auth/me', input);
  return user;
}

export function useUpdateMe() {
  const queryClient = useQueryClient();
  const meKey = getMeQueryOptions().queryKey;
  return useMutation({
    mutationFn: updateMe,
    // Show the new units at once; roll back if the server refuses.
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey: meKey });
      const previous = queryClient.getQueryData(meKey);
      if (previous) queryClient.setQueryData(meKey, { ...previous, ...input });
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(meKey, context.previous);
    },
    onSuccess: (user) => queryClient.setQueryData(meKey, user),
  });
}
