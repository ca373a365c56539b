// Small grid builders for the terrain tests.
import { projectedDem, type DemGrid } from '../../../server/services/terrain/types';

/** A DEM from a function of map x, y (cell centres), origin (0, 0) at the south-west corner. */
export function demFromFunction(width: number, height: number, cellSizeM: number, f: (x: number, y: number) => number): DemGrid {
  const z = new Float32Array(width * height);
  for (let r = 0; r < height; r++) {
    for (let c = 0; c < width; c++) z[r * width + c] = f((c + 0.5) * cellSizeM, (height - r - 0.5) * cellSizeM);
  }
  return projectedDem({ width, height, elevationM: z, cellSizeM, originX: 0, originY: height * cellSizeM });
}

/** A DEM from rows of numbers, north row first. */
export function demFromRows(rows: number[][], cellSizeM = 1): DemGrid {
  const height = rows.length, width = rows[0].length;
  return projectedDem({ width, height, elevationM: Float32Array.from(rows.flat()), cellSizeM, originX: 0, originY: height * cellSizeM });
}

/** Deterministic pseudo-random numbers in [0, 1) (Park–Miller). */
export function seededRandom(seed: number): () => number {
  let s = seed;
  return () => (s = (s * 16807) % 2147483647) / 2147483647;
}
