// After the farm's soil map or its mapping changed: the map info, and every field's map units
// and soil summary (K, T and the soil-group mix come from the map), and every assessment and
// board, are fetched again.
import type { QueryClient } from '@tanstack/react-query';
import type { SoilMapInfo } from '../../../../shared/schemas/soils';
import { invalidateAssessments } from '../../seasons/api/query-keys';
import { getSoilMapQueryOptions } from './get-soil-map';

export function soilMapChanged(queryClient: QueryClient, farmId: number, info?: SoilMapInfo): Promise<void> {
  if (info) queryClient.setQueryData(getSoilMapQueryOptions(farmId).queryKey, info);
  // Field keys are ['fields', fieldId, 'soil-…']: match them by their last part.
  const fieldSoils = (key: readonly unknown[]) =>
    key[0] === 'fields' && (key[2] === 'soil-map-units' || key[2] === 'soil-summary');
  invalidateAssessments(queryClient);
  return Promise.all([
    info ? Promise.resolve() : queryClient.invalidateQueries({ queryKey: getSoilMapQueryOptions(farmId).queryKey }),
    queryClient.invalidateQueries({ predicate: (q) => fieldSoils(q.queryKey) }),
  ]).then(() => undefined);
}
