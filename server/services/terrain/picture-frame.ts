// Where each pixel of a map picture takes its value from. The picture has the grid's size and is
// aligned with Web Mercator (EPSG:3857), the frame Leaflet draws in, so the overlay lines up
// with the map even though the DEM's grid is rotated against it. Each pixel takes the cell under
// its centre (nearest cell); that cell's position is interpolated bilinearly from a coarse
// lattice of exact proj4 transforms, every 32 pixels.
// The lattice depends on the grid only, so the last one is kept for the next layer of the run.
import { converterBetween } from './reproject';
import type { GridFrame } from './rasterise-polygon';

export type BoundsWgs84 = { west: number; south: number; east: number; north: number };

export type PictureFrame = {
  grid: GridFrame;
  /** The picture's corners in WGS84. */
  bounds: BoundsWgs84;
  /** Source (col, row) positions of lattice pixels (k·32, j·32), lw per lattice row; null when not warped. */
  lattice: { col: Float64Array; row: Float64Array; lw: number; lh: number } | null;
};

export type PictureFrameResult = { ok: true; frame: PictureFrame } | { ok: false; reason: string };

const STEP = 32;
/** A source position this close to a cell edge is worked out in full rather than along the row. */
const NEAR_EDGE = 1e-7;
let last: { key: string; frame: PictureFrame } | null = null;

/** The picture frame of a grid; { ok: false } when its CRS is unknown. */
export function pictureFrame(grid: GridFrame & { epsg: number }, noWarp = false): PictureFrameResult {
  const { width: w, height: h } = grid;
  const key = [grid.epsg, w, h, grid.originX, grid.originY, grid.cellSizeX, grid.cellSizeY, noWarp].join(' ');
  if (last?.key === key) return { ok: true, frame: last.frame };
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
  const frame: PictureFrame = { grid, bounds: { west: swWgs[0], south: swWgs[1], east: neWgs[0], north: neWgs[1] }, lattice };
  last = { key, frame };
  return { ok: true, frame };
}

/**
 * The source cell (row-major index) of every pixel of picture row py, -1 where the pixel falls
 * outside the grid. Inside one lattice step the bilinear position is linear in the pixel's
 * column, so it is stepped along the row; where that lands within NEAR_EDGE of a cell edge the
 * full bilinear formula decides, so every pixel gets the cell the full formula gives.
 */
export function sourceRow(frame: PictureFrame, py: number, out: Int32Array): void {
  const { width: w, height: h } = frame.grid;
  const lat = frame.lattice;
  if (!lat) {
    for (let px = 0, i = py * w; px < w; px++) out[px] = i++;
    return;
  }
  const { col: C, row: R, lw, lh } = lat;
  const fj = (py + 0.5) / STEP, j = Math.min(lh - 2, Math.floor(fj)), tj = fj - j, sj = 1 - tj;
  for (let k = 0; k * STEP < w; k++) {
    const a = j * lw + k, b = a + lw;
    // Position at the step's left lattice column, and its change per unit of tk.
    const c0 = sj * C[a] + tj * C[b], dc = sj * (C[a + 1] - C[a]) + tj * (C[b + 1] - C[b]);
    const r0 = sj * R[a] + tj * R[b], dr = sj * (R[a + 1] - R[a]) + tj * (R[b + 1] - R[b]);
    const px0 = k * STEP, end = Math.min(w, px0 + STEP);
    // Along the row from the step's first pixel centre, tk = 0.5 / STEP, by 1 / STEP per pixel.
    const stepC = dc / STEP, stepR = dr / STEP;
    let c = c0 + (0.5 / STEP) * dc, r = r0 + (0.5 / STEP) * dr;
    for (let px = px0; px < end; px++, c += stepC, r += stepR) {
      let cc = c, rr = r;
      let ci = Math.floor(cc), ri = Math.floor(rr);
      if (!(cc - ci >= NEAR_EDGE && cc - ci <= 1 - NEAR_EDGE && rr - ri >= NEAR_EDGE && rr - ri <= 1 - NEAR_EDGE)) {
        const tk = (px + 0.5) / STEP - k, sk = 1 - tk;
        cc = sj * (sk * C[a] + tk * C[a + 1]) + tj * (sk * C[b] + tk * C[b + 1]);
        rr = sj * (sk * R[a] + tk * R[a + 1]) + tj * (sk * R[b] + tk * R[b + 1]);
        ci = Math.floor(cc);
        ri = Math.floor(rr);
      }
      out[px] = ci >= 0 && ri >= 0 && ci < w && ri < h ? ri * w + ci : -1;
    }
  }
}
