// DELETE /api/soil-photos/:photoId
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getSoilPhotosQueryOptions } from './get-soil-photos';

export const deleteSoilPhoto = (photoId: number) => api.delete(`/api/soil-photos/${photoId}`);

export function useDeleteSoilPhoto(fieldId: number) {
  const queryClient = useQueryClient();
  const key = getSoilPhotosQueryOptions(fieldId).queryKey;
  return useMutation({
    mutationFn: (photoId: number) => deleteSoilPhoto(photoId),
    onSuccess: (_void, photoId) => {
      queryClient.setQueryData(key, (old) => old?.filter((p) => p.id !== photoId));
      return queryClient.invalidateQueries({ queryKey: key });
    },
  });
}
