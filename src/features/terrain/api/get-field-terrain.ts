// GET /api/fields/:fieldId/terrain — a field's slope figures from the farm's elevation model;
// 404 no_terrain when no model covers the field (the client then asks for a typed slope).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';

export type SlopeClassShare = { name: string; minPct: number; maxPct: number | null; share: number };

export type FieldTerrain = {
  cellCount: number;
  cellsWithoutData: number;
  meanSlopePct: number;
  p90SlopePct: number;
  slopeClasses: SlopeClassShare[];
  meanLS: number;
  meanSoilLossTPerHaYr: number | null;
  /** Cells where flow from a large upslope area gathers, as [lng, lat] cell centres. */
  concentratedFlow: { minAreaM2: number; cellCount: number; points: [number, number][] };
  cellSizeM: number;
  epsg: number;
  computedAt: string;
  /** false while the figures are for an older outline of the field. */
  upToDate: boolean;
};

/** How often figures for an outdated outline are asked for again, ms. */
export const STALE_TERRAIN_POLL_MS = 3000;

export const getFieldTerrain = (fieldId: number) => api.get<FieldTerrain>(`/api/fields/${fieldId}/terrain`);

/** The key every field's terrain figures sit under (invalidated when a terrain job finishes). */
export const fieldTerrainRootKey = ['field-terrain'] as const;

export const getFieldTerrainQueryOptions = (fieldId: number) =>
  queryOptions({
    queryKey: [...fieldTerrainRootKey, fieldId],
    queryFn: () => getFieldTerrain(fieldId),
    // Figures for an older outline are being recomputed on the server: ask again shortly.
    refetchInterval: (query) => (query.state.data && !query.state.data.upToDate ? STALE_TERRAIN_POLL_MS : false),
  });

export const useFieldTerrain = (fieldId: number | null) =>
  useQuery({ ...getFieldTerrainQueryOptions(fieldId ?? 0), enabled: fieldId !== null });

export const isNoTerrain = (error: unknown) => isApiError(error, 404) && error.code === 'no_terrain';
