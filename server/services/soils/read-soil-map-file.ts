// An uploaded soil map (GeoJSON or zipped shapefile) → map units with their attributes, using
// the boundary import's readers (which keep each feature's properties) and its geometry checks.
import { detectFormat } from '../imports/detect-format';
import { failure, type ImportFailure, type ReadResult } from '../imports/import-types';
import { readGeojson } from '../imports/read-geojson';
import { readShapefileZip } from '../imports/read-shapefile-zip';
import { openZip } from '../imports/read-zip';
import { toParsedItem } from '../imports/to-parsed-item';
import type { MapUnitOutline } from '../../models/soil-map-unit.queries';
import { cleanText } from '../../../shared/text-rules';

/** Most map units one file may hold. */
export const MAX_MAP_UNITS = 20_000;

export type SoilMapRead = { ok: true; units: MapUnitOutline[]; rejected: { index: number; reason: string }[]; warnings: string[] } | ImportFailure;

const ACCEPTED = 'A soil map must be GeoJSON (.geojson or .json) or a zipped shapefile (a .zip with the .shp, .shx, .dbf and .prj of the map units)';
/** Attribute names and text values without the characters jsonb cannot hold (NUL, lone surrogates) or that hide in names. */
function cleanAttributes(value: unknown): unknown {
  if (typeof value === 'string') return cleanText(value);
  if (Array.isArray(value)) return value.map(cleanAttributes);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [cleanText(k), cleanAttributes(v)]));
  return value;
}

const isFailure = (v: unknown): v is ImportFailure => typeof v === 'object' && v !== null && (v as ImportFailure).ok === false;

export async function readSoilMapFile(input: { buffer: Uint8Array; originalName: string }): Promise<SoilMapRead> {
  const detected = detectFormat(input.buffer, input.originalName);
  if (isFailure(detected)) return detected.status === 415 ? failure(415, detected.error, `${ACCEPTED}. ${detected.message.split('.')[0]}.`) : detected;
  let read: ReadResult;
  if (detected.kind === 'zip') {
    const zip = await openZip(input.buffer);
    if (isFailure(zip)) return zip;
    if (!zip.entries.some((e) => /\.shp$/i.test(e.name))) return failure(415, 'unsupported_file_type', `${ACCEPTED}; this zip holds no .shp.`);
    read = await readShapefileZip(zip);
  } else if (detected.kind === 'json') {
    read = readGeojson(detected.text);
  } else {
    return failure(415, 'unsupported_file_type', `${ACCEPTED}; KML is read for field boundaries only.`);
  }
  if (!read.ok) return read;
  if (read.features.length === 0) return failure(422, 'no_features', 'The file holds no map units.');
  if (read.features.length > MAX_MAP_UNITS) {
    return failure(413, 'too_many_features', `The file holds ${read.features.length} map units; at most ${MAX_MAP_UNITS} can be uploaded at once (clip the map to the farm).`);
  }
  const units: MapUnitOutline[] = [];
  const rejected: { index: number; reason: string }[] = [];
  read.features.forEach((raw, i) => {
    const item = toParsedItem(raw, i + 1);
    if ('rejected' in item) rejected.push({ index: item.index, reason: item.rejected.replace(/field boundary/g, 'soil map unit') });
    else units.push({ index: item.index, geometry: item.geometry, properties: cleanAttributes(raw.properties ?? {}) as Record<string, unknown> });
  });
  return { ok: true, units, rejected, warnings: read.warnings };
}
