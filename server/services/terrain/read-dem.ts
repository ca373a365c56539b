// Reads a single-band GeoTIFF elevation model (geotiff.js v3) into a DemGrid: the header
// (read-dem-header.ts: size, geotransform, nodata, EPSG code, per-row metric cell sizes), then
// the rasters, with nodata turned into NaN.
import { endianness } from 'node:os';
import type { GeoTIFFImage } from 'geotiff';
import { readDemHeader, type DemHeaderProblem } from './read-dem-header';
import type { DemGrid } from './types';

export type ReadDemResult = { ok: true; dem: DemGrid } | { ok: false; problem: DemHeaderProblem; reason: string };

/** Reads a GeoTIFF from its bytes. Expected failures come back as { ok: false, reason }. */
export async function readDem(bytes: ArrayBuffer | Uint8Array, maxCells = Infinity): Promise<ReadDemResult> {
  const read = await readDemHeader(bytes, maxCells);
  if (!read.ok) return read;
  const { header, image, buffer } = read;
  let raw: ArrayLike<number>;
  try {
    raw = (await uncompressedFloat32(image, buffer)) ?? ((await image.readRasters({ samples: [0], interleave: true })) as unknown as ArrayLike<number>);
  } catch (e) {
    return { ok: false, problem: 'invalid', reason: `the cells cannot be decoded: ${(e as Error).message}` };
  }
  return { ok: true, dem: { ...header, elevationM: toFloat32(raw, header.nodata) } };
}

/**
 * The samples of an uncompressed single-band Float32 GeoTIFF stored in strips in the machine's
 * byte order, copied straight from the file's bytes into one grid (geotiff.js would copy each
 * strip out first, then into the grid). Null for any other layout: readRasters reads those.
 */
async function uncompressedFloat32(image: GeoTIFFImage, buffer: ArrayBuffer): Promise<Float32Array | null> {
  const dir = image.getFileDirectory();
  const plain = Number(dir.getValue('Compression') ?? 1) === 1 && image.getSamplesPerPixel() === 1 && image.getSampleFormat(0) === 3 && image.getBitsPerSample(0) === 32;
  if (!plain || image.isTiled || image.littleEndian !== (endianness() === 'LE')) return null;
  const offsets = (await dir.loadValue('StripOffsets')) as ArrayLike<number>;
  const counts = (await dir.loadValue('StripByteCounts')) as ArrayLike<number>;
  const bytes = image.getWidth() * image.getHeight() * 4;
  const out = new Float32Array(bytes / 4);
  const outBytes = new Uint8Array(out.buffer);
  let at = 0;
  for (let k = 0; k < offsets.length && at < bytes; k++) {
    const len = Math.min(counts[k], bytes - at);
    if (offsets[k] + len > buffer.byteLength) return null;
    outBytes.set(new Uint8Array(buffer, offsets[k], len), at);
    at += len;
  }
  return at === bytes ? out : null;
}

function toFloat32(raw: ArrayLike<number>, nodata: number | null): Float32Array {
  const out = raw instanceof Float32Array ? raw : Float32Array.from(raw);
  if (nodata === null || Number.isNaN(nodata)) return out;
  // Compare in Float32 so a nodata written as "-3.4028234663852886e+38" still matches.
  const nd = Math.fround(nodata);
  for (let i = 0; i < out.length; i++) if (out[i] === nd) out[i] = NaN;
  return out;
}
