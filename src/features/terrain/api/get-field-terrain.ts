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
  /** false while the figures are for an older outline of the field, or stale. */
  upToDate: boolean;
  /** The terrain run that should have replaced these figures stopped before it finished. */
  stale: boolean;
};

/** How often figures for an outdated outline are asked for again, ms. */
export const STALE_TERRAIN_POLL_MS = 3000;
/**
 * A changed outline may answer no_terrain for a moment while the server works its figures
 * out; so many more tries are made before "no model covers this field" is taken as final.
 */
export const NO_TERRAIN_RETRIES = 3;

export const getFieldTerrain = (fieldId: number) => api.get<FieldTerrain>(`/api/fields/${fieldId}/terrain`);

/** The key every field's terrain figures sit under (invalidated when a terrain job finishes). */
export const fieldTerrainRootKey = ['field-terrain'] as const;

/** `fieldVersion` is the outline's version: a new outline asks again at once. */
export const getFieldTerrainQueryOptions = (fieldId: number, fieldVersion: number) =>
  queryOptions({
    queryKey: [...fieldTerrainRootKey, fieldId, fieldVersion],
    queryFn: () => getFieldTerrain(fieldId),
    // Figures for an older outline are being recomputed on the server: ask again shortly.
    refetchInterval: (query) => {
      // Stale figures wait for someone to run terrain again: nothing to ask for until then.
      if (query.state.data && !query.state.data.upToDate && !query.state.data.stale) return STALE_TERRAIN_POLL_MS;
      // terrain_pending: a terrain run is queued or running; ask until it lands.
      if (isTerrainPending(query.state.error)) return STALE_TERRAIN_POLL_MS;
      if (isNoTerrain(query.state.error) && query.state.errorUpdateCount <= NO_TERRAIN_RETRIES)
        return STALE_TERRAIN_POLL_MS;
      return false;
    },
  });

export const useFieldTerrain = (field: { id: number; version: number } | null) =>
  useQuery({ ...getFieldTerrainQueryOptions(field?.id ?? 0, field?.version ?? 0), enabled: field !== null });

export const isNoTerrain = (error: unknown) => isApiError(error, 404) && error.code === 'no_terrain';
export const isTerrainPending = (error: unknown) => isApiError(error, 404) && error.code === 'terrain_pending';
