// Reads a single-band GeoTIFF elevation model (geotiff.js v3) into a DemGrid: size,
// geotransform, nodata (turned into NaN) and the EPSG code from the GeoKeys. Geographic DEMs
// get per-row metric cell sizes on WGS84 so slope comes out in true percent.
// Assumptions, documented: elevations are metres; projected CRSs in feet are converted to metres
// (ProjLinearUnitsGeoKey 9002/9003); rotated/sheared grids are refused.
import { endianness } from 'node:os';
import { fromArrayBuffer, type GeoTIFFImage } from 'geotiff';
import { geographicCellSizeM } from './geographic-cell-size';
import type { DemGrid } from './types';

export type ReadDemResult = { ok: true; dem: DemGrid } | { ok: false; reason: string };

const USER_DEFINED = 32767;
const FOOT_M: Record<number, number> = { 9002: 0.3048, 9003: 1200 / 3937 };

/** Reads a GeoTIFF from its bytes. Expected failures come back as { ok: false, reason }. */
export async function readDem(bytes: ArrayBuffer | Uint8Array): Promise<ReadDemResult> {
  const buffer =
    bytes instanceof Uint8Array
      ? (bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer)
      : bytes;
  const magic = new Uint8Array(buffer, 0, Math.min(4, buffer.byteLength));
  const isTiff =
    magic.length === 4 &&
    ((magic[0] === 0x49 && magic[1] === 0x49 && (magic[2] === 42 || magic[2] === 43)) ||
      (magic[0] === 0x4d && magic[1] === 0x4d && (magic[3] === 42 || magic[3] === 43)));
  if (!isTiff) return { ok: false, reason: 'not a GeoTIFF: the file does not start with a TIFF header' };
  let image;
  try {
    const tiff = await fromArrayBuffer(buffer);
    image = await tiff.getImage();
  } catch (e) {
    return { ok: false, reason: `not a GeoTIFF: ${(e as Error).message}` };
  }
  const keys = image.getGeoKeys() ?? {};
  const projected = Number(keys.ProjectedCSTypeGeoKey ?? 0);
  const geographicCode = Number(keys.GeographicTypeGeoKey ?? 0);
  const geographic = !(projected > 0 && projected !== USER_DEFINED) && geographicCode > 0 && geographicCode !== USER_DEFINED;
  const epsg = geographic ? geographicCode : projected;
  if (!(epsg > 0) || epsg === USER_DEFINED) {
    return { ok: false, reason: 'no CRS: the GeoTIFF names no EPSG code (ProjectedCSTypeGeoKey or GeographicTypeGeoKey)' };
  }
  const format = image.getSampleFormat(0);
  const bits = image.getBitsPerSample(0);
  const supported = (format === 3 && (bits === 32 || bits === 64)) || ((format === 1 || format === 2) && bits >= 8 && bits <= 32);
  if (!supported) {
    return { ok: false, reason: `unsupported sample type: format ${format}, ${bits} bits (use Float32, Int16 or similar)` };
  }
  const transform = image.getFileDirectory().getValue('ModelTransformation') as number[] | undefined;
  if (transform && (transform[1] !== 0 || transform[4] !== 0)) {
    return { ok: false, reason: 'unsupported grid: rotated or sheared geotransform' };
  }
  let origin: number[];
  let resolution: number[];
  try {
    origin = image.getOrigin();
    resolution = image.getResolution();
  } catch {
    return { ok: false, reason: 'no geotransform: the GeoTIFF has no tie point and pixel scale' };
  }
  const width = image.getWidth();
  const height = image.getHeight();
  const raw = (await uncompressedFloat32(image, buffer)) ?? ((await image.readRasters({ samples: [0], interleave: true })) as unknown as ArrayLike<number>);
  const nodata = image.getGDALNoData();
  const elevationM = toFloat32(raw, nodata);
  const cellSizeX = Math.abs(resolution[0]);
  const cellSizeY = Math.abs(resolution[1]);
  const rowCellSizeXM = new Float64Array(height);
  const rowCellSizeYM = new Float64Array(height);
  if (geographic) {
    for (let r = 0; r < height; r++) {
      const latDeg = origin[1] - (r + 0.5) * cellSizeY;
      const { xM, yM } = geographicCellSizeM(latDeg, cellSizeX, cellSizeY);
      rowCellSizeXM[r] = xM;
      rowCellSizeYM[r] = yM;
    }
  } else {
    const unit = FOOT_M[Number(keys.ProjLinearUnitsGeoKey)] ?? 1;
    rowCellSizeXM.fill(cellSizeX * unit);
    rowCellSizeYM.fill(cellSizeY * unit);
  }
  return {
    ok: true,
    dem: {
      width,
      height,
      elevationM,
      originX: origin[0],
      originY: origin[1],
      cellSizeX,
      cellSizeY,
      epsg,
      geographic,
      rowCellSizeXM,
      rowCellSizeYM,
      nodata: nodata ?? null,
    },
  };
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
