// POST /api/fields/:fieldId/soil-samples — lab results or a feel test (SoilSampleCreate).
// 400 invalid_input names the field in details.issues.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilSample, SoilSampleCreate } from '../../../../shared/schemas/soils';
import { invalidateFieldSoils } from './soil-query-keys';

export const createSoilSample = (fieldId: number, input: SoilSampleCreate) =>
  api.post<SoilSample>(`/api/fields/${fieldId}/soil-samples`, input);

export function useCreateSoilSample(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SoilSampleCreate) => createSoilSample(fieldId, input),
    onSuccess: () => invalidateFieldSoils(queryClient, fieldId),
  });
}
