// The stored assessment follows every kind of input change: it is stored when the input
// changes, so the board and the Risk tab can read it without running the engine. Each check
// reads the stored row through the model, not through a route that could recompute it.
import { afterAll, describe, expect, it } from 'vitest';
import { Assessment, Season } from '../../server/models';
import type { FieldAssessment } from '../../shared/schemas/assessment';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

// Silt loam 20/60/20 with 2.5 % OM (Sharpley & Williams 1990 eq. 2.96 gives its K).
const siltLoam = { kind: 'lab', sandPct: 20, siltPct: 60, clayPct: 20, organicMatterPct: 2.5 };
const sandyLoam = { kind: 'lab', sandPct: 65, siltPct: 25, clayPct: 10, organicMatterPct: 2.5 };
const corn = { season: '2027', crop: 'corn', tillage: 'moldboard plough', residuePct: 5 };

async function stored(fieldId: number, label = '2027'): Promise<FieldAssessment> {
  const row = await Assessment.findOne({ where: { fieldId }, include: [{ model: Season, as: 'season', where: { label } }], rejectOnEmpty: true });
  return row.results;
}

/** A field that can be assessed: climate, a lab sample, a typed slope and cropping for 2027. */
async function assessedField(lng: number) {
  const made = await makeFarm(['farmer']);
  const farmId = made.farm.id;
  const farmer = await signedIn(ctx.app, made.users.farmer);
  await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 100 });
  const fieldId = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(lng, 42.31, 200, 'Fresh'))).body.id as number;
  await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(siltLoam);
  await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 6, slopeLengthM: 40 });
  await farmer.put(`/api/fields/${fieldId}/cropping`).send(corn);
  const first = await stored(fieldId);
  expect(first.gaps).toEqual([]);
  return { farmId, farmer, fieldId, first };
}

describe('the stored assessment follows its inputs', () => {
  it('follows the boundary: a larger field loses more tonnes at the same rate', async () => {
    const { farmer, fieldId, first } = await assessedField(-91.60);
    const field = (await farmer.get(`/api/fields/${fieldId}`)).body;
    const bigger = squareFeature(-91.60, 42.31, 400).geometry;
    expect((await farmer.patch(`/api/fields/${fieldId}`).send({ version: field.properties.version, geometry: bigger })).status).toBe(200);
    const after = await stored(fieldId);
    expect(after.areaHa).toBeCloseTo(first.areaHa * 4, 1);
    expect(after.soilLossTPerHaYr).toBeCloseTo(first.soilLossTPerHaYr!, 9);
    expect(after.tonnesPerYr).toBeCloseTo(after.soilLossTPerHaYr! * after.areaHa, 6);
    expect(after.tonnesPerYr!).toBeGreaterThan(first.tonnesPerYr! * 3.9);
  });

  it('follows the cropping: hay instead of ploughed corn lowers C (AH-537 ordering of C)', async () => {
    const { farmer, fieldId, first } = await assessedField(-91.59);
    await farmer.put(`/api/fields/${fieldId}/cropping`).send({ season: '2027', crop: 'hay or meadow', version: 0 });
    const after = await stored(fieldId);
    expect(after.estimate!.factors.c.value).toBeLessThan(first.estimate!.factors.c.value);
    expect(after.inputs.find((i) => i.key === 'crop')!.value).toBe('hay or meadow');
  });

  it('follows the climate: a typed R, then R from a rainfall record (AH-703 ch. 2)', async () => {
    const { farmId, farmer, fieldId, first } = await assessedField(-91.58);
    await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 3000, designStormMm: 100, version: 0 });
    const typed = await stored(fieldId);
    expect(typed.estimate!.factors.r.value).toBe(3000);
    expect(typed.soilLossTPerHaYr).toBeCloseTo(first.soilLossTPerHaYr! * 1.5, 6);

    const record = ['time,cumulative_mm', '2026-01-01T00:00,0', '2026-06-01T12:00,0', '2026-06-01T12:30,30', '2026-12-31T23:00,30'].join('\n');
    const res = await farmer.post(`/api/farms/${farmId}/climate/rainfall-record`).attach('file', Buffer.from(record), 'rain.csv');
    expect(res.status).toBe(200);
    const fromRecord = await stored(fieldId);
    expect(fromRecord.estimate!.factors.r.value).toBeCloseTo(res.body.rValue, 6);
    expect(fromRecord.inputs.find((i) => i.key === 'r')!.origin).toMatchObject({ kind: 'derived', detail: expect.stringMatching(/rainfall record, 1 yr/) });
  });

  it('follows the typed ground: a steeper slope raises LS (AH-703 ch. 4)', async () => {
    const { farmer, fieldId, first } = await assessedField(-91.57);
    await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 12, slopeLengthM: 40, version: 0 });
    const after = await stored(fieldId);
    expect(after.estimate!.factors.ls.value).toBeGreaterThan(first.estimate!.factors.ls.value);
    expect(after.soilLossTPerHaYr!).toBeGreaterThan(first.soilLossTPerHaYr!);
  });

  it('stores every field of the farm for a new season, waiting for its cropping', async () => {
    const { farmId, farmer, fieldId } = await assessedField(-91.56);
    expect((await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2028' })).status).toBe(201);
    const next = await stored(fieldId, '2028');
    expect(next.estimate).toBeNull();
    expect(next.gaps).toEqual([{ key: 'cropping', tab: 'cropping', message: 'cropping for season 2028' }]);
  });

  it('follows the soils: another lab sample changes the mean texture and K (Sharpley & Williams 1990 eq. 2.96)', async () => {
    const { farmer, fieldId, first } = await assessedField(-91.55);
    expect((await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(sandyLoam)).status).toBe(201);
    const after = await stored(fieldId);
    expect(after.estimate!.factors.k.value).not.toBeCloseTo(first.estimate!.factors.k.value, 6);
    expect(after.inputs.find((i) => i.key === 'k')!.origin).toMatchObject({ kind: 'derived', detail: 'from the mean of 2 lab samples' });
  });
});
