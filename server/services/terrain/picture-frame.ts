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
 * A picture row as runs of pixels that take consecutive cells: run q covers pixels
 * px[q] .. px[q] + len[q] − 1, which take cells src[q] .. src[q] + len[q] − 1 (src −1: outside the
 * grid, transparent). The runs cover the row in order.
 */
export class RowRuns {
  readonly px: Int32Array;
  readonly len: Int32Array;
  readonly src: Int32Array;
  count = 0;

  constructor(width: number) {
    this.px = new Int32Array(width);
    this.len = new Int32Array(width);
    this.src = new Int32Array(width);
  }

  /** Adds pixels px .. px + len − 1 taking cells from src on, joined to the last run where it goes on. */
  add(px: number, len: number, src: number): void {
    if (len <= 0) return;
    const q = this.count - 1;
    if (q >= 0 && this.px[q] + this.len[q] === px && (src < 0 ? this.src[q] < 0 : this.src[q] >= 0 && this.src[q] + this.len[q] === src)) {
      this.len[q] += len;
      return;
    }
    this.px[q + 1] = px;
    this.len[q + 1] = len;
    this.src[q + 1] = src < 0 ? -1 : src;
    this.count = q + 2;
  }
}

/** Pieces of a line x(m) = x0 + m·dx over m in [from, to): (from, to, floor of x) triples, NaN in windows within NEAR_EDGE of a whole number. */
const rowPieces = new Float64Array(3 * (2 * STEP + 3));
const colPieces = new Float64Array(3 * (2 * STEP + 3));

/**
 * Splits m in [from, to) into pieces where floor(x0 + m·dx) is one whole number, with windows
 * (floor NaN) where x is within NEAR_EDGE of a whole number, into out; returns the count of
 * pieces, or −1 when x crosses more than maxCrossings whole numbers or is not a number.
 */
function splitAtWholeNumbers(x0: number, dx: number, from: number, to: number, maxCrossings: number, out: Float64Array): number {
  const xa = x0 + from * dx, xb = x0 + (to - 1) * dx;
  const lo = Math.floor(Math.min(xa, xb) - NEAR_EDGE), hi = Math.floor(Math.max(xa, xb) + NEAR_EDGE);
  if (lo === hi) {
    out[0] = from; out[1] = to; out[2] = lo;
    return 1;
  }
  if (!(hi - lo <= maxCrossings) || dx === 0) return -1;
  const rising = dx > 0;
  const near = NEAR_EDGE / Math.abs(dx);
  let count = 0, m = from;
  for (let q = 1; q <= hi - lo; q++) {
    const line = rising ? lo + q : hi + 1 - q;
    const at = (line - x0) / dx; // where x reaches the line
    const first = Math.max(m, Math.min(to, Math.ceil(at - near)));
    const after = Math.max(first, Math.min(to, Math.floor(at + near) + 1));
    count = piece(out, count, m, first, rising ? line - 1 : line);
    count = piece(out, count, first, after, NaN);
    m = after;
  }
  return piece(out, count, m, to, rising ? hi : lo);
}

/** Writes piece (a, b, v) as number `count` when not empty; returns the new count. */
function piece(out: Float64Array, count: number, a: number, b: number, v: number): number {
  if (a >= b) return count;
  out[3 * count] = a;
  out[3 * count + 1] = b;
  out[3 * count + 2] = v;
  return count + 1;
}

/**
 * The runs of picture row py. Inside one lattice step the bilinear position is linear in the
 * pixel's column: the step is cut where the source row changes (a picture row crosses few cell
 * rows), and each piece where the source column stops moving one cell per pixel (pixels and
 * cells are nearly the same size, so that is seldom). Where a position is within NEAR_EDGE of a
 * cell edge the full bilinear formula decides, so every pixel gets the cell that formula gives.
 */
export function sourceRuns(frame: PictureFrame, py: number, runs: RowRuns): void {
  const { width: w, height: h } = frame.grid;
  const lat = frame.lattice;
  runs.count = 0;
  if (!lat) {
    runs.add(0, w, py * w);
    return;
  }
  const { col: C, row: R, lw, lh } = lat;
  const fj = (py + 0.5) / STEP, j = Math.min(lh - 2, Math.floor(fj)), tj = fj - j, sj = 1 - tj;
  for (let k = 0; k * STEP < w; k++) {
    const a = j * lw + k, b = a + lw;
    const px0 = k * STEP, n = Math.min(w, px0 + STEP) - px0;
    // Position at the step's first pixel centre (tk = 0.5 / STEP), and its change per pixel.
    const dc = sj * (C[a + 1] - C[a]) + tj * (C[b + 1] - C[b]), dr = sj * (R[a + 1] - R[a]) + tj * (R[b + 1] - R[b]);
    const c = sj * C[a] + tj * C[b] + (0.5 / STEP) * dc, r = sj * R[a] + tj * R[b] + (0.5 / STEP) * dr;
    const stepC = dc / STEP, stepR = dr / STEP;
    const rowCount = splitAtWholeNumbers(r, stepR, 0, n, STEP, rowPieces);
    if (rowCount < 0) {
      // NaN positions (outside the projection), or a grid turned by more than 45°
      exactPixels(runs, px0, 0, n, w, h, C, R, a, b, sj, tj, k);
      continue;
    }
    for (let p = 0; p < rowCount; p++) {
      const from = rowPieces[3 * p], to = rowPieces[3 * p + 1], ri = rowPieces[3 * p + 2];
      if (ri !== ri) {
        exactPixels(runs, px0, from, to, w, h, C, R, a, b, sj, tj, k);
        continue;
      }
      if (!(ri >= 0 && ri < h)) {
        runs.add(px0 + from, to - from, -1);
        continue;
      }
      // Column = m + floor(c + m·(stepC − 1)): pieces where the second term is one number are runs.
      const colCount = splitAtWholeNumbers(c, stepC - 1, from, to, 8, colPieces);
      if (colCount < 0) {
        exactPixels(runs, px0, from, to, w, h, C, R, a, b, sj, tj, k);
        continue;
      }
      for (let q = 0; q < colCount; q++) {
        const m0 = colPieces[3 * q], m1 = colPieces[3 * q + 1], shift = colPieces[3 * q + 2];
        if (shift !== shift) {
          exactPixels(runs, px0, m0, m1, w, h, C, R, a, b, sj, tj, k);
          continue;
        }
        // Cells m + shift for m in [m0, m1), inside the grid for m in [mIn, mOut).
        const mIn = Math.min(m1, Math.max(m0, -shift)), mOut = Math.max(mIn, Math.min(m1, w - shift));
        runs.add(px0 + m0, mIn - m0, -1);
        runs.add(px0 + mIn, mOut - mIn, ri * w + mIn + shift);
        runs.add(px0 + mOut, m1 - mOut, -1);
      }
    }
  }
}

/** Pixels px0 + m for m in [from, to), each by the full formula. */
function exactPixels(runs: RowRuns, px0: number, from: number, to: number, w: number, h: number, C: Float64Array, R: Float64Array, a: number, b: number, sj: number, tj: number, k: number): void {
  for (let m = from; m < to; m++) runs.add(px0 + m, 1, exactSource(px0 + m, w, h, C, R, a, b, sj, tj, k));
}

/** The source cell of pixel px by the full bilinear formula, in lattice cell (a, b) of step k. */
function exactSource(px: number, w: number, h: number, C: Float64Array, R: Float64Array, a: number, b: number, sj: number, tj: number, k: number): number {
  const tk = (px + 0.5) / STEP - k, sk = 1 - tk;
  const c = sj * (sk * C[a] + tk * C[a + 1]) + tj * (sk * C[b] + tk * C[b + 1]);
  const r = sj * (sk * R[a] + tk * R[a + 1]) + tj * (sk * R[b] + tk * R[b + 1]);
  const ci = Math.floor(c), ri = Math.floor(r);
  return ci >= 0 && ri >= 0 && ci < w && ri < h ? ri * w + ci : -1;
}
