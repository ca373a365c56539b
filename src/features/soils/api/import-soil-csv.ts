// POST /api/fields/:fieldId/soil-samples/import — multipart, part `file` (CSV, one lab sample a
// row), field acceptGoodRows=true to store the good rows of a file that also has bad ones.
// 201 { created, rejected }; 422 csv_rows_invalid with details.rejected (nothing stored);
// 413 too large, 415 not text, 400 with a message.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { SoilCsvImportResult } from '../../../../shared/schemas/soils';
import { invalidateFieldSoils } from './soil-query-keys';

export type CsvRejectedRow = SoilCsvImportResult['rejected'][number];

export function importSoilCsv(fieldId: number, file: File, acceptGoodRows: boolean): Promise<SoilCsvImportResult> {
  const form = new FormData();
  if (acceptGoodRows) form.append('acceptGoodRows', 'true');
  form.append('file', file, file.name);
  return api.post<SoilCsvImportResult>(`/api/fields/${fieldId}/soil-samples/import`, form);
}

/** The rows a 422 csv_rows_invalid answer refused. */
export function rejectedRowsFromError(error: unknown): CsvRejectedRow[] {
  if (!isApiError(error, 422)) return [];
  const r = (error.details as { rejected?: unknown } | undefined)?.rejected;
  return Array.isArray(r) ? (r as CsvRejectedRow[]) : [];
}

export function useImportSoilCsv(fieldId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, acceptGoodRows }: { file: File; acceptGoodRows: boolean }) => importSoilCsv(fieldId, file, acceptGoodRows),
    onSuccess: () => invalidateFieldSoils(queryClient, fieldId),
  });
}
