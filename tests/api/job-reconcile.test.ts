// Jobs that finish or fail: a server killed during a terrain run leaves a job row "running" and
// a queue job active that no worker will end. A worker starting later (and every minute after)
// sees the queue job past its expiry, fails it in the queue, and the row waits for the queue's
// retry; when no try is left the row is failed with a message and the farm's figures are marked
// stale, not shown as up to date. A run asked for while another ran follows it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Express } from 'express';
import { Op, QueryTypes, type Sequelize } from 'sequelize';
import { randomUUID } from 'node:crypto';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { ProcessingJob } from '../../server/models';
import { makeFarm, signedIn } from '../helpers/test-app';
import { planeDem, startTerrainApp, utmSquare } from '../helpers/terrain-fixtures';

let ctx: Awaited<ReturnType<typeof startTerrainApp>>;
let app: Express;
let sequelize: Sequelize;

beforeAll(async () => {
  ctx = await startTerrainApp({ worker: true });
  ({ app, sequelize } = ctx);
});
afterAll(() => ctx.close());

/** What a worker killed mid-run leaves: the row running at 2 %, the queue job active since an hour ago. */
async function killWorkerMidRun(jobId: string, retryCount: number) {
  await ProcessingJob.update({ state: 'running', progress: 0.02, message: 'Reading the elevation model' }, { where: { id: jobId } });
  await sequelize.query(`UPDATE pgboss.job SET state = 'active', started_on = now() - interval '1 hour', start_after = now() - interval '1 hour', retry_count = :retryCount WHERE id = :jobId`, {
    replacements: { jobId, retryCount },
    type: QueryTypes.UPDATE,
  });
}

describe('a worker killed during a terrain run', () => {
  it('is noticed by the next worker to start: tried again once, then failed with a message and the figures marked stale', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const farmer = await signedIn(app, users.farmer);
    const fieldId = (await farmer.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 200))).body.id;
    const up = await farmer.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
    expect((await JobQueue.waitFor(up.body.jobId, 30_000)).state).toBe('done');
    expect((await farmer.get(`/api/fields/${fieldId}/terrain`)).body.upToDate).toBe(true);

    // A run queued on a queue whose only worker then dies mid-run.
    const prefix = `dead${randomUUID().slice(0, 6)}-`;
    const deadServer = await JobQueue.start(inject('databaseUrl'), undefined, prefix);
    const jobId = await deadServer.enqueue('terrain', farm.id, users.farmer.id, { reason: 'slope classes changed' });
    await deadServer.stop();
    await killWorkerMidRun(jobId, 0);

    // A server starts again on that queue: it reconciles before it takes work.
    let ran = false;
    const restarted = await JobQueue.start(inject('databaseUrl'), { terrain: async () => ((ran = true), 'ran') }, prefix);
    try {
      const retried = await JobQueue.status(jobId);
      expect(retried).toMatchObject({ state: 'queued', progress: 0 });
      expect(retried?.message).toMatch(/worker stopped before it finished.*tried again/);

      // It dies again on its last try: the row is failed with a message for a person.
      await killWorkerMidRun(jobId, 1);
      await restarted.reconcile();
      const failed = await JobQueue.status(jobId);
      expect(failed?.state).toBe('failed');
      expect(failed?.message).toMatch(/Stopped before it finished: its worker stopped .* Run it again\./);
      expect(ran).toBe(false);

      const terrain = (await farmer.get(`/api/fields/${fieldId}/terrain`)).body;
      expect(terrain).toMatchObject({ upToDate: false, stale: true });
      const job = await farmer.get(`/api/jobs/${jobId}`);
      expect(job.body).toMatchObject({ state: 'failed' });

      // Running it again is allowed (the farm has no run pending) and its figures are up to date.
      const set = await farmer.put(`/api/farms/${farm.id}/slope-classes`).send({ classes: null });
      expect(set.status).toBe(200);
      expect((await JobQueue.waitFor(set.body.jobId, 30_000)).state).toBe('done');
      expect((await farmer.get(`/api/fields/${fieldId}/terrain`)).body).toMatchObject({ upToDate: true, stale: false });
    } finally {
      await restarted.stop();
    }
  }, 60_000);

  it('leaves a job whose queue job is still within its expiry alone (another worker may be on it)', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const prefix = `live${randomUUID().slice(0, 6)}-`;
    const other = await JobQueue.start(inject('databaseUrl'), undefined, prefix);
    const jobId = await other.enqueue('terrain', farm.id, users.farmer.id, {});
    await ProcessingJob.update({ state: 'running', progress: 0.4 }, { where: { id: jobId } });
    await sequelize.query(`UPDATE pgboss.job SET state = 'active', started_on = now() WHERE id = :jobId`, { replacements: { jobId } });
    await other.reconcile();
    expect(await JobQueue.status(jobId)).toMatchObject({ state: 'running', progress: 0.4 });
    await other.stop();
  });
});

describe('a run asked for while another runs', () => {
  it('follows the running one as soon as it ends', async () => {
    let release = () => {};
    const released = new Promise<void>((r) => (release = r));
    const seen: number[] = [];
    const slow = await startTerrainApp({
      worker: {
        terrain: async (job) => {
          seen.push(job.farmId);
          if (seen.length === 1) await released;
          return `run ${seen.length}`;
        },
      },
    });
    try {
      const { farm, users } = await makeFarm(['farmer']);
      const farmer = await signedIn(slow.app, users.farmer);
      const fieldId = (await farmer.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 200))).body.id;
      const up = await farmer.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
      while ((await JobQueue.status(up.body.jobId))?.state !== 'running') await new Promise((r) => setTimeout(r, 50));
      const field = (await farmer.get(`/api/fields/${fieldId}`)).body;
      expect((await farmer.patch(`/api/fields/${fieldId}`).send({ version: field.properties.version, geometry: utmSquare(600120, 4684120, 180).geometry })).status).toBe(200);
      release();
      expect((await JobQueue.waitFor(up.body.jobId, 10_000)).message).toBe('run 1');
      const next = await ProcessingJob.findOne({ where: { farmId: farm.id, id: { [Op.ne]: up.body.jobId } } });
      expect(next).not.toBeNull();
      expect((await JobQueue.waitFor(next!.id, 10_000)).message).toBe('run 2');
    } finally {
      release();
      await slow.close();
    }
  }, 40_000);
});
