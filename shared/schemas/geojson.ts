// GeoJSON geometry schemas (RFC 7946), [lng, lat] order, EPSG:4326.
// Shape checks only; topology (self-intersection) is checked by PostGIS on the server.
import { z } from 'zod';
import { FIELD_MAX_ABS_LATITUDE_DEG, OUTLINE_MAX_VERTICES } from '../limits';

const lng = z.number().finite().min(-180, 'longitude must be at least -180').max(180, 'longitude must be at most 180');
const lat = z.number().finite().min(-90, 'latitude must be at least -90').max(90, 'latitude must be at most 90');
export const Position = z.tuple([lng, lat]).rest(z.number());

export const LinearRing = z
  .array(Position)
  .min(4, 'a ring needs at least 4 positions (3 corners and the closing point)')
  .refine((r) => r.length < 4 || (r[0][0] === r[r.length - 1][0] && r[0][1] === r[r.length - 1][1]), {
    message: 'a ring must be closed: its last position must equal its first',
  })
  .refine((r) => new Set(r.slice(0, -1).map((p) => `${p[0]},${p[1]}`)).size >= 3, {
    message: 'a ring needs at least 3 distinct corners',
  });

export const PolygonGeometry = z.object({
  type: z.literal('Polygon'),
  coordinates: z.array(LinearRing).min(1, 'a polygon needs an outer ring'),
});
export const MultiPolygonGeometry = z.object({
  type: z.literal('MultiPolygon'),
  coordinates: z.array(z.array(LinearRing).min(1, 'a polygon needs an outer ring')).min(1, 'a multipolygon needs a polygon'),
});
type Ring = z.infer<typeof LinearRing>;

/**
 * Limits of a field outline: the corner count (OUTLINE_MAX_VERTICES), nothing nearer a pole than
 * FIELD_MAX_ABS_LATITUDE_DEG, and no ring spanning more than 180° of longitude — RFC 7946 §3.1.9
 * asks for a shape crossing the antimeridian to be cut in two there, and read as written such a
 * ring would wrap the whole globe the other way.
 */
function outlineProblem(rings: Ring[]): string | null {
  let corners = 0;
  for (const ring of rings) {
    corners += ring.length - 1;
    let west = Infinity;
    let east = -Infinity;
    for (const [x, y] of ring) {
      if (Math.abs(y) > FIELD_MAX_ABS_LATITUDE_DEG) {
        return `latitude ${y} is too near a pole: fields must lie between ${-FIELD_MAX_ABS_LATITUDE_DEG}° and ${FIELD_MAX_ABS_LATITUDE_DEG}° latitude`;
      }
      west = Math.min(west, x);
      east = Math.max(east, x);
    }
    if (east - west > 180) return 'the outline crosses the antimeridian (180° longitude): cut it in two there, one part each side, and send them as a MultiPolygon';
  }
  if (corners > OUTLINE_MAX_VERTICES) return `the outline has ${corners} corners; at most ${OUTLINE_MAX_VERTICES} are taken (simplify it first)`;
  return null;
}

export const AreaGeometry = z
  .discriminatedUnion('type', [PolygonGeometry, MultiPolygonGeometry], {
    error: 'geometry must be a GeoJSON Polygon or MultiPolygon',
  })
  .superRefine((g, ctx) => {
    const problem = outlineProblem(g.type === 'Polygon' ? g.coordinates : g.coordinates.flat());
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });
export type AreaGeometry = z.infer<typeof AreaGeometry>;
