// Terrain figures of one field: the cells whose centre falls inside the field's rings (already
// in the DEM's CRS), their slope statistics and class shares, mean LS, and the cells of
// concentrated flow (contributing area at or above a threshold, default 1 ha: common practice,
// no single source), which are candidates for a grassed waterway.
// Slope may come as a Float32 grid or as the pipeline's 2-byte codes (slope-pct-grid.ts): then
// mean and 90th percentile are within 0.005 % of the Float32 figures and class shares are the
// same (breaks on a 0.005 % grid). Concentrated flow may come as the area grid or as its mask.
import { ContributingAreaMask, DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2 } from './contributing-area-mask';
import { polygonSpans, spanCellCount, type GridFrame, type Ring } from './rasterise-polygon';
import { DEFAULT_SLOPE_CLASSES, type SlopeClass } from './slope-classes';
import { decodeSlopePct, SLOPE_CODE_NODATA, slopeCodeAtLeast, SlopePctGrid } from './slope-pct-grid';

export type FieldStatsArgs = {
  /** Polygon rings (outer first, then holes), or several polygons' rings, in the DEM's CRS. */
  rings: ReadonlyArray<Ring>;
  grid: GridFrame;
  slopePct: Float32Array | SlopePctGrid;
  ls?: Float32Array;
  /** Contributing area (m²), or the pipeline's mask of where it reaches the threshold. */
  contributingAreaM2?: Float32Array | ContributingAreaMask;
  soilLossTPerHaYr?: Float32Array;
  slopeClasses?: ReadonlyArray<SlopeClass>;
  /** Concentrated flow starts at this contributing area (m²); default 10 000 m² = 1 ha, or the mask's. */
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

/** Cells per slope code of the field being counted, left all zero between calls. */
const codeCounts = new Uint32Array(SLOPE_CODE_NODATA);

export type FieldStatsResult = { ok: true; stats: FieldTerrainStats } | { ok: false; reason: string };

/** Figures for one field; { ok: false } when the field covers no DEM cell with data. */
export function fieldTerrainStats(args: FieldStatsArgs): FieldStatsResult {
  const { grid, slopePct } = args;
  const n = grid.width * grid.height;
  if (slopePct.length !== n) throw new Error(`slopePct has ${slopePct.length} cells, expected ${n}`);
  const classes = args.slopeClasses ?? DEFAULT_SLOPE_CLASSES;
  const area = args.contributingAreaM2;
  const mask = area instanceof ContributingAreaMask ? area : null;
  if (mask && mask.length !== n) throw new Error(`contributingAreaM2 has ${mask.length} cells, expected ${n}`);
  if (mask && args.concentratedFlowMinAreaM2 !== undefined && args.concentratedFlowMinAreaM2 !== mask.minAreaM2) {
    throw new Error(`concentratedFlowMinAreaM2 is ${args.concentratedFlowMinAreaM2} m² but the mask was made at ${mask.minAreaM2} m²`);
  }
  const minAreaM2 = mask ? mask.minAreaM2 : (args.concentratedFlowMinAreaM2 ?? DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2);
  const areaGrid = mask ? null : (area as Float32Array | undefined);
  const spans = polygonSpans(args.rings, grid);
  const cellsInside = spanCellCount(spans);
  if (cellsInside === 0) return { ok: false, reason: 'the field covers no cell of the elevation model' };
  const coded = slopePct instanceof SlopePctGrid ? slopePct.codes : null;
  const floats = coded ? null : (slopePct as Float32Array);
  // Codes sort in the order of their slopes, so the percentile is read from a count of each code;
  // Float32 slopes are sorted.
  const values = coded ? null : new Float32Array(cellsInside);
  let minCode = SLOPE_CODE_NODATA, maxCode = 0;
  const counts = new Float64Array(classes.length);
  const pctBreaks = classes.map((c) => c.minPct);
  const codeBreaks = pctBreaks.map(slopeCodeAtLeast);
  let count = 0, sum = 0, lsSum = 0, lsCount = 0, aSum = 0, aCount = 0;
  const flowCells: number[] = [];
  for (let k = 0; k < spans.length; k += 2) {
    for (let i = spans[k], end = spans[k + 1]; i < end; i++) {
      if (coded) {
        const code = coded[i];
        if (code !== SLOPE_CODE_NODATA) {
          count++;
          codeCounts[code]++;
          if (code < minCode) minCode = code;
          if (code > maxCode) maxCode = code;
          sum += decodeSlopePct(code);
          counts[classIndex(codeBreaks, code)]++;
        }
      } else {
        const s = floats![i];
        if (s === s) {
          values![count++] = s;
          sum += s;
          counts[classIndex(pctBreaks, s)]++;
        }
      }
      if (args.ls) { const v = args.ls[i]; if (v === v) { lsSum += v; lsCount++; } }
      if (args.soilLossTPerHaYr) { const v = args.soilLossTPerHaYr[i]; if (v === v) { aSum += v; aCount++; } }
      if (mask ? mask.has(i) : areaGrid && areaGrid[i] >= minAreaM2) flowCells.push(i);
    }
  }
  if (count === 0) return { ok: false, reason: 'the field covers only nodata cells of the elevation model' };
  // nearest rank: the ⌈0.9·n⌉-th smallest value
  const rankAt = Math.max(0, Math.ceil(0.9 * count) - 1);
  let p90: number;
  if (coded) {
    let code = minCode;
    for (let seen = codeCounts[code]; seen <= rankAt; ) seen += codeCounts[++code];
    p90 = decodeSlopePct(code);
    codeCounts.fill(0, minCode, maxCode + 1);
  } else {
    p90 = values!.subarray(0, count).sort()[rankAt];
  }
  const flowIdx = Int32Array.from(flowCells);
  return {
    ok: true,
    stats: {
      cellCount: count,
      cellsWithoutData: cellsInside - count,
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

/** Index of the class a value falls in, given each class's lower limit (in the value's units). */
function classIndex(minima: ReadonlyArray<number>, v: number): number {
  for (let j = minima.length - 1; j > 0; j--) if (v >= minima[j]) return j;
  return 0;
}

/** Map coordinates of a cell's centre. */
export function cellCentre(grid: GridFrame, i: number): [number, number] {
  const r = Math.floor(i / grid.width), c = i - r * grid.width;
  return [grid.originX + (c + 0.5) * grid.cellSizeX, grid.originY - (r + 0.5) * grid.cellSizeY];
}
