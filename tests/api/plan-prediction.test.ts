// A plan's prediction: each field's A and A/T after its planned treatments, as the treatment
// engine gives them from the season's stored assessment, and the tonnes a year the farm saves.
import { afterAll, describe, expect, it } from 'vitest';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

// Silt loam 10/68/22, OM 1.8 %: an upland Midwest soil (invented figures in the ranges met on such farms).
const siltLoam = { kind: 'lab', sandPct: 10, siltPct: 68, clayPct: 22, organicMatterPct: 1.8, ph: 6.4, depthToGrayCm: null, describedToCm: 110 };

type Option = { id: string; soilLossTPerHaYr: number; aOverT: number; tonnesSavedPerYr: number; reachesT: boolean };

describe('predicted soil loss after a plan', () => {
  it('gives each field the engine’s A and A/T after its treatments, and the farm’s tonnes saved', async () => {
    const made = await makeFarm(['farmer', 'advisor', 'landowner']);
    const farmer = await signedIn(ctx.app, made.users.farmer);
    const farmId = made.farm.id;
    await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2500, designStormMm: 110 });
    const steepFeature = squareFeature(-91.9, 42.3, 300, 'Steep corn');
    (steepFeature.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
    const steep = (await farmer.post(`/api/farms/${farmId}/fields`).send(steepFeature)).body.id as number;
    await farmer.post(`/api/fields/${steep}/soil-samples`).send(siltLoam);
    await farmer.put(`/api/fields/${steep}/ground`).send({ slopePct: 9, slopeLengthM: 60 });
    await farmer.put(`/api/fields/${steep}/cropping`).send({ season: '2027', crop: 'corn', tillage: 'moldboard plough' });
    const bare = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.8, 42.3, 300, 'Not assessed'))).body.id as number;

    const plan = (await farmer.post(`/api/farms/${farmId}/plans`).send({ season: '2027' })).body;
    expect(plan.prediction).toEqual({ fields: [], tonnesSavedPerYr: 0 });
    await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: steep, treatment: 'no-till', cost: 500 });
    await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: steep, treatment: 'cover-crop', cost: 700 });
    await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: steep, treatment: 'other', title: 'Mend the fence' });
    const last = (await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: bare, treatment: 'cover-crop' })).body.plan;

    // The same figures as the field's option with the same treatments on the treatments route.
    const options = (await farmer.get(`/api/fields/${steep}/treatments?season=2027`)).body;
    const both = (options.options as Option[]).find((o) => o.id === 'no-till+cover-crop')!;
    const p = last.prediction;
    const steepP = p.fields.find((f: { fieldId: number }) => f.fieldId === steep);
    expect(steepP).toMatchObject({ ok: true, fieldName: 'Steep corn', treatments: ['no-till', 'cover-crop'], reachesT: both.reachesT });
    expect(steepP.current.soilLossTPerHaYr).toBeCloseTo(options.current.soilLossTPerHaYr, 9);
    expect(steepP.planned.soilLossTPerHaYr).toBeCloseTo(both.soilLossTPerHaYr, 9);
    expect(steepP.planned.aOverT).toBeCloseTo(both.aOverT, 9);
    // tonnes saved = (A now − A after) × area
    expect(steepP.tonnesSavedPerYr).toBeCloseTo(both.tonnesSavedPerYr, 6);
    expect(steepP.tonnesSavedPerYr).toBeGreaterThan(0);
    const bareP = p.fields.find((f: { fieldId: number }) => f.fieldId === bare);
    expect(bareP).toMatchObject({ ok: false, treatments: ['cover-crop'] });
    expect(bareP.reason.length).toBeGreaterThan(0);
    expect(p.tonnesSavedPerYr).toBeCloseTo(steepP.tonnesSavedPerYr, 9);

    // Frozen with the approval; the landowner sees their field's prediction only.
    const s = (await farmer.post(`/api/plans/${plan.id}/submit`).send({ version: last.version })).body;
    const advisor = await signedIn(ctx.app, made.users.advisor);
    await advisor.post(`/api/plans/${plan.id}/approve`).send({ version: s.version });
    const landowner = await signedIn(ctx.app, made.users.landowner);
    const seen = (await landowner.get(`/api/plans/${plan.id}`)).body;
    expect(seen.prediction.fields.map((f: { fieldId: number }) => f.fieldId)).toEqual([steep]);
    expect(seen.prediction.tonnesSavedPerYr).toBeCloseTo(steepP.tonnesSavedPerYr, 9);
  });

  it('says so when a field’s treatments cannot go together', async () => {
    const made = await makeFarm(['farmer']);
    const farmer = await signedIn(ctx.app, made.users.farmer);
    const farmId = made.farm.id;
    await farmer.put(`/api/farms/${farmId}/climate`).send({ rFrom: 'value', rValue: 2500, designStormMm: 110 });
    const id = (await farmer.post(`/api/farms/${farmId}/fields`).send(squareFeature(-91.7, 42.3, 300, 'Two tillages'))).body.id as number;
    await farmer.post(`/api/fields/${id}/soil-samples`).send(siltLoam);
    await farmer.put(`/api/fields/${id}/ground`).send({ slopePct: 6, slopeLengthM: 50 });
    await farmer.put(`/api/fields/${id}/cropping`).send({ season: '2027', crop: 'corn', tillage: 'moldboard plough' });
    const plan = (await farmer.post(`/api/farms/${farmId}/plans`).send({ season: '2027' })).body;
    await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: id, treatment: 'no-till' });
    const last = (await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: id, treatment: 'reduced-till' })).body.plan;
    expect(last.prediction.fields[0]).toMatchObject({ ok: false, treatments: ['no-till', 'reduced-till'] });
    expect(last.prediction.fields[0].reason).toMatch(/cannot go together/);
    expect(last.prediction.tonnesSavedPerYr).toBe(0);
  });
});
