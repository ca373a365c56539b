import { describe, expect, it } from 'vitest';
import { fillDepressions, nextFloat32Up } from '../../../server/services/terrain/fill-depressions';
import { flowDirectionD8, flowAccumulationM2 } from '../../../server/services/terrain/flow-d8';
import { demFromRows, seededRandom } from './helpers';

// Hand-checked grids for Priority-Flood+ε (Barnes, Lehman & Mulla 2014, Alg. 3).
describe('Priority-Flood depression filling', () => {
  it('raises a one-cell pit to just above its rim and changes no cell by more than the ε steps', () => {
    const rows = [
      [9, 9, 9, 9, 9],
      [9, 8, 8, 8, 9],
      [9, 8, 2, 8, 9],
      [9, 8, 8, 8, 5],
      [9, 9, 9, 9, 9],
    ];
    const dem = demFromRows(rows);
    const filled = fillDepressions(dem.elevationM, 5, 5);
    // The spill is over the ring of 8s to the edge cell 5. Equal 8s reached from an 8 are raised
    // by one Float32 step each (the ε of Alg. 3), so the pit ends a few ε above 8.
    expect(filled[12]).toBeGreaterThan(8);
    expect(filled[12]).toBeLessThan(8.0001);
    for (let i = 0; i < 25; i++) {
      expect(filled[i]).toBeGreaterThanOrEqual(dem.elevationM[i]);
      if (i !== 12) expect(filled[i] - dem.elevationM[i]).toBeLessThan(1e-4);
    }
    expect(filled[19]).toBe(5);
    expect(dem.elevationM[12]).toBe(2); // input untouched
  });

  it('makes a flat drain: every interior cell of a flat gets a downhill neighbour', () => {
    const rows = [
      [5, 5, 5, 5, 5, 5],
      [5, 3, 3, 3, 3, 5],
      [5, 3, 3, 3, 3, 5],
      [5, 3, 3, 3, 3, 2],
      [5, 5, 5, 5, 5, 5],
    ];
    const dem = demFromRows(rows);
    const filled = fillDepressions(dem.elevationM, 6, 5);
    const dir = flowDirectionD8(filled, dem);
    for (const r of [1, 2, 3]) for (const c of [1, 2, 3, 4]) expect(dir[r * 6 + c]).not.toBe(0);
    // The 12 flat cells, and the higher border cells that fall into the flat, all leave through
    // the outlet at (3, 5): its contributing area is the whole 30-cell grid (1 m² cells).
    const acc = flowAccumulationM2(dir, dem, filled);
    expect(acc[3 * 6 + 5]).toBe(30);
  });

  it('treats nodata as an edge: cells next to it are outlets and stay unraised', () => {
    const rows = [
      [9, 9, 9, 9],
      [9, 4, NaN, 9],
      [9, 1, 6, 9],
      [9, 9, 9, 9],
    ];
    const dem = demFromRows(rows);
    const filled = fillDepressions(dem.elevationM, 4, 4);
    expect(filled[9]).toBe(1);
    expect(Number.isNaN(filled[6])).toBe(true);
  });
});

// The ε of Alg. 3 is one Float32 step up (IEEE 754-2008, clause 5.3.1, nextUp): the fill's
// rounding shortcut must give exactly the value stepping the bits gives.
describe('the ε step (Float32 nextUp)', () => {
  const f = new Float32Array(1), b = new Int32Array(f.buffer);
  const byBits = (v: number): number => {
    if (v === 0) return 2 ** -149;
    f[0] = v;
    b[0] += v > 0 ? 1 : -1;
    return f[0];
  };
  it('equals stepping the bits on random bit patterns and at the edges of every binade', () => {
    const rnd = seededRandom(3);
    const patterns: number[] = [];
    for (let k = 0; k < 200_000; k++) patterns.push((rnd() * 2 ** 32) | 0);
    for (let e = 0; e < 255; e++) for (const m of [0, 1, 0x400000, 0x7ffffe, 0x7fffff]) patterns.push((e << 23) | m, ((e << 23) | m) | 0x80000000);
    let wrong = 0;
    for (const bits of patterns) {
      b[0] = bits;
      const v = f[0];
      if (Number.isNaN(v)) continue;
      if (!Object.is(nextFloat32Up(v), byBits(v))) wrong++;
    }
    expect(wrong).toBe(0);
    expect(nextFloat32Up(3.4028234663852886e38)).toBe(Infinity);
    expect(nextFloat32Up(-0)).toBe(2 ** -149);
  });
});
