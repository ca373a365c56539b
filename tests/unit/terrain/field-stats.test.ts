import { describe, expect, it } from 'vitest';
import { cellCentre, fieldTerrainStats } from '../../../server/services/terrain/field-stats';
import { rasterisePolygon } from '../../../server/services/terrain/rasterise-polygon';
import { ContributingAreaMask } from '../../../server/services/terrain/contributing-area-mask';
import { SLOPE_CODE_NODATA, slopeCodeAtLeast, SlopePctGrid } from '../../../server/services/terrain/slope-pct-grid';
import { seededRandom } from './helpers';
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

// The figures must be those of the plain rule, cell by cell, whatever the kinds of input: the
// reference below walks every cell of the field once and tests each input as it comes.
describe('field figures against a plain cell-by-cell computation', () => {
  const rnd = seededRandom(5);
  const W = 60, H = 50;
  const grid = { width: W, height: H, originX: 1000, originY: 2000, cellSizeX: 2, cellSizeY: 2 };
  const n = W * H;
  const f32 = new Float32Array(1), u32 = new Uint32Array(f32.buffer);
  const nextFloat = (v: number, by: number): number => ((f32[0] = v), (u32[0] += by), f32[0]);
  // Slopes on and either side of the default breaks, nodata, and spread values (common practice
  // edge cases for class limits, no single source).
  const edges = [0, 2, 6, 12, 18, 25, 4, 10.5].flatMap((b) => [b, nextFloat(b, 1), nextFloat(b, -1)]).filter((v) => v >= 0);
  const slope = Float32Array.from({ length: n }, (_, i) => (i % 17 === 0 ? NaN : i % 3 === 0 ? edges[i % edges.length] : rnd() * 40));
  const ls = Float32Array.from({ length: n }, (_, i) => (i % 23 === 0 ? NaN : rnd() * 5));
  const soilLoss = Float32Array.from({ length: n }, (_, i) => (i % 29 === 0 ? NaN : rnd() * 30));
  const area = Float32Array.from({ length: n }, (_, i) => (i % 31 === 0 ? NaN : rnd() < 0.2 ? 10_000 + rnd() * 5e4 : i % 11 === 0 ? 10_000 : rnd() * 9_999));
  const coded = SlopePctGrid.fromFloat32(slope);
  const mask = ContributingAreaMask.fromArea(area, 10_000);
  const custom = [{ name: 'a', minPct: 0, maxPct: 4 }, { name: 'b', minPct: 4, maxPct: 10.5 }, { name: 'c', minPct: 10.5, maxPct: null }];
  const fields: Array<Array<Array<[number, number]>>> = [
    [[[1003, 1997], [1117, 1997], [1117, 1903], [1003, 1903]]], // most of the grid
    [[[1010, 1990], [1090, 1990], [1090, 1920], [1010, 1920]], [[1030, 1970], [1060, 1970], [1060, 1940], [1030, 1940]]], // with a hole
    [[[1001, 1901], [1060, 1999], [1119, 1901]]], // a triangle
    [[[1100, 1999], [1200, 1999], [1200, 1950], [1100, 1950]]], // partly off the grid's east edge
  ];

  /** The plain computation: every cell of the field once, each input tested as it comes. */
  function plain(rings: Array<Array<[number, number]>>, slopePct: Float32Array | SlopePctGrid, opts: { ls?: Float32Array; soil?: Float32Array; area?: Float32Array; classes?: typeof custom }) {
    const cells = rasterisePolygon(rings, grid);
    const classes = opts.classes ?? DEFAULT_SLOPE_CLASSES;
    const values: number[] = [];
    const counts = classes.map(() => 0);
    let lsSum = 0, lsCount = 0, aSum = 0, aCount = 0;
    const flow: number[] = [];
    for (const i of cells) {
      const s = slopePct instanceof SlopePctGrid ? slopePct.at(i) : slopePct[i];
      if (!Number.isNaN(s)) {
        values.push(s);
        // class by the Float32 slope's breaks; for codes, tested on the code (slope-pct-grid.ts)
        const j = classes.reduce((acc, c, k) => (k > 0 && (slopePct instanceof SlopePctGrid ? slopePct.codes[i] >= slopeCodeAtLeast(c.minPct) : s >= c.minPct) ? k : acc), 0);
        counts[j]++;
      }
      if (opts.ls && !Number.isNaN(opts.ls[i])) { lsSum += opts.ls[i]; lsCount++; }
      if (opts.soil && !Number.isNaN(opts.soil[i])) { aSum += opts.soil[i]; aCount++; }
      if (opts.area && opts.area[i] >= 10_000) flow.push(i);
    }
    const sorted = [...values].sort((p, q) => p - q);
    return {
      cellCount: values.length,
      cellsWithoutData: cells.length - values.length,
      meanSlopePct: values.reduce((p, q) => p + q, 0) / values.length,
      p90SlopePct: sorted[Math.max(0, Math.ceil(0.9 * values.length) - 1)],
      slopeClasses: classes.map((c, j) => ({ name: c.name, minPct: c.minPct, maxPct: c.maxPct, share: counts[j] / values.length })),
      meanLS: lsCount > 0 ? lsSum / lsCount : null,
      meanSoilLossTPerHaYr: aCount > 0 ? aSum / aCount : null,
      concentratedFlow: { minAreaM2: 10_000, cellCount: flow.length, points: flow.map((i) => cellCentre(grid, i)), cells: Int32Array.from(flow) },
    };
  }

  for (const [slopeName, slopePct] of [['Float32 slope', slope], ['slope codes', coded]] as const) {
    for (const withOthers of [false, true]) {
      for (const flowFrom of ['none', 'area grid', 'mask'] as const) {
        it(`equals it for ${slopeName}, ${withOthers ? 'with' : 'without'} LS and soil loss, flow from ${flowFrom}`, () => {
          for (const rings of fields) {
            for (const classes of [undefined, custom]) {
              const res = fieldTerrainStats({
                rings, grid, slopePct, slopeClasses: classes,
                ...(withOthers ? { ls, soilLossTPerHaYr: soilLoss } : {}),
                ...(flowFrom === 'area grid' ? { contributingAreaM2: area } : flowFrom === 'mask' ? { contributingAreaM2: mask } : {}),
              });
              if (!res.ok) throw new Error(res.reason);
              const want = plain(rings, slopePct, { classes, ...(withOthers ? { ls, soil: soilLoss } : {}), ...(flowFrom !== 'none' ? { area } : {}) });
              // Codes: the mean is summed in whole hundredths, so it may differ from a running float sum in its last bits.
              expect(res.stats.meanSlopePct).toBeCloseTo(want.meanSlopePct, 12);
              expect({ ...res.stats, meanSlopePct: 0 }).toEqual({ ...want, meanSlopePct: 0 });
              expect(Array.from(res.stats.concentratedFlow.cells)).toEqual(Array.from(want.concentratedFlow.cells));
            }
          }
        });
      }
    }
  }

  it('keeps every ⌈cells / maxFlowPoints⌉-th flow point when asked for at most that many', () => {
    const rings = fields[0];
    const all = fieldTerrainStats({ rings, grid, slopePct: coded, contributingAreaM2: mask });
    const few = fieldTerrainStats({ rings, grid, slopePct: coded, contributingAreaM2: mask, maxFlowPoints: 40 });
    if (!all.ok || !few.ok) throw new Error('field not covered');
    const every = Math.ceil(all.stats.concentratedFlow.cellCount / 40);
    expect(every).toBeGreaterThan(1);
    expect(few.stats.concentratedFlow.points).toEqual(all.stats.concentratedFlow.points.filter((_, i) => i % every === 0));
    expect(few.stats.concentratedFlow.points.length).toBeLessThanOrEqual(40);
    expect(few.stats.concentratedFlow.cells).toEqual(all.stats.concentratedFlow.cells);
    expect({ ...few.stats, concentratedFlow: null }).toEqual({ ...all.stats, concentratedFlow: null });
    expect(() => fieldTerrainStats({ rings, grid, slopePct: coded, maxFlowPoints: 0 })).toThrow('maxFlowPoints must be a whole number >= 1, got 0');
  });

  it('says so when the field covers only nodata cells', () => {
    const empty = new SlopePctGrid(new Uint16Array(n).fill(SLOPE_CODE_NODATA));
    expect(fieldTerrainStats({ rings: fields[2], grid, slopePct: empty })).toEqual({ ok: false, reason: 'the field covers only nodata cells of the elevation model' });
    expect(fieldTerrainStats({ rings: fields[2], grid, slopePct: new Float32Array(n).fill(NaN) })).toEqual({ ok: false, reason: 'the field covers only nodata cells of the elevation model' });
  });
});
