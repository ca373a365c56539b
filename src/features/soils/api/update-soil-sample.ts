// PATCH /api/soil-samples/:sampleId — any fields (null clears one), always with the version read.
// 409 stale_version carries details.current: the list takes it so the person sees the latest.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { SoilSample, SoilSampleUpdate } from '../../../../shared/schemas/soils';
import { getSoilSamplesQueryOptions } from './get-soil-samples';
import { invalidateFieldSoils } from './soil-query-keys';

export const updateSoilSample = (sampleId: number, input: SoilSampleUpdate) =>
  api.patch<SoilSample>(`/api/soil-samples/${sampleId}`, input);

/** The sample the server holds now, from a 409 answer, if it sent one. */
export function currentSampleFromConflict(error: unknown): SoilSample | null {
  if (!isApiError(error, 409)) return null;
  const current = (error.details as { current?: SoilSample } | undefined)?.current;
  return current && typeof current.id === 'number' ? current : null;
}

export function useUpdateSoilSample(fieldId: number) {
  const queryClient = useQueryClient();
  const listKey = getSoilSamplesQueryOptions(fieldId).queryKey;
  const putInList = (sample: SoilSample) =>
    queryClient.setQueryData(listKey, (old) => old?.map((s) => (s.id === sample.id ? sample : s)));
  return useMutation({
    mutationFn: ({ sampleId, input }: { sampleId: number; input: SoilSampleUpdate }) => updateSoilSample(sampleId, input),
    onSuccess: (sample) => {
      putInList(sample);
      return invalidateFieldSoils(queryClient, fieldId);
    },
    onError: (error) => {
      const current = currentSampleFromConflict(error);
      if (current) putInList(current);
      if (isApiError(error, 409)) void invalidateFieldSoils(queryClient, fieldId);
    },
  });
}
