import { describe, expect, it } from 'vitest';
import { fieldTerrainStats } from '../../../server/services/terrain/field-stats';
import { rasterisePolygon } from '../../../server/services/terrain/rasterise-polygon';
import { DEFAULT_SLOPE_CLASSES, parseSlopeClasses } from '../../../server/services/terrain/slope-classes';

const frame = { width: 10, height: 10, originX: 0, originY: 10, cellSizeX: 1, cellSizeY: 1 };

describe('field rasterisation and figures', () => {
  it('takes the cells whose centre is inside, leaving out a hole (even-odd rule)', () => {
    const outer = [[1, 1], [9, 1], [9, 9], [1, 9]];
    const hole = [[3, 3], [7, 3], [7, 7], [3, 7]];
    expect(rasterisePolygon([outer], frame).length).toBe(64);
    expect(rasterisePolygon([outer, hole], frame).length).toBe(64 - 16);
    // a triangle x + y < 4 (y up) with cell centres (0.5..): centres with x + y < 4 → 6 cells
    expect(rasterisePolygon([[[0, 0], [4, 0], [0, 4]]], frame).length).toBe(6);
  });

  it('gives mean, 90th percentile, class shares, mean LS and concentrated flow on a known shape', () => {
    // Slope = column index (0..9 %) on a 10x10 grid; the field is columns 0..9 of rows 0..4.
    const slope = new Float32Array(100).map((_, i) => i % 10);
    const ls = new Float32Array(100).fill(2);
    const area = new Float32Array(100).map((_, i) => (i % 10 === 4 ? 20_000 : 100));
    const res = fieldTerrainStats({ rings: [[[0, 5], [10, 5], [10, 10], [0, 10]]], grid: frame, slopePct: slope, ls, contributingAreaM2: area });
    if (!res.ok) throw new Error(res.reason);
    const s = res.stats;
    expect(s.cellCount).toBe(50);
    expect(s.meanSlopePct).toBeCloseTo(4.5, 10);
    expect(s.p90SlopePct).toBe(8); // nearest rank: 45th of 50 sorted values (0..9 five times each)
    // default SSM ch. 3 breaks [memory]: 0–2 → {0,1}, 2–6 → {2..5}, 6–12 → {6..9}
    expect(s.slopeClasses.map((c) => c.share)).toEqual([0.2, 0.4, 0.4, 0, 0, 0]);
    expect(s.meanLS).toBe(2);
    expect(s.concentratedFlow.cellCount).toBe(5); // column 4 drains ≥ 1 ha
    expect(s.concentratedFlow.points[0]).toEqual([4.5, 9.5]);
  });

  it('says so when a field covers no cell of the DEM', () => {
    const res = fieldTerrainStats({ rings: [[[20, 20], [30, 20], [30, 30]]], grid: frame, slopePct: new Float32Array(100) });
    expect(res).toEqual({ ok: false, reason: 'the field covers no cell of the elevation model' });
  });

  it('accepts custom slope classes and rejects gaps between them', () => {
    expect(parseSlopeClasses(DEFAULT_SLOPE_CLASSES).ok).toBe(true);
    const bad = parseSlopeClasses([{ name: 'a', minPct: 0, maxPct: 3 }, { name: 'b', minPct: 4, maxPct: null }]);
    expect(bad).toEqual({ ok: false, reason: "class 1: minPct must equal the previous class's maxPct" });
  });
});
