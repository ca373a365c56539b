import { describe, expect, it } from 'vitest';
import { parseBoundaryFile } from '../../../server/services/imports/parse-boundaries';
import { allPositions, boundary, fixtureJson, itemsOf, parseFixture, parseText, rejection } from './fixtures';

type Fc = { features: { geometry: { coordinates: unknown } }[] };

describe('GeoJSON boundary import', () => {
  it('reads a FeatureCollection of three fields with names from name-like properties', async () => {
    const result = await parseFixture('three-fields.geojson');
    expect(result.ok && result.format).toBe('geojson');
    const items = itemsOf(result).map(boundary);
    expect(items.map((i) => i.index)).toEqual([1, 2, 3]);
    // "name", then "FIELD_NAME" (preferred over "id": 17), then "Label".
    expect(items.map((i) => i.name)).toEqual(['North Ridge', 'Creek Parcels', 'Bow-tie Corner']);
    expect(items.map((i) => i.geometry.type)).toEqual(['Polygon', 'MultiPolygon', 'Polygon']);
  });

  it('passes a self-intersecting bow-tie through as parsed, leaving topology to PostGIS', async () => {
    // Shape checks only here; ST_IsValid rejects the bow-tie when the route stores it.
    const bowTie = boundary(itemsOf(await parseFixture('three-fields.geojson'))[2]);
    expect(bowTie.geometry.coordinates[0]).toHaveLength(5);
  });

  it('drops Z values and removes a repeated consecutive vertex', async () => {
    const creek = boundary(itemsOf(await parseFixture('three-fields.geojson'))[1]);
    const source = fixtureJson<Fc>('three-fields.geojson').features[1].geometry.coordinates as number[][][][];
    expect(source[0][0]).toHaveLength(7); // 5 corners, one repeated, plus the closing point
    expect(source[0][0][0]).toHaveLength(3);
    expect(allPositions(creek.geometry.coordinates).every((p) => p.length === 2)).toBe(true);
    const ring = (creek.geometry.coordinates as number[][][][])[0][0];
    expect(ring).toHaveLength(6);
    expect(ring).toEqual(source[0][0].filter((_, i) => i !== 2).map(([x, y]) => [x, y]));
  });

  it('rejects a LineString, a Point and a null geometry by feature number and name, keeping the polygons', async () => {
    const items = itemsOf(await parseFixture('mixed-geometries.geojson'));
    expect(items).toHaveLength(6);
    expect(boundary(items[0]).name).toBe('Mill Hill');
    expect(rejection(items[1]).rejected).toBe('feature 2 ("Fence Line"): a LineString is not a field boundary; draw or upload a polygon');
    expect(rejection(items[2]).rejected).toBe('feature 3 ("Well"): a Point is not a field boundary; draw or upload a polygon');
    expect(boundary(items[3]).name).toBe('Hay Ground'); // from "title"
    expect(rejection(items[4]).rejected).toBe('feature 5 ("Not Yet Mapped"): has no geometry');
  });

  it('flattens a GeometryCollection to its polygons and says what was left out', async () => {
    const upper = boundary(itemsOf(await parseFixture('mixed-geometries.geojson'))[5]);
    expect(upper.name).toBe('Upper Flat'); // from "field"
    expect(upper.geometry.type).toBe('Polygon');
    expect(upper.warnings).toEqual(['feature 6 ("Upper Flat"): 1 Point left out of the GeometryCollection: only polygons become field boundaries']);
  });

  const square = [[-91.78, 42.3], [-91.77, 42.3], [-91.77, 42.31], [-91.78, 42.31], [-91.78, 42.3]];

  it('reads a single Feature', async () => {
    const text = JSON.stringify({ type: 'Feature', properties: { NAME: 'Lone Field' }, geometry: { type: 'Polygon', coordinates: [square] } });
    const [item] = itemsOf(await parseText(text)).map(boundary);
    expect(item).toEqual({ index: 1, name: 'Lone Field', geometry: { type: 'Polygon', coordinates: [square] }, notes: [], properties: { NAME: 'Lone Field' } });
  });

  it('reads a bare Polygon, MultiPolygon and GeometryCollection of polygons', async () => {
    const poly = boundary(itemsOf(await parseText(JSON.stringify({ type: 'Polygon', coordinates: [square] })))[0]);
    expect(poly).toMatchObject({ index: 1, name: null, geometry: { type: 'Polygon' } });
    const multi = boundary(itemsOf(await parseText(JSON.stringify({ type: 'MultiPolygon', coordinates: [[square]] })))[0]);
    expect(multi.geometry.type).toBe('MultiPolygon');
    const shifted = square.map(([x, y]) => [x + 0.02, y]);
    const gc = { type: 'GeometryCollection', geometries: [{ type: 'Polygon', coordinates: [square] }, { type: 'MultiPolygon', coordinates: [[shifted]] }] };
    const flat = boundary(itemsOf(await parseText(JSON.stringify(gc)))[0]);
    expect(flat.geometry).toEqual({ type: 'MultiPolygon', coordinates: [[square], [shifted]] });
    expect(flat.warnings).toBeUndefined();
  });

  it('closes an unclosed ring without a warning', async () => {
    const open = square.slice(0, 4);
    const item = boundary(itemsOf(await parseText(JSON.stringify({ type: 'Polygon', coordinates: [open] })))[0]);
    expect(item.geometry.coordinates[0]).toEqual(square);
    expect(item.warnings).toBeUndefined();
  });

  it('rejects a ring with fewer than three distinct corners, saying which ring', async () => {
    const sliver = [[-91.78, 42.3], [-91.77, 42.3], [-91.77, 42.3], [-91.78, 42.3]];
    const [item] = itemsOf(await parseText(JSON.stringify({ type: 'Polygon', coordinates: [sliver] })));
    // After the repeat is removed the ring has 3 positions: the shared schema wants 4.
    expect(rejection(item).rejected).toBe('feature 1: outer ring: a ring needs at least 4 positions (3 corners and the closing point)');
  });

  it('rejects coordinates outside longitude/latitude range, naming the point and hinting at projected data', async () => {
    const metres = [[600005, 4684805], [600495, 4684805], [600495, 4685195], [600005, 4684805]];
    const text = JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: { name: 'UTM by mistake' }, geometry: { type: 'Polygon', coordinates: [metres] } }] });
    const reason = rejection(itemsOf(await parseText(text))[0]).rejected;
    expect(reason).toMatch(/^feature 1 \("UTM by mistake"\): outer ring, point 1: longitude must be at most 180/);
    expect(reason).toContain('WGS84, EPSG:4326');
  });

  it('rejects a hole in a MultiPolygon by polygon and hole number', async () => {
    const badHole = [[-91.775, 42.305], [-91.774, 42.305], [-91.775, 42.305]];
    const [item] = itemsOf(await parseText(JSON.stringify({ type: 'MultiPolygon', coordinates: [[square], [square, badHole]] })));
    expect(rejection(item).rejected).toMatch(/^feature 1: polygon 2, hole 1: a ring needs at least 4 positions/);
  });

  it('rejects GeometryCollections nested too deeply instead of recursing without end', async () => {
    let g: unknown = { type: 'Polygon', coordinates: [square] };
    for (let i = 0; i < 20; i++) g = { type: 'GeometryCollection', geometries: [g] };
    const [item] = itemsOf(await parseText(JSON.stringify(g)));
    expect(rejection(item).rejected).toBe('feature 1: nests GeometryCollections more than 8 deep');
  });

  it('rejects a collection member that is not a Feature', async () => {
    const text = JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Polygon', coordinates: [square] }, 'x'] });
    const items = itemsOf(await parseText(text));
    expect(rejection(items[0]).rejected).toBe('feature 1: is not a GeoJSON Feature (it has "Polygon")');
    expect(rejection(items[1]).rejected).toBe('feature 2: is not a GeoJSON Feature object');
  });

  it('reads a file with a UTF-8 byte-order mark and an explicit CRS84 crs member', async () => {
    // The GDAL-written reference file carries "crs": urn:ogc:def:crs:OGC:1.3:CRS84.
    const items = itemsOf(await parseFixture('fields-utm15n.reference-wgs84.geojson'));
    expect(items.map((i) => boundary(i).name)).toEqual(['North Ridge', 'East Pasture', 'Creek Parcels']);
    const bom = Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(JSON.stringify({ type: 'Polygon', coordinates: [square] }))]);
    expect((await parseBoundaryFile({ buffer: bom, originalName: 'bom.geojson' })).ok).toBe(true);
  });

  it('refuses GeoJSON whose crs member names a projected system, with 422', async () => {
    const result = await parseFixture('fields-utm15n.source.geojson');
    expect(result).toMatchObject({ ok: false, status: 422, error: 'unsupported_crs' });
    expect(!result.ok && result.message).toContain('urn:ogc:def:crs:EPSG::32615');
  });

  it('answers 422 for a FeatureCollection with no features', async () => {
    expect(await parseText('{"type":"FeatureCollection","features":[]}')).toMatchObject({ ok: false, status: 422, error: 'no_features' });
  });

  it('answers 400 for JSON that is not GeoJSON, naming what it found', async () => {
    expect(await parseText('{"type":"Banana"}')).toMatchObject({ status: 400, error: 'invalid_geojson', message: expect.stringContaining('type "Banana"') });
    expect(await parseText('[1,2,3]')).toMatchObject({ status: 400, error: 'invalid_geojson' });
    expect(await parseText('{"type":"FeatureCollection"}')).toMatchObject({ status: 400, message: 'The FeatureCollection has no "features" list.' });
    expect(await parseText('{"type":"Topology","objects":{}}')).toMatchObject({ status: 400, message: expect.stringContaining('TopoJSON') });
  });
});
