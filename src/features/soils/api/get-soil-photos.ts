// GET /api/fields/:fieldId/soil-photos — the field's profile photos (newest first as listed).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { SoilPhoto } from '../../../../shared/schemas/soils';

export const getSoilPhotos = (fieldId: number) => api.get<SoilPhoto[]>(`/api/fields/${fieldId}/soil-photos`);

export const getSoilPhotosQueryOptions = (fieldId: number) =>
  queryOptions({ queryKey: ['fields', fieldId, 'soil-photos'], queryFn: () => getSoilPhotos(fieldId) });

export const useSoilPhotos = (fieldId: number) => useQuery(getSoilPhotosQueryOptions(fieldId));
