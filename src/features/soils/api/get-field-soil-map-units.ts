// GET /api/fields/:fieldId/soil-map-units — the farm soil map's units under one field, with the
// area and share of the field each covers.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FieldSoilMapUnits } from '../../../../shared/schemas/soils';

export const getFieldSoilMapUnits = (fieldId: number) =>
  api.get<FieldSoilMapUnits>(`/api/fields/${fieldId}/soil-map-units`);

export const getFieldSoilMapUnitsQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId, 'soil-map-units'], queryFn: () => getFieldSoilMapUnits(fieldId) });

export const useFieldSoilMapUnits = (fieldId: number) => useQuery(getFieldSoilMapUnitsQueryOptions(fieldId));
