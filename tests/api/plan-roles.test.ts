// Each role against each season-plan route, in the plan state that matters: rights are per farm
// and per role, and a landowner learns nothing of a plan until a revision of it is approved.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { makeFarm, makeTestApp, makeUser, signedIn, squareFeature } from '../helpers/test-app';
import { Membership } from '../../server/models';

const ctx = makeTestApp();
afterAll(() => ctx.close());

type Who = 'farmer' | 'advisor' | 'owning landowner' | 'other landowner' | 'non-member' | 'nobody';
type State = 'draft' | 'submitted' | 'returned' | 'approved';
let farmId = 0;
let fieldId = 0;
const agents = {} as Record<Who, ReturnType<typeof request.agent>>;

beforeAll(async () => {
  const { farm, users, memberships } = await makeFarm(['farmer', 'advisor', 'landowner']);
  farmId = farm.id;
  const other = await makeUser();
  await Membership.create({ userId: other.id, farmId, role: 'landowner' });
  agents.farmer = await signedIn(ctx.app, users.farmer);
  agents.advisor = await signedIn(ctx.app, users.advisor);
  agents['owning landowner'] = await signedIn(ctx.app, users.landowner);
  agents['other landowner'] = await signedIn(ctx.app, other);
  agents['non-member'] = await signedIn(ctx.app, await makeUser());
  agents.nobody = request.agent(ctx.app);
  const owned = squareFeature(-91.78, 42.31, 200, 'Rented');
  (owned.properties as Record<string, unknown>).ownerMembershipId = memberships.landowner.id;
  fieldId = (await agents.farmer.post(`/api/farms/${farmId}/fields`).send(owned)).body.id;
});

/** A plan of its own season with one action on the rented field, brought to the state asked for. */
async function planIn(state: State) {
  const season = `S-${randomUUID().slice(0, 8)}`;
  const { farmer, advisor } = agents;
  const plan = (await farmer.post(`/api/farms/${farmId}/plans`).send({ season })).body;
  const added = (await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId, treatment: 'cover-crop', cost: 100 })).body;
  let version = added.plan.version;
  if (state !== 'draft') version = (await farmer.post(`/api/plans/${plan.id}/submit`).send({ version })).body.version;
  if (state === 'returned') version = (await advisor.post(`/api/plans/${plan.id}/return`).send({ version, comment: 'Again.' })).body.version;
  if (state === 'approved') version = (await advisor.post(`/api/plans/${plan.id}/approve`).send({ version })).body.version;
  return { season, planId: plan.id as number, actionId: added.action.id as number, version: version as number };
}

const all = (farmer: number, advisor: number, owning: number, other: number, nonMember = 404): Record<Who, number> => ({
  farmer,
  advisor,
  'owning landowner': owning,
  'other landowner': other,
  'non-member': nonMember,
  nobody: 401,
});

const routes: { name: string; state: State; expected: Record<Who, number>; call: (a: ReturnType<typeof request.agent>, p: Awaited<ReturnType<typeof planIn>>) => Promise<{ status: number }> }[] = [
  { name: 'GET season plan', state: 'draft', expected: all(200, 200, 404, 404), call: (a, p) => a.get(`/api/farms/${farmId}/plans?season=${p.season}`) },
  { name: 'GET season plan', state: 'approved', expected: all(200, 200, 200, 200), call: (a, p) => a.get(`/api/farms/${farmId}/plans?season=${p.season}`) },
  { name: 'GET plan', state: 'submitted', expected: all(200, 200, 404, 404), call: (a, p) => a.get(`/api/plans/${p.planId}`) },
  { name: 'GET plan', state: 'returned', expected: all(200, 200, 404, 404), call: (a, p) => a.get(`/api/plans/${p.planId}`) },
  { name: 'GET versions', state: 'approved', expected: all(200, 200, 200, 200), call: (a, p) => a.get(`/api/plans/${p.planId}/versions`) },
  { name: 'POST plan', state: 'draft', expected: all(201, 201, 403, 403), call: (a) => a.post(`/api/farms/${farmId}/plans`).send({ season: `N-${randomUUID().slice(0, 8)}` }) },
  { name: 'POST action', state: 'draft', expected: all(201, 201, 404, 404), call: (a, p) => a.post(`/api/plans/${p.planId}/actions`).send({ fieldId, treatment: 'no-till' }) },
  { name: 'POST action', state: 'submitted', expected: all(422, 422, 404, 404), call: (a, p) => a.post(`/api/plans/${p.planId}/actions`).send({ fieldId, treatment: 'no-till' }) },
  { name: 'POST action', state: 'approved', expected: all(201, 201, 403, 403), call: (a, p) => a.post(`/api/plans/${p.planId}/actions`).send({ fieldId, treatment: 'no-till' }) },
  { name: 'PATCH action', state: 'returned', expected: all(200, 200, 404, 404), call: (a, p) => a.patch(`/api/plan-actions/${p.actionId}`).send({ version: 1, notes: 'Seed by mid-September.' }) },
  { name: 'POST done', state: 'approved', expected: all(200, 200, 403, 403), call: (a, p) => a.post(`/api/plan-actions/${p.actionId}/done`).send({ version: 1, doneOn: '2027-09-12' }) },
  { name: 'POST check', state: 'approved', expected: all(403, 422, 403, 403), call: (a, p) => a.post(`/api/plan-actions/${p.actionId}/check`).send({ version: 1 }) },
  { name: 'POST from-option', state: 'draft', expected: all(400, 400, 404, 404), call: (a, p) => a.post(`/api/plans/${p.planId}/actions/from-option`).send({ fieldId, optionId: 'no-such-option' }) },
  { name: 'DELETE action', state: 'approved', expected: all(200, 200, 403, 403), call: (a, p) => a.delete(`/api/plan-actions/${p.actionId}?version=1`) },
  { name: 'POST submit', state: 'draft', expected: all(200, 403, 404, 404), call: (a, p) => a.post(`/api/plans/${p.planId}/submit`).send({ version: p.version }) },
  { name: 'POST return', state: 'submitted', expected: all(403, 200, 404, 404), call: (a, p) => a.post(`/api/plans/${p.planId}/return`).send({ version: p.version, comment: 'Change it.' }) },
  { name: 'POST approve', state: 'submitted', expected: all(403, 200, 404, 404), call: (a, p) => a.post(`/api/plans/${p.planId}/approve`).send({ version: p.version }) },
  { name: 'POST comment', state: 'approved', expected: all(201, 201, 403, 403), call: (a, p) => a.post(`/api/plans/${p.planId}/comments`).send({ body: 'Noted.' }) },
];

describe('role checks on every plan route', () => {
  for (const route of routes) {
    for (const [who, status] of Object.entries(route.expected) as [Who, number][]) {
      it(`${route.name} (${route.state}) as ${who} → ${status}`, async () => {
        const plan = await planIn(route.state);
        expect((await route.call(agents[who], plan)).status).toBe(status);
      });
    }
  }
});
