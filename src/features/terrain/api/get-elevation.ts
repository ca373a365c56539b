// GET /api/farms/:farmId/elevation — the farm's current elevation model and its latest terrain job.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { JobState } from './get-job';

export type ElevationModel = {
  id: number;
  originalName: string;
  epsg: number;
  /** Size in cells. */
  width: number;
  height: number;
  cellSizeM: number;
  createdAt: string;
};

export type FarmElevation = {
  model: ElevationModel | null;
  latestJob: { id: string; state: JobState; progress: number; message: string | null } | null;
};

export const getElevation = (farmId: number) => api.get<FarmElevation>(`/api/farms/${farmId}/elevation`);

export const getElevationQueryOptions = (farmId: number) =>
  queryOptions({ queryKey: ['farms', farmId, 'elevation'], queryFn: () => getElevation(farmId) });

export const useElevation = (farmId: number) => useQuery(getElevationQueryOptions(farmId));
