// Heavy work bounded per farm and per person, and jobs queued in the same transaction as the write
// that needs them: a farm has at most one terrain run waiting or running (409 naming it), a person
// a bounded number of jobs at once (429 naming the limit), a write that fails leaves no job, and a
// job that cannot be queued leaves no write.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { readdirSync } from 'node:fs';
import { ElevationModel, Field, ProcessingJob } from '../../server/models';
import { makeFarm, makeUser, signedIn } from '../helpers/test-app';
import { planeDem, startTerrainApp, utmSquare } from '../helpers/terrain-fixtures';
import { Membership } from '../../server/models';

let ctx: Awaited<ReturnType<typeof startTerrainApp>>;
let app: Express;
let sequelize: Sequelize;

// No worker: every run stays waiting, which is what these tests need. Two jobs at once per person.
beforeAll(async () => {
  ctx = await startTerrainApp({ worker: false, jobsPerUserMax: 2 });
  ({ app, sequelize } = ctx);
});
afterAll(() => ctx.close());

async function farmWithField(farmer = null as Awaited<ReturnType<typeof makeUser>> | null) {
  const { farm, users } = await makeFarm(farmer ? [] : ['farmer']);
  const user = farmer ?? users.farmer;
  if (farmer) await Membership.create({ userId: farmer.id, farmId: farm.id, role: 'farmer' });
  const agent = await signedIn(app, user);
  const field = await agent.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 200));
  expect(field.status).toBe(201);
  return { farmId: farm.id, fieldId: field.body.id as number, agent, user };
}

const queueJobCount = async (id: string) =>
  (await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM pgboss.job WHERE id = :id', { replacements: { id }, type: QueryTypes.SELECT }))[0].n;
const tifFiles = () => readdirSync(ctx.uploads, { recursive: true }).filter((f) => String(f).endsWith('.tif')).length;

describe('one terrain run per farm', () => {
  it('refuses a second elevation model while the first one’s run waits, with 409 naming that job, and stores nothing', async () => {
    const { farmId, agent } = await farmWithField();
    const first = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(first.status).toBe(202);
    const files = tifFiles();
    const second = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'again.tif');
    expect(second.status).toBe(409);
    expect(second.body.error).toBe('job_pending');
    expect(second.body.message).toContain(first.body.jobId);
    expect(second.body.details).toEqual({ jobId: first.body.jobId });
    expect(await ElevationModel.count({ where: { farmId } })).toBe(1);
    expect(await ProcessingJob.count({ where: { farmId } })).toBe(1);
    expect(tifFiles()).toBe(files);
  });

  it('folds a boundary change into the run already waiting instead of queueing another', async () => {
    const { farmId, fieldId, agent } = await farmWithField();
    const up = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    const field = (await agent.get(`/api/fields/${fieldId}`)).body;
    const moved = await agent.patch(`/api/fields/${fieldId}`).send({ version: field.properties.version, geometry: utmSquare(600120, 4684120, 180).geometry });
    expect(moved.status).toBe(200);
    const jobs = await ProcessingJob.findAll({ where: { farmId } });
    expect(jobs.map((j) => [j.id, j.state, j.rerunRequested])).toEqual([[up.body.jobId, 'queued', false]]);
  });

  it('asks a running run for another after it when a boundary changes meanwhile', async () => {
    const { farmId, fieldId, agent } = await farmWithField();
    const up = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    await ProcessingJob.update({ state: 'running' }, { where: { id: up.body.jobId } }); // a worker took it
    const field = (await agent.get(`/api/fields/${fieldId}`)).body;
    expect((await agent.patch(`/api/fields/${fieldId}`).send({ version: field.properties.version, geometry: utmSquare(600120, 4684120, 180).geometry })).status).toBe(200);
    const jobs = await ProcessingJob.findAll({ where: { farmId } });
    expect(jobs.map((j) => [j.id, j.state, j.rerunRequested])).toEqual([[up.body.jobId, 'running', true]]);
  });
});

describe('jobs per person', () => {
  it('refuses a third run at once with 429 naming the limit, storing no model, job or file', async () => {
    const user = await makeUser();
    for (let i = 0; i < 2; i++) {
      const { farmId, agent } = await farmWithField(user);
      expect((await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif')).status).toBe(202);
    }
    const { farmId, agent } = await farmWithField(user);
    const files = tifFiles();
    const third = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(third.status).toBe(429);
    expect(third.body.error).toBe('too_many_jobs');
    expect(third.body.message).toMatch(/You have 2 background jobs waiting or running; the limit is 2 at once/);
    expect(await ElevationModel.count({ where: { farmId } })).toBe(0);
    expect(await ProcessingJob.count({ where: { farmId } })).toBe(0);
    expect(tifFiles()).toBe(files);
  });
});

describe('a job and the write that needs it, in one transaction', () => {
  it('leaves no job row and no queue job when the write fails after queueing', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    let id = '';
    const write = sequelize.transaction(async (t) => {
      id = await ctx.jobs.enqueue('terrain', farm.id, users.farmer.id, {}, t);
      throw new Error('the write failed');
    });
    await expect(write).rejects.toThrow('the write failed');
    expect(id).toMatch(/^[0-9a-f-]{36}$/);
    expect(await ProcessingJob.count({ where: { id } })).toBe(0);
    expect(await queueJobCount(id)).toBe(0);
  });

  it('writes the job row and the queue job under one id when the write commits', async () => {
    const { farmId, agent } = await farmWithField();
    const up = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(await queueJobCount(up.body.jobId)).toBe(1);
  });

  it('leaves no field when its terrain run cannot be queued (the person is at the limit)', async () => {
    const user = await makeUser();
    // Farm B has an elevation model whose run is over; farms A and C have runs waiting: two jobs.
    const a = await farmWithField(user);
    const b = await farmWithField(user);
    const c = await farmWithField(user);
    expect((await a.agent.post(`/api/farms/${a.farmId}/dems`).attach('file', planeDem(), 'a.tif')).status).toBe(202);
    const bUp = await b.agent.post(`/api/farms/${b.farmId}/dems`).attach('file', planeDem(), 'b.tif');
    await ProcessingJob.update({ state: 'done', progress: 1 }, { where: { id: bUp.body.jobId } });
    expect((await c.agent.post(`/api/farms/${c.farmId}/dems`).attach('file', planeDem(), 'c.tif')).status).toBe(202);

    const fieldsBefore = await Field.count({ where: { farmId: b.farmId } });
    const res = await b.agent.post(`/api/farms/${b.farmId}/fields`).send(utmSquare(600150, 4684150, 100, 'Would need a run'));
    expect(res.status).toBe(429);
    expect(res.body.message).toMatch(/the limit is 2 at once/);
    expect(await Field.count({ where: { farmId: b.farmId } })).toBe(fieldsBefore);
    expect(await ProcessingJob.count({ where: { farmId: b.farmId, state: ['queued', 'running'] } })).toBe(0);
  });
});
