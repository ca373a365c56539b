// POST /api/farms/:farmId/dems — multipart, part `file` (a GeoTIFF elevation model).
// 202 { jobId, elevationModelId }; 400 empty_file, 413 too_large, 415 unsupported_file_type,
// 422 invalid_dem / dem_outside_fields, each with a message for the person.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getElevationQueryOptions } from './get-elevation';

export type DemAccepted = { jobId: string; elevationModelId: number };

/** File endings of a GeoTIFF. */
export const DEM_EXTENSIONS = ['.tif', '.tiff'] as const;

export function uploadDem(farmId: number, file: File): Promise<DemAccepted> {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.post<DemAccepted>(`/api/farms/${farmId}/dems`, form);
}

export function useUploadDem(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadDem(farmId, file),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getElevationQueryOptions(farmId).queryKey });
    },
  });
}
