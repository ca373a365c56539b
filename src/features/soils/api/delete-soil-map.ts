// DELETE /api/farms/:farmId/soil-map — the farm has no soil map afterwards.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { soilMapChanged } from './soil-map-changed';

export const deleteSoilMap = (farmId: number) => api.delete(`/api/farms/${farmId}/soil-map`);

export function useDeleteSoilMap(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteSoilMap(farmId),
    onSuccess: () => soilMapChanged(queryClient, farmId),
  });
}
