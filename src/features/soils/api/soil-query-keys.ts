// After any soils change on a field: its samples, summary and map units are fetched again, through
// their own query options (never a hand-typed key). Other features' views of the field (risk,
// board) read the summary on the server, so they pick the change up when they next load.
import type { QueryClient } from '@tanstack/react-query';
import { getSoilSamplesQueryOptions } from './get-soil-samples';
import { getSoilSummaryQueryOptions } from './get-soil-summary';

export function invalidateFieldSoils(queryClient: QueryClient, fieldId: number): Promise<void> {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: getSoilSamplesQueryOptions(fieldId).queryKey }),
    queryClient.invalidateQueries({ queryKey: getSoilSummaryQueryOptions(fieldId).queryKey }),
  ]).then(() => undefined);
}
