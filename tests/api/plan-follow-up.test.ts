// Follow-up on a season plan: work recorded done (day, amount actually applied, a photo) and
// checked by the advisor are records of what happened, not changes to the plan, so an approved
// plan keeps its revision and approval; who recorded each and when is kept. Bad input stores
// nothing. A treatment option added in one click becomes one action per treatment it combines.
// Bookkeeping rules of the product; no published source applies.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { makeFarm, makeTestApp, signedIn, squareFeature } from '../helpers/test-app';
import { makeDemoLikeFarm } from '../helpers/demo-like-farm';

const ctx = makeTestApp();
afterAll(() => ctx.close());

type Agent = ReturnType<typeof request.agent>;

/** An approved plan with one cover-crop action on a field the landowner owns. */
async function approvedPlan() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const advisor = await signedIn(ctx.app, made.users.advisor);
  const landowner = await signedIn(ctx.app, made.users.landowner);
  const feature = squareFeature(-91.78, 42.31, 200, 'Rented');
  (feature.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
  const fieldId = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(feature)).body.id as number;
  const plan = (await farmer.post(`/api/farms/${made.farm.id}/plans`).send({ season: '2027' })).body;
  const added = (await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId, treatment: 'cover-crop', quantity: 4, unit: 'ha', cost: 280 })).body;
  const submitted = (await farmer.post(`/api/plans/${plan.id}/submit`).send({ version: added.plan.version })).body;
  const approved = (await advisor.post(`/api/plans/${plan.id}/approve`).send({ version: submitted.version })).body;
  return { farmId: made.farm.id, planId: plan.id as number, actionId: added.action.id as number, approved, farmer, advisor, landowner };
}

const done = (agent: Agent, actionId: number, body: Record<string, unknown>) => agent.post(`/api/plan-actions/${actionId}/done`).send(body);

describe('marking work done and checked', () => {
  it('records work done on an approved plan without a new revision or approval, naming who and when', async () => {
    const { planId, actionId, approved, farmer, landowner } = await approvedPlan();
    const res = await done(farmer, actionId, { version: 1, doneOn: '2027-09-14', appliedQuantity: 3.6, note: 'The wet corner was left.' });
    expect(res.status).toBe(200);
    expect(res.body.action).toMatchObject({ status: 'done', doneOn: '2027-09-14', appliedQuantity: 3.6, doneNote: 'The wet corner was left.', doneRecordedBy: { name: 'Test farmer' }, version: 2, hasPhoto: false });
    expect(Date.parse(res.body.action.doneRecordedAt)).not.toBeNaN();
    // The plan is as the advisor approved it: same state, revision and version.
    expect(res.body.plan).toMatchObject({ state: 'approved', revision: 1, version: approved.version, approvedRevision: 1 });
    // The landowner still reads the approved revision, with the work recorded done on it (no photo for them).
    const theirs = (await landowner.get(`/api/plans/${planId}`)).body;
    expect(theirs).toMatchObject({ state: 'approved', revision: 1 });
    expect(theirs.actions[0]).toMatchObject({ status: 'done', doneOn: '2027-09-14', appliedQuantity: 3.6, doneRecordedBy: { name: 'Test farmer' }, hasPhoto: false });
  });

  it('lets only the advisor check work, and only once it is done', async () => {
    const { actionId, approved, farmer, advisor } = await approvedPlan();
    const early = await advisor.post(`/api/plan-actions/${actionId}/check`).send({ version: 1 });
    expect([early.status, early.body.error]).toEqual([422, 'not_done']);
    await done(farmer, actionId, { version: 1, doneOn: '2027-09-14' });
    expect((await farmer.post(`/api/plan-actions/${actionId}/check`).send({ version: 2 })).status).toBe(403);
    const checked = await advisor.post(`/api/plan-actions/${actionId}/check`).send({ version: 2 });
    expect(checked.status).toBe(200);
    expect(checked.body.action).toMatchObject({ status: 'checked', checkedBy: { name: 'Test advisor' }, version: 3 });
    expect(checked.body.plan).toMatchObject({ state: 'approved', revision: 1, version: approved.version });
    const again = await done(farmer, actionId, { version: 3, doneOn: '2027-09-20' });
    expect([again.status, again.body.error]).toEqual([422, 'already_checked']);
  });

  it('answers 409 to a stale version and 400 naming the field to bad input, storing nothing', async () => {
    const { planId, actionId, farmer } = await approvedPlan();
    const stale = await done(farmer, actionId, { version: 7, doneOn: '2027-09-14' });
    expect(stale.status).toBe(409);
    expect(stale.body.details.current).toMatchObject({ id: actionId, version: 1 });
    const noDate = await done(farmer, actionId, { version: 1 });
    expect(noDate.status).toBe(400);
    expect(noDate.body.message).toMatch(/doneOn/);
    const badAmount = await done(farmer, actionId, { version: 1, doneOn: '2027-09-14', appliedQuantity: -2 });
    expect(badAmount.status).toBe(400);
    expect(badAmount.body.message).toMatch(/appliedQuantity/);
    // Done and checked are not plan changes: PATCH refuses them, naming status.
    const patched = await farmer.patch(`/api/plan-actions/${actionId}`).send({ version: 1, status: 'done' });
    expect(patched.status).toBe(400);
    expect(patched.body.message).toMatch(/^status/);
    const plan = (await farmer.get(`/api/plans/${planId}`)).body;
    expect(plan.actions[0]).toMatchObject({ status: 'planned', version: 1, doneOn: null });
    expect(plan.state).toBe('approved');
  });

  it('keeps a photo of the work, refuses a file that is not one, and shows it to the farmer and advisor only', async () => {
    const { actionId, farmer, advisor, landowner } = await approvedPlan();
    const notPhoto = await farmer.post(`/api/plan-actions/${actionId}/done`).field('version', '1').field('doneOn', '2027-09-14').attach('file', Buffer.from('not a photo\n'), { filename: 'field.jpg', contentType: 'image/jpeg' });
    expect(notPhoto.status).toBe(415);
    expect((await farmer.get(`/api/plan-actions/${actionId}/photo`)).status).toBe(404);
    const empty = await farmer.post(`/api/plan-actions/${actionId}/done`).field('version', '1').field('doneOn', '2027-09-14').attach('file', Buffer.alloc(0), 'empty.png');
    expect([400, 422]).toContain(empty.status);

    const png = await sharp({ create: { width: 60, height: 40, channels: 3, background: '#8a6' } }).png().toBuffer();
    const res = await farmer.post(`/api/plan-actions/${actionId}/done`).field('version', '1').field('doneOn', '2027-09-14').field('appliedQuantity', '3.5').attach('file', png, 'cover.png');
    expect(res.status).toBe(200);
    expect(res.body.action).toMatchObject({ status: 'done', appliedQuantity: 3.5, hasPhoto: true });
    const image = await advisor.get(`/api/plan-actions/${actionId}/photo`);
    expect([image.status, image.headers['content-type']]).toEqual([200, 'image/png']);
    expect((await sharp(image.body).metadata()).width).toBe(60);
    expect((await farmer.get(`/api/plan-actions/${actionId}/photo/thumbnail`)).headers['content-type']).toBe('image/jpeg');
    expect((await landowner.get(`/api/plan-actions/${actionId}/photo`)).status).toBe(403);
  });
});

describe('adding a treatment option to the plan in one click', () => {
  it('makes one action per treatment of a combined option, its cost split by the option’s cost lines', async () => {
    const { farm, users, ids, season } = await makeDemoLikeFarm(ctx.sequelize);
    const farmer = await signedIn(ctx.app, users.farmer);
    const fieldId = ids['Long Slope'];
    const treatments = (await farmer.get(`/api/fields/${fieldId}/treatments?season=${season}`)).body;
    const combined = treatments.options.find((o: { treatments: string[] }) => o.treatments.length > 1);
    expect(combined).toBeDefined();
    const plan = (await farmer.post(`/api/farms/${farm.id}/plans`).send({ season })).body;
    const res = await farmer.post(`/api/plans/${plan.id}/actions/from-option`).send({ fieldId, optionId: combined.id });
    expect(res.status).toBe(201);
    const actions = res.body.plan.actions as { treatment: string; cost: number; fieldId: number; notes: string }[];
    expect(actions.map((a) => a.treatment)).toEqual(combined.treatments);
    const total = actions.reduce((s, a) => s + a.cost, 0);
    expect(total).toBeCloseTo(combined.cost.total, 2);
    expect(actions.every((a) => a.fieldId === fieldId && a.notes.includes(combined.title))).toBe(true);
    // The plan's prediction applies the same treatments: the field's A after equals the option's.
    const predicted = res.body.plan.prediction.fields.find((f: { fieldId: number }) => f.fieldId === fieldId);
    expect(predicted.planned.soilLossTPerHaYr).toBeCloseTo(combined.soilLossTPerHaYr, 6);

    const unknown = await farmer.post(`/api/plans/${plan.id}/actions/from-option`).send({ fieldId, optionId: 'moon-dust' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.message).toMatch(/^optionId/);
    expect((await farmer.get(`/api/plans/${plan.id}`)).body.actions).toHaveLength(combined.treatments.length);
  });
});
