// Where each pixel of a map picture takes its value from. The picture has the grid's size and is
// aligned with Web Mercator (EPSG:3857), the frame Leaflet draws in, so the overlay lines up
// with the map even though the DEM's grid is rotated against it. Each pixel takes the cell under
// its centre (nearest cell); that cell's position is interpolated bilinearly from a coarse
// lattice of exact proj4 transforms, every 32 pixels.
// The frame depends on the grid only: it is kept, with the rows' source cells once worked out
// (picture-runs.ts), for as long as the caller keeps the same grid object (a run's layers).
import { converterBetween } from './reproject';
import type { GridFrame } from './rasterise-polygon';

export type BoundsWgs84 = { west: number; south: number; east: number; north: number };

export type PictureFrame = {
  grid: GridFrame;
  /** The picture's corners in WGS84. */
  bounds: BoundsWgs84;
  /** Source (col, row) positions of lattice pixels (k·32, j·32), lw per lattice row; null when not warped. */
  lattice: { col: Float64Array; row: Float64Array; lw: number; lh: number } | null;
  /** Every row's runs of source cells, once worked out (picture-runs.ts). */
  runs: { rowStart: Int32Array; len: Int32Array; src: Int32Array } | null;
};

export type PictureFrameResult = { ok: true; frame: PictureFrame } | { ok: false; reason: string };

/** Lattice spacing, pixels. */
export const STEP = 32;
const kept = new WeakMap<object, Map<string, PictureFrame>>();

/** The picture frame of a grid; { ok: false } when its CRS is unknown. */
export function pictureFrame(grid: GridFrame & { epsg: number }, noWarp = false): PictureFrameResult {
  const { width: w, height: h } = grid;
  const key = [grid.epsg, w, h, grid.originX, grid.originY, grid.cellSizeX, grid.cellSizeY, noWarp].join(' ');
  const hit = kept.get(grid)?.get(key);
  if (hit) return { ok: true, frame: hit };
  const toWgs = converterBetween(grid.epsg, 4326);
  if (!toWgs.ok) return toWgs;
  const toMerc = converterBetween(grid.epsg, 3857);
  if (!toMerc.ok) return toMerc;
  const x0 = grid.originX, y0 = grid.originY, x1 = x0 + w * grid.cellSizeX, y1 = y0 - h * grid.cellSizeY;
  // Envelope of the grid's edge in Web Mercator (sampled along the edges, not just corners).
  let mx0 = Infinity, my0 = Infinity, mx1 = -Infinity, my1 = -Infinity;
  const steps = 16;
  for (let k = 0; k <= steps; k++) {
    const t = k / steps;
    for (const p of [[x0 + t * (x1 - x0), y0], [x0 + t * (x1 - x0), y1], [x0, y0 + t * (y1 - y0)], [x1, y0 + t * (y1 - y0)]] as Array<[number, number]>) {
      const [mx, my] = noWarp ? p : toMerc.converter.forward(p);
      mx0 = Math.min(mx0, mx); my0 = Math.min(my0, my); mx1 = Math.max(mx1, mx); my1 = Math.max(my1, my);
    }
  }
  let lattice: PictureFrame['lattice'] = null;
  if (!noWarp) {
    const lw = Math.ceil(w / STEP) + 1, lh = Math.ceil(h / STEP) + 1;
    const col = new Float64Array(lw * lh), row = new Float64Array(lw * lh);
    for (let j = 0; j < lh; j++) {
      for (let k = 0; k < lw; k++) {
        const mx = mx0 + ((k * STEP) / w) * (mx1 - mx0);
        const my = my1 - ((j * STEP) / h) * (my1 - my0);
        const [sx, sy] = toMerc.converter.inverse([mx, my]);
        col[j * lw + k] = (sx - x0) / grid.cellSizeX;
        row[j * lw + k] = (y0 - sy) / grid.cellSizeY;
      }
    }
    lattice = { col, row, lw, lh };
  }
  const sw = noWarp ? toWgs.converter.forward([mx0, my0]) : toMerc.converter.inverse([mx0, my0]);
  const ne = noWarp ? toWgs.converter.forward([mx1, my1]) : toMerc.converter.inverse([mx1, my1]);
  const swWgs = noWarp ? sw : toWgs.converter.forward(sw);
  const neWgs = noWarp ? ne : toWgs.converter.forward(ne);
  const frame: PictureFrame = { grid: { ...grid }, bounds: { west: swWgs[0], south: swWgs[1], east: neWgs[0], north: neWgs[1] }, lattice, runs: null };
  if (!kept.has(grid)) kept.set(grid, new Map());
  kept.get(grid)!.set(key, frame);
  return { ok: true, frame };
}
