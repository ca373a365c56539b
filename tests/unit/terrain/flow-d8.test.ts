import { describe, expect, it } from 'vitest';
import { flowDirectionD8, flowAccumulationM2, inletAreaM2 } from '../../../server/services/terrain/flow-d8';
import { demFromRows } from './helpers';

describe('D8 flow direction and accumulation', () => {
  it('follows the steepest drop, counting the diagonal distance as D·√2 (O\'Callaghan & Mark 1984)', () => {
    // Centre 10: drop 3 east over 1 (gradient 3) beats drop 4 south-east over √2 (2.83).
    const dem = demFromRows([
      [10, 10, 10],
      [10, 10, 7],
      [10, 10, 6],
    ]);
    const dir = flowDirectionD8(dem.elevationM, dem);
    expect(dir[4]).toBe(1); // E
  });

  it('accumulates contributing area on a small grid as counted by hand', () => {
    // 2 m cells (4 m² each). Hand-traced D8 receivers:
    //  a(0,0)=9 → (1,1)=5 [SE], b(0,1)=8 → (1,1) [S], c(0,2)=9 → (1,1) [SW]
    //  (1,0)=8 → (2,1) [SE: 7/(2√2) = 2.47 beats E: 3/2], (1,2)=8 → (2,1) [SW], (1,1)=5 → (2,1) [S]
    //  (2,0)=7 → (2,1) [E], (2,2)=7 → (2,1) [W], (2,1)=1 is an edge outlet.
    const dem = demFromRows(
      [
        [9, 8, 9],
        [8, 5, 8],
        [7, 1, 7],
      ],
      2,
    );
    const dir = flowDirectionD8(dem.elevationM, dem);
    expect(Array.from(dir)).toEqual([2, 3, 4, 2, 3, 4, 1, 0, 5]);
    const acc = flowAccumulationM2(dir, dem, dem.elevationM);
    // (1,1) gets 3 donors + itself = 4 cells = 16 m²; the outlet gets all 9 cells = 36 m².
    expect(acc[4]).toBe(16);
    expect(acc[7]).toBe(36);
    expect(acc[0]).toBe(4);
    const aIn = inletAreaM2(acc, dem);
    expect(aIn[7]).toBe(32);
    expect(aIn[0]).toBe(0);
  });

  it('gives nodata cells NaN area and no direction', () => {
    const dem = demFromRows([
      [3, 2, 1],
      [3, NaN, 1],
      [3, 2, 1],
    ]);
    const dir = flowDirectionD8(dem.elevationM, dem);
    const acc = flowAccumulationM2(dir, dem, dem.elevationM);
    expect(dir[4]).toBe(0);
    expect(Number.isNaN(acc[4])).toBe(true);
  });
});
