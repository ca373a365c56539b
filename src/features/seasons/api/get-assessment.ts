// GET /api/fields/:fieldId/assessment?season= — the field's assessment for a season: inputs and
// where each came from, gaps, every factor with its source, A, A/T, runoff, problem clay.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { FieldAssessment } from '../../../../shared/schemas/assessment';
import { assessmentsRootKey } from './query-keys';

export const getAssessment = (fieldId: number, season: string) =>
  api.get<FieldAssessment>(`/api/fields/${fieldId}/assessment?season=${encodeURIComponent(season)}`);

export const getAssessmentQueryOptions = (fieldId: number, season: string) =>
  queryOptions({ queryKey: [...assessmentsRootKey, fieldId, season], queryFn: () => getAssessment(fieldId, season) });

export const useAssessment = (fieldId: number, season: string | null) =>
  useQuery({ ...getAssessmentQueryOptions(fieldId, season ?? ''), enabled: season !== null });
