// GET /api/farms/:farmId/layers — the farm's terrain map layers (PNG image overlays with
// their bounds and a legend in words); an empty list before any elevation model.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type LayerKey = 'hillshade' | 'slope-classes' | 'ls' | 'concentrated-flow' | 'soil-loss';

/** One legend row. colour is a CSS colour, or 'none' for classes drawn without colour. */
export type LegendEntry = { label: string; colour: string };

export type TerrainLayer = {
  key: LayerKey;
  label: string;
  /** Same-origin PNG, sent with the session cookie. */
  url: string;
  /** [[south, west], [north, east]] in degrees, already in Leaflet order. */
  bounds: [[number, number], [number, number]];
  legend: LegendEntry[];
};

export const getLayers = (farmId: number) => api.get<TerrainLayer[]>(`/api/farms/${farmId}/layers`);

export const getLayersQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'layers'], queryFn: () => getLayers(farmId) });

export const useLayers = (farmId: number) => useQuery(getLayersQueryOptions(farmId));
