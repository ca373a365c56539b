// Odd and hostile input gets a 4xx naming the field and the limit, never a 500, and nothing stored.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { Field, ProcessingJob, SoilMapUnit, SoilMap } from '../../server/models';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';
import { OUTLINE_MAX_VERTICES, SLOPE_CLASSES_MAX } from '../../shared/limits';

const ctx = makeTestApp();
afterAll(() => ctx.close());

async function farmer() {
  const made = await makeFarm(['farmer', 'landowner']);
  return { ...made, farmId: made.farm.id, agent: await signedIn(ctx.app, made.users.farmer), landowner: await signedIn(ctx.app, made.users.landowner) };
}
const named = (name: string) => squareFeature(-91.78, 42.31, 200, name);
const polygon = (ring: number[][]) => ({ type: 'Feature', properties: { name: 'Odd' }, geometry: { type: 'Polygon', coordinates: [ring] } });

describe('hostile text in names', () => {
  it('refuses a lone surrogate in a field name with 400 naming the field', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.post(`/api/farms/${farmId}/fields`).send(named('North \ud800 field'));
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^properties\.name: name contains a broken character/);
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });

  it('refuses right-to-left overrides and zero-width characters in names', async () => {
    const { farmId, agent } = await farmer();
    for (const name of ['Field\u202Egpj.exe', 'Ba\u200Bck forty', 'Ho\uFEFFme', 'Lower\u2066 meadow']) {
      const res = await agent.post(`/api/farms/${farmId}/fields`).send(named(name));
      expect(res.status, JSON.stringify(name)).toBe(400);
      expect(res.body.message).toMatch(/invisible or direction-changing characters/);
    }
    // Zero-width (non-)joiners are part of Persian and Indic spelling and of emoji.
    expect((await agent.post(`/api/farms/${farmId}/fields`).send(named('مزرعه\u200Cی شمالی'))).status).toBe(201);
    const farmName = await request(ctx.app).post('/api/auth/register').send({ email: `rtl-${randomUUID()}@example.test`, password: 'a long password', name: 'A', farmName: 'Farm\u202E' });
    expect(farmName.status).toBe(400);
    expect(farmName.body.message).toMatch(/^farmName: /);
  });

  it('refuses a NUL character in a slope-class name with 400, not 500', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.put(`/api/farms/${farmId}/slope-classes`).send({ classes: [{ name: 'flat\u0000', minPct: 0, maxPct: null }] });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('classes.0.name: name must not contain control characters');
  });

  it('refuses a NUL character in a cover-crop species with 400, not 500', async () => {
    const { farmId, agent } = await farmer();
    const fieldId = (await agent.post(`/api/farms/${farmId}/fields`).send(named('Cover'))).body.id;
    const res = await agent.put(`/api/fields/${fieldId}/cropping`).send({ season: '2027', crop: 'corn', practice: 'none', coverCrop: { species: 'cereal rye\u0000' } });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^coverCrop\.species: coverCrop\.species must not contain control characters/);
  });

  it('stores a soil map whose attributes hold NUL characters and lone surrogates, without them', async () => {
    const { farmId, agent } = await farmer();
    const unit = { type: 'Feature', properties: { 'MU\u0000SYM': 'Ab\u00002', NOTE: 'half \udc00 pair' }, geometry: named('x').geometry };
    const res = await agent.post(`/api/farms/${farmId}/soil-map`).attach('file', Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [unit] })), 'map.geojson');
    expect(res.status).toBe(201);
    const map = await SoilMap.findOne({ where: { farmId } });
    const [stored] = await SoilMapUnit.findAll({ where: { soilMapId: map!.id } });
    expect(stored.attributes).toEqual({ MUSYM: 'Ab2', NOTE: 'half  pair' });
  });

  it('drops NUL characters from a field name read from an imported file', async () => {
    const { farmId, agent } = await farmer();
    const file = { type: 'FeatureCollection', features: [named('Creek\u0000 bottom')] };
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', Buffer.from(JSON.stringify(file)), 'f.geojson');
    expect(res.status).toBe(201);
    expect(res.body.created[0].properties.name).toBe('Creek bottom');
  });
});

describe('hostile ids and numbers', () => {
  it('answers a job id that fits the pattern but is not a UUID with 400', async () => {
    const { agent } = await farmer();
    for (const id of ['------------------------------------', 'aaaaaaaa-aaaa-aaaa-aaaa-aaaaaaaaaaaa-', '0000000000000000000000000000000000-0']) {
      const res = await agent.get(`/api/jobs/${id}`);
      expect(res.status, id).toBe(400);
      expect(res.body).toEqual({ error: 'invalid_id', message: 'jobId must be a job id.' });
    }
  });

  it(`refuses more than ${SLOPE_CLASSES_MAX} slope classes, naming the limit`, async () => {
    const { farmId, agent } = await farmer();
    const classes = Array.from({ length: SLOPE_CLASSES_MAX + 1 }, (_, i) => ({ name: `c${i}`, minPct: i, maxPct: i === SLOPE_CLASSES_MAX ? null : i + 1 }));
    const res = await agent.put(`/api/farms/${farmId}/slope-classes`).send({ classes });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe(`classes: may hold at most ${SLOPE_CLASSES_MAX} classes`);
  });

  it('refuses 1e999 (Infinity) in slope classes rather than reading it as no limit, and keeps the classes', async () => {
    const { farmId, agent } = await farmer();
    const mine = [{ name: 'flat', minPct: 0, maxPct: 3 }, { name: 'steep', minPct: 3, maxPct: null }];
    expect((await agent.put(`/api/farms/${farmId}/slope-classes`).send({ classes: mine })).status).toBe(200);
    for (const body of ['{"classes":[{"name":"a","minPct":0,"maxPct":1e999}]}', '{"classes":[{"name":"a","minPct":1e999,"maxPct":null}]}']) {
      const res = await agent.put(`/api/farms/${farmId}/slope-classes`).set('Content-Type', 'application/json').send(body);
      expect(res.status).toBe(400);
      expect(res.body.message).toMatch(/must be a finite number/);
    }
    expect((await agent.get(`/api/farms/${farmId}/slope-classes`)).body.classes.map((c: { name: string }) => c.name)).toEqual(['flat', 'steep']);
  });
});

describe('hostile outlines', () => {
  it('refuses a polygon crossing the antimeridian with a message saying how to send it', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.post(`/api/farms/${farmId}/fields`).send(polygon([[179.999, -16.5], [-179.999, -16.5], [-179.999, -16.49], [179.999, -16.49], [179.999, -16.5]]));
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/crosses the antimeridian \(180° longitude\): cut it in two/);
    // The same field cut at 180° is taken.
    const cut = {
      type: 'Feature',
      properties: { name: 'Both sides' },
      geometry: {
        type: 'MultiPolygon',
        coordinates: [
          [[[179.999, -16.5], [180, -16.5], [180, -16.49], [179.999, -16.49], [179.999, -16.5]]],
          [[[-180, -16.5], [-179.999, -16.5], [-179.999, -16.49], [-180, -16.49], [-180, -16.5]]],
        ],
      },
    };
    const ok = await agent.post(`/api/farms/${farmId}/fields`).send(cut);
    expect(ok.status).toBe(201);
    // Two parts of 0.001° × 0.01° at 16.5° S: about 2 × 106.7 m × 1106 m = 23.6 ha, not the globe.
    expect(ok.body.properties.areaHa).toBeGreaterThan(23);
    expect(ok.body.properties.areaHa).toBeLessThan(24.2);
  });

  it('refuses a field at a pole', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.post(`/api/farms/${farmId}/fields`).send(polygon([[0, 89.99], [120, 89.99], [-120, 89.99], [0, 90], [0, 89.99]]));
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/too near a pole: fields must lie between -85° and 85° latitude/);
  });

  it(`refuses an outline of more than ${OUTLINE_MAX_VERTICES} corners, naming the limit`, async () => {
    const { farmId, agent } = await farmer();
    const n = OUTLINE_MAX_VERTICES + 1;
    const ring = Array.from({ length: n }, (_, i) => [-91.78 + 0.002 * Math.cos((2 * Math.PI * i) / n), 42.31 + 0.002 * Math.sin((2 * Math.PI * i) / n)]);
    ring.push(ring[0]);
    const res = await agent.post(`/api/farms/${farmId}/fields`).send(polygon(ring));
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(new RegExp(`has ${n} corners; at most ${OUTLINE_MAX_VERTICES} are taken`));
  });
});

describe("a job's message", () => {
  it("does not tell a landowner the farm's field count; the farmer reads it in full", async () => {
    const { farmId, agent, landowner, users } = await farmer();
    const job = await ProcessingJob.create({ id: randomUUID(), farmId, kind: 'terrain', state: 'done', progress: 1, message: 'Terrain ready: 5 of 7 fields covered by the elevation model.', createdBy: users.farmer.id });
    const seen = await landowner.get(`/api/jobs/${job.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body).toMatchObject({ state: 'done', progress: 1, message: 'Finished' });
    expect(seen.body.message).not.toMatch(/\d|field/);
    expect((await agent.get(`/api/jobs/${job.id}`)).body.message).toBe('Terrain ready: 5 of 7 fields covered by the elevation model.');
  });
});
