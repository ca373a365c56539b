// A local stand-in for a geocoding service (development and tests): answers GET /search?q= the way
// a Nominatim server does (JSON list with lat, lon as text, display_name, address parts), from the
// invented gazetteer in data/demo/places.json. A place matches when every word typed appears in its
// name or address; an exact name comes first. It listens on 127.0.0.1 only and counts requests.
import { createServer, type Server } from 'node:http';
import gazetteer from '../../../data/demo/places.json';

export type FakeGeocoder = { url: string; port: number; requests: () => number; close: () => Promise<void> };

type Entry = (typeof gazetteer.places)[number];

const words = (text: string) => text.toLowerCase().normalize('NFKD').replace(/[\u0300-\u036f]/g, '').match(/[a-z0-9]+/g) ?? [];

const displayName = (p: Entry) => {
  const a: Partial<Record<string, string>> = p.address;
  const street = a.road ? [a.house_number, a.road].filter(Boolean).join(' ') : null;
  const around = [street, a.hamlet ?? a.village ?? a.town, a.county].filter((x): x is string => Boolean(x) && x !== p.name);
  return [p.name, ...around].join(', ');
};

/** Nominatim-shaped matches for the typed text, best first, at most `limit`. */
function searchGazetteer(q: string, limit: number) {
  const wanted = words(q);
  if (wanted.length === 0) return [];
  return gazetteer.places
    .map((p) => ({ p, text: new Set(words(displayName(p))), exact: words(p.name).join(' ') === wanted.join(' ') }))
    .filter(({ text }) => wanted.every((w) => text.has(w)))
    .sort((a, b) => Number(b.exact) - Number(a.exact))
    .slice(0, limit)
    .map(({ p }, i) => ({
      place_id: i + 1,
      lat: String(p.lat),
      lon: String(p.lon),
      display_name: displayName(p),
      type: p.kind,
      address: p.address,
    }));
}

/** Starts the fake on 127.0.0.1 (`port` 0 picks a free port); resolves once it listens. */
export async function startFakeGeocoder(port = 0): Promise<FakeGeocoder> {
  let requests = 0;
  const server: Server = createServer((req, res) => {
    requests += 1;
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    if (req.method !== 'GET' || url.pathname !== '/search') {
      res.writeHead(404, { 'content-type': 'application/json' }).end(JSON.stringify({ error: 'Only /search is offered here.' }));
      return;
    }
    const limit = Math.min(Math.max(Number(url.searchParams.get('limit')) || 10, 1), 50);
    res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(searchGazetteer(url.searchParams.get('q') ?? '', limit)));
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const actual = (server.address() as { port: number }).port;
  return {
    url: `http://127.0.0.1:${actual}`,
    port: actual,
    requests: () => requests,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
