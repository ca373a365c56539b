// GeoJSON text → raw features: a FeatureCollection, one Feature, or a bare geometry.
import { failure, type RawFeature, type ReadResult } from './import-types';

const GEOMETRY_TYPES = new Set(['Point', 'MultiPoint', 'LineString', 'MultiLineString', 'Polygon', 'MultiPolygon', 'GeometryCollection']);
// RFC 7946 GeoJSON is WGS84 longitude/latitude; an old-style "crs" member may say so too.
const WGS84_CRS = /(CRS84|EPSG:{1,2}4326)$/i;

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const propertiesOf = (v: unknown): Record<string, unknown> | null => (isObject(v) ? v : null);

function fromFeature(f: unknown): RawFeature {
  if (!isObject(f)) return { geometry: null, properties: null, problem: 'is not a GeoJSON Feature object' };
  if (f.type !== 'Feature') {
    const type = typeof f.type === 'string' ? `"${f.type}"` : 'no "type"';
    return { geometry: null, properties: propertiesOf(f.properties), problem: `is not a GeoJSON Feature (it has ${type})` };
  }
  return { geometry: f.geometry, properties: propertiesOf(f.properties) };
}

/** Reads GeoJSON (RFC 7946); whole-file problems are 400/422, per-feature ones are left to the items. */
export function readGeojson(text: string): ReadResult {
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    return failure(400, 'invalid_json', `The file is not valid JSON (${(e as Error).message}). Check that it was saved completely.`);
  }
  if (!isObject(doc)) {
    return failure(400, 'invalid_geojson', 'The JSON is not a GeoJSON object: expected a FeatureCollection, a Feature or a geometry with a "type".');
  }
  const crsName = (doc.crs as { properties?: { name?: unknown } } | undefined)?.properties?.name;
  if (doc.crs !== undefined && doc.crs !== null && !(typeof crsName === 'string' && WGS84_CRS.test(crsName))) {
    const named = typeof crsName === 'string' ? `"${crsName}"` : 'a coordinate system Fieldshed cannot read';
    return failure(422, 'unsupported_crs',
      `The GeoJSON names the coordinate system ${named}. Fieldshed reads GeoJSON in WGS84 longitude/latitude (EPSG:4326, as RFC 7946 requires): export it that way, or upload a zipped shapefile with its .prj.`);
  }
  const warnings: string[] = [];
  if (doc.type === 'FeatureCollection') {
    if (!Array.isArray(doc.features)) {
      return failure(400, 'invalid_geojson', 'The FeatureCollection has no "features" list.');
    }
    return { ok: true, features: doc.features.map(fromFeature), warnings };
  }
  if (doc.type === 'Feature') return { ok: true, features: [fromFeature(doc)], warnings };
  if (typeof doc.type === 'string' && GEOMETRY_TYPES.has(doc.type)) {
    return { ok: true, features: [{ geometry: doc, properties: null }], warnings };
  }
  if (doc.type === 'Topology') {
    return failure(400, 'invalid_geojson', 'The file is TopoJSON, which Fieldshed does not read: convert it to GeoJSON first.');
  }
  const found = typeof doc.type === 'string' ? `type "${doc.type}"` : 'no "type"';
  return failure(400, 'invalid_geojson', `The JSON is not GeoJSON: expected a FeatureCollection, a Feature or a geometry, but it has ${found}.`);
}
