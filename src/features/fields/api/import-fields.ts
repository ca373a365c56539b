// POST /api/farms/:farmId/fields/import — multipart, part `file`.
// 201 { created, rejected }; 422 nothing_imported with details.rejected; 413/415/400 with a message.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ImportResult } from '../../../../shared/schemas/field';
import { getFieldsQueryOptions } from './get-fields';

/** File endings the server reads. */
export const IMPORT_EXTENSIONS = ['.geojson', '.json', '.zip', '.kml', '.kmz'] as const;

export function importFields(farmId: number, file: File): Promise<ImportResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.post<ImportResult>(`/api/farms/${farmId}/fields/import`, form);
}

export function useImportFields(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => importFields(farmId, file),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getFieldsQueryOptions(farmId).queryKey });
    },
  });
}
