// Heavy work bounded at the upload: an elevation model's size is read from its header, without
// decoding a cell, and a grid over the configured cell limit is refused with 413 naming the
// limit; a damaged header is refused with 422. Nothing is stored, no job is queued, and the
// server keeps answering.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { readdirSync } from 'node:fs';
import { ElevationModel, ProcessingJob } from '../../server/models';
import { DEM_MAX_CELLS } from '../../shared/limits';
import { makeFarm, signedIn } from '../helpers/test-app';
import { planeDem, startTerrainApp, utmSquare } from '../helpers/terrain-fixtures';
import { craftedGeoTiff, deflatedZeros } from '../helpers/crafted-geotiff';

let ctx: Awaited<ReturnType<typeof startTerrainApp>>;
let small: Awaited<ReturnType<typeof startTerrainApp>>;
let app: Express;

// No worker: a file that got through would sit queued, and the test would see its job row.
beforeAll(async () => {
  ctx = await startTerrainApp({ worker: false });
  small = await startTerrainApp({ worker: false, env: { DEM_MAX_CELLS: '1000' } });
  app = ctx.app;
});
afterAll(async () => {
  await ctx.close();
  await small.close();
});

async function farmWithField(on: Express = app) {
  const { farm, users } = await makeFarm(['farmer']);
  const agent = await signedIn(on, users.farmer);
  expect((await agent.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 200))).status).toBe(201);
  return { farmId: farm.id, agent };
}

async function expectNothingStored(farmId: number, uploads: string) {
  expect(await ElevationModel.count({ where: { farmId } })).toBe(0);
  expect(await ProcessingJob.count({ where: { farmId } })).toBe(0);
  expect(readdirSync(uploads, { recursive: true }).filter((f) => String(f).endsWith('.tif'))).toEqual([]);
}

describe('the cell limit of an elevation model', () => {
  it('refuses a 0.2 MB deflated GeoTIFF that would decode to 8000 × 8000 cells with 413 naming the limit', async () => {
    const strip = await deflatedZeros(8000 * 8000 * 4);
    const file = craftedGeoTiff({ width: 8000, height: 8000, compression: 8, strip });
    expect(file.length).toBeLessThan(300_000);
    const { farmId, agent } = await farmWithField();
    const res = await agent.post(`/api/farms/${farmId}/dems`).attach('file', file, 'bomb.tif');
    expect(res.status).toBe(413);
    expect(res.body.error).toBe('dem_too_large');
    expect(res.body.message).toContain('8000 × 8000');
    expect(res.body.message).toContain(DEM_MAX_CELLS.toLocaleString('en'));
    await expectNothingStored(farmId, ctx.uploads);
    expect((await request(app).get('/api/health')).status).toBe(200);
  });

  it('refuses a 400-byte GeoTIFF declaring 100000 × 100000 cells with 413, not a server error', async () => {
    const file = craftedGeoTiff({ width: 100_000, height: 100_000, compression: 1, strip: Buffer.alloc(134) });
    expect(file.length).toBe(400);
    const { farmId, agent } = await farmWithField();
    const res = await agent.post(`/api/farms/${farmId}/dems`).attach('file', file, 'huge.tif');
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/100000 × 100000 = 10,000,000,000 cells, more than the limit of 25,000,000/);
    await expectNothingStored(farmId, ctx.uploads);
  });

  it('takes its limit from DEM_MAX_CELLS: an 80 × 80 grid is refused under a limit of 1000 cells', async () => {
    const { farmId, agent } = await farmWithField(small.app);
    const res = await agent.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/80 × 80 = 6,400 cells, more than the limit of 1,000/);
    await expectNothingStored(farmId, small.uploads);
  });

  it('refuses a GeoTIFF whose header is cut short with 422 naming the problem', async () => {
    const whole = craftedGeoTiff({ width: 100, height: 100, compression: 1, strip: Buffer.alloc(40_000) });
    const { farmId, agent } = await farmWithField();
    const res = await agent.post(`/api/farms/${farmId}/dems`).attach('file', whole.subarray(0, 100), 'cut.tif');
    expect(res.status).toBe(422);
    expect(res.body.error).toBe('invalid_dem');
    expect(res.body.message).toMatch(/damaged GeoTIFF header/);
    await expectNothingStored(farmId, ctx.uploads);
  });

  it('refuses a header that names a grid of zero cells with 422', async () => {
    const file = craftedGeoTiff({ width: 0, height: 10, compression: 1, strip: Buffer.alloc(16) });
    const { farmId, agent } = await farmWithField();
    const res = await agent.post(`/api/farms/${farmId}/dems`).attach('file', file, 'empty-grid.tif');
    expect(res.status).toBe(422);
    expect(res.body.error).toBe('invalid_dem');
    await expectNothingStored(farmId, ctx.uploads);
  });
});
