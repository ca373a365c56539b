// GET /api/fields/:fieldId/treatments?season= — the field's current figures, its treatment
// options (A after, cost, quantities, cautions) and what cannot be offered yet; `site` lets the
// what-if rerun the engine in the browser.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { treatmentsRootKey } from '../../../lib/query-keys';
import type { FieldTreatmentsAnswer } from '../../../../shared/schemas/treatments';

export const getFieldTreatments = (fieldId: number, season: string) =>
  api.get<FieldTreatmentsAnswer>(`/api/fields/${fieldId}/treatments?season=${encodeURIComponent(season)}`);

export const getFieldTreatmentsQueryOptions = (fieldId: number, season: string) =>
  queryOptions({ queryKey: [...treatmentsRootKey, 'field', fieldId, season], queryFn: () => getFieldTreatments(fieldId, season) });

export const useFieldTreatments = (fieldId: number, season: string | null, enabled = true) =>
  useQuery({ ...getFieldTreatmentsQueryOptions(fieldId, season ?? ''), enabled: enabled && season !== null });
