// Turns whatever geometry a reader found into a Polygon or MultiPolygon candidate: collections
// flattened, Z/M values dropped, consecutive repeated points removed, open rings closed.
// Shape and range are checked afterwards with the shared AreaGeometry schema.

export type AreaCandidate = { type: 'Polygon' | 'MultiPolygon'; coordinates: unknown };
export type NormalizedGeometry = { ok: true; geometry: AreaCandidate; warnings: string[] } | { ok: false; reason: string };

const NOT_AREA = new Set(['Point', 'MultiPoint', 'LineString', 'MultiLineString']);
const NOT_BOUNDARY = 'is not a field boundary; draw or upload a polygon';

type Xy = [number, number];
const isPosition = (p: unknown): p is number[] =>
  Array.isArray(p) && p.length >= 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]);

/** A ring of well-formed positions → 2D, no consecutive repeats, closed. Anything else is left as found. */
export function cleanRing(ring: unknown): unknown {
  if (!Array.isArray(ring) || ring.length === 0 || !ring.every(isPosition)) return ring;
  const out: Xy[] = [];
  for (const p of ring as number[][]) {
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push([p[0], p[1]]);
  }
  const first = out[0];
  const last = out[out.length - 1];
  if (out.length > 1 && (first[0] !== last[0] || first[1] !== last[1])) out.push([first[0], first[1]]);
  return out;
}

const cleanPolygon = (rings: unknown): unknown => (Array.isArray(rings) ? rings.map(cleanRing) : rings);

type Collected = { polygons: unknown[]; dropped: string[]; bad: string | null };

/** Deepest nesting of GeometryCollections read. */
const MAX_NESTING = 8;

/** Gathers the polygons of a geometry (recursing into collections) and the names of what is not one. */
function collect(g: unknown, into: Collected, depth = 0): void {
  if (g === null || typeof g !== 'object' || typeof (g as { type?: unknown }).type !== 'string') {
    into.bad ??= 'holds a geometry without a "type"';
    return;
  }
  const { type, coordinates, geometries } = g as { type: string; coordinates?: unknown; geometries?: unknown };
  if (type === 'Polygon') into.polygons.push(cleanPolygon(coordinates));
  else if (type === 'MultiPolygon') {
    if (Array.isArray(coordinates)) into.polygons.push(...coordinates.map(cleanPolygon));
    else into.bad ??= 'has a MultiPolygon whose "coordinates" is not a list';
  } else if (type === 'GeometryCollection') {
    if (depth >= MAX_NESTING) into.bad ??= `nests GeometryCollections more than ${MAX_NESTING} deep`;
    else if (Array.isArray(geometries)) for (const member of geometries) collect(member, into, depth + 1);
    else into.bad ??= 'has a GeometryCollection whose "geometries" is not a list';
  } else if (NOT_AREA.has(type)) into.dropped.push(type);
  else into.bad ??= `has "${type}", which is not a GeoJSON geometry type`;
}

function countWords(types: string[]): string {
  const counts = new Map<string, number>();
  for (const t of types) counts.set(t, (counts.get(t) ?? 0) + 1);
  return [...counts].map(([t, n]) => `${n} ${t}${n > 1 ? 's' : ''}`).join(' and ');
}

/** The polygon candidate of one feature's geometry, or why there is none. */
export function normalizeGeometry(geometry: unknown): NormalizedGeometry {
  if (geometry === null || geometry === undefined) return { ok: false, reason: 'has no geometry' };
  const type = (geometry as { type?: unknown } | null)?.type;
  if (typeof type === 'string' && NOT_AREA.has(type)) return { ok: false, reason: `a ${type} ${NOT_BOUNDARY}` };
  if (type === 'Polygon') {
    return { ok: true, geometry: { type, coordinates: cleanPolygon((geometry as { coordinates?: unknown }).coordinates) }, warnings: [] };
  }
  const found: Collected = { polygons: [], dropped: [], bad: null };
  collect(geometry, found);
  if (found.bad) return { ok: false, reason: found.bad };
  if (type === 'MultiPolygon') return { ok: true, geometry: { type, coordinates: found.polygons }, warnings: [] };
  // A GeometryCollection from here on.
  if (found.polygons.length === 0) {
    const what = found.dropped.length ? `of ${countWords(found.dropped)}` : 'that is empty';
    return { ok: false, reason: `a GeometryCollection ${what} holds no polygon; draw or upload a polygon` };
  }
  const warnings = found.dropped.length
    ? [`${countWords(found.dropped)} left out of the GeometryCollection: only polygons become field boundaries`]
    : [];
  const geometryOut: AreaCandidate =
    found.polygons.length === 1
      ? { type: 'Polygon', coordinates: found.polygons[0] }
      : { type: 'MultiPolygon', coordinates: found.polygons };
  return { ok: true, geometry: geometryOut, warnings };
}
