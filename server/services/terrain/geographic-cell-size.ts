// Metric size of a geographic (lat/lon) grid cell on the WGS84 ellipsoid.
// Meridional radius M(φ) = a(1−e²)/(1−e² sin²φ)^{3/2} and prime-vertical radius
// N(φ) = a/(1−e² sin²φ)^{1/2} (any geodesy text, e.g. Torge & Müller, Geodesy §6.2).

const WGS84_A_M = 6378137;
const WGS84_F = 1 / 298.257223563;
const E2 = WGS84_F * (2 - WGS84_F);
const DEG = Math.PI / 180;

/** East-west and north-south size in metres of a cell Δλ × Δφ degrees centred at latitude φ. */
export function geographicCellSizeM(latDeg: number, dLonDeg: number, dLatDeg: number): { xM: number; yM: number } {
  const s = Math.sin(latDeg * DEG);
  const w = 1 - E2 * s * s;
  // M(φ) = a(1−e²)/w^{3/2}; N(φ) = a/w^{1/2}
  const mRadius = (WGS84_A_M * (1 - E2)) / (w * Math.sqrt(w));
  const nRadius = WGS84_A_M / Math.sqrt(w);
  // Arc lengths: north-south M·Δφ, east-west N·cos φ·Δλ
  return { xM: nRadius * Math.cos(latDeg * DEG) * dLonDeg * DEG, yM: mRadius * dLatDeg * DEG };
}
