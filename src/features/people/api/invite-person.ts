// POST /api/farms/:farmId/invitations — mails a one-time link to join the farm with a role.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { InvitationCreate, OpenInvitation } from '../../../../shared/schemas/people';
import { getPeopleQueryOptions } from './get-people';

export const invitePerson = (farmId: number, input: InvitationCreate) => api.post<OpenInvitation>(`/api/farms/${farmId}/invitations`, input);

export function useInvitePerson(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationCreate) => invitePerson(farmId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getPeopleQueryOptions(farmId).queryKey }),
  });
}
