// Reads what a GeoTIFF elevation model's header says (geotiff.js v3) without decoding its
// rasters: size, sample type, geotransform and the EPSG code from the GeoKeys. The upload checks
// its size against the cell limit from here, so a small compressed file that would decode to a
// huge grid is refused before any cell is decoded. readDem decodes from the same header.
// Assumptions, documented: elevations are metres; projected CRSs in feet are converted to metres
// (ProjLinearUnitsGeoKey 9002/9003); rotated/sheared grids are refused.
import { fromArrayBuffer, type GeoTIFFImage } from 'geotiff';
import { geographicCellSizeM } from './geographic-cell-size';
import type { DemGrid } from './types';

export type DemHeader = Omit<DemGrid, 'elevationM'>;
/** Why a header cannot be used: not a TIFF at all, a grid over the cell limit, or anything else. */
export type DemHeaderProblem = 'not_tiff' | 'too_many_cells' | 'invalid';
export type ReadDemHeaderResult = { ok: true; header: DemHeader; image: GeoTIFFImage } | { ok: false; problem: DemHeaderProblem; reason: string };

const fail = (problem: DemHeaderProblem, reason: string): ReadDemHeaderResult => ({ ok: false, problem, reason });

const USER_DEFINED = 32767;
const FOOT_M: Record<number, number> = { 9002: 0.3048, 9003: 1200 / 3937 };

/** The bytes as a whole ArrayBuffer (geotiff reads whole ArrayBuffers), copied only when they are part of a larger one. */
function asArrayBuffer(bytes: ArrayBuffer | Uint8Array): ArrayBuffer {
  if (!(bytes instanceof Uint8Array)) return bytes;
  if (bytes.byteOffset === 0 && bytes.byteLength === bytes.buffer.byteLength && bytes.buffer instanceof ArrayBuffer) return bytes.buffer;
  return bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
}

function isTiff(buffer: ArrayBuffer): boolean {
  const magic = new Uint8Array(buffer, 0, Math.min(4, buffer.byteLength));
  return (
    magic.length === 4 &&
    ((magic[0] === 0x49 && magic[1] === 0x49 && (magic[2] === 42 || magic[2] === 43)) ||
      (magic[0] === 0x4d && magic[1] === 0x4d && (magic[3] === 42 || magic[3] === 43)))
  );
}

/**
 * Reads the header only. Expected failures (not a TIFF, more cells than `maxCells`, no CRS, odd
 * sample type) come back as { ok: false, problem, reason }.
 */
export async function readDemHeader(bytes: ArrayBuffer | Uint8Array, maxCells = Infinity): Promise<ReadDemHeaderResult> {
  const buffer = asArrayBuffer(bytes);
  if (!isTiff(buffer)) return fail('not_tiff', 'not a GeoTIFF: the file does not start with a TIFF header');
  let image: GeoTIFFImage;
  try {
    const tiff = await fromArrayBuffer(buffer);
    image = await tiff.getImage();
  } catch (e) {
    return fail('invalid', `damaged GeoTIFF header: ${(e as Error).message}`);
  }
  try {
    return headerOf(image, maxCells);
  } catch (e) {
    // A damaged header can make geotiff throw while a tag is read.
    return fail('invalid', `damaged GeoTIFF header: ${(e as Error).message}`);
  }
}

function headerOf(image: GeoTIFFImage, maxCells: number): ReadDemHeaderResult {
  const width = image.getWidth();
  const height = image.getHeight();
  if (!(Number.isInteger(width) && width > 0 && Number.isInteger(height) && height > 0)) {
    return fail('invalid', `damaged GeoTIFF header: a grid of ${width} × ${height} cells`);
  }
  if (width * height > maxCells) {
    return fail('too_many_cells', `${width} × ${height} = ${(width * height).toLocaleString('en')} cells, more than the limit of ${maxCells.toLocaleString('en')}`);
  }
  const keys = image.getGeoKeys() ?? {};
  const projected = Number(keys.ProjectedCSTypeGeoKey ?? 0);
  const geographicCode = Number(keys.GeographicTypeGeoKey ?? 0);
  const geographic = !(projected > 0 && projected !== USER_DEFINED) && geographicCode > 0 && geographicCode !== USER_DEFINED;
  const epsg = geographic ? geographicCode : projected;
  if (!(epsg > 0) || epsg === USER_DEFINED) {
    return fail('invalid', 'no CRS: the GeoTIFF names no EPSG code (ProjectedCSTypeGeoKey or GeographicTypeGeoKey)');
  }
  const format = image.getSampleFormat(0);
  const bits = image.getBitsPerSample(0);
  const supported = (format === 3 && (bits === 32 || bits === 64)) || ((format === 1 || format === 2) && bits >= 8 && bits <= 32);
  if (!supported) {
    return fail('invalid', `unsupported sample type: format ${format}, ${bits} bits (use Float32, Int16 or similar)`);
  }
  const transform = image.getFileDirectory().getValue('ModelTransformation') as number[] | undefined;
  if (transform && (transform[1] !== 0 || transform[4] !== 0)) {
    return fail('invalid', 'unsupported grid: rotated or sheared geotransform');
  }
  let origin: number[];
  let resolution: number[];
  try {
    origin = image.getOrigin();
    resolution = image.getResolution();
  } catch {
    return fail('invalid', 'no geotransform: the GeoTIFF has no tie point and pixel scale');
  }
  const cellSizeX = Math.abs(resolution[0]);
  const cellSizeY = Math.abs(resolution[1]);
  if (!(cellSizeX > 0 && cellSizeY > 0 && Number.isFinite(origin[0]) && Number.isFinite(origin[1]))) {
    return fail('invalid', 'no geotransform: the pixel scale or tie point is not a usable number');
  }
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
  const nodata = image.getGDALNoData();
  return {
    ok: true,
    image,
    header: { width, height, originX: origin[0], originY: origin[1], cellSizeX, cellSizeY, epsg, geographic, rowCellSizeXM, rowCellSizeYM, nodata: nodata ?? null },
  };
}
