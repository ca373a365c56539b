// The only place where GeoJSON [lng, lat] meets Leaflet's LatLng [lat, lng].
import L from 'leaflet';
import type { AreaGeometry } from '../../shared/schemas/geojson';

type Ring = number[][];

const ringToLatLngs = (ring: Ring): L.LatLngTuple[] =>
  // GeoJSON rings repeat the first corner at the end; Leaflet closes polygons itself.
  ring.slice(0, ring.length > 1 ? -1 : undefined).map(([lng, lat]) => [lat, lng] as L.LatLngTuple);

/** Positions for react-leaflet's <Polygon>: rings for a Polygon, polygons of rings for a MultiPolygon. */
export function geometryToLatLngs(geometry: AreaGeometry): L.LatLngTuple[][] | L.LatLngTuple[][][] {
  if (geometry.type === 'Polygon') return geometry.coordinates.map(ringToLatLngs);
  return geometry.coordinates.map((polygon) => polygon.map(ringToLatLngs));
}

/** Leaflet bounds from a GeoJSON bbox [west, south, east, north]. */
export function bboxToBounds(bbox: [number, number, number, number]): L.LatLngBounds {
  const [west, south, east, north] = bbox;
  return L.latLngBounds([south, west], [north, east]);
}

/** Bounds around one geometry. */
export function geometryBounds(geometry: AreaGeometry): L.LatLngBounds {
  const bounds = L.latLngBounds([]);
  const polygons = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
  for (const polygon of polygons) for (const [lng, lat] of polygon[0]) bounds.extend([lat, lng]);
  return bounds;
}

/** Bounds around many geometries, or null when there are none. */
export function geometriesBounds(geometries: AreaGeometry[]): L.LatLngBounds | null {
  if (geometries.length === 0) return null;
  const bounds = L.latLngBounds([]);
  for (const g of geometries) bounds.extend(geometryBounds(g));
  return bounds.isValid() ? bounds : null;
}

/**
 * The GeoJSON geometry of a drawn or edited Leaflet layer, or null when it is not an area.
 * Leaflet's toGeoJSON does the flip back to [lng, lat] and closes the rings.
 */
export function layerToGeometry(layer: L.Layer): AreaGeometry | null {
  if (!(layer instanceof L.Polygon)) return null;
  const geometry = layer.toGeoJSON(8).geometry;
  if (geometry.type === 'Polygon' || geometry.type === 'MultiPolygon') return geometry as AreaGeometry;
  return null;
}

/** The Leaflet position of one GeoJSON-ordered [lng, lat] point. */
export function positionToLatLng([lng, lat]: [number, number]): L.LatLngTuple {
  return [lat, lng];
}

/** Leaflet positions for GeoJSON-ordered [lng, lat] points. */
export function pointsToLatLngs(points: [number, number][]): L.LatLngTuple[] {
  return points.map(([lng, lat]) => [lat, lng] as L.LatLngTuple);
}
