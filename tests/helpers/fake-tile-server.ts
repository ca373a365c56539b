// A local stand-in for web tile services in browser tests: any GET /<base>/<z>/<x>/<y>.png answers
// a small solid PNG in the base's own colour, and every request is counted, so a test sees which
// base the map drew and where, without reaching the internet.
import { createServer } from 'node:http';
import { PNG } from 'pngjs';

export type TileRequest = { base: string; z: number; x: number; y: number };

const COLOURS: Record<string, [number, number, number]> = { streets: [214, 226, 205], topo: [232, 220, 190], imagery: [120, 140, 100] };

function solidPng([r, g, b]: [number, number, number]): Buffer {
  const png = new PNG({ width: 256, height: 256 });
  for (let i = 0; i < png.data.length; i += 4) png.data.set([r, g, b, 255], i);
  return PNG.sync.write(png);
}

export async function startFakeTileServer() {
  const requests: TileRequest[] = [];
  const pngs = new Map<string, Buffer>();
  const server = createServer((req, res) => {
    const m = /^\/([a-z]+)\/(\d+)\/(\d+)\/(\d+)\.png$/.exec(req.url ?? '');
    if (!m) {
      res.writeHead(404).end();
      return;
    }
    const [, base, z, x, y] = m;
    requests.push({ base, z: Number(z), x: Number(x), y: Number(y) });
    if (!pngs.has(base)) pngs.set(base, solidPng(COLOURS[base] ?? [200, 200, 200]));
    res.writeHead(200, { 'content-type': 'image/png', 'cache-control': 'no-store' }).end(pngs.get(base));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const url = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
  return {
    url,
    /** The Leaflet URL template for one named base. */
    template: (base: string) => `${url}/${base}/{z}/{x}/{y}.png`,
    requests,
    count: (base: string) => requests.filter((r) => r.base === base).length,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** The tile at zoom z holding a point (the usual Web Mercator tile numbering of OpenStreetMap's tile services). */
export function tileOf(lng: number, lat: number, z: number): { x: number; y: number } {
  const n = 2 ** z;
  const phi = (lat * Math.PI) / 180;
  return { x: Math.floor(((lng + 180) / 360) * n), y: Math.floor(((1 - Math.log(Math.tan(phi) + 1 / Math.cos(phi)) / Math.PI) / 2) * n) };
}
