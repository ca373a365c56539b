// GET /api/fields/:fieldId/cropping?season= — the field's cropping for a season; null when
// none is recorded yet (404 from the cropping route, not from membership).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import type { Cropping } from '../../../../shared/schemas/season';

export async function getCropping(fieldId: number, season: string): Promise<Cropping | null> {
  try {
    return await api.get<Cropping>(`/api/fields/${fieldId}/cropping?season=${encodeURIComponent(season)}`);
  } catch (error) {
    if (isApiError(error, 404) && error.code === 'no_cropping') return null;
    throw error;
  }
}

export const getCroppingQueryOptions = (fieldId: number, season: string) =>
  queryOptions({ queryKey: ['fields', fieldId, 'cropping', season], queryFn: () => getCropping(fieldId, season) });

export const useCropping = (fieldId: number, season: string | null) =>
  useQuery({ ...getCroppingQueryOptions(fieldId, season ?? ''), enabled: season !== null });
