import { describe, expect, it } from 'vitest';
import { allPositions, boundary, itemsOf, parseFixture, parseText, rejection } from './fixtures';

const kmlDoc = (body: string) => `<?xml version="1.0" encoding="UTF-8"?><kml xmlns="http://www.opengis.net/kml/2.2"><Document>${body}</Document></kml>`;

describe('KML and KMZ boundary import', () => {
  it('reads a Polygon placemark and a MultiGeometry placemark with names from <name>', async () => {
    const result = await parseFixture('two-placemarks.kml');
    expect(result.ok && result.format).toBe('kml');
    const items = itemsOf(result).map(boundary);
    expect(items.map((i) => [i.index, i.name, i.geometry.type])).toEqual([
      [1, 'Swale Field', 'Polygon'],
      [2, 'Creek Parcels', 'MultiPolygon'],
    ]);
    expect(items[1].geometry.coordinates).toHaveLength(2);
  });

  it('closes the unclosed KML ring quietly and drops the altitude', async () => {
    const [swale] = itemsOf(await parseFixture('two-placemarks.kml')).map(boundary);
    const ring = swale.geometry.coordinates[0] as number[][];
    expect(ring).toHaveLength(6); // 5 corners in the file, closing point added
    expect(ring[5]).toEqual(ring[0]);
    expect(swale.warnings).toBeUndefined();
    expect(allPositions(swale.geometry.coordinates).every((p) => p.length === 2)).toBe(true);
  });

  it('gives the same coordinates as the GeoJSON fixture made from the same corners', async () => {
    // Both files come from the same UTM corners through scripts/make-import-fixtures.ts.
    const kmlCreek = boundary(itemsOf(await parseFixture('two-placemarks.kml'))[1]);
    const geojsonCreek = boundary(itemsOf(await parseFixture('three-fields.geojson'))[1]);
    expect(kmlCreek.geometry).toEqual(geojsonCreek.geometry);
  });

  it('reads a KMZ (a zip holding doc.kml) like the KML inside it', async () => {
    const kmz = await parseFixture('two-placemarks.kmz');
    const kml = await parseFixture('two-placemarks.kml');
    expect(kmz.ok && kmz.format).toBe('kml');
    expect(kmz).toEqual(kml);
  });

  it('refuses a KML with a DOCTYPE and external ENTITY (XXE) with 400, without reading it', async () => {
    const result = await parseFixture('xxe-entity.kml');
    expect(result).toMatchObject({ ok: false, status: 400, error: 'xml_declaration_not_allowed' });
    expect(!result.ok && result.message).toContain('DOCTYPE or ENTITY');
    expect(JSON.stringify(result)).not.toMatch(/root:/);
  });

  it('refuses a billion-laughs entity bomb with 400', async () => {
    expect(await parseFixture('billion-laughs.kml')).toMatchObject({ ok: false, status: 400, error: 'xml_declaration_not_allowed' });
  });

  it('refuses an ENTITY declaration even without a DOCTYPE keyword first', async () => {
    const text = '<?xml version="1.0"?><!ENTITY x "y"><kml xmlns="http://www.opengis.net/kml/2.2"></kml>';
    expect(await parseText(text, 'x.kml')).toMatchObject({ status: 400, error: 'xml_declaration_not_allowed', message: expect.stringContaining('<!ENTITY>') });
  });

  it('reads a placemark whose CDATA description holds HTML with <!DOCTYPE html>', async () => {
    const ring = '-91.78,42.30 -91.77,42.30 -91.77,42.31 -91.78,42.30';
    const text = kmlDoc(`<Placemark><name>Hay Ground</name><description><![CDATA[<!DOCTYPE html><p>cut twice</p>]]></description>` +
      `<Polygon><outerBoundaryIs><LinearRing><coordinates>${ring}</coordinates></LinearRing></outerBoundaryIs></Polygon></Placemark>`);
    expect(boundary(itemsOf(await parseText(text, 'hay.kml'))[0]).name).toBe('Hay Ground');
  });

  it('still refuses a DOCTYPE placed after a comment that mentions CDATA', async () => {
    const text = '<?xml version="1.0"?><!-- <![CDATA[ --><!DOCTYPE kml [<!ENTITY x SYSTEM "file:///etc/passwd">]><!-- ]]> --><kml><Placemark><name>&x;</name></Placemark></kml>';
    expect(await parseText(text, 'x.kml')).toMatchObject({ status: 400, error: 'xml_declaration_not_allowed' });
  });

  it('answers 400 for malformed XML, naming the line', async () => {
    const result = await parseFixture('malformed.kml');
    expect(result).toMatchObject({ ok: false, status: 400, error: 'invalid_xml' });
    expect(!result.ok && result.message).toContain('line 5: Opening and ending tag mismatch');
  });

  it('rejects a Point placemark by number and name', async () => {
    const text = kmlDoc('<Placemark><name>Gate</name><Point><coordinates>-91.78,42.31,0</coordinates></Point></Placemark>');
    const [item] = itemsOf(await parseText(text, 'gate.kml'));
    expect(rejection(item).rejected).toBe('feature 1 ("Gate"): a Point is not a field boundary; draw or upload a polygon');
  });

  it('answers 422 for a KML without placemarks', async () => {
    expect(await parseText(kmlDoc('<name>empty</name>'), 'empty.kml')).toMatchObject({ ok: false, status: 422, error: 'no_features' });
  });

  it('answers 415 for XML that is not KML (GPX)', async () => {
    const gpx = '<?xml version="1.0"?><gpx version="1.1" creator="x"><trk><name>walk</name></trk></gpx>';
    const result = await parseText(gpx, 'walk.kml');
    expect(result).toMatchObject({ ok: false, status: 415, error: 'unsupported_file_type' });
    expect(!result.ok && result.message).toContain('<gpx>');
  });
});
