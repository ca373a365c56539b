// Import through the HTTP route with real files (fixtures made by scripts/make-import-fixtures.ts).
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';
import { Field, AuditEvent } from '../../server/models';

const ctx = makeTestApp();
afterAll(() => ctx.close());
const fixture = (name: string) => readFileSync(path.join('tests/fixtures/imports', name));

async function farmerAgent() {
  const { farm, users } = await makeFarm(['farmer']);
  return { farmId: farm.id, agent: await signedIn(ctx.app, users.farmer) };
}

describe('importing boundary files', () => {
  it('creates each polygon of a GeoJSON file and rejects lines and points with a reason', async () => {
    const { farmId, agent } = await farmerAgent();
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', fixture('mixed-geometries.geojson'), 'mixed.geojson');
    expect(res.status).toBe(201);
    expect(res.body.created.length).toBeGreaterThan(0);
    expect(res.body.rejected.length).toBeGreaterThan(0);
    for (const r of res.body.rejected) expect(r.reason).toMatch(/feature \d+/);
    expect(await Field.count({ where: { farmId } })).toBe(res.body.created.length);
  });

  it('reprojects a zipped UTM shapefile with its .prj to the same WGS84 corners ogr2ogr gives', async () => {
    const { farmId, agent } = await farmerAgent();
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', fixture('fields-utm15n-shp.zip'), 'fields.zip');
    expect(res.status).toBe(201);
    // Reference: the same features reprojected by GDAL's ogr2ogr (fields-utm15n.reference-wgs84.geojson).
    const ref = JSON.parse(fixture('fields-utm15n.reference-wgs84.geojson').toString()) as { features: { geometry: { coordinates: number[][][] | number[][][][] } }[] };
    expect(res.body.created).toHaveLength(ref.features.length);
    const first = ref.features[0].geometry.coordinates.flat(3) as number[];
    const got = (res.body.created as { geometry: { coordinates: number[][][][] } }[]).map((f) => f.geometry.coordinates.flat(3) as number[]);
    const match = got.find((g) => Math.abs(g[0] - first[0]) < 1e-6 && Math.abs(g[1] - first[1]) < 1e-6);
    expect(match).toBeDefined();
  });

  it('names fields from the KML placemark names', async () => {
    const { farmId, agent } = await farmerAgent();
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', fixture('two-placemarks.kml'), 'fields.kml');
    expect(res.status).toBe(201);
    expect(res.body.created.every((f: { properties: { name: string } }) => !/^Field \d+$/.test(f.properties.name))).toBe(true);
  });

  it('stores one valid field and rejects a self-intersecting one from the same file', async () => {
    const { farmId, agent } = await farmerAgent();
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', fixture('three-fields.geojson'), 'three.geojson');
    expect(res.status).toBe(201);
    const all = res.body.created.length + res.body.rejected.length;
    expect(all).toBe(3);
    const bad = res.body.rejected.find((r: { reason: string }) => /Self-intersection/.test(r.reason));
    expect(bad).toBeDefined();
    expect(await Field.count({ where: { farmId } })).toBe(res.body.created.length);
  });

  const bad: [string, Buffer, string, number, string][] = [
    ['an empty file', fixture('empty.geojson'), 'empty.geojson', 400, 'empty_file'],
    ['a PNG renamed .geojson', fixture('png-renamed.geojson'), 'map.geojson', 415, 'unsupported_file_type'],
    ['malformed JSON', fixture('malformed.geojson'), 'broken.geojson', 400, ''],
    ['a truncated zip', fixture('truncated-shp.zip'), 'broken.zip', 400, ''],
    ['a KML with an entity declaration (XXE)', fixture('xxe-entity.kml'), 'evil.kml', 400, ''],
    ['a zip with no .shp', fixture('no-shp.zip'), 'nothing.zip', 400, ''],
  ];
  for (const [what, buf, name, status, code] of bad) {
    it(`refuses ${what} with ${status} and stores nothing`, async () => {
      const { farmId, agent } = await farmerAgent();
      const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', buf, name);
      expect(res.status).toBe(status);
      if (code) expect(res.body.error).toBe(code);
      expect(res.body.message.length).toBeGreaterThan(10);
      expect(await Field.count({ where: { farmId } })).toBe(0);
      expect(await AuditEvent.count({ where: { farmId } })).toBe(0);
    });
  }

  it('answers 422 and stores nothing when no feature is usable', async () => {
    const { farmId, agent } = await farmerAgent();
    const lines = Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'LineString', coordinates: [[0, 0], [1, 1]] } }] }));
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', lines, 'lines.geojson');
    expect(res.status).toBe(422);
    expect(res.body.error).toBe('nothing_imported');
    expect(res.body.details.rejected).toHaveLength(1);
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });

  it('answers 413 to a file over the 8 MB limit', async () => {
    const { farmId, agent } = await farmerAgent();
    const big = Buffer.alloc(8 * 1024 * 1024 + 10, 0x20);
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', big, 'big.geojson');
    expect(res.status).toBe(413);
    expect(res.body.message).toBe('The boundary file is larger than the 8 MB limit.');
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });

  it('answers 400 when the file part is missing', async () => {
    const { farmId, agent } = await farmerAgent();
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).field('other', 'x');
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/"file"/);
  });
});
