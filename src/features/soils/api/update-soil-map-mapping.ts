import { api } from '../../../lib/api-client';
// PUT /api/farms/:farmId/soil-map/mapping — which attribute gives texture, K (and its units),
// hydrologic soil group, T and drainage; null unsets one. 422 unknown_attribute.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SoilMapInfo, SoilMapMapping } from '../../../../shared/schemas/soils';
import { soilMapChanged } from './soil-map-changed';

export const updateSoilMapMapping = (farmId: number, mapping: SoilMapMapping) =>
  api.put<SoilMapInfo>(`/api/farms/${farmId}/soil-map/mapping`, mapping);

export function useUpdateSoilMapMapping(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (mapping: SoilMapMapping) => updateSoilMapMapping(farmId, mapping),
    onSuccess: (info) => soilMapChanged(queryClient, farmId, info),
  });
}
