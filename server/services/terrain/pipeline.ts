// The whole terrain run on one DEM: Horn slope and hillshade from the DEM as given, then
// Priority-Flood+ε filling, D8 directions, contributing area, Desmet–Govers × RUSLE LS, and,
// when R, K, C, P are given, per-cell soil loss. Synchronous and pure; progress is reported
// between stages with the fraction of the run's typical time done so far.
// Memory: the filled DEM is a working copy that becomes the contributing-area grid once the
// directions are known, so the run holds 4 (slope) + 1 (hillshade) + 1 (direction) + 4 (area)
// + 4 (LS) bytes per cell of results, plus 1 byte per cell of scratch at a time.
import type { RillRatio } from '../../../shared/erosion/slope-length';
import { fillDepressions } from './fill-depressions';
import { flowAccumulationM2, flowDirectionD8 } from './flow-d8';
import { hillshade } from './hillshade';
import { lsGrid } from './ls-grid';
import { slopeHorn } from './slope-horn';
import { soilLossGrid, type SoilLossFactors } from './soil-loss-grid';
import type { DemGrid, ProgressFn } from './types';

export type TerrainOptions = {
  onProgress?: ProgressFn;
  rillRatio?: RillRatio;
  /** Scalar R, K, C, P for a soil-loss grid (omit to skip it). */
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
  flowBreakLabels?: Int32Array;
  /** With flowBreakLabels: a longest slope length per label for LS (NaN = only the 305 m cap). */
  maxSlopeLengthMByLabel?: Float64Array;
};

export type TerrainGrids = {
  width: number;
  height: number;
  slopePct: Float32Array;
  hillshade: Uint8Array | null;
  /** D8 receiver codes, see flow-d8.ts. */
  flowDir: Uint8Array;
  /** Contributing area including the cell, m². A_in = this − cell area (inletAreaM2()). */
  contributingAreaM2: Float32Array;
  ls: Float32Array;
  soilLossTPerHaYr: Float32Array | null;
};

// Share of a typical run's time taken by each stage (from scripts/bench-terrain.ts).
const STAGES = [
  ['slope', 0.03],
  ['hillshade', 0.04],
  ['fill', 0.5],
  ['flow-direction', 0.13],
  ['flow-accumulation', 0.1],
  ['ls', 0.17],
  ['soil-loss', 0.03],
] as const;

/** Runs every stage on `dem`; the DEM itself is not modified. */
export function runTerrain(dem: DemGrid, options: TerrainOptions = {}): TerrainGrids {
  const progress = options.onProgress ?? (() => {});
  let done = 0;
  const step = (name: (typeof STAGES)[number][0]): void => {
    done += STAGES.find((s) => s[0] === name)![1];
    progress(Math.min(1, done), name);
  };
  progress(0, 'start');
  const slopePct = slopeHorn(dem, { computeEdges: options.computeEdges });
  step('slope');
  const shade = options.skipHillshade ? null : hillshade(dem);
  step('hillshade');
  const filled = fillDepressions(dem.elevationM, dem.width, dem.height);
  step('fill');
  const flowDir = flowDirectionD8(filled, dem);
  step('flow-direction');
  const contributingAreaM2 = flowAccumulationM2(flowDir, dem, filled, filled);
  step('flow-accumulation');
  const lsAreaM2 = options.flowBreakLabels ? flowAccumulationM2(flowDir, dem, contributingAreaM2, undefined, options.flowBreakLabels) : contributingAreaM2;
  const ls = lsGrid({
    grid: dem,
    slopePct,
    contributingAreaM2: lsAreaM2,
    flowDir,
    rillRatio: options.rillRatio,
    labels: options.flowBreakLabels,
    maxSlopeLengthMByLabel: options.maxSlopeLengthMByLabel,
  });
  step('ls');
  const soilLoss = options.soilLossFactors ? soilLossGrid(ls, options.soilLossFactors) : null;
  step('soil-loss');
  progress(1, 'done');
  return {
    width: dem.width,
    height: dem.height,
    slopePct,
    hillshade: shade,
    flowDir,
    contributingAreaM2,
    ls,
    soilLossTPerHaYr: soilLoss,
  };
}
