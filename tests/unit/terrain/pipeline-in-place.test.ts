import { describe, expect, it } from 'vitest';
import { runTerrain } from '../../../server/services/terrain/pipeline';
import { runTerrainInPlace } from '../../../server/services/terrain/pipeline-in-place';
import { FieldLabelRows } from '../../../server/services/terrain/field-label-rows';
import { slopeCodesAndRelief } from '../../../server/services/terrain/slope-and-relief';
import { hillshade } from '../../../server/services/terrain/hillshade';
import { slopeHorn } from '../../../server/services/terrain/slope-horn';
import { encodeSlopePct, SLOPE_CODE_NODATA } from '../../../server/services/terrain/slope-pct-grid';
import { polygonSpans } from '../../../server/services/terrain/rasterise-polygon';
import { projectedDem, type DemGrid } from '../../../server/services/terrain/types';
import { seededRandom } from './helpers';

// The farm job's in-place run against runTerrain (pipeline.ts), which keeps the DEM and takes
// LS from Float32 slope: our own reference, so these checks are about equality, not a published value.
function hillyDem(w: number, h: number): DemGrid {
  const rnd = seededRandom(7);
  const z = new Float32Array(w * h);
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) z[r * w + c] = 120 + 18 * Math.sin(c / 23) * Math.cos(r / 29) + 5 * Math.sin((c + r) / 13) - 0.04 * r + rnd() * 0.4;
  }
  for (let r = 30; r < 42; r++) for (let c = 50; c < 66; c++) z[r * w + c] = NaN; // a nodata hole
  return projectedDem({ width: w, height: h, elevationM: z, cellSizeM: 5, originX: 500000, originY: 4700000, epsg: 32615 });
}

const W = 180, H = 160;
const frame = { width: W, height: H, originX: 500000, originY: 4700000, cellSizeX: 5, cellSizeY: 5 };
// Three fields, the last overlapping the second (the later field's label wins, as when labels are written field by field).
const rings = [
  [[500010, 4699990], [500400, 4699990], [500380, 4699600], [500010, 4699620]],
  [[500450, 4699990], [500880, 4699990], [500880, 4699500], [500450, 4699520]],
  [[500700, 4699700], [500890, 4699700], [500890, 4699250], [500700, 4699250]],
] as Array<Array<[number, number]>>;
const spans = rings.map((r) => polygonSpans([r], frame));
const labelsByFill = new Uint16Array(W * H);
spans.forEach((s, k) => { for (let j = 0; j < s.length; j += 2) labelsByFill.fill(k + 1, s[j], s[j + 1]); });
const caps = Float64Array.of(NaN, NaN, 40, NaN);

describe('terrain run in the DEM’s own grid (farm job)', () => {
  it('makes slope codes and relief in one pass equal to slopeHorn and hillshade', () => {
    const dem = hillyDem(W, H);
    const codes = new Uint16Array(W * H), shade = new Uint8Array(W * H);
    slopeCodesAndRelief(dem, codes, shade);
    const slope = slopeHorn(dem);
    expect(shade).toEqual(hillshade(dem));
    expect(codes).toEqual(Uint16Array.from(slope, encodeSlopePct));
  });

  it('writes each row’s labels as a label grid filled field by field would hold them', () => {
    const rows = new FieldLabelRows(W, H, spans);
    expect(rows.toGrid(new Uint16Array(W * H))).toEqual(labelsByFill);
  });

  it('gives the same slope codes and concentrated flow as runTerrain, and LS within the slope codes’ step', () => {
    const ref = runTerrain(hillyDem(W, H), { flowBreakLabels: labelsByFill, maxSlopeLengthMByLabel: caps });
    const dem = hillyDem(W, H);
    let relief: Uint8Array | null = null;
    const out = runTerrainInPlace(dem, { fields: new FieldLabelRows(W, H, spans), maxSlopeLengthMByLabel: caps, onRelief: (s) => (relief = s.slice()) });
    expect(relief).toEqual(ref.hillshade);
    expect(out.ls).toBe(dem.elevationM); // LS lives in the DEM's own grid
    expect(out.slopePct.codes).toEqual(ref.slopePct.codes);
    expect(out.contributingAreaM2.bits).toEqual(ref.contributingAreaM2.bits);
    let compared = 0;
    for (let i = 0; i < W * H; i++) {
      const a = ref.ls[i], b = out.ls[i];
      if (Number.isNaN(a)) { expect(Number.isNaN(b)).toBe(true); continue; }
      // S and m at the code's middle slope, within 0.0025 % slope: S moves by at most
      // 10.8 × 0.0025 / 100 = 2.7e-4 (AH-703 eq. 4-4), m a little; LS within 0.5 % + 5e-4 here.
      expect(Math.abs(b - a)).toBeLessThanOrEqual(5e-3 * a + 5e-4);
      compared++;
    }
    expect(compared).toBeGreaterThan(0.9 * W * H - 2 * (W + H) - 12 * 16 - 200);
    expect(out.slopePct.codes.includes(SLOPE_CODE_NODATA)).toBe(true);
  });
});
