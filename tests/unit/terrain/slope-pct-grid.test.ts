import { describe, expect, it } from 'vitest';
import { decodeSlopePct, encodeSlopePct, SLOPE_CODE_MAX_PCT, SLOPE_CODE_NODATA, slopeCodeAtLeast, SlopePctGrid } from '../../../server/services/terrain/slope-pct-grid';
import { DEFAULT_SLOPE_CLASSES } from '../../../server/services/terrain/slope-classes';
import { seededRandom } from './helpers';

// The 2-byte slope codes are our own storage format; the checks are against the Float32 slope
// they replace (no published source: exactness is the requirement).
const f32 = (x: number): number => Math.fround(x);
const nextUp = (x: number): number => { const a = new Float32Array([x]); const i = new Int32Array(a.buffer); i[0] += 1; return a[0]; };
const nextDown = (x: number): number => { const a = new Float32Array([x]); const i = new Int32Array(a.buffer); i[0] -= 1; return a[0]; };

describe('slope codes (2 bytes per cell)', () => {
  it('read every Float32 slope back within 0.005 % (rounded to 0.01 %)', () => {
    const rnd = seededRandom(7);
    for (let k = 0; k < 200_000; k++) {
      const s = f32(k < 100_000 ? rnd() * 40 : rnd() * SLOPE_CODE_MAX_PCT);
      const back = decodeSlopePct(encodeSlopePct(s));
      expect(Math.abs(back - s)).toBeLessThanOrEqual(0.005 + 1e-12);
      expect(back).toBe(Math.round(s * 100) / 100);
    }
    expect(decodeSlopePct(encodeSlopePct(0))).toBe(0);
    expect(decodeSlopePct(encodeSlopePct(f32(5.00001)))).toBe(5);
    expect(decodeSlopePct(encodeSlopePct(f32(4.99999)))).toBe(5);
  });

  it('give exactly the Float32 class of every slope for breaks on a 0.005 % grid', () => {
    const breaks = [...DEFAULT_SLOPE_CLASSES.map((c) => c.minPct), 0.5, 2.345, 10.5, 3.005, 99.995, 300];
    const rnd = seededRandom(11);
    for (const b of breaks) {
      const t = slopeCodeAtLeast(b);
      const near = [f32(b), nextUp(f32(b)), nextDown(f32(b)), nextUp(nextUp(f32(b))), nextDown(nextDown(f32(b)))];
      for (let k = 0; k < 2000; k++) near.push(f32(b + (rnd() - 0.5) * 0.02));
      for (const s of near) if (s >= 0) expect(encodeSlopePct(s) >= t).toBe(s >= b);
    }
  });

  it('keep nodata as nodata and saturate cliffs at 327.67 %', () => {
    expect(encodeSlopePct(NaN)).toBe(SLOPE_CODE_NODATA);
    expect(Number.isNaN(decodeSlopePct(SLOPE_CODE_NODATA))).toBe(true);
    expect(decodeSlopePct(encodeSlopePct(1000))).toBe(327.67);
    const g = SlopePctGrid.fromFloat32(Float32Array.of(NaN, 2.5, 12));
    expect([g.at(1), g.at(2), g.length]).toEqual([2.5, 12, 3]);
    expect(Number.isNaN(g.at(0))).toBe(true);
  });
});
