// The whole terrain run on one DEM: Priority-Flood+ε filling, D8 directions, contributing area,
// Desmet–Govers × RUSLE LS with Horn slope, hillshade, and, when R, K, C, P are given, per-cell
// soil loss. Synchronous and pure; progress is reported between stages with the fraction of the
// run's typical time done so far.
//
// Memory (bytes per cell beyond the DEM, n cells; accounted in a ByteLedger, see
// docs/benchmarks.md): one Float32 work grid is the filled DEM, then the contributing area, then
// LS (4); the fill's closed flags become the D8 directions (1), dropped once LS is done (the
// accumulation keeps its count of donors in the directions' upper bits). Slope is computed row by row for
// LS and kept as 2-byte codes (slope-pct-grid.ts); where water gathers is kept as 1 bit per cell
// (contributing-area-mask.ts); the hillshade (1) comes last, after the directions are freed.
// Peak: 7.125 (at LS, and again at the end) — plus the caller's labels (2 as Uint16), plus 4
// for the optional soil-loss grid.
import type { RillRatio } from '../../../shared/erosion/slope-length';
import { ByteLedger, type MemoryFn } from './byte-ledger';
import { ContributingAreaMask, DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2 } from './contributing-area-mask';
import { fillDepressions } from './fill-depressions';
import { flowAccumulationM2, flowDirectionD8, labelFlowBreaks } from './flow-d8';
import { hillshade } from './hillshade';
import { lsGrid } from './ls-grid';
import { slopeHornRow } from './slope-horn';
import { encodeSlopePct, SlopePctGrid } from './slope-pct-grid';
import { soilLossGrid, type SoilLossFactors } from './soil-loss-grid';
import type { DemGrid, ProgressFn } from './types';

export type TerrainOptions = {
  onProgress?: ProgressFn;
  rillRatio?: RillRatio;
  /** Scalar R, K, C, P for a soil-loss grid (omit to skip it; it adds 4 bytes per cell). */
  soilLossFactors?: SoilLossFactors;
  /** Compute slope on the 1-cell border too (gdaldem -compute_edges). Default false, as gdaldem. */
  computeEdges?: boolean;
  /** Skip the hillshade (e.g. when only field figures are wanted). */
  skipHillshade?: boolean;
  /**
   * Field label per cell (0 outside fields). When given, LS counts only the area upslope inside
   * the same field: field borders, headlands, roads and ditches usually interrupt overland flow
   * (common practice, no single source). `contributingAreaM2` stays unbroken, for where water gathers.
   */
  flowBreakLabels?: Uint16Array | Int32Array;
  /** With flowBreakLabels: a longest slope length per label for LS (NaN = only the 305 m cap). */
  maxSlopeLengthMByLabel?: Float64Array;
  /** Contributing area at which flow counts as concentrated, m². Default 10 000 m² (1 ha). */
  concentratedFlowMinAreaM2?: number;
  /**
   * Called where the run's memory peaks locally, with the typed-array bytes it holds beyond the
   * DEM at that point (accounted by construction, the caller's labels included).
   */
  onMemory?: MemoryFn;
};

export type TerrainGrids = {
  width: number;
  height: number;
  /** Slope %, 2 bytes per cell; `at(i)` reads it back rounded to 0.01 % (slope-pct-grid.ts). */
  slopePct: SlopePctGrid;
  hillshade: Uint8Array | null;
  /**
   * Where the (unbroken) contributing area reaches the concentrated-flow threshold, 1 bit per
   * cell (contributing-area-mask.ts); the Float32 area grid itself is not kept.
   */
  contributingAreaM2: ContributingAreaMask;
  ls: Float32Array;
  soilLossTPerHaYr: Float32Array | null;
  /** Most typed-array bytes the run held at once beyond the DEM (accounted, labels included). */
  peakWorkingBytes: number;
};

// Share of a typical run's time taken by each stage (from scripts/bench-terrain.ts).
const STAGES = [
  ['fill', 0.56],
  ['flow-direction', 0.08],
  ['flow-accumulation', 0.06],
  ['ls', 0.2],
  ['hillshade', 0.07],
  ['soil-loss', 0.03],
] as const;

type StepFn = (name: (typeof STAGES)[number][0]) => void;

/** Runs every stage on `dem`; the DEM itself is not modified. */
export function runTerrain(dem: DemGrid, options: TerrainOptions = {}): TerrainGrids {
  const progress = options.onProgress ?? (() => {});
  let done = 0;
  const step: StepFn = (name) => {
    done += STAGES.find((s) => s[0] === name)![1];
    progress(Math.min(1, done), name);
  };
  const { width: w, height: h } = dem;
  const n = w * h;
  const labels = options.flowBreakLabels;
  if (labels && labels.length !== n) throw new Error(`flowBreakLabels has ${labels.length} cells, expected ${n}`);
  const ledger = new ByteLedger(options.onMemory);
  // The caller's labels: alive through the whole run (the farm job keeps them), so counted.
  if (labels) ledger.hold('labels', labels.byteLength);
  progress(0, 'start');

  // Filled DEM → contributing area → LS, all in one Float32 grid.
  const work = dem.elevationM.slice();
  ledger.hold('work', work.byteLength);
  const { flowMask, codes } = flowAndLs(dem, work, options, ledger, step);
  const ls = work;

  let shade: Uint8Array | null = null;
  if (!options.skipHillshade) {
    shade = hillshade(dem);
    ledger.hold('hillshade', shade.byteLength);
    ledger.mark('hillshade');
  }
  step('hillshade');
  let soilLoss: Float32Array | null = null;
  if (options.soilLossFactors) {
    soilLoss = soilLossGrid(ls, options.soilLossFactors);
    ledger.hold('soil loss', soilLoss.byteLength);
    ledger.mark('soil-loss');
  }
  step('soil-loss');
  progress(1, 'done');
  return {
    width: w,
    height: h,
    slopePct: new SlopePctGrid(codes),
    hillshade: shade,
    contributingAreaM2: flowMask,
    ls,
    soilLossTPerHaYr: soilLoss,
    peakWorkingBytes: ledger.peakBytes,
  };
}

// The stages that need the directions, in functions of their own: a buffer referenced only from
// a returned function's frame is surely unreachable afterwards (a stale interpreter register in
// a long-lived frame can keep a dropped buffer alive).

/** Fill, D8, accumulation(s) and LS, all into `work`. Returns the flow mask and the slope codes. */
function flowAndLs(dem: DemGrid, work: Float32Array, options: TerrainOptions, ledger: ByteLedger, step: StepFn): { flowMask: ContributingAreaMask; codes: Uint16Array } {
  const { width: w, height: h } = dem;
  const labels = options.flowBreakLabels;
  const dir = new Uint8Array(w * h); // the fill's closed flags, then D8 directions
  ledger.hold('closed/directions', dir.byteLength);
  const fillStats = { queueBytes: 0 };
  fillDepressions(work, w, h, { inPlace: true, closedScratch: dir, stats: fillStats });
  ledger.mark('fill', fillStats.queueBytes);
  step('fill');

  flowDirectionD8(work, dem, dir);
  ledger.mark('flow-direction');
  step('flow-direction');

  const flowMask = accumulate(dem, work, dir, options, ledger);
  step('flow-accumulation');

  // Slope row by row: each row's Float32 values go to LS and are kept as 2-byte codes.
  const codes = new Uint16Array(w * h);
  ledger.hold('slope codes', codes.byteLength);
  const slopeRow = (r: number, out: Float32Array): void => {
    slopeHornRow(dem, r, out, { computeEdges: options.computeEdges });
    for (let c = 0, i = r * w; c < w; c++, i++) codes[i] = encodeSlopePct(out[c]);
  };
  lsGrid({
    grid: dem,
    slopePct: slopeRow,
    contributingAreaM2: work,
    out: work,
    flowDir: dir,
    rillRatio: options.rillRatio,
    labels,
    maxSlopeLengthMByLabel: options.maxSlopeLengthMByLabel,
  });
  ledger.mark('ls');
  ledger.drop('closed/directions');
  step('ls');
  return { flowMask, codes };
}

/** Contributing area into `work` (unbroken → the mask; then, with labels, broken at their edges). */
function accumulate(dem: DemGrid, work: Float32Array, dir: Uint8Array, options: TerrainOptions, ledger: ByteLedger): ContributingAreaMask {
  const labels = options.flowBreakLabels;
  // The filled DEM is NaN exactly where the DEM is, so the DEM serves as the nodata mask.
  flowAccumulationM2(dir, dem, dem.elevationM, work);
  const flowMask = ContributingAreaMask.fromArea(work, options.concentratedFlowMinAreaM2 ?? DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2);
  ledger.hold('flow mask', flowMask.bits.byteLength);
  ledger.mark('flow-accumulation');
  if (labels) {
    // LS counts only the area inside the same field: accumulate again, broken at labels.
    const breaks = labelFlowBreaks(dir, dem.width, dem.height, labels);
    ledger.hold('flow breaks', breaks.byteLength);
    flowAccumulationM2(dir, dem, dem.elevationM, work, undefined, breaks);
    ledger.mark('field-broken accumulation');
    ledger.drop('flow breaks');
  }
  return flowMask;
}
