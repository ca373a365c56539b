// `npm run worker` on its own: a job the API queued with no worker in its process is done by a
// separate worker process on the same database and file storage, which stops cleanly on SIGTERM.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { Express } from 'express';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { makeFarm, signedIn } from '../helpers/test-app';
import { planeDem, startTerrainApp, utmSquare } from '../helpers/terrain-fixtures';

let ctx: Awaited<ReturnType<typeof startTerrainApp>>;
let app: Express;
let worker: ChildProcess | null = null;

// The worker works the queues under their own names, so this file's jobs use no prefix; no
// other test file works those queues.
beforeAll(async () => {
  ctx = await startTerrainApp({ worker: false, queuePrefix: '' });
  app = ctx.app;
});
afterAll(async () => {
  worker?.kill('SIGKILL');
  await ctx.close();
});

function startWorker(): { exited: Promise<number | null>; output: () => string } {
  const child = spawn(path.resolve('node_modules/.bin/tsx'), ['server/worker.ts'], {
    env: { ...process.env, DATABASE_URL: inject('databaseUrl'), DATA_DIR: ctx.dataDir, NODE_ENV: 'test' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  worker = child;
  let output = '';
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return { exited, output: () => output };
}

describe('a worker process on its own', () => {
  it('works a terrain job queued by an API without a worker, then stops cleanly on SIGTERM', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const farmer = await signedIn(app, users.farmer);
    const fieldId = (await farmer.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 200))).body.id;
    const up = await farmer.post(`/api/farms/${farm.id}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(up.status).toBe(202);
    // Workers poll every half second: after a second, none in reach has taken it.
    await new Promise((r) => setTimeout(r, 1000));
    expect((await JobQueue.status(up.body.jobId))?.state).toBe('queued');

    const run = startWorker();
    const done = await JobQueue.waitFor(up.body.jobId, 25_000);
    expect(done.state, run.output()).toBe('done');
    const terrain = await farmer.get(`/api/fields/${fieldId}/terrain`);
    expect(terrain.status).toBe(200);
    expect(terrain.body.meanSlopePct).toBeCloseTo(5, 3);

    worker!.kill('SIGTERM');
    expect(await run.exited, run.output()).toBe(0);
    worker = null;
    expect(run.output()).toMatch(/SIGTERM: stopping/);
  }, 40_000);
});
