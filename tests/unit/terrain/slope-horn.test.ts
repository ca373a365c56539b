import { describe, expect, it } from 'vitest';
import { slopeHorn } from '../../../server/services/terrain/slope-horn';
import { hillshade } from '../../../server/services/terrain/hillshade';
import { demFromFunction, demFromRows } from './helpers';

describe('Horn slope', () => {
  it('gives the exact slope of the plane z = 100 + 0.05x + 0.02y on every interior cell', () => {
    const dem = demFromFunction(12, 9, 5, (x, y) => 100 + 0.05 * x + 0.02 * y);
    const s = slopeHorn(dem);
    for (let r = 1; r < 8; r++) {
      for (let c = 1; c < 11; c++) {
        // Horn 1981 on a plane: 100·√(0.05² + 0.02²) = 5.3852 %
        expect(s[r * 12 + c]).toBeCloseTo(5.3852, 3);
      }
    }
  });

  it('leaves the 1-cell border as nodata, as gdaldem does without -compute_edges', () => {
    const s = slopeHorn(demFromFunction(5, 4, 1, (x) => x));
    for (const i of [0, 1, 4, 5, 9, 15, 19]) expect(Number.isNaN(s[i])).toBe(true);
    expect(s[6]).toBeCloseTo(100, 4);
  });

  it('computes the border of a plane exactly with computeEdges, except the corners (as gdaldem)', () => {
    const s = slopeHorn(demFromFunction(6, 5, 2, (x, y) => 0.03 * x - 0.04 * y), { computeEdges: true });
    // √(3² + 4²) = 5 %, exact on a plane (Horn 1981 on a linear window). gdaldem -compute_edges
    // repeats the centre column at the four corners, so they are not exact (checked against
    // Debian gdaldem 3.6 in gdaldem-compare.test.ts).
    const corners = new Set([0, 5, 24, 29]);
    for (let i = 0; i < s.length; i++) if (!corners.has(i)) expect(s[i]).toBeCloseTo(5, 4);
    for (const i of corners) expect(Number.isFinite(s[i])).toBe(true);
  });

  it('gives the cone slope away from its apex: z = 50 − 0.2·r → 20 %', () => {
    // A right circular cone has slope tan = 0.2 everywhere but the apex; Horn's 3x3 estimate is
    // exact for a locally planar surface, so cells 8+ cells from the apex are within 0.2 %
    // (the 3x3 window's curvature error falls with distance; our bound, no single source).
    const dem = demFromFunction(41, 41, 1, (x, y) => 50 - 0.2 * Math.hypot(x - 20.5, y - 20.5));
    const s = slopeHorn(dem);
    let checked = 0;
    for (let r = 1; r < 40; r++) {
      for (let c = 1; c < 40; c++) {
        const d = Math.hypot(c + 0.5 - 20.5, 40 - r + 0.5 - 20.5);
        if (d < 8) continue;
        expect(Math.abs(s[r * 41 + c] - 20)).toBeLessThan(0.2);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(1000);
  });

  it('makes every cell touching nodata nodata', () => {
    const dem = demFromRows([
      [1, 2, 3, 4, 5],
      [1, 2, 3, 4, 5],
      [1, 2, NaN, 4, 5],
      [1, 2, 3, 4, 5],
      [1, 2, 3, 4, 5],
    ]);
    const s = slopeHorn(dem);
    for (const i of [6, 7, 8, 11, 12, 13, 16, 17, 18]) expect(Number.isNaN(s[i])).toBe(true);
  });
});

describe('hillshade', () => {
  it('shades a flat surface at 1 + 254·sin(45°) = 181 and the border as 0 (gdaldem default)', () => {
    const h = hillshade(demFromFunction(4, 4, 1, () => 10));
    expect(h[5]).toBe(181);
    expect(h[0]).toBe(0);
  });

  it('lights a slope facing the north-west sun brighter than one facing away', () => {
    const towardSun = hillshade(demFromFunction(3, 3, 1, (x, y) => 0.3 * (x - y)))[4]; // falls toward the NW
    const away = hillshade(demFromFunction(3, 3, 1, (x, y) => 0.3 * (y - x)))[4];
    expect(towardSun).toBeGreaterThan(181);
    expect(away).toBeLessThan(181);
  });
});
