// After any soils change on a field: its samples and summary are fetched again, through their own
// query options (never a hand-typed key), and every assessment and board (K, T, the soil group
// and the problem-clay flag come from the soils) through the seasons feature's helper.
import type { QueryClient } from '@tanstack/react-query';
import { invalidateAssessments } from '../../seasons/api/query-keys';
import { getSoilSamplesQueryOptions } from './get-soil-samples';
import { getSoilSummaryQueryOptions } from './get-soil-summary';

export function invalidateFieldSoils(queryClient: QueryClient, fieldId: number): Promise<void> {
  invalidateAssessments(queryClient);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: getSoilSamplesQueryOptions(fieldId).queryKey }),
    queryClient.invalidateQueries({ queryKey: getSoilSummaryQueryOptions(fieldId).queryKey }),
  ]).then(() => undefined);
}
