// Writes data/demo/fields.geojson from the invented demo farm laid out in UTM zone 15N
// (EPSG:32615) metres in data/demo/fields-utm.json. Run: npx tsx scripts/make-demo-fields.ts
import { readFileSync, writeFileSync } from 'node:fs';
import proj4 from 'proj4';

const utm15n = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';
type Spec = { key: string; name: string; ringUtm: [number, number][]; [k: string]: unknown };
const spec = JSON.parse(readFileSync('data/demo/fields-utm.json', 'utf8')) as { fields: Spec[] };
const features = spec.fields.map((f) => {
  const ring = f.ringUtm.map(([e, n]) => {
    const [lng, lat] = proj4(utm15n, 'WGS84', [e, n]);
    return [Number(lng.toFixed(7)), Number(lat.toFixed(7))];
  });
  ring.push(ring[0]);
  const { ringUtm: _ring, ...props } = f;
  return { type: 'Feature', properties: props, geometry: { type: 'Polygon', coordinates: [ring] } };
});
writeFileSync('data/demo/fields.geojson', JSON.stringify({ type: 'FeatureCollection', features }, null, 1) + '\n');
console.log(`wrote ${features.length} fields`);
