// Writes the boundary-import test files in tests/fixtures/imports/ (committed, so the tests
// need no GDAL). Shapefiles are written by Debian's GDAL (ogr2ogr) from GeoJSON made here in
// UTM zone 15N (EPSG:32615) around the invented demo farm of data/demo/fields-utm.json, and
// the reference WGS84 coordinates of the UTM shapefile are GDAL's own reprojection of it
// (ogr2ogr -t_srs EPSG:4326, through PROJ), recorded next to it.
// Run: npx tsx scripts/make-import-fixtures.ts   (needs /usr/bin/ogr2ogr from gdal-bin)
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import JSZip from 'jszip';
import proj4 from 'proj4';
import { PNG } from 'pngjs';

const outDir = 'tests/fixtures/imports';
const ogr2ogr = '/usr/bin/ogr2ogr';
const utm15n = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';
const fixedDate = new Date('2026-01-01T00:00:00Z');

type Xy = [number, number];
type UtmFeature = { name: string; props?: Record<string, unknown>; polygons: Xy[][][] };

/** UTM 15N easting/northing → [lng, lat], 7 decimals (about 1 cm). */
function toLngLat([e, n]: Xy): Xy {
  const [lng, lat] = proj4(utm15n, 'WGS84', [e, n]);
  return [Number(lng.toFixed(7)), Number(lat.toFixed(7))];
}
const closed = (ring: Xy[]): Xy[] => [...ring, ring[0]];
const ringLngLat = (ring: Xy[]): Xy[] => closed(ring).map(toLngLat);

// Corners (UTM 15N m) taken from data/demo/fields-utm.json, plus a pond hole and a bow-tie.
const northRidge: Xy[] = [[600005, 4684805], [600495, 4684805], [600495, 4685195], [600065, 4685195], [600005, 4685135]];
const swaleField: Xy[] = [[601005, 4684705], [601595, 4684705], [601595, 4685135], [601535, 4685195], [601005, 4685195]];
const creekBottom: Xy[] = [[600005, 4684115], [600065, 4684055], [600445, 4684055], [600445, 4684395], [600005, 4684395]];
const streamStrip: Xy[] = [[600455, 4684055], [601035, 4684055], [601095, 4684115], [601095, 4684245], [600455, 4684245]];
const eastPasture: Xy[] = [[601105, 4684055], [601535, 4684055], [601595, 4684115], [601595, 4684695], [601105, 4684695]];
const pond: Xy[] = [[601300, 4684300], [601300, 4684400], [601400, 4684400], [601400, 4684300]]; // clockwise: a hole
const millHill: Xy[] = [[600005, 4684405], [600495, 4684405], [600495, 4684795], [600065, 4684795], [600005, 4684735]];
const hayGround: Xy[] = [[600505, 4684315], [600565, 4684255], [600995, 4684255], [600995, 4684595], [600505, 4684595]];
const upperFlat: Xy[] = [[600505, 4685005], [600995, 4685005], [600995, 4685195], [600565, 4685195], [600505, 4685135]];
const bowTie: Xy[] = [[600505, 4684255], [600995, 4684595], [600995, 4684255], [600505, 4684595]];

function write(name: string, data: string | Buffer): void {
  writeFileSync(join(outDir, name), data);
  console.log(`wrote ${join(outDir, name)}`);
}
const json = (v: unknown) => JSON.stringify(v, null, 1) + '\n';

function geojsonFeature(props: Record<string, unknown>, geometry: unknown) {
  return { type: 'Feature', properties: props, geometry };
}

// ---- GeoJSON -------------------------------------------------------------------------------

function threeFields(): unknown {
  // 1: a Polygon named by "name"; 2: a MultiPolygon named by "FIELD_NAME", with Z values and a
  // repeated vertex; 3: a self-intersecting bow-tie named by "Label" (parsed here; PostGIS
  // rejects its topology later).
  const withZ = (ring: Xy[]) => ringLngLat(ring).map(([x, y]) => [x, y, 312.5]);
  const creek = withZ(creekBottom);
  creek.splice(2, 0, creek[1]); // a consecutive duplicate point
  return {
    type: 'FeatureCollection',
    features: [
      geojsonFeature({ name: 'North Ridge', crop: 'corn' }, { type: 'Polygon', coordinates: [ringLngLat(northRidge)] }),
      geojsonFeature({ FIELD_NAME: 'Creek Parcels', id: 17 }, {
        type: 'MultiPolygon',
        coordinates: [[creek], [withZ(streamStrip)]],
      }),
      geojsonFeature({ Label: 'Bow-tie Corner' }, { type: 'Polygon', coordinates: [ringLngLat(bowTie)] }),
    ],
  };
}

function mixedGeometries(): unknown {
  const millHillRing = ringLngLat(millHill);
  return {
    type: 'FeatureCollection',
    features: [
      geojsonFeature({ name: 'Mill Hill' }, { type: 'Polygon', coordinates: [millHillRing] }),
      geojsonFeature({ name: 'Fence Line' }, { type: 'LineString', coordinates: [millHillRing[0], millHillRing[1]] }),
      geojsonFeature({ NAME: 'Well' }, { type: 'Point', coordinates: millHillRing[2] }),
      geojsonFeature({ title: 'Hay Ground' }, { type: 'Polygon', coordinates: [ringLngLat(hayGround)] }),
      geojsonFeature({ name: 'Not Yet Mapped' }, null),
      geojsonFeature({ field: 'Upper Flat' }, {
        type: 'GeometryCollection',
        geometries: [
          { type: 'Polygon', coordinates: [ringLngLat(upperFlat)] },
          { type: 'Point', coordinates: toLngLat(upperFlat[0]) },
        ],
      }),
    ],
  };
}

// ---- Shapefiles via GDAL -------------------------------------------------------------------

function utmGeojson(features: UtmFeature[]): unknown {
  return {
    type: 'FeatureCollection',
    crs: { type: 'name', properties: { name: 'urn:ogc:def:crs:EPSG::32615' } },
    features: features.map((f) => ({
      type: 'Feature',
      properties: { NAME: f.name, ...f.props },
      geometry:
        f.polygons.length === 1
          ? { type: 'Polygon', coordinates: f.polygons[0].map(closed) }
          : { type: 'MultiPolygon', coordinates: f.polygons.map((p) => p.map(closed)) },
    })),
  };
}

function lngLatGeojson(features: UtmFeature[]): unknown {
  return {
    type: 'FeatureCollection',
    features: features.map((f) => ({
      type: 'Feature',
      properties: { NAME: f.name, ...f.props },
      geometry: { type: 'Polygon', coordinates: f.polygons[0].map(ringLngLat) },
    })),
  };
}

/** Runs ogr2ogr to a shapefile named `layer` in `dir`; returns the layer's files by extension. */
function shapefile(dir: string, layer: string, sourceJson: unknown, srs: string): Map<string, Buffer> {
  const src = join(dir, `${layer}.source.geojson`);
  writeFileSync(src, JSON.stringify(sourceJson));
  const shpDir = join(dir, layer);
  mkdirSync(shpDir);
  execFileSync(ogr2ogr, ['-f', 'ESRI Shapefile', '-a_srs', srs, '-lco', 'ENCODING=UTF-8', join(shpDir, `${layer}.shp`), src]);
  const files = new Map<string, Buffer>();
  for (const ext of ['shp', 'shx', 'dbf', 'prj', 'cpg']) {
    const p = join(shpDir, `${layer}.${ext}`);
    if (existsSync(p)) files.set(ext, readFileSync(p));
  }
  return files;
}

async function zipOf(entries: [string, Buffer | string][]): Promise<Buffer> {
  const zip = new JSZip();
  for (const [name, data] of entries) zip.file(name, data, { date: fixedDate, createFolders: false });
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
}
const layerEntries = (layer: string, files: Map<string, Buffer>, skip: string[] = []): [string, Buffer][] =>
  [...files].filter(([ext]) => !skip.includes(ext)).map(([ext, data]) => [`${layer}.${ext}`, data]);

// ---- Preview fixtures: names from FIELD_NAME, the same field again, an overlap ---------------

/** UTM 15N features with their attributes as given (no NAME added). */
function utmWithAttributes(features: { props: Record<string, unknown>; ring: Xy[] }[]): unknown {
  return {
    type: 'FeatureCollection',
    crs: { type: 'name', properties: { name: 'urn:ogc:def:crs:EPSG::32615' } },
    features: features.map((f) => ({ type: 'Feature', properties: f.props, geometry: { type: 'Polygon', coordinates: [closed(f.ring)] } })),
  };
}

const shift = (ring: Xy[], de: number, dn: number): Xy[] => ring.map(([e, n]) => [e + de, n + dn]);

function sameAsNorthRidge(): unknown {
  // North Ridge as fields-utm15n-shp.zip stores it, written again at 6 decimals (about 10 cm).
  const ring = ringLngLat(northRidge).map(([x, y]) => [Number(x.toFixed(6)), Number(y.toFixed(6))]);
  return { type: 'FeatureCollection', features: [geojsonFeature({ name: 'North Ridge (from the old map)' }, { type: 'Polygon', coordinates: [ring] })] };
}

function overlapsNorthRidge(): unknown {
  // 200 m east of North Ridge: about 290 m of its 490 m width lies on that field.
  return {
    type: 'FeatureCollection',
    features: [geojsonFeature({ name: 'Ridge Extension' }, { type: 'Polygon', coordinates: [ringLngLat(shift(northRidge, 200, 0))] })],
  };
}

function bowTieField(): unknown {
  return {
    type: 'FeatureCollection',
    features: [
      geojsonFeature({ name: 'Crossed Corner' }, { type: 'Polygon', coordinates: [ringLngLat(bowTie)] }),
      geojsonFeature({ name: 'Upper Flat' }, { type: 'Polygon', coordinates: [ringLngLat(upperFlat)] }),
    ],
  };
}

// ---- KML -----------------------------------------------------------------------------------

const kmlRing = (ring: Xy[], close: boolean) =>
  (close ? closed(ring) : ring).map(toLngLat).map(([x, y]) => `${x},${y},0`).join(' ');
const kmlPolygon = (ring: Xy[], close = true) =>
  `<Polygon><outerBoundaryIs><LinearRing><coordinates>${kmlRing(ring, close)}</coordinates></LinearRing></outerBoundaryIs></Polygon>`;

function twoPlacemarksKml(): string {
  return `<?xml version="1.0" encoding="UTF-8"?>
<kml xmlns="http://www.opengis.net/kml/2.2">
  <Document>
    <name>Alder Run Farm boundaries</name>
    <Placemark>
      <name>Swale Field</name>
      <!-- ring left unclosed on purpose: the reader closes it -->
      ${kmlPolygon(swaleField, false)}
    </Placemark>
    <Placemark>
      <name>Creek Parcels</name>
      <MultiGeometry>
        ${kmlPolygon(creekBottom)}
        ${kmlPolygon(streamStrip)}
      </MultiGeometry>
    </Placemark>
  </Document>
</kml>
`;
}

const xxeKml = `<?xml version="1.0" encoding="UTF-8"?>
<!DOCTYPE kml [
  <!ENTITY secret SYSTEM "file:///etc/passwd">
]>
<kml xmlns="http://www.opengis.net/kml/2.2">
  <Placemark>
    <name>&secret;</name>
    ${kmlPolygon(northRidge)}
  </Placemark>
</kml>
`;

const billionLaughsKml = `<?xml version="1.0"?>
<!DOCTYPE kml [
  <!ENTITY lol "lol">
  <!ENTITY lol1 "&lol;&lol;&lol;&lol;&lol;&lol;&lol;&lol;&lol;&lol;">
  <!ENTITY lol2 "&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;">
  <!ENTITY lol3 "&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;">
]>
<kml xmlns="http://www.opengis.net/kml/2.2"><Placemark><name>&lol3;</name></Placemark></kml>
`;

const malformedKml = `<?xml version="1.0" encoding="UTF-8"?>
<kml xmlns="http://www.opengis.net/kml/2.2">
  <Placemark>
    <name>Broken</name>
    <Polygon><outerBoundaryIs><LinearRing><coordinates>-91.78,42.31 -91.77,42.31 -91.77,42.32</coordinates>
  </Placemark>
</kml>
`;

// ---- main ----------------------------------------------------------------------------------

async function main(): Promise<void> {
  mkdirSync(outDir, { recursive: true });
  const work = mkdtempSync(join(tmpdir(), 'fieldshed-fixtures-'));
  try {
    write('three-fields.geojson', json(threeFields()));
    write('mixed-geometries.geojson', json(mixedGeometries()));

    const utmFields: UtmFeature[] = [
      { name: 'North Ridge', props: { FARM_KEY: 'north-ridge' }, polygons: [[northRidge]] },
      { name: 'East Pasture', props: { FARM_KEY: 'east-pasture' }, polygons: [[eastPasture, pond]] },
      { name: 'Creek Parcels', props: { FARM_KEY: 'creek' }, polygons: [[creekBottom], [streamStrip]] },
    ];
    const utmSource = utmGeojson(utmFields);
    write('fields-utm15n.source.geojson', json(utmSource));
    const utm = shapefile(work, 'fields-utm15n', utmSource, 'EPSG:32615');
    write('fields-utm15n-shp.zip', await zipOf(layerEntries('fields-utm15n', utm)));
    write('fields-utm15n-no-prj-shp.zip', await zipOf(layerEntries('fields-utm15n', utm, ['prj'])));

    // The independent reference: GDAL/PROJ's reprojection of the very same shapefile.
    const refPath = join(work, 'reference.geojson');
    execFileSync(ogr2ogr, ['-f', 'GeoJSON', '-t_srs', 'EPSG:4326', '-lco', 'COORDINATE_PRECISION=10', '-lco', 'RFC7946=NO',
      refPath, join(work, 'fields-utm15n', 'fields-utm15n.shp')]);
    const reference = JSON.parse(readFileSync(refPath, 'utf8')) as Record<string, unknown>;
    const gdalVersion = execFileSync(ogr2ogr, ['--version'], { encoding: 'utf8' }).trim();
    write('fields-utm15n.reference-wgs84.geojson', json({
      ...reference,
      source: `${gdalVersion}: ogr2ogr -f GeoJSON -t_srs EPSG:4326 -lco COORDINATE_PRECISION=10 fields-utm15n.shp`,
    }));

    const wgsFields: UtmFeature[] = [
      { name: 'Mill Hill', polygons: [[millHill]] },
      { name: 'Hay Ground', polygons: [[hayGround]] },
    ];
    const wgs = shapefile(work, 'fields-wgs84', lngLatGeojson(wgsFields), 'EPSG:4326');
    write('fields-wgs84-no-prj-shp.zip', await zipOf(layerEntries('fields-wgs84', wgs, ['prj'])));
    write('two-layers-shp.zip', await zipOf([
      ...layerEntries('layers/fields-utm15n', utm),
      ...layerEntries('layers/fields-wgs84', wgs),
    ]));
    const named = shapefile(work, 'named-fields', utmWithAttributes([
      { props: { FIELD_NAME: 'Mill Hill', CROP: 'corn', PLOT: 'A1' }, ring: millHill },
      { props: { FIELD_NAME: 'Hay Ground', CROP: 'hay', PLOT: 'A2' }, ring: hayGround },
      { props: { FIELD_NAME: 'Upper Flat', CROP: 'soybean', PLOT: 'A3' }, ring: upperFlat },
    ]), 'EPSG:32615');
    write('named-fields-shp.zip', await zipOf(layerEntries('named-fields', named)));
    write('same-as-north-ridge.geojson', json(sameAsNorthRidge()));
    write('overlaps-north-ridge.geojson', json(overlapsNorthRidge()));
    write('bow-tie-field.geojson', json(bowTieField()));
    write('no-shp.zip', await zipOf([['readme.txt', 'Field notes, no shapefile here.\n'], ['fields.dbf', utm.get('dbf')!]]));

    // 65 MiB of zeros deflate to about 64 KiB: more than the importer unpacks (64 MiB).
    write('zip-bomb.zip', await zipOf([['huge.shp', Buffer.alloc(65 * 1024 * 1024)]]));
    const fullZip = readFileSync(join(outDir, 'fields-utm15n-shp.zip'));
    write('truncated-shp.zip', fullZip.subarray(0, Math.floor(fullZip.length * 0.6)));

    write('two-placemarks.kml', twoPlacemarksKml());
    write('two-placemarks.kmz', await zipOf([['doc.kml', twoPlacemarksKml()]]));
    write('xxe-entity.kml', xxeKml);
    write('billion-laughs.kml', billionLaughsKml);
    write('malformed.kml', malformedKml);

    write('empty.geojson', '');
    const png = new PNG({ width: 2, height: 2 });
    png.data.fill(200);
    write('png-renamed.geojson', PNG.sync.write(png));
    write('malformed.geojson', '{ "type": "FeatureCollection", "features": [ { "type": "Feature", "geometry": { "type": "Polygon", "coordinates": [[[-91.78, 42.31], [-91.77\n');
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

await main();
