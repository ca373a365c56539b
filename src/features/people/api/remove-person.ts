// DELETE /api/farms/:farmId/people/:membershipId — the person loses the farm at once.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getPeopleQueryOptions } from './get-people';

export const removePerson = (farmId: number, membershipId: number) => api.delete(`/api/farms/${farmId}/people/${membershipId}`);

export function useRemovePerson(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (membershipId: number) => removePerson(farmId, membershipId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getPeopleQueryOptions(farmId).queryKey }),
  });
}
