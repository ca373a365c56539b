// GET /api/places?q=: finding a place by name or address through the geocoding service.
import { z } from 'zod';

export const PLACE_QUERY_MAX_CHARS = 200;

export const PlaceSearchQuery = z.object({
  q: z
    .string({ error: 'type a place name or an address to look for' })
    .trim()
    .min(2, { error: 'type at least 2 letters of a place name or an address' })
    .max(PLACE_QUERY_MAX_CHARS, { error: `keep the search under ${PLACE_QUERY_MAX_CHARS} characters` }),
});
export type PlaceSearchQuery = z.infer<typeof PlaceSearchQuery>;

/** One match: its name, the rest of its address, and where it is as a GeoJSON position [lng, lat]. */
export type Place = { name: string; detail: string; position: [number, number] };

/** No match is an empty list, not an error. */
export type PlaceSearchResult = { places: Place[] };
