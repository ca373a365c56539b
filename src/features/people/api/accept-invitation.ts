// POST /api/invitations/:token/accept — joins the farm and signs in.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { User } from '../../../../shared/schemas/auth';
import type { InvitationAccept } from '../../../../shared/schemas/people';

export const acceptInvitation = (token: string, input: InvitationAccept) =>
  api.post<{ user: User; farmId: number }>(`/api/invitations/${encodeURIComponent(token)}/accept`, input);

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationAccept) => acceptInvitation(token, input),
    // A new session: nothing cached for whoever was signed in before is kept.
    onSuccess: () => queryClient.clear(),
  });
}
