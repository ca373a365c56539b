// After a terrain job finishes: the farm's model, its layers and every field's figures are new.
import type { QueryClient } from '@tanstack/react-query';
import { getElevationQueryOptions } from './get-elevation';
import { fieldTerrainRootKey } from './get-field-terrain';
import { getLayersQueryOptions } from './get-layers';

export function refreshTerrain(queryClient: QueryClient, farmId: number) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: getElevationQueryOptions(farmId).queryKey }),
    queryClient.invalidateQueries({ queryKey: getLayersQueryOptions(farmId).queryKey }),
    queryClient.invalidateQueries({ queryKey: fieldTerrainRootKey }),
  ]);
}
