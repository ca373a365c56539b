// Parses an uploaded field-boundary file (GeoJSON, zipped shapefile, KML or KMZ) in memory into
// checked Polygon/MultiPolygon candidates, one item per input feature. No disk, no network.
// Topology (self-intersection) and area limits are checked later, by PostGIS.
import { decodeText } from './decode-text';
import { detectFormat } from './detect-format';
import { failure, type ImportFailure, type ImportFormat, type ParseResult, type ReadResult } from './import-types';
import { readGeojson } from './read-geojson';
import { readKml } from './read-kml';
import { readShapefileZip } from './read-shapefile-zip';
import { openZip, type OpenedZip } from './read-zip';
import { toParsedItem } from './to-parsed-item';
import { BOUNDARY_IMPORT_MAX_BYTES, BYTES_PER_MIB } from '../../../shared/limits';

export type { ImportFailure, ImportFormat, ParseResult, ParsedBoundary, ParsedItem, RejectedFeature } from './import-types';

/** Most features one file may hold. */
export const MAX_IMPORT_FEATURES = 5000;

export type BoundaryFileInput = { buffer: Buffer; originalName: string; mimeType?: string };

const isFailure = (v: unknown): v is ImportFailure => typeof v === 'object' && v !== null && (v as ImportFailure).ok === false;

/** A zip is a shapefile unless it has no .shp but has a .kml (a KMZ: doc.kml, else the first .kml). */
async function readZip(zip: OpenedZip): Promise<{ format: ImportFormat; read: ReadResult }> {
  const hasShp = zip.entries.some((e) => /\.shp$/i.test(e.name));
  const kmls = zip.entries.filter((e) => /\.kml$/i.test(e.name));
  if (hasShp || kmls.length === 0) return { format: 'shapefile', read: await readShapefileZip(zip) };
  const doc = kmls.find((e) => e.name.toLowerCase() === 'doc.kml') ?? kmls[0];
  const bytes = await zip.read(doc);
  return { format: 'kml', read: isFailure(bytes) ? bytes : readKml(decodeText(bytes)) };
}

/**
 * Parses one uploaded boundary file. Expected problems come back as values: a whole-file
 * failure `{ ok: false, status, error, message }`, or per-feature `rejected` items.
 * Misuse (no Buffer, no name) throws.
 */
export async function parseBoundaryFile(input: BoundaryFileInput): Promise<ParseResult> {
  if (!input || !(input.buffer instanceof Uint8Array)) throw new Error('parseBoundaryFile: input.buffer must be a Buffer');
  if (typeof input.originalName !== 'string') throw new Error('parseBoundaryFile: input.originalName must be a string');
  const bytes = input.buffer;
  if (bytes.length > BOUNDARY_IMPORT_MAX_BYTES) {
    return failure(413, 'file_too_large', `The file is larger than ${BOUNDARY_IMPORT_MAX_BYTES / BYTES_PER_MIB} MB; upload only the field boundaries.`);
  }
  const detected = detectFormat(bytes, input.originalName);
  if (isFailure(detected)) return detected;

  let format: ImportFormat;
  let read: ReadResult;
  if (detected.kind === 'zip') {
    const zip = await openZip(bytes);
    if (isFailure(zip)) return zip;
    ({ format, read } = await readZip(zip));
  } else if (detected.kind === 'json') {
    format = 'geojson';
    read = readGeojson(detected.text);
  } else {
    format = 'kml';
    read = readKml(detected.text);
  }
  if (!read.ok) return read;
  if (read.features.length === 0) {
    return failure(422, 'no_features', 'The file holds no features, so there is no field boundary to import.');
  }
  if (read.features.length > MAX_IMPORT_FEATURES) {
    return failure(413, 'too_many_features',
      `The file holds ${read.features.length} features; at most ${MAX_IMPORT_FEATURES} can be imported at once.`);
  }
  const items = read.features.map((f, i) => toParsedItem(f, i + 1));
  return { ok: true, format, items, ...(read.warnings.length ? { warnings: read.warnings } : {}) };
}
