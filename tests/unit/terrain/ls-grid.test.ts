import { describe, expect, it } from 'vitest';
import { desmetGoversL, rusleLengthExponent, rusleSlopeFactor, segmentL } from '../../../shared/erosion/slope-length';
import { lsGrid } from '../../../server/services/terrain/ls-grid';
import { D8_DIR_FACTOR, flowDirectionD8 } from '../../../server/services/terrain/flow-d8';
import { fillDepressions } from '../../../server/services/terrain/fill-depressions';
import { runTerrain } from '../../../server/services/terrain/pipeline';
import { projectedDem } from '../../../server/services/terrain/types';
import { demFromFunction, seededRandom } from './helpers';

describe('LS grid', () => {
  it('gives LS 0.414 for a 10 m ridge cell on a 5 % slope', () => {
    const grid = projectedDem({ width: 1, height: 1, elevationM: new Float32Array(1), cellSizeM: 10 });
    const ls = lsGrid({ grid, slopePct: Float32Array.of(5), contributingAreaM2: Float32Array.of(100), flowDir: Uint8Array.of(3) });
    // Desmet & Govers 1996 grid LS: D 10 m, A_in 0, 5 % → LS 0.414
    expect(ls[0]).toBeCloseTo(0.414, 3);
  });

  it('equals the shared engine functions cell by cell (the inlined hot loop)', () => {
    const rnd = seededRandom(42);
    const n = 2000;
    const grid = projectedDem({ width: n, height: 1, elevationM: new Float32Array(n), cellSizeM: 5 });
    const slope = new Float32Array(n), acc = new Float32Array(n), dir = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      slope[i] = i < 5 ? [0, 0.001, 9, 8.999, 60][i] : rnd() * 40;
      acc[i] = 25 + (rnd() < 0.2 ? 0 : Math.floor(rnd() ** 4 * 1e6));
      dir[i] = Math.floor(rnd() * 9);
    }
    for (const rillRatio of ['low', 'moderate', 'high'] as const) {
      const ls = lsGrid({ grid, slopePct: slope, contributingAreaM2: acc, flowDir: dir, rillRatio, maxSlopeLengthM: Infinity });
      for (let i = 0; i < n; i++) {
        const m = rusleLengthExponent(slope[i], rillRatio);
        const l = desmetGoversL({ upslopeAreaM2: acc[i] - 25, cellSizeM: 5, flowDirFactor: D8_DIR_FACTOR[dir[i]], m });
        const expected = Math.fround(l * rusleSlopeFactor(slope[i]));
        // shared/erosion/slope-length.ts is the reference (AH-703 eq. 4-2..4-4; Desmet & Govers 1996 eq. 6)
        expect(Math.abs(ls[i] - expected)).toBeLessThanOrEqual(2e-6 * Math.max(1, expected));
      }
    }
  });

  it('stops L growing past the longest RUSLE slope length (305 m, AH-703 ch. 4)', () => {
    const grid = projectedDem({ width: 2, height: 1, elevationM: new Float32Array(2), cellSizeM: 5 });
    // Cell 0: A_in = 305 m × 5 m (exactly the cap); cell 1: ten times more upslope area.
    const acc = Float32Array.of(25 + 305 * 5, 25 + 3050 * 5);
    const ls = lsGrid({ grid, slopePct: Float32Array.of(10, 10), contributingAreaM2: acc, flowDir: Uint8Array.of(3, 3) });
    expect(ls[1]).toBeCloseTo(ls[0], 5);
    const m = rusleLengthExponent(10);
    const uncapped = desmetGoversL({ upslopeAreaM2: 3050 * 5, cellSizeM: 5, flowDirFactor: 1, m }) * rusleSlopeFactor(10);
    expect(ls[1]).toBeLessThan(uncapped);
  });

  it('past a label’s own slope length (a field’s typed length) gives the whole-slope L of that length', () => {
    const grid = projectedDem({ width: 2, height: 1, elevationM: new Float32Array(2), cellSizeM: 5 });
    const acc = Float32Array.of(25 + 3050 * 5, 25 + 3050 * 5);
    const labels = Int32Array.of(1, 2);
    const ls = lsGrid({ grid, slopePct: Float32Array.of(10, 10), contributingAreaM2: acc, flowDir: Uint8Array.of(3, 3), labels, maxSlopeLengthMByLabel: Float64Array.of(NaN, 60, NaN) });
    const m = rusleLengthExponent(10);
    // Label 1: flow restarts every 60 m, so the cell stands for a whole 60 m slope,
    // L = (60/22.13)^m (AH-703 eq. 4-1); label 2 has no own cap: the cell L at 305 m.
    const at = (lenM: number) => desmetGoversL({ upslopeAreaM2: lenM * 5, cellSizeM: 5, flowDirFactor: 1, m }) * rusleSlopeFactor(10);
    expect(ls[0]).toBeCloseTo((60 / 22.13) ** m * rusleSlopeFactor(10), 5);
    expect(ls[1]).toBeCloseTo(at(305), 5);
  });

  it('on a uniform plane gives each cell the 1-D segment L (Desmet–Govers plane identity)', () => {
    // A plane falling due south at 8 %: D8 sends each column straight down, so a cell k rows from
    // the top has A_in = k·D² and its L must equal AH-703 eq. 4-6 for the segment [kD, (k+1)D].
    const d = 5, w = 7, h = 30;
    const dem = demFromFunction(w, h, d, (_x, y) => 0.08 * y);
    const out = runTerrain(dem);
    const dir = flowDirectionD8(fillDepressions(dem.elevationM, w, h), dem);
    const m = rusleLengthExponent(8);
    const s = rusleSlopeFactor(8);
    for (let r = 1; r < h - 1; r++) {
      const i = r * w + 3;
      expect(dir[i]).toBe(3); // south
      const expectedL = segmentL({ upperM: r * d, lowerM: (r + 1) * d, m });
      expect(out.ls[i] / s).toBeCloseTo(expectedL, 5); // AH-703 eq. 4-6 vs Desmet & Govers 1996 eq. 6
    }
  });
});
