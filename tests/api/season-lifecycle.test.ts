// Seasons that behave: a new season may start with the last one's cropping; an empty season
// (no cropping, no plan) can be deleted by the farmer, one holding records cannot (409 saying
// what it holds); screens open on the current season, never on an empty newer one. And the
// farm's recent changes list, for the farmer and the advisor. Product rules; no published source.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

const corn = { season: '2027', crop: 'corn', tillage: 'no-till', residuePct: 60, practice: 'none' };

async function farmWithCropping() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const advisor = await signedIn(ctx.app, made.users.advisor);
  const landowner = await signedIn(ctx.app, made.users.landowner);
  const owned = squareFeature(-91.78, 42.31, 200, 'Rented');
  (owned.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
  const a = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(owned)).body.id as number;
  const b = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(squareFeature(-91.77, 42.31, 200, 'Home'))).body.id as number;
  expect((await farmer.put(`/api/fields/${a}/cropping`).send(corn)).status).toBe(200);
  expect((await farmer.put(`/api/fields/${b}/cropping`).send({ ...corn, crop: 'soybean', residuePct: 30 })).status).toBe(200);
  return { farmId: made.farm.id, a, b, farmer, advisor, landowner };
}

describe('seasons that behave', () => {
  it('copies the last season’s cropping into a new season when asked, as the farmer’s record', async () => {
    const { farmId, a, b, farmer } = await farmWithCropping();
    const res = await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2028', copyCroppingFrom: '2027' });
    expect(res.status).toBe(201);
    expect((await farmer.get(`/api/fields/${a}/cropping?season=2028`)).body).toMatchObject({ season: '2028', crop: 'corn', tillage: 'no-till', residuePct: 60, version: 0 });
    expect((await farmer.get(`/api/fields/${b}/cropping?season=2028`)).body).toMatchObject({ crop: 'soybean', residuePct: 30 });
    // Without the option, a new season starts empty.
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2029' });
    expect((await farmer.get(`/api/fields/${a}/cropping?season=2029`)).status).toBe(404);
    // A season the farm does not have is named.
    const bad = await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2030', copyCroppingFrom: '1999' });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^copyCroppingFrom/);
    expect((await farmer.get(`/api/farms/${farmId}/seasons`)).body.map((s: { label: string }) => s.label)).toEqual(['2029', '2028', '2027']);
  });

  it('opens on the current season, not on an empty newer one', async () => {
    const { farmId, farmer } = await farmWithCropping();
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2028' });
    const seasons = (await farmer.get(`/api/farms/${farmId}/seasons`)).body;
    expect(seasons.map((s: { label: string; empty: boolean; current: boolean }) => [s.label, s.empty, s.current])).toEqual([
      ['2028', true, false],
      ['2027', false, true],
    ]);
    expect((await farmer.get(`/api/farms/${farmId}/board`)).body.season).toBe('2027');
    // A plan makes a season hold data.
    await farmer.post(`/api/farms/${farmId}/plans`).send({ season: '2028' });
    expect((await farmer.get(`/api/farms/${farmId}/board`)).body.season).toBe('2028');
  });

  it('deletes an empty season (farmer only) and refuses one with records, saying what it holds', async () => {
    const { farmId, farmer, advisor, landowner } = await farmWithCropping();
    await farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2028' });
    expect((await advisor.delete(`/api/farms/${farmId}/seasons/2028`)).status).toBe(403);
    expect((await landowner.delete(`/api/farms/${farmId}/seasons/2028`)).status).toBe(403);
    expect((await farmer.delete(`/api/farms/${farmId}/seasons/2028`)).status).toBe(204);
    expect((await farmer.delete(`/api/farms/${farmId}/seasons/2028`)).status).toBe(404);
    const full = await farmer.delete(`/api/farms/${farmId}/seasons/2027`);
    expect([full.status, full.body.error]).toEqual([409, 'season_has_data']);
    expect(full.body.message).toContain('cropping for 2 fields');
    await farmer.post(`/api/farms/${farmId}/plans`).send({ season: '2031' });
    expect((await farmer.delete(`/api/farms/${farmId}/seasons/2031`)).body.message).toContain('a season plan');
    expect((await farmer.get(`/api/farms/${farmId}/seasons`)).body.map((s: { label: string }) => s.label)).toEqual(['2031', '2027']);
  });
});

describe('the farm’s recent changes', () => {
  it('lists who changed what, newest first, for the farmer and the advisor; a landowner gets 403', async () => {
    const { farmId, a, farmer, advisor, landowner } = await farmWithCropping();
    await advisor.put(`/api/fields/${a}/cropping`).send({ ...corn, residuePct: 45, version: 0 });
    const res = await farmer.get(`/api/farms/${farmId}/changes`);
    expect(res.status).toBe(200);
    expect(res.body[0]).toMatchObject({ by: { name: 'Test advisor' }, entity: 'cropping', action: 'updated', fieldId: a, summary: 'changed the cropping of Rented for 2027' });
    expect(res.body.some((c: { by: { name: string }; entity: string }) => c.entity === 'field' && c.by.name === 'Test farmer')).toBe(true);
    expect((await advisor.get(`/api/farms/${farmId}/changes?limit=2`)).body).toHaveLength(2);
    expect((await landowner.get(`/api/farms/${farmId}/changes`)).status).toBe(403);
    const bad = await farmer.get(`/api/farms/${farmId}/changes?limit=9999`);
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^limit/);
    expect((await landowner.get(`/api/farms/${farmId}/soil-loss-history`)).status).toBe(403);
  });

  it('shows on each record who last changed it and when', async () => {
    const { a, farmer, advisor } = await farmWithCropping();
    expect((await farmer.get(`/api/fields/${a}/cropping?season=2027`)).body.lastChange).toMatchObject({ by: 'Test farmer' });
    const changed = await advisor.put(`/api/fields/${a}/cropping`).send({ ...corn, residuePct: 45, version: 0 });
    expect(changed.body.lastChange).toMatchObject({ by: 'Test advisor' });
    expect(Date.parse(changed.body.lastChange.at)).not.toBeNaN();
    expect((await farmer.get(`/api/fields/${a}/cropping?season=2027`)).body.lastChange.by).toBe('Test advisor');
    const ground = await advisor.put(`/api/fields/${a}/ground`).send({ slopePct: 6, slopeLengthM: 80 });
    expect(ground.body.lastChange.by).toBe('Test advisor');
    expect((await farmer.get(`/api/fields/${a}/ground`)).body.lastChange.by).toBe('Test advisor');
    const sample = await farmer.post(`/api/fields/${a}/soil-samples`).send({ kind: 'lab', sandPct: 20, siltPct: 50, clayPct: 30, organicMatterPct: 3 });
    expect(sample.body.lastChange.by).toBe('Test farmer');
    const edited = await advisor.patch(`/api/soil-samples/${sample.body.id}`).send({ version: sample.body.version, organicMatterPct: 3.4 });
    expect(edited.body.lastChange.by).toBe('Test advisor');
    expect((await farmer.get(`/api/fields/${a}/soil-samples`)).body[0].lastChange.by).toBe('Test advisor');
  });
});
