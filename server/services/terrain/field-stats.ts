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
  /**
   * At most this many concentrated-flow points, every ⌈cells / maxFlowPoints⌉-th cell from the
   * first (a map needs no more); default all of them. `cells` always lists every cell.
   */
  maxFlowPoints?: number;
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

/** Slope figures of the cells in spans: count with data, sum, 90th percentile, cells per class. */
type SlopeFigures = { count: number; meanPct: number; p90Pct: number; classCounts: Float64Array };

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
  if (args.maxFlowPoints !== undefined && !(Number.isInteger(args.maxFlowPoints) && args.maxFlowPoints >= 1)) {
    throw new Error(`maxFlowPoints must be a whole number >= 1, got ${args.maxFlowPoints}`);
  }
  const minAreaM2 = mask ? mask.minAreaM2 : (args.concentratedFlowMinAreaM2 ?? DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2);
  const spans = polygonSpans(args.rings, grid);
  const cellsInside = spanCellCount(spans);
  if (cellsInside === 0) return { ok: false, reason: 'the field covers no cell of the elevation model' };
  const slope = slopePct instanceof SlopePctGrid ? codedSlopeFigures(slopePct.codes, spans, classes) : floatSlopeFigures(slopePct, spans, classes, cellsInside);
  if (slope.count === 0) return { ok: false, reason: 'the field covers only nodata cells of the elevation model' };
  const flowIdx = mask ? maskCells(mask.bits, spans) : area ? cellsAtLeast(area as Float32Array, minAreaM2, spans) : new Int32Array(0);
  const every = args.maxFlowPoints === undefined ? 1 : Math.max(1, Math.ceil(flowIdx.length / args.maxFlowPoints));
  const points = new Array<[number, number]>(Math.ceil(flowIdx.length / every));
  for (let k = 0, j = 0; k < flowIdx.length; k += every) points[j++] = cellCentre(grid, flowIdx[k]);
  return {
    ok: true,
    stats: {
      cellCount: slope.count,
      cellsWithoutData: cellsInside - slope.count,
      meanSlopePct: slope.meanPct,
      p90SlopePct: slope.p90Pct,
      slopeClasses: classes.map((c, j) => ({ name: c.name, minPct: c.minPct, maxPct: c.maxPct, share: slope.classCounts[j] / slope.count })),
      meanLS: args.ls ? meanOver(args.ls, spans) : null,
      meanSoilLossTPerHaYr: args.soilLossTPerHaYr ? meanOver(args.soilLossTPerHaYr, spans) : null,
      concentratedFlow: { minAreaM2, cellCount: flowIdx.length, points, cells: flowIdx },
    },
  };
}

/**
 * Slope figures from 2-byte codes: the cells of each code are counted, and the percentile and
 * class shares read from the counts (the codes sort in the order of their slopes), up to the
 * highest class break or the percentile, whichever is further; the cells above are the rest.
 * The codes' 0.01 % steps add up to a whole number, so the mean is exact up to its one division.
 */
function codedSlopeFigures(codes: Uint16Array, spans: Int32Array, classes: ReadonlyArray<SlopeClass>): SlopeFigures {
  const counts = codeCounts;
  let count = 0, hundredths = 0;
  for (let k = 0; k < spans.length; k += 2) {
    for (let i = spans[k], end = spans[k + 1]; i < end; i++) {
      const code = codes[i];
      if (code === SLOPE_CODE_NODATA) continue;
      counts[code]++;
      count++;
      // decodeSlopePct(code) = ((code + 1) >> 1) / 100: hundredths of a percent
      hundredths += (code + 1) >> 1;
    }
  }
  const classCounts = new Float64Array(classes.length);
  if (count === 0) return { count, meanPct: NaN, p90Pct: NaN, classCounts };
  // Class j holds codes from codeBreaks[j] (class 0 from 0) up to the next class's.
  const codeBreaks = classes.map((c, j) => (j === 0 ? 0 : slopeCodeAtLeast(c.minPct)));
  // nearest rank: the ⌈0.9·n⌉-th smallest value
  const rankAt = Math.max(0, Math.ceil(0.9 * count) - 1);
  // Classes as parseSlopeClasses allows them go up; any others are looked up code by code.
  const rising = codeBreaks.every((b, j) => j === 0 || b >= codeBreaks[j - 1]);
  let p90Code = -1, seen = 0, j = 0, code = 0;
  for (; code < SLOPE_CODE_NODATA; code++) {
    if (!rising) j = classIndex(codeBreaks, code);
    else while (j + 1 < codeBreaks.length && code >= codeBreaks[j + 1]) j++;
    if (p90Code >= 0 && rising && j === codeBreaks.length - 1) break; // the rest all fall in the last class
    const m = counts[code];
    counts[code] = 0;
    seen += m;
    classCounts[j] += m;
    if (p90Code < 0 && seen > rankAt) p90Code = code;
  }
  classCounts[codeBreaks.length - 1] += count - seen;
  // The counts are left all zero: those not read above, up to the last cell counted.
  for (let rest = count - seen; rest > 0; code++) {
    rest -= counts[code];
    counts[code] = 0;
  }
  return { count, meanPct: hundredths / (100 * count), p90Pct: decodeSlopePct(p90Code), classCounts };
}

/** Slope figures from Float32 slope %: the values are copied out and sorted for the percentile. */
function floatSlopeFigures(slope: Float32Array, spans: Int32Array, classes: ReadonlyArray<SlopeClass>, cellsInside: number): SlopeFigures {
  const values = new Float32Array(cellsInside);
  const classCounts = new Float64Array(classes.length);
  const minima = classes.map((c) => c.minPct);
  let count = 0, sum = 0;
  for (let k = 0; k < spans.length; k += 2) {
    for (let i = spans[k], end = spans[k + 1]; i < end; i++) {
      const s = slope[i];
      if (s !== s) continue;
      values[count++] = s;
      sum += s;
      classCounts[classIndex(minima, s)]++;
    }
  }
  // nearest rank: the ⌈0.9·n⌉-th smallest value
  const rankAt = Math.max(0, Math.ceil(0.9 * count) - 1);
  return { count, meanPct: sum / count, p90Pct: count > 0 ? values.subarray(0, count).sort()[rankAt] : NaN, classCounts };
}

/** Mean of the values with data (not NaN) in spans, null when there are none. */
function meanOver(values: Float32Array, spans: Int32Array): number | null {
  let sum = 0, count = 0;
  for (let k = 0; k < spans.length; k += 2) {
    for (let i = spans[k], end = spans[k + 1]; i < end; i++) {
      const v = values[i];
      if (v === v) {
        sum += v;
        count++;
      }
    }
  }
  return count > 0 ? sum / count : null;
}

/** A growing list of cell indices. */
class CellList {
  private cells = new Int32Array(64);
  private n = 0;

  push(i: number): void {
    if (this.n === this.cells.length) {
      const bigger = new Int32Array(2 * this.n);
      bigger.set(this.cells);
      this.cells = bigger;
    }
    this.cells[this.n++] = i;
  }

  toArray(): Int32Array {
    return this.cells.slice(0, this.n);
  }
}

/** The cells in spans whose mask bit is set, a byte of the mask at a time, set bits only. */
function maskCells(bits: Uint8Array, spans: Int32Array): Int32Array {
  const out = new CellList();
  for (let k = 0; k < spans.length; k += 2) {
    for (let i = spans[k], end = spans[k + 1]; i < end; i = (i | 7) + 1) {
      let rest = bits[i >> 3] >> (i & 7); // this byte's bits from cell i on
      while (rest !== 0) {
        const cell = i + 31 - Math.clz32(rest & -rest); // the lowest set bit
        if (cell >= end) break;
        out.push(cell);
        rest &= rest - 1;
      }
    }
  }
  return out.toArray();
}

/** The cells in spans whose contributing area reaches minAreaM2. */
function cellsAtLeast(areaM2: Float32Array, minAreaM2: number, spans: Int32Array): Int32Array {
  const out = new CellList();
  for (let k = 0; k < spans.length; k += 2) {
    for (let i = spans[k], end = spans[k + 1]; i < end; i++) if (areaM2[i] >= minAreaM2) out.push(i);
  }
  return out.toArray();
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
