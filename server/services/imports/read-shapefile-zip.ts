// The shapefile layers of an opened zip → raw features, reprojected to WGS84 from each layer's
// .prj (shpjs with proj4). Every layer in the zip is read, in the order of its .shp entry.
import proj4 from 'proj4';
import { parseDbf, parseShp } from 'shpjs';
import { decodeText } from './decode-text';
import { failure, type ImportFailure, type RawFeature, type ReadResult } from './import-types';
import type { OpenedZip, ZipEntry } from './read-zip';

export const MISSING_PRJ = 'the shapefile has no .prj; add it so Fieldshed knows the coordinate system';

type Layer = { name: string; shp: ZipEntry; dbf?: ZipEntry; prj?: ZipEntry; cpg?: ZipEntry };
type Part = 'shp' | 'dbf' | 'prj' | 'cpg';

/** Groups entries by path without extension (case-insensitive). */
export function findLayers(entries: ZipEntry[]): Layer[] {
  const groups = new Map<string, Partial<Record<Part, ZipEntry>> & { name: string }>();
  for (const entry of entries) {
    const m = /^(.*)\.(shp|dbf|prj|cpg)$/i.exec(entry.name);
    if (!m) continue;
    const key = m[1].toLowerCase();
    const group = groups.get(key) ?? { name: m[1].split('/').pop()! };
    group[m[2].toLowerCase() as Part] ??= entry;
    groups.set(key, group);
  }
  return [...groups.values()].filter((g): g is Layer => g.shp !== undefined);
}

/** Every position of a geometry tree, for range checks. */
function* positions(coords: unknown): Generator<number[]> {
  if (!Array.isArray(coords)) return;
  if (typeof coords[0] === 'number') yield coords as number[];
  else for (const c of coords) yield* positions(c);
}
function firstOutOfRange(geoms: unknown[]): number[] | null {
  for (const g of geoms) {
    const coordinates = (g as { coordinates?: unknown } | null)?.coordinates;
    for (const [x, y] of positions(coordinates)) {
      if (!(Math.abs(x) <= 180 && Math.abs(y) <= 90)) return [x, y];
    }
  }
  return null;
}
const round = (p: number[]) => p.map((v) => (Number.isFinite(v) ? Math.round(v * 1000) / 1000 : v)).join(', ');

async function text(zip: OpenedZip, entry: ZipEntry | undefined): Promise<string | undefined | ImportFailure> {
  if (!entry) return undefined;
  const bytes = await zip.read(entry);
  return bytes instanceof Uint8Array ? decodeText(bytes).trim() : bytes;
}
const isFailure = (v: unknown): v is ImportFailure => typeof v === 'object' && v !== null && (v as ImportFailure).ok === false;

async function readLayer(zip: OpenedZip, layer: Layer): Promise<{ features: RawFeature[]; warnings: string[] } | ImportFailure> {
  const label = `Layer "${layer.name}"`;
  const prj = await text(zip, layer.prj);
  if (isFailure(prj)) return prj;
  if (prj !== undefined) {
    try {
      proj4(prj);
    } catch (e) {
      return failure(422, 'unknown_projection',
        `${label}: the .prj could not be understood (${(e as Error).message || 'unknown coordinate system'}). Export the layer in WGS84 (EPSG:4326) or a common projection such as UTM.`);
    }
  }
  const shpBytes = await zip.read(layer.shp);
  if (isFailure(shpBytes)) return shpBytes;
  let geometries: unknown[];
  try {
    geometries = parseShp(shpBytes, prj || undefined);
  } catch (e) {
    return failure(400, 'invalid_shapefile', `${label}: the .shp could not be read (${(e as Error).message}).`);
  }
  const outside = firstOutOfRange(geometries);
  if (outside && prj === undefined) {
    return failure(422, 'missing_prj',
      `${MISSING_PRJ[0].toUpperCase()}${MISSING_PRJ.slice(1)} (layer "${layer.name}" has coordinates such as ${round(outside)}, which are not longitude/latitude).`);
  }
  if (outside) {
    return failure(422, 'unknown_projection',
      `${label}: after reprojection from its .prj a point lies at ${round(outside)}, outside longitude/latitude range; check the .prj matches the data.`);
  }
  const warnings = prj === undefined
    ? [`${label} has no .prj; its coordinates are within longitude/latitude range, so WGS84 (EPSG:4326) was assumed`]
    : [];
  let rows: Record<string, unknown>[] = [];
  if (layer.dbf) {
    const dbfBytes = await zip.read(layer.dbf);
    if (isFailure(dbfBytes)) return dbfBytes;
    const cpg = await text(zip, layer.cpg);
    if (isFailure(cpg)) return cpg;
    try {
      rows = parseDbf(dbfBytes, cpg || undefined);
    } catch (e) {
      warnings.push(`${label}: the .dbf could not be read (${(e as Error).message}), so its fields have no names`);
    }
  } else {
    warnings.push(`${label} has no .dbf, so its fields have no names`);
  }
  const notes = prj === undefined ? [{ kind: 'no_prj_assumed_wgs84' as const, layer: layer.name }] : undefined;
  return { features: geometries.map((geometry, i) => ({ geometry, properties: rows[i] ?? null, ...(notes ? { notes } : {}) })), warnings };
}

/** Reads all layers; a zip without a .shp is a 400 listing what it holds. */
export async function readShapefileZip(zip: OpenedZip): Promise<ReadResult> {
  const layers = findLayers(zip.entries);
  if (layers.length === 0) {
    const held = zip.entries.slice(0, 10).map((e) => e.name).join(', ') || 'nothing';
    const more = zip.entries.length > 10 ? ` and ${zip.entries.length - 10} more` : '';
    return failure(400, 'no_shapefile_in_zip',
      `The zip holds no .shp file (it holds ${held}${more}). A zipped shapefile needs the .shp, .shx, .dbf and .prj of a layer; a KMZ needs a .kml.`);
  }
  const features: RawFeature[] = [];
  const warnings: string[] = [];
  for (const layer of layers) {
    const read = await readLayer(zip, layer);
    if (isFailure(read)) return read;
    features.push(...read.features);
    warnings.push(...read.warnings);
  }
  return { ok: true, features, warnings };
}
