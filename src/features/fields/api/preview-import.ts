// POST /api/farms/:farmId/fields/import/preview — multipart, part `file`. Stores nothing.
// 200 ImportPreview; 413/415/400/422 with a message for a file that cannot be read.
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ImportPreview } from '../../../../shared/schemas/field-import';

export function previewImport(farmId: number, file: File): Promise<ImportPreview> {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.post<ImportPreview>(`/api/farms/${farmId}/fields/import/preview`, form);
}

export function usePreviewImport(farmId: number) {
  return useMutation({ mutationFn: (file: File) => previewImport(farmId, file) });
}
