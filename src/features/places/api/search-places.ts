// GET /api/places?q= — places matching a name or an address (typed coordinates never come here).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlaceSearchResult } from '../../../../shared/schemas/places';

export const searchPlaces = (q: string) => api.get<PlaceSearchResult>(`/api/places?q=${encodeURIComponent(q)}`);

export const searchPlacesQueryOptions = (q: string) =>
  // A search answers the same for a while; an error is shown, not retried behind the person's back.
  queryOptions({ queryKey: ['places', q], queryFn: () => searchPlaces(q), staleTime: 10 * 60_000, retry: false });

/** Runs once a search is submitted (q not null). */
export const useSearchPlaces = (q: string | null) => useQuery({ ...searchPlacesQueryOptions(q ?? ''), enabled: q !== null });
