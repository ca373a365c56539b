// DELETE /api/farms/:farmId/invitations/:id — the link stops working.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getPeopleQueryOptions } from './get-people';

export const cancelInvitation = (farmId: number, invitationId: number) => api.delete(`/api/farms/${farmId}/invitations/${invitationId}`);

export function useCancelInvitation(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => cancelInvitation(farmId, invitationId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getPeopleQueryOptions(farmId).queryKey }),
  });
}
