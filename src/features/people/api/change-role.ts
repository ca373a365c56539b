// PATCH /api/farms/:farmId/people/:membershipId — a new role (a landowner with their fields).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MembershipUpdate, People } from '../../../../shared/schemas/people';
import { getPeopleQueryOptions } from './get-people';

export const changeRole = (farmId: number, membershipId: number, input: MembershipUpdate) => api.patch<People>(`/api/farms/${farmId}/people/${membershipId}`, input);

export function useChangeRole(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ membershipId, input }: { membershipId: number; input: MembershipUpdate }) => changeRole(farmId, membershipId, input),
    onSuccess: (people) => {
      queryClient.setQueryData(getPeopleQueryOptions(farmId).queryKey, people);
      // Field ownership changed: the farm's field list and members are read again.
      return queryClient.invalidateQueries({ queryKey: ['farms', farmId] });
    },
  });
}
