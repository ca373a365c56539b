// GeoJSON geometry schemas (RFC 7946), [lng, lat] order, EPSG:4326.
// Shape checks only; topology (self-intersection) is checked by PostGIS on the server.
import { z } from 'zod';

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
export const AreaGeometry = z.discriminatedUnion('type', [PolygonGeometry, MultiPolygonGeometry], {
  error: 'geometry must be a GeoJSON Polygon or MultiPolygon',
});
export type AreaGeometry = z.infer<typeof AreaGeometry>;
