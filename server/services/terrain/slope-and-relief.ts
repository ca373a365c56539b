// Slope codes and shaded relief in one pass over the DEM: both come from Horn's (1981) 3×3
// gradients, so each cell's gradient is worked out once. The values are exactly those of
// slopeHornRow → encodeSlopePct (slope-horn.ts, slope-pct-grid.ts) and of hillshade() with its
// defaults (hillshade.ts): the same expressions in the same order (the relief's north gradient
// is minus the slope's south one, which IEEE arithmetic negates exactly). Edges as gdaldem
// without -compute_edges: the 1-cell border and cells next to nodata are nodata.
// Taken before the fill, the DEM's own grid can then be filled in place (pipeline-in-place.ts).
import { SLOPE_CODE_NODATA, encodeSlopePct } from './slope-pct-grid';
import type { DemGrid } from './types';

// gdaldem hillshade's defaults, as hillshade.ts: sun azimuth 315°, altitude 45°, z factor 1.
const AZIMUTH = (315 * Math.PI) / 180;
const ALTITUDE = (45 * Math.PI) / 180;
const SIN_ALT = Math.sin(ALTITUDE);
const SUN_E = Math.sin(AZIMUTH) * Math.cos(ALTITUDE);
const SUN_N = Math.cos(AZIMUTH) * Math.cos(ALTITUDE);

/** Fills `codes` (slope, 2-byte codes) and `shade` (relief 0..255, 0 = nodata), either or both. */
export function slopeCodesAndRelief(dem: DemGrid, codes: Uint16Array | null, shade: Uint8Array | null): void {
  const { width: w, height: h, elevationM: z } = dem;
  if (codes && codes.length !== w * h) throw new Error(`codes has ${codes.length} cells, expected ${w * h}`);
  if (shade && shade.length !== w * h) throw new Error(`shade has ${shade.length} cells, expected ${w * h}`);
  codes?.fill(SLOPE_CODE_NODATA);
  shade?.fill(0);
  for (let r = 1; r < h - 1; r++) {
    // Horn 1981: dz/dx = ((z2 + 2z5 + z8) − (z0 + 2z3 + z6)) / (8·dx); dz/dy likewise by rows
    const kx = 1 / (8 * dem.rowCellSizeXM[r]);
    const ky = 1 / (8 * dem.rowCellSizeYM[r]);
    for (let i = r * w + 1, end = r * w + w - 1; i < end; i++) {
      const centre = z[i];
      if (centre !== centre) continue;
      const n = i - w, s = i + w;
      const z0 = z[n - 1], z1 = z[n], z2 = z[n + 1];
      const z3 = z[i - 1], z5 = z[i + 1];
      const z6 = z[s - 1], z7 = z[s], z8 = z[s + 1];
      const dx = (z2 + 2 * z5 + z8 - (z0 + 2 * z3 + z6)) * kx;
      const dy = (z6 + 2 * z7 + z8 - (z0 + 2 * z1 + z2)) * ky;
      // slopeHornRow keeps slope in a Float32 grid: round as it does
      if (codes !== null) codes[i] = encodeSlopePct(Math.fround(100 * Math.sqrt(dx * dx + dy * dy)));
      if (shade === null) continue;
      // Lambert, as hillshade.ts with p = dx, q = −dy: (sin h − p·sinA·cos h − q·cosA·cos h) / √(1 + p² + q²)
      const cang = (SIN_ALT - dx * SUN_E + dy * SUN_N) / Math.sqrt(1 + dx * dx + dy * dy);
      if (cang !== cang) continue;
      shade[i] = cang <= 0 ? 1 : Math.round(1 + 254 * cang);
    }
  }
}
