// DELETE /api/soil-samples/:sampleId
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getSoilSamplesQueryOptions } from './get-soil-samples';
import { invalidateFieldSoils } from './soil-query-keys';

export const deleteSoilSample = (sampleId: number) => api.delete(`/api/soil-samples/${sampleId}`);

export function useDeleteSoilSample(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (sampleId: number) => deleteSoilSample(sampleId),
    onSuccess: (_void, sampleId) => {
      queryClient.setQueryData(getSoilSamplesQueryOptions(fieldId).queryKey, (old) => old?.filter((s) => s.id !== sampleId));
      return invalidateFieldSoils(queryClient, fieldId);
    },
  });
}
