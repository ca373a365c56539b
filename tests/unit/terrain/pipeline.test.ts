import { describe, expect, it } from 'vitest';
import { runTerrain } from '../../../server/services/terrain/pipeline';
import { slopeHorn } from '../../../server/services/terrain/slope-horn';
import { hillshade } from '../../../server/services/terrain/hillshade';
import { fillDepressions } from '../../../server/services/terrain/fill-depressions';
import { flowAccumulationM2, flowDirectionD8 } from '../../../server/services/terrain/flow-d8';
import { lsGrid } from '../../../server/services/terrain/ls-grid';
import { fieldTerrainStats } from '../../../server/services/terrain/field-stats';
import { renderLayer } from '../../../server/services/terrain/render-layer';
import { rasterisePolygon } from '../../../server/services/terrain/rasterise-polygon';
import { ContributingAreaMask } from '../../../server/services/terrain/contributing-area-mask';
import { decodeSlopePct, encodeSlopePct } from '../../../server/services/terrain/slope-pct-grid';
import { projectedDem, type DemGrid } from '../../../server/services/terrain/types';
import { seededRandom } from './helpers';

// The pipeline reuses buffers and keeps slope as 2-byte codes and concentrated flow as a bit
// mask; its reference is the same stages run one by one with a grid each (our own pipeline
// before that change), so every check here is exactness, not a published value.
function hillyDem(w: number, h: number): DemGrid {
  const rnd = seededRandom(99);
  const z = new Float32Array(w * h);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) z[r * w + c] = 300 + 20 * Math.sin(c / 25) * Math.cos(r / 31) + 6 * Math.sin((c + r) / 11) - 0.05 * r + rnd() * 0.5;
  }
  for (let r = 40; r < 55; r++) for (let c = 60; c < 80; c++) z[r * w + c] = NaN; // a nodata hole
  for (let r = 150; r < 156; r++) for (let c = 20; c < 160; c++) z[r * w + c] += (r - 150) * 4; // a scarp
  return projectedDem({ width: w, height: h, elevationM: z, cellSizeM: 5, originX: 500000, originY: 4700000, epsg: 32615 });
}

const W = 210, H = 190;
const dem = hillyDem(W, H);
const frame = { width: W, height: H, originX: dem.originX, originY: dem.originY, cellSizeX: 5, cellSizeY: 5, epsg: 32615 };
const fields = [0, 1, 2, 3].map((k) => {
  const x0 = 500000 + 15 + (k % 2) * 520, y0 = 4700000 - 15 - Math.floor(k / 2) * 470;
  return [[x0, y0], [x0 + 480, y0], [x0 + 450, y0 - 440], [x0, y0 - 430]] as Array<[number, number]>;
});
const labels = new Uint16Array(W * H);
fields.forEach((f, k) => { for (const cell of rasterisePolygon([f], frame)) labels[cell] = k + 1; });
const capByLabel = Float64Array.of(NaN, NaN, 60, NaN, 25);

/** The stages one by one, each with its own grid. */
function stageByStage(computeEdges: boolean) {
  const slope = slopeHorn(dem, { computeEdges });
  const filled = fillDepressions(dem.elevationM, W, H);
  const dir = flowDirectionD8(filled, dem);
  const area = flowAccumulationM2(dir, dem, filled);
  const broken = flowAccumulationM2(dir, dem, filled, undefined, labels);
  const ls = lsGrid({ grid: dem, slopePct: slope, contributingAreaM2: broken, flowDir: dir, labels, maxSlopeLengthMByLabel: capByLabel });
  return { slope, shade: hillshade(dem), area, ls };
}

describe('terrain pipeline in little memory', () => {
  for (const computeEdges of [false, true]) {
    it(`gives the same LS, hillshade and concentrated-flow cells as the stages one by one${computeEdges ? ' (computeEdges)' : ''}`, () => {
      const before = dem.elevationM.slice();
      const ref = stageByStage(computeEdges);
      const out = runTerrain(dem, { flowBreakLabels: labels, maxSlopeLengthMByLabel: capByLabel, computeEdges });
      expect(dem.elevationM).toEqual(before); // the DEM is not modified
      expect(out.ls).toEqual(ref.ls);
      expect(out.hillshade).toEqual(ref.shade);
      expect(out.contributingAreaM2.minAreaM2).toBe(10_000);
      let flowCells = 0;
      for (let i = 0; i < W * H; i++) {
        expect(out.contributingAreaM2.has(i)).toBe(ref.area[i] >= 10_000);
        if (ref.area[i] >= 10_000) flowCells++;
        expect(out.slopePct.codes[i]).toBe(encodeSlopePct(ref.slope[i]));
      }
      expect(flowCells).toBeGreaterThan(100);
    });
  }

  it('keeps slope within 0.005 % of the Float32 grid and the field figures the same', () => {
    const ref = stageByStage(false);
    const out = runTerrain(dem, { flowBreakLabels: labels, maxSlopeLengthMByLabel: capByLabel });
    for (let i = 0; i < W * H; i++) {
      if (Number.isNaN(ref.slope[i])) expect(Number.isNaN(out.slopePct.at(i))).toBe(true);
      else expect(Math.abs(out.slopePct.at(i) - ref.slope[i])).toBeLessThanOrEqual(0.005 + 1e-9);
    }
    const custom = [{ name: 'a', minPct: 0, maxPct: 4 }, { name: 'b', minPct: 4, maxPct: 10.5 }, { name: 'c', minPct: 10.5, maxPct: null }];
    for (const rings of fields) {
      for (const slopeClasses of [undefined, custom]) {
        const a = fieldTerrainStats({ rings: [rings], grid: frame, slopePct: ref.slope, ls: ref.ls, contributingAreaM2: ref.area, slopeClasses });
        const b = fieldTerrainStats({ rings: [rings], grid: frame, slopePct: out.slopePct, ls: out.ls, contributingAreaM2: out.contributingAreaM2, slopeClasses });
        if (!a.ok || !b.ok) throw new Error('field not covered');
        expect(Math.abs(b.stats.meanSlopePct - a.stats.meanSlopePct)).toBeLessThanOrEqual(0.005);
        expect(b.stats.p90SlopePct).toBe(decodeSlopePct(encodeSlopePct(a.stats.p90SlopePct)));
        expect({ ...b.stats, meanSlopePct: 0, p90SlopePct: 0 }).toEqual({ ...a.stats, meanSlopePct: 0, p90SlopePct: 0 });
      }
    }
  });

  it('draws the same slope-class and concentrated-flow pictures from codes and the mask', () => {
    const ref = stageByStage(false);
    const out = runTerrain(dem);
    const slopeClasses = [{ name: 'a', minPct: 0, maxPct: 4 }, { name: 'b', minPct: 4, maxPct: 10.5 }, { name: 'c', minPct: 10.5, maxPct: null }];
    const pairs = [
      ['slope-classes', ref.slope, out.slopePct, undefined],
      ['slope-classes', ref.slope, out.slopePct, slopeClasses],
      ['concentrated-flow', ref.area, out.contributingAreaM2, undefined],
    ] as const;
    for (const [kind, a, b, classes] of pairs) {
      const ra = renderLayer({ kind, grid: frame, values: a, slopeClasses: classes });
      const rb = renderLayer({ kind, grid: frame, values: b, slopeClasses: classes });
      if (!ra.ok || !rb.ok) throw new Error('render failed');
      expect(rb.png.equals(ra.png)).toBe(true);
      expect(rb.legend).toEqual(ra.legend);
      expect(rb.bounds).toEqual(ra.bounds);
    }
    expect(() => renderLayer({ kind: 'ls', grid: frame, values: out.contributingAreaM2 })).toThrow("a ContributingAreaMask can only draw 'concentrated-flow', not 'ls'");
  });

  it('holds under 10 bytes per cell beyond the DEM at its peak, field labels included (accounted)', () => {
    const plain = runTerrain(dem);
    const farm = runTerrain(dem, { flowBreakLabels: labels, maxSlopeLengthMByLabel: capByLabel });
    const n = W * H;
    // 4 LS + 2 slope codes + 1 hillshade + 1/8 flow mask, at LS (directions still held) and at the end.
    expect(plain.peakWorkingBytes / n).toBeCloseTo(7.125, 2);
    expect(farm.peakWorkingBytes / n).toBeCloseTo(9.125, 2); // + 2 for the Uint16 labels
    expect(farm.peakWorkingBytes / n).toBeLessThan(10);
    const points: string[] = [];
    runTerrain(dem, { onMemory: (p) => points.push(p) });
    expect(points).toEqual(['fill', 'flow-direction', 'flow-accumulation', 'ls', 'hillshade']);
  });

  it('marks a cell as concentrated flow exactly when its area reaches the threshold', () => {
    const m = ContributingAreaMask.fromArea(Float32Array.of(9999, 10_000, NaN, 25_000, 0, 0, 0, 0, 10_001), 10_000);
    expect(Array.from({ length: 9 }, (_, i) => m.has(i))).toEqual([false, true, false, true, false, false, false, false, true]);
    expect(m.bits.length).toBe(2);
  });
});
