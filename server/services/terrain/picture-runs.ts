// The source cells of a map picture's rows (picture-frame.ts places the picture), as runs of
// pixels that take consecutive cells, so that painting reads cells in order. Inside one lattice
// step the bilinear position is linear in the pixel's column: the step is cut where the source
// row changes (a picture row crosses few cell rows) and where the column stops moving one cell
// per pixel (pixels and cells are nearly the same size, so that is seldom). Where a position is
// within NEAR_EDGE of a cell edge the full bilinear formula decides, so every pixel gets the
// cell that formula gives. A frame's runs are worked out once and kept with it: about 8 bytes
// per run, a run every ~30 pixels for a UTM grid drawn in Web Mercator.
import { STEP, type PictureFrame } from './picture-frame';

/** A source position this close to a cell edge is worked out in full rather than along the row. */
const NEAR_EDGE = 1e-7;

export type FrameRuns = NonNullable<PictureFrame['runs']>;

/**
 * Every row's runs: row py's are numbers rowStart[py] .. rowStart[py + 1] − 1, run q covering
 * len[q] pixels from where the last one ended, which take cells src[q] .. src[q] + len[q] − 1
 * (src −1: outside the grid, transparent).
 */
export function frameRuns(frame: PictureFrame): FrameRuns {
  if (frame.runs) return frame.runs;
  const { width: w, height: h } = frame.grid;
  const row = new RowRuns(w);
  const rowStart = new Int32Array(h + 1);
  let len = new Int32Array(8 * h), src = new Int32Array(8 * h), n = 0;
  for (let py = 0; py < h; py++) {
    sourceRuns(frame, py, row);
    if (n + row.count > len.length) {
      const size = 2 * (n + row.count);
      const moreLen = new Int32Array(size), moreSrc = new Int32Array(size);
      moreLen.set(len.subarray(0, n));
      moreSrc.set(src.subarray(0, n));
      len = moreLen;
      src = moreSrc;
    }
    len.set(row.len.subarray(0, row.count), n);
    src.set(row.src.subarray(0, row.count), n);
    n += row.count;
    rowStart[py + 1] = n;
  }
  frame.runs = { rowStart, len: len.slice(0, n), src: src.slice(0, n) };
  return frame.runs;
}

/**
 * A picture row as runs of pixels that take consecutive cells: run q covers pixels
 * px[q] .. px[q] + len[q] − 1, which take cells src[q] .. src[q] + len[q] − 1 (src −1: outside the
 * grid, transparent). The runs cover the row in order.
 */
class RowRuns {
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
function sourceRuns(frame: PictureFrame, py: number, runs: RowRuns): void {
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
