// POST /api/fields/:fieldId/soil-photos — multipart, part `file` (+ caption, sampleId, clientKey: a photo sent
// again under the same key is stored once).
// 201 SoilPhoto; 413 over the limit; 415 not a JPEG, PNG or WebP (checked from the content).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilPhoto } from '../../../../shared/schemas/soils';
import { getSoilPhotosQueryOptions } from './get-soil-photos';

/** Image types the server keeps. */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

export type PhotoUpload = { file: File; caption?: string; sampleId?: number | null; clientKey?: string };

export function uploadSoilPhoto(fieldId: number, { file, caption, sampleId, clientKey }: PhotoUpload): Promise<SoilPhoto> {
  const form = new FormData();
  if (caption) form.append('caption', caption);
  if (sampleId != null) form.append('sampleId', String(sampleId));
  if (clientKey) form.append('clientKey', clientKey);
  form.append('file', file, file.name);
  return api.post<SoilPhoto>(`/api/fields/${fieldId}/soil-photos`, form);
}

export function useUploadSoilPhoto(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (upload: PhotoUpload) => uploadSoilPhoto(fieldId, upload),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getSoilPhotosQueryOptions(fieldId).queryKey }),
  });
}
