// Import in two steps — a preview that stores nothing, then the chosen features — with real files
// (fixtures made by scripts/make-import-fixtures.ts with GDAL's ogr2ogr).
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import geodesicModule from 'geographiclib-geodesic';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';
import { AuditEvent, Field } from '../../server/models';
import type { ImportPreview, PreviewFeature } from '../../shared/schemas/field-import';

const ctx = makeTestApp();
afterAll(() => ctx.close());
const fixture = (name: string) => readFileSync(path.join('tests/fixtures/imports', name));

const { Geodesic } = geodesicModule as unknown as { Geodesic: { WGS84: { Polygon: (line: boolean) => GeoPolygon } } };
type GeoPolygon = { AddPoint: (lat: number, lon: number) => void; Compute: (reverse: boolean, sign: boolean) => { area: number } };

/** Area of a MultiPolygon's outer rings less its holes on the WGS84 ellipsoid (GeographicLib, Karney 2013). */
function geographicLibAreaM2(coordinates: number[][][][]): number {
  let total = 0;
  for (const polygon of coordinates) {
    polygon.forEach((ring, i) => {
      const p = Geodesic.WGS84.Polygon(false);
      for (const [lng, lat] of ring.slice(0, -1)) p.AddPoint(lat, lng);
      total += (i === 0 ? 1 : -1) * Math.abs(p.Compute(false, true).area);
    });
  }
  return total;
}

async function farmer() {
  const { farm, users } = await makeFarm(['farmer', 'advisor', 'landowner']);
  return { farmId: farm.id, users, agent: await signedIn(ctx.app, users.farmer) };
}
type Agent = Awaited<ReturnType<typeof farmer>>['agent'];

const preview = (agent: Agent, farmId: number, file: string) =>
  agent.post(`/api/farms/${farmId}/fields/import/preview`).attach('file', fixture(file), file);
const confirm = (agent: Agent, farmId: number, file: string, options?: unknown) => {
  const req = agent.post(`/api/farms/${farmId}/fields/import`).attach('file', fixture(file), file);
  return options === undefined ? req : req.field('options', typeof options === 'string' ? options : JSON.stringify(options));
};
const kinds = (f: PreviewFeature) => f.warnings.map((w) => w.kind);

describe('import preview', () => {
  it('lists each feature of a zipped shapefile with its ellipsoidal area and attributes, proposes FIELD_NAME, and stores nothing', async () => {
    const { farmId, agent } = await farmer();
    const res = await preview(agent, farmId, 'named-fields-shp.zip');
    expect(res.status).toBe(200);
    const body = res.body as ImportPreview;
    expect(body.format).toBe('shapefile');
    expect(body.attributeKeys).toEqual(['FIELD_NAME', 'CROP', 'PLOT']);
    expect(body.proposedNameAttribute).toBe('FIELD_NAME');
    expect(body.features.map((f) => f.attributes.FIELD_NAME)).toEqual(['Mill Hill', 'Hay Ground', 'Upper Flat']);
    for (const f of body.features) {
      expect(f.problem).toBeNull();
      expect(f.warnings).toEqual([]);
      expect(f.original).toBeNull();
      // Source: GeographicLib (geographiclib-geodesic), WGS84 ellipsoid polygon area of the returned outline.
      const ref = geographicLibAreaM2((f.geometry as { coordinates: number[][][][] }).coordinates);
      expect(Math.abs(f.areaHa! * 10_000 - ref) / ref).toBeLessThan(1e-6); // the outline is sent at 9 decimals (0.1 mm)
    }
    // Mill Hill is 490 m × 390 m less a 60 m × 60 m corner triangle in UTM 15N: 189,300 m² on the
    // grid. 100 km east of the central meridian the point scale is k ≈ 0.9996 (1 + x²/2R²) ≈ 0.99972
    // (Snyder 1987, Map Projections — A Working Manual, eq. 8-1), so the ground area is about 1/k² ≈ 1.00055 times it.
    expect(body.features[0].areaHa! * 10_000 / 189_300).toBeCloseTo(1.00055, 3);
    expect(await Field.count({ where: { farmId } })).toBe(0);
    expect(await AuditEvent.count({ where: { farmId } })).toBe(0);
  });

  it('says WGS84 was assumed for a shapefile without .prj', async () => {
    const { farmId, agent } = await farmer();
    const body = (await preview(agent, farmId, 'fields-wgs84-no-prj-shp.zip')).body as ImportPreview;
    expect(body.features).toHaveLength(2);
    for (const f of body.features) expect(f.warnings).toEqual([{ kind: 'no_prj_assumed_wgs84', layer: 'fields-wgs84' }]);
    expect(body.proposedNameAttribute).toBe('NAME');
  });

  it('offers a repaired outline for a self-intersecting polygon, with the original beside it', async () => {
    const { farmId, agent } = await farmer();
    const body = (await preview(agent, farmId, 'bow-tie-field.geojson')).body as ImportPreview;
    const [bowTie, upper] = body.features;
    expect(kinds(bowTie)).toEqual(['repaired']);
    expect(bowTie.warnings[0]).toMatchObject({ kind: 'repaired', reason: expect.stringMatching(/Self-intersection/) });
    expect(bowTie.original?.type).toBe('MultiPolygon');
    // ST_MakeValid splits a bow-tie into its two triangles.
    expect(bowTie.geometry?.type === 'MultiPolygon' && bowTie.geometry.coordinates).toHaveLength(2);
    expect(bowTie.problem).toBeNull();
    expect(upper.warnings).toEqual([]);
  });

  it('marks a feature that is the same as a field on the farm, and one that overlaps it', async () => {
    const { farmId, agent } = await farmer();
    expect((await confirm(agent, farmId, 'fields-utm15n-shp.zip')).status).toBe(201);
    const ridge = await Field.findOne({ where: { farmId, name: 'North Ridge' } });
    const same = (await preview(agent, farmId, 'same-as-north-ridge.geojson')).body as ImportPreview;
    expect(same.features[0].warnings).toEqual([{ kind: 'same_as_field', fieldId: ridge!.id, name: 'North Ridge' }]);
    const over = (await preview(agent, farmId, 'overlaps-north-ridge.geojson')).body as ImportPreview;
    expect(kinds(over.features[0])).toEqual(['overlaps_field']);
    // 290 m × 390 m less the moved field's own cut corner (60 m × 60 m / 2): 111,300 m² on the UTM grid,
    // about 11.14 ha on the ground (scale as above).
    expect(over.features[0].warnings[0]).toMatchObject({ fieldId: ridge!.id, name: 'North Ridge' });
    const overlapHa = (over.features[0].warnings[0] as { overlapHa: number }).overlapHa;
    expect(overlapHa).toBeCloseTo(11.14, 1);
  });

  it('lists lines and points as features that cannot be imported, with the reason', async () => {
    const { farmId, agent } = await farmer();
    const body = (await preview(agent, farmId, 'mixed-geometries.geojson')).body as ImportPreview;
    const line = body.features.find((f) => f.attributes.name === 'Fence Line')!;
    expect(line.geometry).toBeNull();
    expect(line.problem).toMatch(/LineString is not a field boundary/);
  });

  it('refuses a bad file with a message and stores nothing', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.post(`/api/farms/${farmId}/fields/import/preview`).attach('file', fixture('malformed.geojson'), 'broken.geojson');
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/not valid JSON/);
    const none = await agent.post(`/api/farms/${farmId}/fields/import/preview`).field('x', '1');
    expect(none.status).toBe(400);
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });

  it('is for the farmer only: the advisor and the landowner are refused', async () => {
    const { farmId, users } = await farmer();
    for (const who of [users.advisor, users.landowner]) {
      const agent = await signedIn(ctx.app, who);
      expect((await preview(agent, farmId, 'named-fields-shp.zip')).status).toBe(403);
      expect((await confirm(agent, farmId, 'named-fields-shp.zip', { indexes: [1] })).status).toBe(403);
    }
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });
});

describe('import with the preview’s choices', () => {
  it('stores only the chosen features, named from the chosen attribute', async () => {
    const { farmId, agent } = await farmer();
    const res = await confirm(agent, farmId, 'named-fields-shp.zip', { nameAttribute: 'PLOT', indexes: [1, 3] });
    expect(res.status).toBe(201);
    expect(res.body.created.map((f: { properties: { name: string } }) => f.properties.name).sort()).toEqual(['A1', 'A3']);
    expect(res.body.rejected).toEqual([]);
    expect(await Field.count({ where: { farmId } })).toBe(2);
  });

  it('makes no duplicates when the same file comes twice, unless asked', async () => {
    const { farmId, agent } = await farmer();
    expect((await confirm(agent, farmId, 'named-fields-shp.zip', { nameAttribute: 'FIELD_NAME' })).body.created).toHaveLength(3);
    const again = await confirm(agent, farmId, 'named-fields-shp.zip', { nameAttribute: 'FIELD_NAME' });
    expect(again.status).toBe(201);
    expect(again.body.created).toEqual([]);
    expect(again.body.rejected).toHaveLength(3);
    for (const r of again.body.rejected) {
      expect(r.kind).toBe('same_as_field');
      expect(r.reason).toMatch(/the same as the field "(Mill Hill|Hay Ground|Upper Flat)"/);
    }
    // Without options (a script) the same holds.
    expect((await confirm(agent, farmId, 'named-fields-shp.zip')).body.created).toEqual([]);
    expect(await Field.count({ where: { farmId } })).toBe(3);
    const asked = await confirm(agent, farmId, 'named-fields-shp.zip', { indexes: [2], allowDuplicates: true });
    expect(asked.body.created).toHaveLength(1);
    expect(await Field.count({ where: { farmId } })).toBe(4);
  });

  it('stores a repaired outline only when it is accepted; otherwise nothing is stored', async () => {
    const { farmId, agent } = await farmer();
    const refused = await confirm(agent, farmId, 'bow-tie-field.geojson', { indexes: [1, 2] });
    expect(refused.status).toBe(422);
    expect(refused.body.error).toBe('feature_not_importable');
    expect(refused.body.message).toMatch(/^Feature 1 \(Crossed Corner\): .*Self-intersection.*Nothing was stored\.$/);
    expect(await Field.count({ where: { farmId } })).toBe(0);
    const accepted = await confirm(agent, farmId, 'bow-tie-field.geojson', { indexes: [1, 2], acceptRepaired: true });
    expect(accepted.status).toBe(201);
    const crossed = accepted.body.created.find((f: { properties: { name: string } }) => f.properties.name === 'Crossed Corner');
    expect(crossed.geometry.coordinates).toHaveLength(2);
    expect(await Field.count({ where: { farmId } })).toBe(2);
  });

  it('refuses choices that make no sense with a message naming them, and stores nothing', async () => {
    const { farmId, agent } = await farmer();
    const cases: [unknown, RegExp][] = [
      ['{not json', /options must be JSON text/],
      [{ indexes: [9] }, /options.indexes: the file has no feature 9 \(it holds 3\)/],
      [{ indexes: [0] }, /options.indexes.0: indexes start at 1/],
      [{ keepAll: true }, /options/],
    ];
    for (const [options, message] of cases) {
      const res = await confirm(agent, farmId, 'named-fields-shp.zip', options);
      expect(res.status).toBe(400);
      expect(res.body.message).toMatch(message);
    }
    const line = await confirm(agent, farmId, 'mixed-geometries.geojson', { indexes: [1, 2] });
    expect(line.status).toBe(422);
    expect(line.body.message).toMatch(/feature 2 \("Fence Line"\).*Nothing was stored/);
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });
});
