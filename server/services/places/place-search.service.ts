// Place search by name or address through a Nominatim-style geocoding service, with node-geocoder's
// OpenStreetMap provider (its `osmServer` is GEOCODER_URL, or npm start's local fake). Expected
// failures are values: the service could not be reached, or answered with something unreadable.
import NodeGeocoder from 'node-geocoder';
import type { Place } from '../../../shared/schemas/places';

export type PlaceSearchOutcome = { ok: true; places: Place[] } | { ok: false; reason: 'off' | 'unreachable' | 'failed'; detail: string };

export type PlaceSearch = { search: (q: string) => Promise<PlaceSearchOutcome> };

/** How many matches a search offers. */
const PLACE_RESULTS_MAX = 6;
/** A service slower than this counts as out of reach. */
const TIMEOUT_MS = 8_000;
/** node-geocoder's fetch adapter keeps our error's code: it tells "not reached" from "bad answer". */
const UNREACHABLE = 'FIELDSHED_GEOCODER_UNREACHABLE';

type Fetch = typeof globalThis.fetch;

/**
 * The fetch node-geocoder calls: Node's own, with a user agent naming the installation (public
 * Nominatim servers require one), a timeout, and a tagged error when the service is not reached.
 */
function fetchFor(userAgent: string): Fetch {
  return async (url, init) => {
    const headers = { ...(init?.headers as Record<string, string>), 'user-agent': userAgent };
    try {
      const res = await fetch(url, { method: 'GET', headers, signal: AbortSignal.timeout(TIMEOUT_MS) });
      if (!res.ok) throw Object.assign(new Error(`the geocoding service answered ${res.status}`), { code: `HTTP_${res.status}` });
      return res;
    } catch (e) {
      if (e instanceof Error && 'code' in e && String(e.code).startsWith('HTTP_')) throw e;
      throw Object.assign(new Error(e instanceof Error ? e.message : String(e)), { code: UNREACHABLE });
    }
  };
}

/** "Marrowby, Sedge County" → name "Marrowby", detail "Sedge County". */
function toPlace(entry: NodeGeocoder.Entry): Place | null {
  const { latitude, longitude } = entry;
  if (typeof latitude !== 'number' || typeof longitude !== 'number' || !Number.isFinite(latitude) || !Number.isFinite(longitude)) return null;
  const [name, ...rest] = (entry.formattedAddress ?? '').split(',').map((s) => s.trim());
  return { name: name || `${latitude}, ${longitude}`, detail: rest.join(', '), position: [longitude, latitude] };
}

/** A place search on the service at `url`; null → place search is off (only typed coordinates work). */
export function placeSearchFor(url: string | null, userAgent: string): PlaceSearch {
  if (!url) return { search: async () => ({ ok: false, reason: 'off', detail: 'no geocoding service is configured' }) };
  const geocoder = NodeGeocoder({ provider: 'openstreetmap', osmServer: url.replace(/\/+$/, ''), fetch: fetchFor(userAgent) as never });
  return {
    search: async (q) => {
      try {
        const entries = await geocoder.geocode({ q, limit: PLACE_RESULTS_MAX } as never);
        return { ok: true, places: entries.map(toPlace).filter((p): p is Place => p !== null).slice(0, PLACE_RESULTS_MAX) };
      } catch (e) {
        const code = (e as { code?: unknown }).code;
        return { ok: false, reason: code === UNREACHABLE ? 'unreachable' : 'failed', detail: e instanceof Error ? e.message : String(e) };
      }
    },
  };
}
