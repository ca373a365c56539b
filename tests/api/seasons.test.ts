// Seasons, cropping, climate and typed ground: versions, validation and roles.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { makeFarm, makeTestApp, makeUser, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

async function farmWithField() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const owned = squareFeature(-91.78, 42.31, 200, 'Rented');
  (owned.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
  const fieldId = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(owned)).body.id as number;
  const other = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(squareFeature(-91.77, 42.31, 200, 'Own'))).body.id as number;
  return { ...made, farmer, fieldId, other };
}

const corn = { season: '2027', crop: 'corn', tillage: 'no-till', residuePct: 60, practice: 'none' };

describe('cropping per field per season', () => {
  it('creates the season with the first cropping record and answers 409 to a stale change', async () => {
    const { farm, farmer, fieldId } = await farmWithField();
    const first = await farmer.put(`/api/fields/${fieldId}/cropping`).send(corn);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ season: '2027', crop: 'corn', tillage: 'no-till', version: 0 });
    expect((await farmer.get(`/api/farms/${farm.id}/seasons`)).body).toEqual([{ id: expect.any(Number), label: '2027', croppedFields: 1, hasPlan: false, empty: false, current: true }]);
    const second = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, residuePct: 40, version: 0 });
    expect(second.body.version).toBe(1);
    const stale = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, residuePct: 10, version: 0 });
    expect(stale.status).toBe(409);
    expect(stale.body.details.current.residuePct).toBe(40);
    const blind = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, residuePct: 10 });
    expect(blind.status).toBe(409);
    expect((await farmer.get(`/api/fields/${fieldId}/cropping?season=2027`)).body.residuePct).toBe(40);
  });

  it('names the field when cropping is incomplete', async () => {
    const { farmer, fieldId } = await farmWithField();
    const noTillage = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ season: '2027', crop: 'soybean' });
    expect(noTillage.status).toBe(400);
    expect(noTillage.body.message).toMatch(/^tillage/);
    const pasture = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ season: '2027', crop: 'pasture' });
    expect(pasture.body.message).toMatch(/^groundCoverPct/);
    const terraces = await farmer.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, practice: 'terraces' });
    expect(terraces.body.message).toMatch(/^terraceIntervalM/);
  });

  it('lets the advisor change cropping, and refuses the landowner', async () => {
    const { users, fieldId } = await farmWithField();
    const advisor = await signedIn(ctx.app, users.advisor);
    expect((await advisor.put(`/api/fields/${fieldId}/cropping`).send(corn)).status).toBe(200);
    const landowner = await signedIn(ctx.app, users.landowner);
    expect((await landowner.put(`/api/fields/${fieldId}/cropping`).send({ ...corn, version: 0 })).status).toBe(403);
    expect((await landowner.get(`/api/fields/${fieldId}/cropping?season=2027`)).status).toBe(200);
  });
});

describe('farm climate and typed ground', () => {
  it('keeps R and the design storm per farm with a version', async () => {
    const { farm, farmer } = await farmWithField();
    expect((await farmer.get(`/api/farms/${farm.id}/climate`)).status).toBe(404);
    const put = await farmer.put(`/api/farms/${farm.id}/climate`).send({ rFrom: 'precipitation', annualPrecipitationMm: 900, designStormMm: 100 });
    expect(put.status).toBe(200);
    expect(put.body).toMatchObject({ rFrom: 'precipitation', annualPrecipitationMm: 900, designStormMm: 100, version: 0 });
    expect((await farmer.put(`/api/farms/${farm.id}/climate`).send({ rFrom: 'value', rValue: 2500, designStormMm: 100, version: 3 })).status).toBe(409);
    const missing = await farmer.put(`/api/farms/${farm.id}/climate`).send({ rFrom: 'value', designStormMm: 100, version: 0 });
    expect(missing.status).toBe(400);
    expect(missing.body.message).toMatch(/^rValue/);
  });

  it('stores a typed slope and refuses an impossible one', async () => {
    const { farmer, fieldId } = await farmWithField();
    const ok = await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 6, slopeLengthM: 30.48 });
    expect(ok.body).toMatchObject({ slopePct: 6, slopeLengthM: 30.48, version: 0 });
    const bad = await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 140, slopeLengthM: 30, version: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^slopePct/);
  });

  const routes: [string, (a: ReturnType<typeof request.agent>, farmId: number, fieldId: number) => Promise<{ status: number }>, Record<string, number>][] = [
    ['PUT climate', (a, farmId) => a.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 80 }), { advisor: 200, landowner: 403, stranger: 404, nobody: 401 }],
    ['PUT ground of an owned field', (a, _f, fieldId) => a.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 5, slopeLengthM: 40 }), { advisor: 200, landowner: 403, stranger: 404, nobody: 401 }],
    ['GET seasons', (a, farmId) => a.get(`/api/farms/${farmId}/seasons`), { advisor: 200, landowner: 200, stranger: 404, nobody: 401 }],
    ['POST season', (a, farmId) => a.post(`/api/farms/${farmId}/seasons`).send({ label: '2028' }), { advisor: 403, landowner: 403, stranger: 404, nobody: 401 }],
    ['GET assessment of an owned field', (a, _f, fieldId) => a.get(`/api/fields/${fieldId}/assessment`), { advisor: 404, landowner: 404, stranger: 404, nobody: 401 }],
  ];
  for (const [what, call, byWho] of routes) {
    it(`checks roles on ${what}`, async () => {
      const { farm, users, fieldId } = await farmWithField();
      const agents: Record<string, ReturnType<typeof request.agent>> = {
        advisor: await signedIn(ctx.app, users.advisor),
        landowner: await signedIn(ctx.app, users.landowner),
        stranger: await signedIn(ctx.app, await makeUser()),
        nobody: request.agent(ctx.app),
      };
      for (const [who, status] of Object.entries(byWho)) expect([who, (await call(agents[who], farm.id, fieldId)).status]).toEqual([who, status]);
    });
  }
});
