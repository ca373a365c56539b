// GET /api/farms/:farmId/board?season= — the farm's fields ranked by A/T, then tonnes a year
// (a landowner gets only the fields they own).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Board } from '../../../../shared/schemas/assessment';
import { boardsRootKey } from '../../seasons/api/query-keys';

export const getBoard = (farmId: number, season: string) =>
  api.get<Board>(`/api/farms/${farmId}/board?season=${encodeURIComponent(season)}`);

export const getBoardQueryOptions = (farmId: number, season: string) =>
  queryOptions({ queryKey: [...boardsRootKey, farmId, season], queryFn: () => getBoard(farmId, season) });

export const useBoard = (farmId: number, season: string | null) =>
  useQuery({ ...getBoardQueryOptions(farmId, season ?? ''), enabled: season !== null });
