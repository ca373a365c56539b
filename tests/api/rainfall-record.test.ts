// R from an uploaded rainfall record (breakpoint CSV): storm EI30 with the RUSLE unit energy.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

// One storm of 30 mm at a steady 60 mm/h for 30 minutes in a one-year record.
// Brown & Foster (1987), AH-703 eq. 2-6: e = 0.29 [1 − 0.72 exp(−0.05 i)] MJ/(ha·mm) at i = 60 mm/h;
// E = e × 30 mm; I30 = 60 mm/h (the storm's 30-minute depth × 2); EI30 = E × I30.
const e60 = 0.29 * (1 - 0.72 * Math.exp(-0.05 * 60));
const expectedR = e60 * 30 * 60;
const record = ['time,cumulative_mm', '2026-01-01T00:00,0', '2026-06-01T12:00,0', '2026-06-01T12:30,30', '2026-12-31T23:00,30'].join('\n');

async function farmer() {
  const { farm, users } = await makeFarm(['farmer', 'landowner']);
  return { farmId: farm.id, agent: await signedIn(ctx.app, users.farmer), landowner: await signedIn(ctx.app, users.landowner) };
}

describe('R from a rainfall record', () => {
  it('sums storm EI30 over the record and stores it as the farm’s R', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(record), 'rain.csv').field('designStormMm', '100');
    expect(res.status).toBe(200);
    expect(res.body.rFrom).toBe('record');
    expect(res.body.rValue).toBeCloseTo(expectedR, 1);
    expect(res.body.record).toMatchObject({ years: 1, erosiveStorms: 1 });
    expect(res.body.designStormMm).toBe(100);
  });

  it('refuses a record whose times go backwards, naming the row, and keeps the climate as it was', async () => {
    const { farmId, agent } = await farmer();
    await agent.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 90 });
    const broken = ['time,cumulative_mm', '2026-06-01T12:00,0', '2026-06-01T11:00,10'].join('\n');
    const res = await agent.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(broken), 'rain.csv');
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/row 3, column time/);
    expect((await agent.get(`/api/farms/${farmId}/climate`)).body).toMatchObject({ rFrom: 'value', rValue: 2000 });
  });

  it('needs a design storm with the first climate record, and the right columns', async () => {
    const { farmId, agent } = await farmer();
    const noStorm = await agent.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(record), 'rain.csv');
    expect(noStorm.status).toBe(422);
    expect(noStorm.body.message).toMatch(/designStormMm/);
    const wrong = await agent.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from('when,rain\n1,2\n3,4'), 'rain.csv').field('designStormMm', '100');
    expect(wrong.status).toBe(422);
    expect(wrong.body.message).toMatch(/cumulative_mm/);
  });

  it('refuses a years or design-storm figure out of range with 400 naming it, and stores nothing', async () => {
    const { farmId, agent } = await farmer();
    const years = await agent.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(record), 'rain.csv').field('years', '500').field('designStormMm', '100');
    expect(years.status).toBe(400);
    expect(years.body.message).toBe('years: must be a number from 0.1 to 200');
    const storm = await agent.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(record), 'rain.csv').field('designStormMm', 'deep');
    expect(storm.status).toBe(400);
    expect(storm.body.message).toMatch(/^designStormMm/);
    expect((await agent.get(`/api/farms/${farmId}/climate`)).status).toBe(404);
  });

  it('is for the farmer and advisor only', async () => {
    const { farmId, landowner } = await farmer();
    expect((await landowner.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(record), 'rain.csv')).status).toBe(403);
  });
});
