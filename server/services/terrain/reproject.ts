// Reprojection of field boundaries (GeoJSON, EPSG:4326 [lng, lat]) into a DEM's CRS, and of
// points back to WGS84, with proj4. Unknown EPSG codes are an expected failure.
import proj4 from 'proj4';
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { proj4Definition } from './epsg-definitions';

export type Converter = { forward: (p: [number, number]) => [number, number]; inverse: (p: [number, number]) => [number, number] };
export type ConverterResult = { ok: true; converter: Converter } | { ok: false; reason: string };

const cache = new Map<string, Converter>();

/** A converter between two EPSG codes (forward: from → to). */
export function converterBetween(fromEpsg: number, toEpsg: number): ConverterResult {
  const key = `${fromEpsg}>${toEpsg}`;
  const hit = cache.get(key);
  if (hit) return { ok: true, converter: hit };
  const from = proj4Definition(fromEpsg), to = proj4Definition(toEpsg);
  if (!from) return { ok: false, reason: `unknown CRS EPSG:${fromEpsg}` };
  if (!to) return { ok: false, reason: `unknown CRS EPSG:${toEpsg}` };
  const conv = proj4(from, to);
  const converter: Converter = {
    forward: (p) => conv.forward(p) as [number, number],
    inverse: (p) => conv.inverse(p) as [number, number],
  };
  cache.set(key, converter);
  return { ok: true, converter };
}

export type RingsResult = { ok: true; rings: Array<Array<[number, number]>> } | { ok: false; reason: string };

/**
 * A Polygon or MultiPolygon in EPSG:4326 as a flat list of rings in the target CRS (outer and
 * hole rings of every part), ready for rasterisePolygon's even-odd rule.
 */
export function reprojectBoundary(geometry: Polygon | MultiPolygon, toEpsg: number): RingsResult {
  if (geometry?.type !== 'Polygon' && geometry?.type !== 'MultiPolygon') {
    throw new Error(`geometry must be a GeoJSON Polygon or MultiPolygon, got ${String((geometry as { type?: unknown })?.type)}`);
  }
  const conv = converterBetween(4326, toEpsg);
  if (!conv.ok) return conv;
  const polygons: Position[][][] = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
  const rings: Array<Array<[number, number]>> = [];
  for (const polygon of polygons) {
    for (const ring of polygon) {
      rings.push(ring.map((p) => conv.converter.forward([p[0], p[1]])));
    }
  }
  return { ok: true, rings };
}
