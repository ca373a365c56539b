// POST /api/farms/:farmId/fields/import — multipart, part `file`, and `options` (JSON of
// ImportOptions) with the choices made in the preview.
// 201 { created, rejected }; 422 with a message when a chosen feature cannot be stored (nothing is);
// 413/415/400 with a message.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ImportResult } from '../../../../shared/schemas/field';
import type { ImportOptions } from '../../../../shared/schemas/field-import';
import { getFieldsQueryOptions } from './get-fields';

/** File endings the server reads. */
export const IMPORT_EXTENSIONS = ['.geojson', '.json', '.zip', '.kml', '.kmz'] as const;

export type ImportRequest = { file: File; options: ImportOptions };

export function importFields(farmId: number, { file, options }: ImportRequest): Promise<ImportResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  form.append('options', JSON.stringify(options));
  return api.post<ImportResult>(`/api/farms/${farmId}/fields/import`, form);
}

export function useImportFields(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: ImportRequest) => importFields(farmId, request),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getFieldsQueryOptions(farmId).queryKey });
    },
  });
}
