// Season plans: the review loop per role, versions and what changed, 409 on stale versions,
// the landowner's view (approved revisions of their own fields only), and bad input.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { makeFarm, makeTestApp, makeUser, signedIn, squareFeature } from '../helpers/test-app';
import { AuditEvent, Membership, PlanAction, PlanComment } from '../../server/models';

const ctx = makeTestApp();
afterAll(() => ctx.close());

type Agent = ReturnType<typeof request.agent>;

/** A farm with farmer, advisor, an owning landowner and another landowner; one rented field, one not. */
async function planFarm() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const otherOwner = await makeUser({ name: 'Other owner' });
  const otherMembership = await Membership.create({ userId: otherOwner.id, farmId: made.farm.id, role: 'landowner' });
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const rentedFeature = squareFeature(-91.78, 42.31, 200, 'Rented');
  (rentedFeature.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
  const rented = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(rentedFeature)).body.id as number;
  const own = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(squareFeature(-91.77, 42.31, 200, 'Home'))).body.id as number;
  const agents = {
    farmer,
    advisor: await signedIn(ctx.app, made.users.advisor),
    landowner: await signedIn(ctx.app, made.users.landowner),
    otherLandowner: await signedIn(ctx.app, otherOwner),
    stranger: await signedIn(ctx.app, await makeUser()),
  };
  return { farmId: made.farm.id, rented, own, agents, otherMembership };
}

async function newPlan(farmer: Agent, farmId: number, season = '2027') {
  const res = await farmer.post(`/api/farms/${farmId}/plans`).send({ season });
  expect(res.status).toBe(201);
  return res.body as { id: number; version: number; state: string };
}

const noTill = (fieldId: number) => ({ fieldId, treatment: 'no-till', quantity: 20, unit: 'ha', cost: 900, plannedOn: '2027-04-20', doneBy: 'Contractor', notes: 'Hire the drill.' });
const cover = (fieldId: number) => ({ fieldId, treatment: 'cover-crop', quantity: 20, unit: 'ha', cost: 1400, plannedFrom: '2027-09-01', plannedTo: '2027-09-30' });

describe('a season plan from draft to approval', () => {
  it('creates the season plan with its shape, and answers the same plan when asked again', async () => {
    const { farmId, agents } = await planFarm();
    const res = await agents.farmer.post(`/api/farms/${farmId}/plans`).send({ season: '2027' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ id: expect.any(Number), season: '2027', state: 'draft', version: 1, revision: 1, actions: [], approvedRevision: null, currency: 'USD' });
    const again = await agents.advisor.post(`/api/farms/${farmId}/plans`).send({ season: '2027' });
    expect([again.status, again.body.id]).toEqual([200, res.body.id]);
    expect((await agents.farmer.get(`/api/farms/${farmId}/seasons`)).body.map((s: { label: string }) => s.label)).toEqual(['2027']);
  });

  it('adds actions with totals per field and farm, names who added them, and bumps the plan version', async () => {
    const { farmId, rented, own, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented));
    expect(a.status).toBe(201);
    expect(a.body.action).toMatchObject({ title: 'No-till', fieldName: 'Rented', status: 'planned', version: 1, currency: 'USD', plannedOn: '2027-04-20', createdBy: { name: 'Test farmer' } });
    await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(cover(rented));
    const typed = await agents.advisor.post(`/api/plans/${plan.id}/actions`).send({ fieldId: own, treatment: 'other', title: 'Clean out the culvert', cost: 150.25 });
    expect(typed.body.action).toMatchObject({ title: 'Clean out the culvert', treatment: 'other', createdBy: { name: 'Test advisor' } });
    const body = typed.body.plan;
    expect(body.version).toBe(4);
    // 900 + 1400 on the rented field, 150.25 on the home field.
    expect(body.totals).toEqual({
      cost: 2450.25,
      fields: [
        { fieldId: rented, fieldName: 'Rented', actions: 2, cost: 2300 },
        { fieldId: own, fieldName: 'Home', actions: 1, cost: 150.25 },
      ],
    });
    expect(await AuditEvent.count({ where: { entity: 'plan_action', farmId } })).toBe(3);
  });

  it('runs the loop: submit, return with comments, change, resubmit, approve; the landowner reads their fields only', async () => {
    const { farmId, rented, own, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a1 = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body;
    await agents.farmer.post(`/api/plans/${plan.id}/actions`).send({ ...cover(own) });

    // Drafts are invisible to landowners.
    expect((await agents.landowner.get(`/api/farms/${farmId}/plans?season=2027`)).status).toBe(404);
    expect((await agents.landowner.get(`/api/plans/${plan.id}`)).status).toBe(404);

    // The advisor may not submit; the farmer does.
    let version = (await agents.farmer.get(`/api/plans/${plan.id}`)).body.version;
    expect((await agents.advisor.post(`/api/plans/${plan.id}/submit`).send({ version })).status).toBe(403);
    const submitted = await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version });
    expect(submitted.status).toBe(200);
    expect(submitted.body).toMatchObject({ state: 'submitted', submittedBy: { name: 'Test farmer' } });
    expect((await agents.landowner.get(`/api/plans/${plan.id}`)).status).toBe(404);

    // Locked while in review.
    const locked = await agents.farmer.patch(`/api/plan-actions/${a1.action.id}`).send({ version: 1, cost: 800 });
    expect([locked.status, locked.body.error]).toEqual([422, 'plan_submitted']);
    expect((await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(cover(rented))).status).toBe(422);

    // The farmer may not return or approve; the advisor returns it with a comment, and one on an action.
    version = submitted.body.version;
    expect((await agents.farmer.post(`/api/plans/${plan.id}/approve`).send({ version })).status).toBe(403);
    const actionNote = await agents.advisor.post(`/api/plans/${plan.id}/comments`).send({ body: 'Price the drill hire per hectare.', actionId: a1.action.id });
    expect(actionNote.status).toBe(201);
    expect(actionNote.body).toMatchObject({ actionId: a1.action.id, kind: 'comment', author: { name: 'Test advisor' }, revision: 1 });
    const returned = await agents.advisor.post(`/api/plans/${plan.id}/return`).send({ version, comment: 'Add a cover crop on the rented field too.' });
    expect(returned.status).toBe(200);
    expect(returned.body).toMatchObject({ state: 'returned', returnedBy: { name: 'Test advisor' } });
    expect(returned.body.comments.map((c: { kind: string; body: string }) => [c.kind, c.body])).toEqual([
      ['comment', 'Price the drill hire per hectare.'],
      ['return', 'Add a cover crop on the rented field too.'],
    ]);
    expect((await agents.landowner.get(`/api/plans/${plan.id}`)).status).toBe(404);

    // Back with the farmer: change, add, resubmit.
    const farmerView = (await agents.farmer.get(`/api/plans/${plan.id}`)).body;
    expect(farmerView.state).toBe('returned');
    expect(farmerView.comments).toHaveLength(2);
    await agents.farmer.patch(`/api/plan-actions/${a1.action.id}`).send({ version: 1, cost: 800 });
    const added = await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(cover(rented));
    const resubmitted = await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: added.body.plan.version });
    expect(resubmitted.body.state).toBe('submitted');

    const approved = await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: resubmitted.body.version, comment: 'Good plan.' });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ state: 'approved', approvedRevision: 1, approvedBy: { name: 'Test advisor' } });

    // The landowner reads the approved plan, cut to the field they own, with no review conversation.
    const seen = await agents.landowner.get(`/api/farms/${farmId}/plans?season=2027`);
    expect(seen.status).toBe(200);
    expect(seen.body).toMatchObject({ id: plan.id, state: 'approved', frozen: true, revision: 1, comments: [] });
    expect(seen.body.actions.map((a: { fieldId: number; title: string }) => [a.fieldId, a.title])).toEqual([
      [rented, 'No-till'],
      [rented, 'Cover crop'],
    ]);
    expect(seen.body.totals).toEqual({ cost: 2200, fields: [{ fieldId: rented, fieldName: 'Rented', actions: 2, cost: 2200 }] });
    expect((await agents.landowner.get(`/api/plans/${plan.id}`)).body).toEqual(seen.body);
    // A landowner of no field in the plan sees an approved plan with no actions.
    expect((await agents.otherLandowner.get(`/api/plans/${plan.id}`)).body.actions).toEqual([]);
    // Landowners read only.
    expect((await agents.landowner.post(`/api/plans/${plan.id}/comments`).send({ body: 'Thanks' })).status).toBe(403);
    expect((await agents.landowner.patch(`/api/plan-actions/${a1.action.id}`).send({ version: 2, cost: 1 })).status).toBe(403);
  });

  it('starts a new revision when an approved plan is changed; the landowner keeps the approved one', async () => {
    const { farmId, rented, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body;
    const s = (await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: a.plan.version })).body;
    await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: s.version });

    const changed = await agents.farmer.patch(`/api/plan-actions/${a.action.id}`).send({ version: 1, cost: 950, notes: 'Drilled on 22 April.' });
    expect(changed.status).toBe(200);
    expect(changed.body.plan).toMatchObject({ state: 'draft', revision: 2, approvedRevision: 1, approvedBy: null });
    const extra = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: rented, treatment: 'filter-strip', cost: 300 })).body;

    const landownerView = (await agents.landowner.get(`/api/plans/${plan.id}`)).body;
    expect(landownerView).toMatchObject({ revision: 1, state: 'approved' });
    expect(landownerView.actions.map((x: { status: string; cost: number }) => [x.status, x.cost])).toEqual([['planned', 900]]);

    // The advisor sees every version with what changed from the one before.
    const versions = (await agents.advisor.get(`/api/plans/${plan.id}/versions`)).body;
    expect(versions.map((v: { revision: number; state: string }) => [v.revision, v.state])).toEqual([
      [1, 'approved'],
      [2, 'draft'],
    ]);
    expect(versions[0].changes).toBeNull();
    expect(versions[0].approvedBy).toMatchObject({ name: 'Test advisor' });
    expect(versions[1].changes.fromRevision).toBe(1);
    expect(versions[1].changes.added.map((x: { id: number }) => x.id)).toEqual([extra.action.id]);
    expect(versions[1].changes.removed).toEqual([]);
    expect(versions[1].changes.changed).toEqual([
      {
        actionId: a.action.id,
        title: 'No-till',
        fieldName: 'Rented',
        fields: [
          { key: 'cost', from: 900, to: 950 },
          { key: 'notes', from: 'Hire the drill.', to: 'Drilled on 22 April.' },
        ],
      },
    ]);

    // Approving revision 2 gives the landowner the new one, and the list two frozen versions.
    const s2 = (await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: extra.plan.version })).body;
    await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: s2.version });
    const after = (await agents.landowner.get(`/api/plans/${plan.id}`)).body;
    expect(after.revision).toBe(2);
    expect(after.actions).toHaveLength(2);
    const theirVersions = (await agents.landowner.get(`/api/plans/${plan.id}/versions`)).body;
    expect(theirVersions.map((v: { revision: number }) => v.revision)).toEqual([1, 2]);
    expect(theirVersions[1].changes.added).toHaveLength(1);
  });

  it('shows a landowner an approved version cut to their fields, without the other fields in what changed', async () => {
    const { farmId, rented, own, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(own))).body;
    const s = (await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: a.plan.version })).body;
    await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: s.version });
    const b = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(cover(own))).body;
    const s2 = (await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: b.plan.version })).body;
    await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: s2.version });
    const versions = (await agents.landowner.get(`/api/plans/${plan.id}/versions`)).body;
    for (const v of versions) {
      expect(v.plan.actions).toEqual([]);
      expect(v.plan.comments).toEqual([]);
    }
    expect(versions[1].changes).toEqual({ fromRevision: 1, added: [], removed: [], changed: [] });
    expect(rented).toBeGreaterThan(0);
  });
});

describe('concurrent edits', () => {
  it('answers 409 with the current action to a stale action change or removal, and changes nothing', async () => {
    const { farmId, rented, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body.action;
    expect((await agents.advisor.patch(`/api/plan-actions/${a.id}`).send({ version: 1, cost: 750 })).body.action).toMatchObject({ cost: 750, version: 2, updatedBy: { name: 'Test advisor' } });
    const stale = await agents.farmer.patch(`/api/plan-actions/${a.id}`).send({ version: 1, cost: 600 });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ error: 'stale_version', details: { current: { id: a.id, cost: 750, version: 2 } } });
    const staleDelete = await agents.farmer.delete(`/api/plan-actions/${a.id}`).send({ version: 1 });
    expect(staleDelete.status).toBe(409);
    expect(await PlanAction.findByPk(a.id)).not.toBeNull();
    const gone = await agents.farmer.delete(`/api/plan-actions/${a.id}?version=2`);
    expect(gone.status).toBe(200);
    expect(gone.body.plan.actions).toEqual([]);
    expect((await agents.farmer.delete(`/api/plan-actions/${a.id}?version=2`)).status).toBe(404);
  });

  it('answers 409 with the current plan when the plan changed since it was read', async () => {
    const { farmId, rented, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body;
    const read = a.plan.version;
    await agents.advisor.post(`/api/plans/${plan.id}/actions`).send(cover(rented));
    const stale = await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: read });
    expect(stale.status).toBe(409);
    expect(stale.body.details.current.actions).toHaveLength(2);
    expect(stale.body.details.current.state).toBe('draft');
    const fresh = await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: stale.body.details.current.version });
    expect(fresh.status).toBe(200);
    // The advisor approving what they read before the resubmission gets a 409 too.
    const approve = await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: read });
    expect(approve.status).toBe(409);
    expect((await agents.advisor.get(`/api/plans/${plan.id}`)).body.state).toBe('submitted');
  });
});

describe('who may see and do what', () => {
  it('hides a farm’s plans from strangers and other farms’ members', async () => {
    const { farmId, rented, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body;
    const other = await planFarm();
    for (const who of [agents.stranger, other.agents.farmer, other.agents.advisor]) {
      expect((await who.get(`/api/farms/${farmId}/plans?season=2027`)).status).toBe(404);
      expect((await who.get(`/api/plans/${plan.id}`)).status).toBe(404);
      expect((await who.get(`/api/plans/${plan.id}/versions`)).status).toBe(404);
      expect((await who.post(`/api/plans/${plan.id}/comments`).send({ body: 'hello' })).status).toBe(404);
      expect((await who.patch(`/api/plan-actions/${a.action.id}`).send({ version: 1, cost: 1 })).status).toBe(404);
      expect((await who.post(`/api/farms/${farmId}/plans`).send({ season: '2028' })).status).toBe(404);
    }
    expect((await request(ctx.app).get(`/api/plans/${plan.id}`)).status).toBe(401);
    // A field of another farm is not a field of this plan.
    const foreign = await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(other.rented));
    expect([foreign.status, foreign.body.message]).toEqual([400, 'fieldId: there is no field with that id on this farm']);
  });

  it('lets only the farmer and the advisor create plans, and answers 404 when a season has none', async () => {
    const { farmId, agents } = await planFarm();
    expect((await agents.landowner.post(`/api/farms/${farmId}/plans`).send({ season: '2027' })).status).toBe(403);
    expect((await agents.farmer.get(`/api/farms/${farmId}/plans?season=2027`)).status).toBe(404);
    await agents.farmer.post(`/api/farms/${farmId}/seasons`).send({ label: '2027' });
    const none = await agents.farmer.get(`/api/farms/${farmId}/plans?season=2027`);
    expect([none.status, none.body.error]).toEqual([404, 'no_plan']);
  });

  it('refuses to submit an empty plan, and to approve or return a plan not in review', async () => {
    const { farmId, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const empty = await agents.farmer.post(`/api/plans/${plan.id}/submit`).send({ version: plan.version });
    expect([empty.status, empty.body.error]).toEqual([422, 'plan_empty']);
    const approve = await agents.advisor.post(`/api/plans/${plan.id}/approve`).send({ version: plan.version });
    expect([approve.status, approve.body.error]).toEqual([422, 'plan_state']);
    expect(approve.body.message).toMatch(/submitted for review/);
    const ret = await agents.advisor.post(`/api/plans/${plan.id}/return`).send({ version: plan.version, comment: 'x' });
    expect(ret.status).toBe(422);
  });
});

describe('bad input', () => {
  it('names the field and stores nothing', async () => {
    const { farmId, rented, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const cases: [Record<string, unknown>, RegExp][] = [
      [{ ...noTill(rented), treatment: 'magic' }, /^treatment: /],
      [{ ...noTill(rented), fieldId: 'x' }, /^fieldId: /],
      [{ ...noTill(rented), cost: -5 }, /^cost: cost must be at least 0/],
      [{ ...noTill(rented), plannedOn: '2027-02-30' }, /^plannedOn: /],
      [{ ...noTill(rented), plannedFrom: '2027-05-01' }, /^plannedOn: give either plannedOn or a window/],
      [{ ...cover(rented), plannedTo: '2027-08-01' }, /^plannedTo: plannedTo must not be before plannedFrom/],
      [{ fieldId: rented, treatment: 'other' }, /^title: title is required/],
      [{ ...noTill(rented), unit: null }, /^unit: /],
      [{ ...noTill(rented), status: 'finished' }, /^status: /],
    ];
    for (const [body, message] of cases) {
      const res = await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(body);
      expect([res.status, res.body.error]).toEqual([400, 'invalid_input']);
      expect(res.body.message).toMatch(message);
    }
    expect(await PlanAction.count({ where: { planId: plan.id } })).toBe(0);
    expect((await agents.farmer.get(`/api/plans/${plan.id}`)).body.version).toBe(plan.version);

    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body.action;
    const clash = await agents.farmer.patch(`/api/plan-actions/${a.id}`).send({ version: 1, plannedFrom: '2027-05-01' });
    expect([clash.status, clash.body.message]).toEqual([400, 'plannedOn: give either plannedOn or a window (plannedFrom and plannedTo), not both']);
    const noVersion = await agents.farmer.patch(`/api/plan-actions/${a.id}`).send({ cost: 1 });
    expect(noVersion.body.message).toMatch(/^version: /);
    expect((await PlanAction.findByPk(a.id))!.version).toBe(1);
    const other = await agents.farmer.patch(`/api/plan-actions/${a.id}`).send({ version: 1, treatment: 'other' });
    expect(other.body.message).toMatch(/^title: /);

    expect((await agents.advisor.post(`/api/plans/${plan.id}/return`).send({ version: 2 })).body.message).toMatch(/^comment: /);
    expect((await agents.farmer.post(`/api/plans/${plan.id}/comments`).send({ body: '   ' })).body.message).toMatch(/^body: /);
    const wrongAction = await agents.farmer.post(`/api/plans/${plan.id}/comments`).send({ body: 'On what?', actionId: 2_000_000_000 });
    expect([wrongAction.status, wrongAction.body.message]).toEqual([400, 'actionId: there is no action with that id in this plan']);
    expect(await PlanComment.count({ where: { planId: plan.id } })).toBe(0);
    expect((await agents.farmer.post(`/api/farms/${farmId}/plans`).send({ season: '' })).body.message).toMatch(/^season: /);
    expect((await agents.farmer.get(`/api/plans/abc`)).status).toBe(400);
  });

  it('changes the title with the treatment, and keeps a typed title', async () => {
    const { farmId, rented, agents } = await planFarm();
    const plan = await newPlan(agents.farmer, farmId);
    const a = (await agents.farmer.post(`/api/plans/${plan.id}/actions`).send(noTill(rented))).body.action;
    const r = await agents.farmer.patch(`/api/plan-actions/${a.id}`).send({ version: 1, treatment: 'reduced-till' });
    expect(r.body.action).toMatchObject({ treatment: 'reduced-till', title: 'Reduced tillage', version: 2 });
    const t = await agents.farmer.patch(`/api/plan-actions/${a.id}`).send({ version: 2, title: 'Strip-till with the old planter', cost: null });
    expect(t.body.action).toMatchObject({ title: 'Strip-till with the old planter', cost: null, plannedOn: '2027-04-20' });
  });
});
