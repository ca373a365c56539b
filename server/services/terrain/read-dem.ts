// Reads a single-band GeoTIFF elevation model (geotiff.js v3) into a DemGrid: the header
// (read-dem-header.ts: size, geotransform, nodata, EPSG code, per-row metric cell sizes), then
// the rasters, with nodata turned into NaN.
// An uncompressed Float32 file in the machine's byte order (what GDAL and write-geotiff.ts write)
// is read where it lies: the grid is a view on the file's own bytes, so a DEM costs its file and
// nothing more. Every other layout is decoded by geotiff.js into a grid of its own.
import { endianness } from 'node:os';
import type { GeoTIFFImage } from 'geotiff';
import { readDemHeader, type DemHeaderProblem } from './read-dem-header';
import type { DemGrid } from './types';

export type ReadDemResult = { ok: true; dem: DemGrid } | { ok: false; problem: DemHeaderProblem; reason: string };

/**
 * Reads a GeoTIFF from its bytes. Expected failures come back as { ok: false, reason }.
 * An ArrayBuffer is taken over: `elevationM` may be a view on it, written in place (nodata to NaN,
 * samples moved to a 4-byte boundary), so the caller must not use it afterwards. A Uint8Array is
 * copied first and left as it was.
 */
export async function readDem(bytes: ArrayBuffer | Uint8Array, maxCells = Infinity): Promise<ReadDemResult> {
  const buffer = bytes instanceof Uint8Array ? new Uint8Array(bytes).buffer : bytes;
  const read = await readDemHeader(buffer, maxCells);
  if (!read.ok) return read;
  const { header, image } = read;
  let raw: ArrayLike<number>;
  try {
    raw = (await float32InPlace(image, buffer)) ?? ((await image.readRasters({ samples: [0], interleave: true })) as unknown as ArrayLike<number>);
  } catch (e) {
    return { ok: false, problem: 'invalid', reason: `the cells cannot be decoded: ${(e as Error).message}` };
  }
  return { ok: true, dem: { ...header, elevationM: toFloat32(raw, header.nodata) } };
}

/**
 * The samples of an uncompressed single-band Float32 GeoTIFF stored in strips, in file order, in
 * the machine's byte order, as a view on the file's buffer. A Float32Array must start on a 4-byte
 * boundary, so strips that do not lie end to end from one (GDAL starts them where its header
 * ends) are first moved down within the buffer, each to the end of the one before: a move never
 * reaches bytes not yet moved, and overwrites only the header (read already) and gaps.
 * Null, with the buffer untouched, for any other layout: readRasters reads those.
 */
async function float32InPlace(image: GeoTIFFImage, buffer: ArrayBuffer): Promise<Float32Array | null> {
  const dir = image.getFileDirectory();
  const plain = Number(dir.getValue('Compression') ?? 1) === 1 && image.getSamplesPerPixel() === 1 && image.getSampleFormat(0) === 3 && image.getBitsPerSample(0) === 32;
  if (!plain || image.isTiled || image.littleEndian !== (endianness() === 'LE')) return null;
  const offsets = Array.from((await dir.loadValue('StripOffsets')) as ArrayLike<number | bigint>, Number);
  const counts = Array.from((await dir.loadValue('StripByteCounts')) as ArrayLike<number | bigint>, Number);
  const cells = image.getWidth() * image.getHeight();
  const bytes = cells * 4;
  // Strips needed, each after the one before and inside the file.
  const lengths: number[] = [];
  for (let k = 0, at = 0, end = 0; at < bytes; k++) {
    if (k >= offsets.length || !(counts[k] > 0) || offsets[k] < end || offsets[k] + Math.min(counts[k], bytes - at) > buffer.byteLength) return null;
    lengths.push(Math.min(counts[k], bytes - at));
    at += lengths[k];
    end = offsets[k] + lengths[k];
  }
  const base = offsets[0] - (offsets[0] % 4);
  const u8 = new Uint8Array(buffer);
  for (let k = 0, at = base; k < lengths.length; at += lengths[k++]) {
    if (offsets[k] !== at) u8.copyWithin(at, offsets[k], offsets[k] + lengths[k]);
  }
  return new Float32Array(buffer, base, cells);
}

function toFloat32(raw: ArrayLike<number>, nodata: number | null): Float32Array {
  const out = raw instanceof Float32Array ? raw : Float32Array.from(raw);
  if (nodata === null || Number.isNaN(nodata)) return out;
  // Compare in Float32 so a nodata written as "-3.4028234663852886e+38" still matches.
  const nd = Math.fround(nodata);
  for (let i = 0; i < out.length; i++) if (out[i] === nd) out[i] = NaN;
  return out;
}
