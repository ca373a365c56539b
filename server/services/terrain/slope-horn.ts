// Slope in percent by Horn's (1981) 3x3 method, computed the way GDAL's `gdaldem slope`
// does (Horn 1981, Proc. IEEE 69:14; GDAL gdaldem_lib.cpp), so the two agree cell by cell.
// Edges, as gdaldem by default: the 1-cell border and every cell with a nodata neighbour are
// nodata (NaN). With { computeEdges: true } they are computed from a filled window as
// `gdaldem -compute_edges` does (see edge-window.ts).
// slopeHornRow does one row, so the pipeline can use each row's slope and keep none of it.
import { edgeWindow } from './edge-window';
import type { DemGrid } from './types';

export type SlopeOptions = { computeEdges?: boolean };

/** Slope % of every cell (NaN = nodata). Uses each row's metric cell sizes. */
export function slopeHorn(dem: DemGrid, options: SlopeOptions = {}): Float32Array {
  const { width: w, height: h } = dem;
  const out = new Float32Array(w * h);
  for (let r = 0; r < h; r++) slopeHornRow(dem, r, out.subarray(r * w, r * w + w), options);
  return out;
}

/** Slope % of row r into out[0..width-1] (NaN = nodata), the same values slopeHorn gives. */
export function slopeHornRow(dem: DemGrid, r: number, out: Float32Array, options: SlopeOptions = {}): void {
  const { width: w, height: h, elevationM: z } = dem;
  out.fill(NaN, 0, w);
  if (r >= 1 && r < h - 1) {
    // Horn 1981: dz/dx = ((z2 + 2z5 + z8) − (z0 + 2z3 + z6)) / (8·dx); dz/dy likewise by rows
    const kx = 1 / (8 * dem.rowCellSizeXM[r]);
    const ky = 1 / (8 * dem.rowCellSizeYM[r]);
    const base = r * w;
    for (let c = 1; c < w - 1; c++) {
      const i = base + c;
      const centre = z[i];
      if (centre !== centre) continue;
      const n = i - w, s = i + w;
      const z0 = z[n - 1], z1 = z[n], z2 = z[n + 1];
      const z3 = z[i - 1], z5 = z[i + 1];
      const z6 = z[s - 1], z7 = z[s], z8 = z[s + 1];
      const dx = (z2 + 2 * z5 + z8 - (z0 + 2 * z3 + z6)) * kx;
      const dy = (z6 + 2 * z7 + z8 - (z0 + 2 * z1 + z2)) * ky;
      // slope % = 100·√(dx² + dy²); NaN neighbours propagate to NaN (gdaldem: nodata)
      out[c] = 100 * Math.sqrt(dx * dx + dy * dy);
    }
  }
  if (options.computeEdges) computeEdgeCells(dem, r, out);
}

function computeEdgeCells(dem: DemGrid, r: number, out: Float32Array): void {
  const { width: w, height: h, elevationM: z } = dem;
  const win = new Float64Array(9);
  const rowBorder = r === 0 || r === h - 1;
  for (let c = 0; c < w; c++) {
    const i = r * w + c;
    const border = rowBorder || c === 0 || c === w - 1;
    if (!border && (out[c] === out[c] || z[i] !== z[i])) continue;
    if (!edgeWindow(z, w, h, r, c, win)) continue;
    // Horn 1981 on the filled window, as above
    const dx = (win[2] + 2 * win[5] + win[8] - (win[0] + 2 * win[3] + win[6])) / (8 * dem.rowCellSizeXM[r]);
    const dy = (win[6] + 2 * win[7] + win[8] - (win[0] + 2 * win[1] + win[2])) / (8 * dem.rowCellSizeYM[r]);
    out[c] = 100 * Math.sqrt(dx * dx + dy * dy);
  }
}
