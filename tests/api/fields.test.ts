import { afterAll, describe, expect, it } from 'vitest';
import geodesicModule from 'geographiclib-geodesic';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';
import { Field, AuditEvent } from '../../server/models';

const ctx = makeTestApp();
afterAll(() => ctx.close());
const { Geodesic } = geodesicModule as unknown as { Geodesic: { WGS84: { Polygon: (line: boolean) => GeoPolygon } } };
type GeoPolygon = { AddPoint: (lat: number, lon: number) => void; Compute: (reverse: boolean, sign: boolean) => { area: number; perimeter: number } };

/** Reference area and perimeter of a ring on the WGS84 ellipsoid (GeographicLib, Karney 2013). */
function geographicLib(ring: number[][]) {
  const p = Geodesic.WGS84.Polygon(false);
  for (const [lng, lat] of ring.slice(0, -1)) p.AddPoint(lat, lng);
  const r = p.Compute(false, true);
  return { areaM2: Math.abs(r.area), perimeterM: r.perimeter };
}

describe('fields API', () => {
  it('stores a drawn field with area and perimeter on the WGS84 ellipsoid, matching GeographicLib', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const feature = squareFeature(-91.78, 42.31, 700, 'Big Square');
    const res = await agent.post(`/api/farms/${farm.id}/fields`).send(feature);
    expect(res.status).toBe(201);
    const ref = geographicLib(feature.geometry.coordinates[0]);
    // Source: GeographicLib (geographiclib-geodesic), WGS84 ellipsoid polygon area.
    expect(res.body.properties.areaHa * 10_000).toBeCloseTo(ref.areaM2, 3);
    expect(Math.abs(res.body.properties.areaHa * 10_000 - ref.areaM2) / ref.areaM2).toBeLessThan(1e-9);
    expect(res.body.properties.perimeterM).toBeCloseTo(ref.perimeterM, 1);
    expect(res.body).toMatchObject({ type: 'Feature', id: expect.any(Number), properties: { name: 'Big Square', version: 0 } });
    expect(res.body.geometry.type).toBe('MultiPolygon');
    expect(res.body.geometry.crs).toBeUndefined();
  });

  it('lists the farm fields as a FeatureCollection whose ids are the field ids', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const a = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 300, 'A'));
    await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.77, 42.31, 300, 'B'));
    const res = await agent.get(`/api/farms/${farm.id}/fields`);
    expect(res.status).toBe(200);
    expect(res.body.type).toBe('FeatureCollection');
    expect(res.body.features.map((f: { properties: { name: string } }) => f.properties.name)).toEqual(['A', 'B']);
    expect(res.body.features[0].id).toBe(a.body.id);
    expect(res.body.features[0].properties).toMatchObject({ areaHa: expect.any(Number), version: 0 });
  });

  it('names a field by itself when no name is given', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const res = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31));
    expect(res.body.properties.name).toBe('Field 1');
  });

  it('flags overlaps with the farm other fields with the overlap area', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200, 'West'));
    const res = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.7790, 42.31, 200, 'East'));
    expect(res.status).toBe(201);
    expect(res.body.properties.overlaps).toHaveLength(1);
    expect(res.body.properties.overlaps[0]).toMatchObject({ name: 'West' });
    expect(res.body.properties.overlaps[0].areaHa).toBeGreaterThan(0.5);
  });

  it('changes a field with its version and answers 409 to a stale version, changing nothing', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const made = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200, 'Old name'));
    const ok = await agent.patch(`/api/fields/${made.body.id}`).send({ version: 0, name: 'New name', geometry: squareFeature(-91.78, 42.31, 400).geometry });
    expect(ok.status).toBe(200);
    expect(ok.body.properties).toMatchObject({ name: 'New name', version: 1 });
    expect(ok.body.properties.areaHa).toBeGreaterThan(made.body.properties.areaHa * 3.9);
    const stale = await agent.patch(`/api/fields/${made.body.id}`).send({ version: 0, name: 'Lost edit' });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toBe('stale_version');
    expect(stale.body.details.current.properties.name).toBe('New name');
    expect((await Field.findByPk(made.body.id))!.name).toBe('New name');
  });

  it('deletes a field and keeps an audit trail of who did what', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const made = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31));
    expect((await agent.delete(`/api/fields/${made.body.id}`)).status).toBe(204);
    expect((await agent.get(`/api/fields/${made.body.id}`)).status).toBe(404);
    const events = await AuditEvent.findAll({ where: { farmId: farm.id }, order: [['id', 'ASC']] });
    expect(events.map((e) => e.action)).toEqual(['created', 'deleted']);
    expect(events.every((e) => e.userId === users.farmer.id)).toBe(true);
  });
});

describe('bad boundaries get a clear 4xx and store nothing', () => {
  const cases: [string, unknown, number, RegExp][] = [
    ['malformed GeoJSON (no geometry)', { type: 'Feature', properties: {} }, 400, /geometry/],
    ['a point is not a boundary', { type: 'Feature', geometry: { type: 'Point', coordinates: [-91.78, 42.31] } }, 400, /Polygon or MultiPolygon/],
    ['out-of-range coordinates', squareFeatureWith([[200, 42.31], [200.01, 42.31], [200.01, 42.32], [200, 42.31]]), 400, /longitude/],
    ['an unclosed ring', squareFeatureWith([[-91.78, 42.31], [-91.77, 42.31], [-91.77, 42.32], [-91.78, 42.32]]), 400, /closed/],
    ['a ring of two distinct corners', squareFeatureWith([[-91.78, 42.31], [-91.77, 42.31], [-91.78, 42.31], [-91.78, 42.31]]), 400, /3 distinct/],
    ['a self-intersecting ring (bow tie)', squareFeatureWith([[-91.78, 42.31], [-91.77, 42.32], [-91.77, 42.31], [-91.78, 42.32], [-91.78, 42.31]]), 422, /Self-intersection/],
    ['a field smaller than 0.01 ha', squareFeature(-91.78, 42.31, 5), 422, /between 0.01 ha/],
  ];
  for (const [what, body, status, message] of cases) {
    it(`refuses ${what}`, async () => {
      const { farm, users } = await makeFarm(['farmer']);
      const agent = await signedIn(ctx.app, users.farmer);
      const res = await agent.post(`/api/farms/${farm.id}/fields`).send(body as object);
      expect(res.status).toBe(status);
      expect(res.body.message).toMatch(message);
      expect(await Field.count({ where: { farmId: farm.id } })).toBe(0);
    });
  }

  it('offers the repaired shape of a bow tie for the user to confirm', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const bow = squareFeatureWith([[-91.78, 42.31], [-91.77, 42.32], [-91.77, 42.31], [-91.78, 42.32], [-91.78, 42.31]]);
    const res = await agent.post(`/api/farms/${farm.id}/fields`).send(bow);
    expect(res.body.details.repaired.type).toBe('MultiPolygon');
    expect(res.body.details.repaired.coordinates).toHaveLength(2);
    const confirmed = await agent.post(`/api/farms/${farm.id}/fields`).send({ type: 'Feature', properties: {}, geometry: res.body.details.repaired });
    expect(confirmed.status).toBe(201);
  });

  it('refuses a name with control characters', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const res = await agent.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.78, 42.31, 200, 'North\u0000field'));
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^properties.name: name must not contain control characters/);
    expect(await Field.count({ where: { farmId: farm.id } })).toBe(0);
  });

  it('answers 400 to a body that is not JSON', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, users.farmer);
    const res = await agent.post(`/api/farms/${farm.id}/fields`).set('Content-Type', 'application/json').send('{"type": "Feat');
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('malformed_json');
  });
});

function squareFeatureWith(ring: number[][]) {
  return { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [ring] } };
}
