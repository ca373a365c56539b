// GET /api/board?season= — an advisor's board across every client farm; rows carry farmName.
// Without a season each farm shows its newest one.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Board } from '../../../../shared/schemas/assessment';
import { boardsRootKey } from '../../seasons/api/query-keys';

export const getClientBoard = (season: string | null) =>
  api.get<Board>(`/api/board${season ? `?season=${encodeURIComponent(season)}` : ''}`);

export const getClientBoardQueryOptions = (season: string | null) =>
  queryOptions({ queryKey: [...boardsRootKey, 'clients', season ?? 'newest'], queryFn: () => getClientBoard(season) });

export const useClientBoard = (season: string | null) => useQuery(getClientBoardQueryOptions(season));
