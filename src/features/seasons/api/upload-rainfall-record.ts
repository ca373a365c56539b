// POST /api/farms/:farmId/climate/rainfall-record (farmer, advisor) — a breakpoint CSV; the
// server works out R (storm EI30 summed, mean per year) and stores it as the farm's R.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Climate } from '../../../../shared/schemas/season';
import { getClimateQueryOptions } from './get-climate';
import { invalidateAssessments } from './query-keys';

export function uploadRainfallRecord(farmId: number, file: File, designStormMm?: number): Promise<Climate> {
  const form = new FormData();
  form.append('file', file);
  if (designStormMm !== undefined) form.append('designStormMm', String(designStormMm));
  return api.post<Climate>(`/api/farms/${farmId}/climate/rainfall-record`, form);
}

export function useUploadRainfallRecord(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, designStormMm }: { file: File; designStormMm?: number }) => uploadRainfallRecord(farmId, file, designStormMm),
    onSuccess: (climate) => {
      queryClient.setQueryData(getClimateQueryOptions(farmId).queryKey, climate);
      invalidateAssessments(queryClient);
    },
  });
}
