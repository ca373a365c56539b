// Reads a single-band GeoTIFF elevation model (geotiff.js v3) into a DemGrid: the header
// (read-dem-header.ts: size, geotransform, nodata, EPSG code, per-row metric cell sizes), then
// the rasters, with nodata turned into NaN.
import { readDemHeader, type DemHeaderProblem } from './read-dem-header';
import type { DemGrid } from './types';

export type ReadDemResult = { ok: true; dem: DemGrid } | { ok: false; problem: DemHeaderProblem; reason: string };

/** Reads a GeoTIFF from its bytes. Expected failures come back as { ok: false, reason }. */
export async function readDem(bytes: ArrayBuffer | Uint8Array, maxCells = Infinity): Promise<ReadDemResult> {
  const read = await readDemHeader(bytes, maxCells);
  if (!read.ok) return read;
  const { header, image } = read;
  let raw: ArrayLike<number>;
  try {
    raw = (await image.readRasters({ samples: [0], interleave: true })) as unknown as ArrayLike<number>;
  } catch (e) {
    return { ok: false, problem: 'invalid', reason: `the cells cannot be decoded: ${(e as Error).message}` };
  }
  return { ok: true, dem: { ...header, elevationM: toFloat32(raw, header.nodata) } };
}

function toFloat32(raw: ArrayLike<number>, nodata: number | null): Float32Array {
  const out = raw instanceof Float32Array ? raw : Float32Array.from(raw);
  if (nodata === null || Number.isNaN(nodata)) return out;
  // Compare in Float32 so a nodata written as "-3.4028234663852886e+38" still matches.
  const nd = Math.fround(nodata);
  for (let i = 0; i < out.length; i++) if (out[i] === nd) out[i] = NaN;
  return out;
}
