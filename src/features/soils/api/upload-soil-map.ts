// POST /api/farms/:farmId/soil-map — multipart, part `file`: GeoJSON or a zipped shapefile of map
// units with attributes. Replaces the farm's map. 201 SoilMapInfo + rejected; 422
// nothing_imported with details.rejected; 413 too large; 415 not a soil map file.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilMapInfo } from '../../../../shared/schemas/soils';
import { soilMapChanged } from './soil-map-changed';

/** File endings the server reads. */
export const SOIL_MAP_EXTENSIONS = ['.geojson', '.json', '.zip'] as const;

export type SoilMapUploadResult = SoilMapInfo & { rejected: { index: number; reason: string }[] };

export function uploadSoilMap(farmId: number, file: File): Promise<SoilMapUploadResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.post<SoilMapUploadResult>(`/api/farms/${farmId}/soil-map`, form);
}

export function useUploadSoilMap(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadSoilMap(farmId, file),
    onSuccess: ({ rejected: _rejected, ...info }) => soilMapChanged(queryClient, farmId, info),
  });
}
