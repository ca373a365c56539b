// The API stays responsive while a large elevation model is processed: the terrain run works in
// a worker thread, so a request made during the run is answered while the run is still computing.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { writeGeoTiff } from '../../server/services/terrain';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { makeFarm, signedIn } from '../helpers/test-app';
import { startTerrainApp, utmSquare } from '../helpers/terrain-fixtures';

let ctx: Awaited<ReturnType<typeof startTerrainApp>>;
let app: Express;

beforeAll(async () => {
  ctx = await startTerrainApp({ worker: true });
  app = ctx.app;
});
afterAll(() => ctx.close());

/** Rolling hills with small hollows, 5 m cells, in UTM zone 15N: terrain-like work for every stage. */
function hillsDem(size: number, originX = 600000, originY = 4684400): Buffer {
  const z = new Float32Array(size * size);
  for (let r = 0; r < size; r++) {
    for (let c = 0; c < size; c++) z[r * size + c] = 200 + 8 * Math.sin(c / 37) * Math.cos(r / 53) + 0.02 * c + ((r * 7919 + c * 104729) % 13) * 0.05;
  }
  return Buffer.from(writeGeoTiff({ width: size, height: size, samples: z, originX, originY, cellSizeX: 5, cellSizeY: 5, epsg: 32615, nodata: -9999 }));
}

describe('the API during a terrain run', () => {
  it('answers a field list while a 4 M-cell elevation model is still being computed', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const farmer = await signedIn(app, users.farmer);
    expect((await farmer.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 400))).status).toBe(201);
    const up = await farmer.post(`/api/farms/${farm.id}/dems`).attach('file', hillsDem(2000, 600000, 4684400 + 2000 * 5 - 400 * 5), 'hills.tif');
    expect(up.status).toBe(202);
    const jobId = up.body.jobId as string;

    // Wait for the run to reach its first terrain stage (the thread has decoded the file).
    let status = await JobQueue.status(jobId);
    while (status && !(status.state === 'running' && status.progress >= 0.05)) {
      await new Promise((r) => setTimeout(r, 20));
      status = await JobQueue.status(jobId);
    }
    expect(status?.state).toBe('running');

    const fields = await farmer.get(`/api/farms/${farm.id}/fields`);
    expect(fields.status).toBe(200);
    expect(fields.body.features).toHaveLength(1);
    const health = await request(app).get('/api/health');
    expect(health.status).toBe(200);
    // Both answered before the run was over, indeed before its grids were done (progress 0.7 is
    // "drawing map layers"): a run on the event loop would have held them until then.
    const during = await JobQueue.status(jobId);
    expect(during?.state).toBe('running');
    expect(during?.progress).toBeLessThan(0.7);

    const done = await JobQueue.waitFor(jobId, 120_000);
    expect(done.state, done.message).toBe('done');
  }, 180_000);
});
