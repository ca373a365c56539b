// Per-field overrides of R, K, C and P: who may set them, what a bad one gets, and how the
// assessment takes the typed figure and names who typed it and why.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

// Loam 40/40/20 with OC 1.5 %: Williams K = 0.2604 US (Sharpley & Williams 1990 eq. 2.96 check value).
const loam = { kind: 'lab', sandPct: 40, siltPct: 40, clayPct: 20, organicMatterPct: 1.5 * 1.724, depthToGrayCm: null, describedToCm: 120 };

async function assessedField() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const farmId = made.farm.id;
  await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2000, designStormMm: 127 });
  const owned = squareFeature(-91.78, 42.31, 300, 'Rented');
  (owned.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
  const fieldId = (await farmer.post(`/api/farms/${farmId}/fields`).send(owned)).body.id as number;
  expect((await farmer.post(`/api/fields/${fieldId}/soil-samples`).send(loam)).status).toBe(201);
  await farmer.put(`/api/fields/${fieldId}/ground`).send({ slopePct: 6, slopeLengthM: 30.48 });
  await farmer.put(`/api/fields/${fieldId}/cropping`).send({ season: '2027', crop: 'pasture', groundCoverPct: 60 });
  return { ...made, farmer, farmId, fieldId };
}

describe('factor overrides of a field', () => {
  it('lets the farmer and the advisor set them, the landowner only read them', async () => {
    const { users, farmer, fieldId } = await assessedField();
    const put = await farmer.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'c', value: 0.02, note: 'measured cover, spring walk' });
    expect(put.status).toBe(200);
    expect(put.body).toMatchObject({ factor: 'c', value: 0.02, note: 'measured cover, spring walk', setBy: 'Test farmer', unit: '' });
    const advisor = await signedIn(ctx.app, users.advisor);
    expect((await advisor.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'k', value: 0.28, note: 'soil survey K for this map unit' })).status).toBe(200);
    const landowner = await signedIn(ctx.app, users.landowner);
    expect((await landowner.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'p', value: 0.5, note: 'mine' })).status).toBe(403);
    expect((await landowner.delete(`/api/fields/${fieldId}/overrides/c`)).status).toBe(403);
    const read = await landowner.get(`/api/fields/${fieldId}/overrides`);
    expect(read.status).toBe(200);
    expect(read.body.map((o: { factor: string; setBy: string }) => [o.factor, o.setBy])).toEqual([
      ['k', 'Test advisor'],
      ['c', 'Test farmer'],
    ]);
  });

  it('answers 404 to a member of another farm', async () => {
    const { fieldId } = await assessedField();
    const stranger = await makeFarm(['farmer']);
    const agent = await signedIn(ctx.app, stranger.users.farmer);
    expect((await agent.get(`/api/fields/${fieldId}/overrides`)).status).toBe(404);
    expect((await agent.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'c', value: 0.1, note: 'x' })).status).toBe(404);
  });

  it.each([
    [{ factor: 'c', value: 0.1 }, /^note/],
    [{ factor: 'c', value: 0.1, note: '   ' }, /^note: note is required/],
    [{ factor: 'c', value: 1.5, note: 'too much' }, /^value: value for C must be from 0 to 1/],
    [{ factor: 'r', value: -1, note: 'negative' }, /^value: value for R must be from 0 to 100000/],
    [{ factor: 'ls', value: 1, note: 'not a factor one overrides' }, /^factor/],
    [{ factor: 'k', value: 'high', note: 'words' }, /^value/],
  ])('refuses %j with a 400 naming the field, and stores nothing', async (body, message) => {
    const { farmer, fieldId } = await assessedField();
    const res = await farmer.put(`/api/fields/${fieldId}/overrides`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(message);
    expect((await farmer.get(`/api/fields/${fieldId}/overrides`)).body).toEqual([]);
  });

  it('refuses to remove an unknown factor or one not overridden', async () => {
    const { farmer, fieldId } = await assessedField();
    const bad = await farmer.delete(`/api/fields/${fieldId}/overrides/ls`);
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^factor/);
    expect((await farmer.delete(`/api/fields/${fieldId}/overrides/c`)).status).toBe(404);
  });

  it('puts the typed figure into the assessment, says who typed it and why, and takes it back out', async () => {
    const { farmer, fieldId } = await assessedField();
    const before = (await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
    expect(before.estimate.factors.c.value).toBeCloseTo(0.042, 3); // AH-537 Table 10: grass, no canopy, 60 % cover
    await farmer.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'r', value: 3000, note: 'state erosivity map for this county' });
    await farmer.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'k', value: 0.3, note: 'soil survey K' });
    await farmer.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'c', value: 0.02, note: 'measured cover' });
    await farmer.put(`/api/fields/${fieldId}/overrides`).send({ factor: 'p', value: 0.5, note: 'contour strips put in this spring' });
    const a = (await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
    const f = a.estimate.factors;
    expect(f.r).toMatchObject({ value: 3000, source: 'typed by Test farmer', override: { note: 'state erosivity map for this county', by: 'Test farmer' } });
    // K typed in US units; SI = US × 0.1317 (AH-703 units).
    expect(f.k.us.value).toBeCloseTo(0.3, 6);
    expect(f.k.value).toBeCloseTo(0.3 * 0.1317, 6);
    expect(f.k.override).toEqual({ note: 'soil survey K', by: 'Test farmer' });
    expect(f.c).toMatchObject({ value: 0.02, override: { note: 'measured cover' } });
    expect(f.p).toMatchObject({ value: 0.5, method: 'override: contour strips put in this spring' });
    expect(f.c.flag).toBeUndefined();
    // A = R·K·LS·C·P with the typed figures (LS 0.78: AH-703 LS table, 6 %, 100 ft).
    expect(a.soilLossTPerHaYr).toBeCloseTo(3000 * 0.3 * 0.1317 * f.ls.value * 0.02 * 0.5, 6);
    const rLine = a.inputs.find((i: { key: string }) => i.key === 'r');
    expect(rLine.origin).toEqual({ kind: 'typed', typedBy: 'Test farmer', detail: 'state erosivity map for this county' });
    expect(a.inputs.find((i: { key: string }) => i.key === 'c').value).toBe('0.020');

    expect((await farmer.delete(`/api/fields/${fieldId}/overrides/c`)).status).toBe(204);
    const after = (await farmer.get(`/api/fields/${fieldId}/assessment?season=2027`)).body;
    expect(after.estimate.factors.c.value).toBeCloseTo(0.042, 3);
    expect(after.estimate.factors.c.override).toBeUndefined();
    expect(after.estimate.factors.r.override).toBeDefined();
  });

  it('fills the erosivity and erodibility gaps of a field that has neither', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const farmer = await signedIn(ctx.app, users.farmer);
    const id = (await farmer.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.7, 42.31, 300, 'Bare'))).body.id;
    await farmer.put(`/api/fields/${id}/ground`).send({ slopePct: 6, slopeLengthM: 30.48 });
    await farmer.put(`/api/fields/${id}/cropping`).send({ season: '2027', crop: 'pasture', groundCoverPct: 60 });
    const gapsBefore = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body.gaps.map((g: { key: string }) => g.key);
    expect(gapsBefore).toEqual(expect.arrayContaining(['erosivity', 'erodibility']));
    await farmer.put(`/api/fields/${id}/overrides`).send({ factor: 'r', value: 2000, note: 'county figure' });
    await farmer.put(`/api/fields/${id}/overrides`).send({ factor: 'k', value: 0.3, note: 'survey' });
    const a = (await farmer.get(`/api/fields/${id}/assessment?season=2027`)).body;
    expect(a.gaps.map((g: { key: string }) => g.key)).not.toContain('erosivity');
    expect(a.estimate.factors.r.value).toBe(2000);
  });
});
