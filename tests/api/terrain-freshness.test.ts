// A finished terrain run brings the stored assessments up to date, and a change of slope classes
// re-runs terrain so every field's figures follow it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { JobQueue } from '../../server/services/jobs/job-queue';
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

// Loam 40/40/20 with 1.5 % organic carbon: a soil the engine can give K for.
const loam = { kind: 'lab', sandPct: 40, siltPct: 40, clayPct: 20, organicMatterPct: 1.5 * 1.724, depthToGrayCm: null, describedToCm: 120 };

/** A field on the 5 % plane with every input an assessment needs, slope typed, season 2027. */
async function assessableField() {
  const { farm, users } = await makeFarm(['farmer']);
  const farmer = await signedIn(app, users.farmer);
  const fieldId = (await farmer.post(`/api/farms/${farm.id}/fields`).send(utmSquare(600100, 4684100, 200))).body.id as number;
  expect((await farmer.put(`/api/farms/${farm.id}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 127 })).status).toBe(200);
  expect((await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(loam)).status).toBe(201);
  expect((await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 2, slopeLengthM: 60 })).status).toBe(200);
  const corn = { season: '2027', crop: 'corn', tillage: 'moldboard plough', residuePct: 5 };
  expect((await farmer.put(`/api/fields/${fieldId}/cropping`).send(corn)).status).toBe(200);
  return { farmId: farm.id, fieldId, farmer };
}

/** The assessment as stored, read without asking the API (which would recompute it). */
async function storedAssessment(fieldId: number) {
  const [row] = await sequelize.query<{ results: { lsSource: string | null; estimate: { factors: { ls: { value: number } } } | null } }>(
    `SELECT a.results FROM assessments a JOIN seasons s ON s.id = a.season_id WHERE a.field_id = :fieldId AND s.label = '2027'`,
    { replacements: { fieldId }, type: QueryTypes.SELECT },
  );
  return row?.results ?? null;
}

describe('freshness after a terrain run', () => {
  it("stores the field's assessment with LS from the elevation model as soon as a DEM upload's run finishes", async () => {
    const { farmId, fieldId, farmer } = await assessableField();
    expect((await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body.lsSource).toBe('typed slope');
    expect((await storedAssessment(fieldId))?.lsSource).toBe('typed slope');

    const up = await farmer.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    expect(up.status).toBe(202);
    expect((await JobQueue.waitFor(up.body.jobId)).state).toBe('done');

    const terrain = (await farmer.get(`/api/fields/${fieldId}/terrain`)).body;
    const stored = await storedAssessment(fieldId);
    expect(stored?.lsSource).toBe('elevation model');
    expect(stored?.estimate?.factors.ls.value).toBeCloseTo(terrain.meanLS, 6);

    const assessment = (await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
    expect(assessment.lsSource).toBe('elevation model');
    expect(assessment.estimate.factors.ls.value).toBeCloseTo(terrain.meanLS, 6);
    const board = (await farmer.get(`/api/farms/${farmId}/board?season=2027`)).body;
    const row = board.rows.find((r: { fieldId: number }) => r.fieldId === fieldId);
    expect(row.soilLossTPerHaYr).toBeCloseTo(assessment.soilLossTPerHaYr, 9);
  });

  it("re-runs terrain when the slope classes change, leaving the field's figures recomputed and up to date", async () => {
    const { farmId, fieldId, farmer } = await assessableField();
    const up = await farmer.post(`/api/farms/${farmId}/dems`).attach('file', planeDem(), 'plane.tif');
    await JobQueue.waitFor(up.body.jobId);
    const before = (await farmer.get(`/api/fields/${fieldId}/terrain`)).body;
    expect(before.slopeClasses.map((c: { name: string }) => c.name)).toContain('gently sloping');

    const classes = [{ name: 'flat', minPct: 0, maxPct: 4 }, { name: 'sloping', minPct: 4, maxPct: null }];
    const set = await farmer.put(`/api/farms/${farmId}/slope-classes`).send({ classes });
    expect(set.status).toBe(200);
    expect(set.body).toMatchObject({ classes, custom: true });
    expect(set.body.jobId).toMatch(/^[0-9a-f-]{36}$/);
    expect((await JobQueue.waitFor(set.body.jobId)).state).toBe('done');

    const after = (await farmer.get(`/api/fields/${fieldId}/terrain`)).body;
    expect(after.upToDate).toBe(true);
    expect(new Date(after.computedAt).getTime()).toBeGreaterThan(new Date(before.computedAt).getTime());
    // The 5 % plane lies wholly in "sloping" (4 % and over).
    expect(after.slopeClasses.map((c: { name: string; share: number }) => [c.name, c.share])).toEqual([['flat', 0], ['sloping', 1]]);
    expect((await storedAssessment(fieldId))?.lsSource).toBe('elevation model');

    const reset = await farmer.put(`/api/farms/${farmId}/slope-classes`).send({ classes: null });
    expect(reset.body).toMatchObject({ custom: false });
    await JobQueue.waitFor(reset.body.jobId);
    expect((await farmer.get(`/api/farms/${farmId}/slope-classes`)).body.custom).toBe(false);
    const defaults = (await farmer.get(`/api/fields/${fieldId}/terrain`)).body;
    expect(defaults.slopeClasses.find((c: { name: string }) => c.name === 'gently sloping').share).toBeCloseTo(1, 6);
  });
});
