// Shared shapes of the terrain pipeline. Grids are row-major, row 0 at the north edge,
// with NaN for nodata in Float32 grids.

/** An elevation model held in memory, ready for the pipeline. */
export type DemGrid = {
  width: number;
  height: number;
  /** Elevations in metres, row-major from the north-west corner; NaN = nodata. */
  elevationM: Float32Array;
  /** Map x of the grid's west edge (CRS units). */
  originX: number;
  /** Map y of the grid's north edge (CRS units). */
  originY: number;
  /** Cell width in CRS units (positive). */
  cellSizeX: number;
  /** Cell height in CRS units (positive; rows go south). */
  cellSizeY: number;
  /** EPSG code of the horizontal CRS. */
  epsg: number;
  /** True when the CRS is geographic (degrees); metric cell sizes are then per row. */
  geographic: boolean;
  /** Metric east-west cell size of each row, metres (constant for a projected CRS). */
  rowCellSizeXM: Float64Array;
  /** Metric north-south cell size of each row, metres (constant for a projected CRS). */
  rowCellSizeYM: Float64Array;
  /** The nodata value named in the file, if any (already turned into NaN in elevationM). */
  nodata: number | null;
};

/** Progress callback: fraction 0..1 of the whole run, and the stage just finished or started. */
export type ProgressFn = (fraction: number, stage: string) => void;

/** Builds a DemGrid for a projected grid with square or rectangular metric cells. */
export function projectedDem(args: {
  width: number;
  height: number;
  elevationM: Float32Array;
  originX?: number;
  originY?: number;
  cellSizeM: number;
  cellSizeYM?: number;
  epsg?: number;
}): DemGrid {
  const { width, height, elevationM, cellSizeM } = args;
  if (!Number.isInteger(width) || width < 1 || !Number.isInteger(height) || height < 1) {
    throw new Error(`width and height must be positive integers, got ${width} x ${height}`);
  }
  if (elevationM.length !== width * height) {
    throw new Error(`elevationM has ${elevationM.length} cells, expected ${width * height}`);
  }
  const cellSizeYM = args.cellSizeYM ?? cellSizeM;
  if (!(cellSizeM > 0) || !(cellSizeYM > 0)) throw new Error(`cell sizes must be > 0, got ${cellSizeM}, ${cellSizeYM}`);
  return {
    width,
    height,
    elevationM,
    originX: args.originX ?? 0,
    originY: args.originY ?? height * cellSizeYM,
    cellSizeX: cellSizeM,
    cellSizeY: cellSizeYM,
    epsg: args.epsg ?? 32615,
    geographic: false,
    rowCellSizeXM: new Float64Array(height).fill(cellSizeM),
    rowCellSizeYM: new Float64Array(height).fill(cellSizeYM),
    nodata: null,
  };
}
