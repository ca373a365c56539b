// DEM upload → background job with progress → per-field terrain figures and map layers.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readdirSync } from 'node:fs';
import request from 'supertest';
import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { makeFarm, signedIn } from '../helpers/test-app';
import { planeDem, startTerrainApp, utmSquare } from '../helpers/terrain-fixtures';

let ctx: Awaited<ReturnType<typeof startTerrainApp>>;
let app: Express;
let sequelize: Sequelize;
let uploads: string;

beforeAll(async () => {
  ctx = await startTerrainApp({ worker: true });
  ({ app, sequelize, uploads } = ctx);
});
afterAll(() => ctx.close());

async function farmWithField() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const agent = await signedIn(app, made.users.farmer);
  const field = await agent.post(`/api/farms/${made.farm.id}/fields`).send(utmSquare(600100, 4684100, 200));
  expect(field.status).toBe(201);
  return { ...made, agent, fieldId: field.body.id as number };
}

const demRows = async (farmId: number) => (await sequelize.query(`SELECT id FROM elevation_models WHERE farm_id = ${farmId}`))[0].length;

describe('terrain from an uploaded DEM', () => {
  it('answers 202 with a job whose progress ends done, then gives the field its slope figures', async () => {
    const { farm, agent, fieldId } = await farmWithField();
    const up = await agent.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(up.status).toBe(202);
    expect(up.body.jobId).toMatch(/^[0-9a-f-]{36}$/);
    const done = await JobQueue.waitFor(up.body.jobId);
    expect(done.state).toBe('done');
    const job = await agent.get(`/api/jobs/${up.body.jobId}`);
    expect(job.body).toMatchObject({ state: 'done', progress: 1 });
    expect(job.body.message).toMatch(/1 of 1 fields/);

    const t = await agent.get(`/api/fields/${fieldId}/terrain`);
    expect(t.status).toBe(200);
    // Analytic: a plane z = 100 + 0.05x has slope 5 % in every cell (Horn 1981 is exact on planes).
    expect(t.body.meanSlopePct).toBeCloseTo(5, 3);
    expect(t.body.p90SlopePct).toBeCloseTo(5, 3);
    expect(t.body.cellCount).toBe(40 * 40);
    const gentle = t.body.slopeClasses.find((c: { name: string }) => c.name === 'gently sloping');
    expect(gentle.share).toBeCloseTo(1, 6);
    expect(t.body.meanLS).toBeGreaterThan(0);
    expect(t.body.upToDate).toBe(true);

    const layers = await agent.get(`/api/farms/${farm.id}/layers`);
    expect(layers.body.map((l: { key: string }) => l.key).sort()).toEqual(['concentrated-flow', 'hillshade', 'ls', 'slope-classes']);
    for (const l of layers.body) expect(l.legend.length).toBeGreaterThan(0);
    const png = await agent.get(layers.body[0].url);
    expect(png.status).toBe(200);
    expect(png.headers['content-type']).toMatch(/image\/png/);
    expect(png.body.subarray(0, 4).toString('hex')).toBe('89504e47');
  });

  it('recomputes a field’s figures when its boundary changes', async () => {
    const { farm, agent, fieldId } = await farmWithField();
    const up = await agent.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
    await JobQueue.waitFor(up.body.jobId);
    const smaller = utmSquare(600100, 4684100, 100);
    const patch = await agent.patch(`/api/fields/${fieldId}`).send({ version: 0, geometry: smaller.geometry });
    expect(patch.status).toBe(200);
    const latest = await agent.get(`/api/farms/${farm.id}/elevation`);
    await JobQueue.waitFor(latest.body.latestJob.id);
    const t = await agent.get(`/api/fields/${fieldId}/terrain`);
    expect(t.body.cellCount).toBe(20 * 20);
    expect(t.body.upToDate).toBe(true);
  });

  it('says a field has no terrain yet when no DEM covers it', async () => {
    const { agent, fieldId } = await farmWithField();
    const t = await agent.get(`/api/fields/${fieldId}/terrain`);
    expect(t.status).toBe(404);
    expect(t.body.error).toBe('no_terrain');
    expect(t.body.message).toMatch(/slope %/);
  });

  const bad: [string, () => Buffer, number, string][] = [
    ['a file that is not a GeoTIFF', () => Buffer.from('just some text, not an image'), 415, 'unsupported_file_type'],
    ['a DEM that does not overlap the fields', () => planeDem(650000, 4700000), 422, 'dem_outside_fields'],
    ['an empty file', () => Buffer.alloc(0), 400, 'empty_file'],
  ];
  for (const [what, make, status, code] of bad) {
    it(`refuses ${what} with ${status}, storing no row and no file`, async () => {
      const { farm, agent } = await farmWithField();
      const before = readdirSync(uploads, { recursive: true }).length;
      const res = await agent.post(`/api/farms/${farm.id}/dems`).attach('file', make(), 'dem.tif');
      expect(res.status).toBe(status);
      expect(res.body.error).toBe(code);
      expect(await demRows(farm.id)).toBe(0);
      expect(readdirSync(uploads, { recursive: true }).length).toBe(before);
    });
  }

  it('lets only the farmer upload; other roles and strangers are refused', async () => {
    const { farm, users } = await farmWithField();
    for (const role of ['advisor', 'landowner'] as const) {
      const a = await signedIn(app, users[role]);
      expect((await a.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'p.tif')).status).toBe(403);
      expect((await a.get(`/api/farms/${farm.id}/layers`)).status).toBe(200);
    }
    // The farm-wide model and its pictures show every field: not for a landowner.
    const landowner = await signedIn(app, users.landowner);
    expect((await landowner.get(`/api/farms/${farm.id}/layers`)).body).toEqual([]);
    expect((await landowner.get(`/api/farms/${farm.id}/elevation`)).status).toBe(403);
    expect((await landowner.get(`/api/farms/${farm.id}/layers/hillshade.png`)).status).toBe(403);
    expect((await request(app).post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'p.tif')).status).toBe(401);
    const stranger = await signedIn(app, (await makeFarm(['farmer'])).users.farmer);
    expect((await stranger.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'p.tif')).status).toBe(404);
    expect((await stranger.get(`/api/farms/${farm.id}/layers`)).status).toBe(404);
    expect(await demRows(farm.id)).toBe(0);
  });

  it('hides a job from people who are not members of its farm', async () => {
    const { farm, agent } = await farmWithField();
    const up = await agent.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
    const stranger = await signedIn(app, (await makeFarm(['farmer'])).users.farmer);
    expect((await stranger.get(`/api/jobs/${up.body.jobId}`)).status).toBe(404);
    await JobQueue.waitFor(up.body.jobId);
  });

  it('uses the farm’s own slope-class breaks when set, and refuses broken ones', async () => {
    const { farm, agent, fieldId, users } = await farmWithField();
    const up = await agent.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
    await JobQueue.waitFor(up.body.jobId);
    const def = (await agent.get(`/api/farms/${farm.id}/slope-classes`)).body;
    expect(def.custom).toBe(false);
    expect(def.classes[0]).toEqual({ name: 'nearly level', minPct: 0, maxPct: 2 });
    const gap = await agent.put(`/api/farms/${farm.id}/slope-classes`).send({ classes: [{ name: 'flat', minPct: 0, maxPct: 3 }, { name: 'sloping', minPct: 4, maxPct: null }] });
    expect(gap.status).toBe(400);
    expect(gap.body.message).toMatch(/minPct/);
    const set = await agent.put(`/api/farms/${farm.id}/slope-classes`).send({ classes: [{ name: 'flat', minPct: 0, maxPct: 4 }, { name: 'sloping', minPct: 4, maxPct: null }] });
    expect(set.status).toBe(200);
    await JobQueue.waitFor(set.body.jobId);
    const t = (await agent.get(`/api/fields/${fieldId}/terrain`)).body;
    // The 5 % plane lies wholly in "sloping" (4 % and over).
    expect(t.slopeClasses.map((c: { name: string; share: number }) => [c.name, c.share])).toEqual([['flat', 0], ['sloping', 1]]);
    const landowner = await signedIn(app, users.landowner);
    expect((await landowner.put(`/api/farms/${farm.id}/slope-classes`).send({ classes: null })).status).toBe(403);
  });
});
