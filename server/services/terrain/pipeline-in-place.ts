// The farm job's terrain run in the DEM's own grid: the same stages as runTerrain (pipeline.ts),
// ordered so that the elevations can be overwritten and every large buffer serves twice.
//   1. shaded relief (1 byte) from the DEM, which the caller draws at once (onRelief) with the
//      slope codes' buffer as the picture's scratch, then slope as 2-byte codes into that buffer
//      (slope-and-relief.ts);
//   2. Priority-Flood+ε fill in place, the relief's buffer reused for the closed flags, which
//      become the D8 directions;
//   3. contributing area into the filled grid (where water gathers → a 1-bit mask), then again
//      broken at field borders (a 1-bit mask of flow leaving a field, made row by row from the
//      fields' runs: no label grid);
//   4. LS into the same grid from the slope codes (S and m looked up per code, ls-grid.ts).
// Memory (bytes per cell): DEM/filled/area/LS 4 + slope codes 2 + relief or directions 1 + two
// bit masks 0.25, plus the fill's queues; about 7.3–7.7 in all. What differs from runTerrain: LS
// takes its slope from the codes (within 0.0025 % of the Float32 slope), and the DEM is gone.
import type { RillRatio } from '../../../shared/erosion/slope-length';
import { ContributingAreaMask, DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2 } from './contributing-area-mask';
import type { FieldLabelRows } from './field-label-rows';
import { fillDepressions } from './fill-depressions';
import { flowAccumulationM2, flowBreaksByRow, flowDirectionD8 } from './flow-d8';
import { lsGrid } from './ls-grid';
import { slopeCodesAndRelief } from './slope-and-relief';
import { SlopePctGrid } from './slope-pct-grid';
import type { DemGrid, ProgressFn } from './types';

export type InPlaceOptions = {
  onProgress?: ProgressFn;
  rillRatio?: RillRatio;
  /** The fields: overland flow starts afresh at their borders, and their own slope-length caps apply. */
  fields?: FieldLabelRows;
  /** With `fields`: a longest slope length per label (NaN = only the 305 m cap). */
  maxSlopeLengthMByLabel?: Float64Array;
  /** Contributing area at which flow counts as concentrated, m². Default 10 000 m² (1 ha). */
  concentratedFlowMinAreaM2?: number;
  /**
   * Given the shaded relief (0 = nodata) before its buffer is reused: draw it here. `scratch` is
   * the slope codes' buffer before they are made (2 bytes per cell), free for the picture's scanlines.
   */
  onRelief?: (shade: Uint8Array, scratch: Uint8Array) => void;
};

export type InPlaceGrids = {
  width: number;
  height: number;
  slopePct: SlopePctGrid;
  contributingAreaM2: ContributingAreaMask;
  /** LS per cell: the DEM's own grid (dem.elevationM), now holding LS. */
  ls: Float32Array;
  /** The directions' buffer (1 byte per cell), spent: free for the caller's scratch. */
  spare: Uint8Array;
};

// Share of a typical run's time taken by each stage (scripts/bench-terrain-job.ts).
const STAGES = [
  ['slope and relief', 0.12],
  ['fill', 0.45],
  ['flow-direction', 0.1],
  ['flow-accumulation', 0.15],
  ['ls', 0.18],
] as const;

/** Runs every stage, overwriting `dem.elevationM` (it ends holding LS). */
export function runTerrainInPlace(dem: DemGrid, options: InPlaceOptions = {}): InPlaceGrids {
  const progress = options.onProgress ?? (() => {});
  let done = 0;
  const step = (name: (typeof STAGES)[number][0]) => {
    done += STAGES.find((s) => s[0] === name)![1];
    progress(Math.min(1, done), name);
  };
  const { width: w, height: h } = dem;
  const fields = options.fields;
  if (fields && (fields.width !== w || fields.height !== h)) throw new Error(`fields are laid out on ${fields.width} × ${fields.height} cells, the DEM has ${w} × ${h}`);
  const z = dem.elevationM;
  progress(0, 'start');

  // The relief first, drawn at once with the codes' buffer as the picture's scratch; then the codes.
  const byteGrid = new Uint8Array(w * h); // the relief, then the closed flags, then the directions
  const codes = new Uint16Array(w * h);
  if (options.onRelief) {
    slopeCodesAndRelief(dem, null, byteGrid);
    options.onRelief(byteGrid, new Uint8Array(codes.buffer, codes.byteOffset, codes.byteLength));
  }
  slopeCodesAndRelief(dem, codes, null);
  step('slope and relief');

  fillDepressions(z, w, h, { inPlace: true, closedScratch: byteGrid });
  step('fill');
  const dir = flowDirectionD8(z, dem, byteGrid);
  step('flow-direction');

  // The filled grid is NaN exactly where the DEM was, so it serves as its own nodata mask.
  flowAccumulationM2(dir, dem, z, z);
  const flowMask = ContributingAreaMask.fromArea(z, options.concentratedFlowMinAreaM2 ?? DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2);
  if (fields) {
    const breaks = flowBreaksByRow(dir, w, h, (r, out) => fields.fillRow(r, out));
    // Undo the unbroken sums: every valid cell back to its own area, then accumulate again.
    flowAccumulationM2(dir, dem, z, z, undefined, breaks);
  }
  step('flow-accumulation');

  lsGrid({
    grid: dem,
    slopeCodes: codes,
    contributingAreaM2: z,
    out: z,
    flowDir: dir,
    rillRatio: options.rillRatio,
    labels: fields ? (r, out) => fields.fillRow(r, out) : undefined,
    maxSlopeLengthMByLabel: options.maxSlopeLengthMByLabel,
  });
  step('ls');
  return { width: w, height: h, slopePct: new SlopePctGrid(codes), contributingAreaM2: flowMask, ls: z, spare: dir };
}
