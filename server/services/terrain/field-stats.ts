// Terrain figures of one field: the cells whose centre falls inside the field's rings (already
// in the DEM's CRS), their slope statistics and class shares, mean LS, and the cells of
// concentrated flow (contributing area at or above a threshold, default 1 ha: common practice,
// no single source), which are candidates for a grassed waterway.
import { rasterisePolygon, type GridFrame, type Ring } from './rasterise-polygon';
import { DEFAULT_SLOPE_CLASSES, type SlopeClass } from './slope-classes';

export type FieldStatsArgs = {
  /** Polygon rings (outer first, then holes), or several polygons' rings, in the DEM's CRS. */
  rings: ReadonlyArray<Ring>;
  grid: GridFrame;
  slopePct: Float32Array;
  ls?: Float32Array;
  contributingAreaM2?: Float32Array;
  soilLossTPerHaYr?: Float32Array;
  slopeClasses?: ReadonlyArray<SlopeClass>;
  /** Concentrated flow starts at this contributing area (m²); default 10 000 m² = 1 ha. */
  concentratedFlowMinAreaM2?: number;
};

export type FieldTerrainStats = {
  /** Cells inside the field with a slope value. */
  cellCount: number;
  /** Cells inside the field without data (nodata, or the DEM's 1-cell border). */
  cellsWithoutData: number;
  meanSlopePct: number;
  /** 90th percentile, nearest-rank method. */
  p90SlopePct: number;
  slopeClasses: Array<{ name: string; minPct: number; maxPct: number | null; share: number }>;
  meanLS: number | null;
  meanSoilLossTPerHaYr: number | null;
  concentratedFlow: {
    minAreaM2: number;
    cellCount: number;
    /** Cell centres [x, y] in the DEM's CRS. */
    points: Array<[number, number]>;
    /** Row-major cell indices, for a mask. */
    cells: Int32Array;
  };
};

export type FieldStatsResult = { ok: true; stats: FieldTerrainStats } | { ok: false; reason: string };

/** Figures for one field; { ok: false } when the field covers no DEM cell with data. */
export function fieldTerrainStats(args: FieldStatsArgs): FieldStatsResult {
  const { grid, slopePct } = args;
  const n = grid.width * grid.height;
  if (slopePct.length !== n) throw new Error(`slopePct has ${slopePct.length} cells, expected ${n}`);
  const classes = args.slopeClasses ?? DEFAULT_SLOPE_CLASSES;
  const minAreaM2 = args.concentratedFlowMinAreaM2 ?? 10_000;
  const cells = rasterisePolygon(args.rings, grid);
  if (cells.length === 0) return { ok: false, reason: 'the field covers no cell of the elevation model' };
  const values = new Float32Array(cells.length);
  const counts = new Float64Array(classes.length);
  let count = 0, sum = 0, lsSum = 0, lsCount = 0, aSum = 0, aCount = 0;
  const flowCells: number[] = [];
  for (let k = 0; k < cells.length; k++) {
    const i = cells[k];
    const s = slopePct[i];
    if (s === s) {
      values[count++] = s;
      sum += s;
      counts[classIndex(classes, s)]++;
    }
    if (args.ls) { const v = args.ls[i]; if (v === v) { lsSum += v; lsCount++; } }
    if (args.soilLossTPerHaYr) { const v = args.soilLossTPerHaYr[i]; if (v === v) { aSum += v; aCount++; } }
    if (args.contributingAreaM2 && args.contributingAreaM2[i] >= minAreaM2) flowCells.push(i);
  }
  if (count === 0) return { ok: false, reason: 'the field covers only nodata cells of the elevation model' };
  const sorted = values.subarray(0, count).sort();
  // nearest rank: the ⌈0.9·n⌉-th smallest value
  const p90 = sorted[Math.max(0, Math.ceil(0.9 * count) - 1)];
  const flowIdx = Int32Array.from(flowCells);
  return {
    ok: true,
    stats: {
      cellCount: count,
      cellsWithoutData: cells.length - count,
      meanSlopePct: sum / count,
      p90SlopePct: p90,
      slopeClasses: classes.map((c, j) => ({ name: c.name, minPct: c.minPct, maxPct: c.maxPct, share: counts[j] / count })),
      meanLS: lsCount > 0 ? lsSum / lsCount : null,
      meanSoilLossTPerHaYr: aCount > 0 ? aSum / aCount : null,
      concentratedFlow: {
        minAreaM2,
        cellCount: flowIdx.length,
        points: Array.from(flowIdx, (i) => cellCentre(grid, i)),
        cells: flowIdx,
      },
    },
  };
}

function classIndex(classes: ReadonlyArray<SlopeClass>, s: number): number {
  for (let j = classes.length - 1; j > 0; j--) if (s >= classes[j].minPct) return j;
  return 0;
}

/** Map coordinates of a cell's centre. */
export function cellCentre(grid: GridFrame, i: number): [number, number] {
  const r = Math.floor(i / grid.width), c = i - r * grid.width;
  return [grid.originX + (c + 0.5) * grid.cellSizeX, grid.originY - (r + 0.5) * grid.cellSizeY];
}
