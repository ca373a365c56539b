// The benchmark farm's fields over a generated DEM (UTM 15N, 5 m cells, north-west corner at
// originX/originY, n cells a side): fields of 1 km² (200 × 200 cells, 10-cell lanes between them),
// every third with a typed slope length of 60 m (terraces), as in scripts/bench-terrain.ts;
// outlines in WGS84, as the app stores them.
import proj4 from 'proj4';

export type BenchField = { id: number; geometry: GeoJSON.Polygon; typedSlopeLengthM: number | null };

const UTM15N = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';
const CELL_M = 5;

export function benchFields(originX: number, originY: number, n: number): BenchField[] {
  const fields: BenchField[] = [];
  const per = Math.floor(n / 210);
  for (let fr = 0; fr < per; fr++) {
    for (let fc = 0; fc < per; fc++) {
      const e0 = originX + fc * 210 * CELL_M, n1 = originY - fr * 210 * CELL_M, s = 200 * CELL_M;
      const ring = [[e0, n1 - s], [e0 + s, n1 - s], [e0 + s, n1], [e0, n1], [e0, n1 - s]].map((p) => proj4(UTM15N, 'WGS84', p));
      fields.push({ id: fields.length + 1, geometry: { type: 'Polygon', coordinates: [ring] }, typedSlopeLengthM: fields.length % 3 === 2 ? 60 : null });
    }
  }
  return fields;
}
