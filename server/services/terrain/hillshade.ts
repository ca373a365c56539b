// Hillshade 0..255 from Horn (1981) gradients, with gdaldem hillshade's defaults (sun azimuth
// 315°, altitude 45°, z factor 1) and output convention: 0 = nodata (border and cells next to
// nodata), otherwise 1 + 254·cos(incidence), 1 where the cell faces away from the sun.
import type { DemGrid } from './types';

export type HillshadeOptions = { azimuthDeg?: number; altitudeDeg?: number; zFactor?: number };

/** Shaded relief, one byte per cell. */
export function hillshade(dem: DemGrid, options: HillshadeOptions = {}): Uint8Array {
  const { azimuthDeg = 315, altitudeDeg = 45, zFactor = 1 } = options;
  const { width: w, height: h, elevationM: z } = dem;
  const out = new Uint8Array(w * h);
  const az = (azimuthDeg * Math.PI) / 180;
  const alt = (altitudeDeg * Math.PI) / 180;
  const sinAlt = Math.sin(alt);
  // Sun vector components (east, north) scaled by cos(altitude)
  const sunE = Math.sin(az) * Math.cos(alt);
  const sunN = Math.cos(az) * Math.cos(alt);
  for (let r = 1; r < h - 1; r++) {
    // Horn 1981 gradients, east (p) and north (q), times the z factor
    const kx = zFactor / (8 * dem.rowCellSizeXM[r]);
    const ky = zFactor / (8 * dem.rowCellSizeYM[r]);
    const end = r * w + w - 1;
    for (let i = r * w + 1; i < end; i++) {
      if (z[i] !== z[i]) continue;
      const n = i - w, s = i + w;
      const p = (z[n + 1] + 2 * z[i + 1] + z[s + 1] - (z[n - 1] + 2 * z[i - 1] + z[s - 1])) * kx;
      const q = (z[n - 1] + 2 * z[n] + z[n + 1] - (z[s - 1] + 2 * z[s] + z[s + 1])) * ky;
      // Lambert: cos(incidence) = (sin h − p·sinA·cos h − q·cosA·cos h) / √(1 + p² + q²)
      const cang = (sinAlt - p * sunE - q * sunN) / Math.sqrt(1 + p * p + q * q);
      if (cang !== cang) continue;
      out[i] = cang <= 0 ? 1 : Math.round(1 + 254 * cang);
    }
  }
  return out;
}
