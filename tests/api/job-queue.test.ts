// The job queue as people see it: a job's row follows its run, and a worker that stops while a
// job runs leaves it waiting for another try or failed with a reason, never "running" forever.
import { afterAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { randomUUID } from 'node:crypto';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { makeFarm, makeTestApp } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

const startQueue = (handler: Parameters<typeof JobQueue.start>[1]) => JobQueue.start(inject('databaseUrl'), handler, `q${randomUUID().slice(0, 8)}-`);

describe('job queue', () => {
  it("reports progress and ends done with the handler's closing message", async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const queue = await startQueue({
      terrain: async (_job, report) => {
        await report(0.5, 'Halfway');
        return 'All done';
      },
    });
    const id = await queue.enqueue('terrain', farm.id, users.farmer.id, {});
    const done = await JobQueue.waitFor(id, 10_000);
    expect(done).toMatchObject({ state: 'done', progress: 1, message: 'All done', farmId: farm.id, createdBy: users.farmer.id });
    await queue.stop();
  });

  it('puts a job back in line with a reason when its worker stops before it finishes, and its late end changes nothing', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    let release = () => {};
    const released = new Promise<void>((r) => (release = r));
    let started = () => {};
    const running = new Promise<void>((r) => (started = r));
    const queue = await startQueue({
      terrain: async () => {
        started();
        await released;
        return 'Finished too late';
      },
    });
    const id = await queue.enqueue('terrain', farm.id, users.farmer.id, {});
    await running;
    await queue.stop(1000);
    const stopped = await JobQueue.status(id);
    // pg-boss fails the job as its worker stops; a terrain job has one more try, so it waits again.
    expect(stopped).toMatchObject({ state: 'queued' });
    expect(stopped?.message).toMatch(/worker shut down.*tried again/);
    release();
    await new Promise((r) => setTimeout(r, 200));
    expect((await JobQueue.status(id))?.state).toBe('queued');
  });
});
