// Every API route × every kind of caller → the status the role table asks for. The routes come
// from the app's own router, so a route added without a rule in authorization-rules.ts fails
// here. Denied callers must be stopped before anything runs: 401 signed out, 404 for farms and
// fields that are not theirs (their existence does not leak), 403 for a member whose role may
// not. Allowed callers send an empty body and must get past the checks to the route's own answer.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import { makeTestApp, makeUser, signedIn } from '../helpers/test-app';
import { makePlanFarm } from '../helpers/plan-farm';
import { makeImage } from '../fixtures/soils/soil-fixtures';
import { ProcessingJob } from '../../server/models';
import type { Role } from '../../shared/schemas/auth';
import { RULES, type Rule } from './authorization-rules';

// With the fake mail server's mailbox mounted, so its route is in the table too.
const ctx = makeTestApp({ devMailbox: true });
afterAll(() => ctx.close());

type Actor = 'anonymous' | 'outsider' | 'admin' | 'landowner on their field' | 'landowner on another field' | 'advisor' | 'farmer';
const ACTORS: Actor[] = ['anonymous', 'outsider', 'admin', 'landowner on their field', 'landowner on another field', 'advisor', 'farmer'];
const ROLE_OF: Partial<Record<Actor, Role>> = {
  'landowner on their field': 'landowner',
  'landowner on another field': 'landowner',
  advisor: 'advisor',
  farmer: 'farmer',
};

/** Method and path of every route the app answers, walked from Express's own router stack. */
type Layer = { route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: Layer[] }; rawPath?: string };
function routeTable(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) for (const m of Object.keys(layer.route.methods)) out.push(`${m.toUpperCase()} ${prefix}${layer.route.path}`);
      else if (layer.handle?.stack) walk(layer.handle.stack, prefix + (layer.rawPath && layer.rawPath !== '/' ? layer.rawPath : ''));
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return out;
}

/** What the role table says this caller gets; 'not-called' for allowed callers of a destructive route. */
function expected(rule: Rule, actor: Actor): number | 'not-called' {
  if (rule.kind === 'public') return rule.allowed;
  if (actor === 'anonymous') return 401;
  if (rule.kind === 'signed-in') return rule.allowed;
  const role = ROLE_OF[actor];
  if (!role) return 404;
  if (rule.kind === 'field' && actor === 'landowner on another field') return 404;
  return rule.roles.includes(role) ? rule.allowed : 403;
}

type Ids = Record<string, string | number>;
const agents = {} as Record<Actor, ReturnType<typeof request.agent>>;
let own: Ids = {};
let other: Ids = {};

beforeAll(async () => {
  const made = await makePlanFarm(ctx.app, ctx.sequelize);
  const { farm, ids, planId, memberships } = made;
  agents.farmer = made.agents.farmer;
  agents.advisor = made.agents.advisor;
  agents['landowner on their field'] = made.agents.landowner;
  agents['landowner on another field'] = made.agents.landowner;
  agents.outsider = await signedIn(ctx.app, await makeUser());
  agents.admin = await signedIn(ctx.app, await makeUser({ isAdmin: true }));
  agents.anonymous = request.agent(ctx.app);
  const farmer = agents.farmer;

  const plan = (await farmer.get(`/api/plans/${planId}`)).body as { actions: { id: number; fieldId: number }[] };
  const job = await ProcessingJob.create({ id: randomUUID(), farmId: farm.id, kind: 'terrain', createdBy: made.users.farmer.id });
  const invitation = (await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email: `inv-${randomUUID()}@example.test`, role: 'advisor' })).body;
  const common: Ids = {
    farmId: farm.id,
    planId,
    jobId: job.id,
    invitationId: invitation.id,
    membershipId: memberships.landowner.id,
    label: 'S-none',
    file: 'slope.png',
    factor: 'k',
    token: 'no-such-invitation-token',
  };
  const idsOn = async (fieldId: number): Promise<Ids> => {
    const samples = (await farmer.get(`/api/fields/${fieldId}/soil-samples`)).body as { id: number }[];
    const photo = await farmer.post(`/api/fields/${fieldId}/soil-photos`).attach('file', await makeImage('png', 40, 30), 'profile.png');
    const action = plan.actions.find((a) => a.fieldId === fieldId);
    if (!samples.length || photo.status !== 201 || !action) throw new Error(`matrix set-up incomplete on field ${fieldId}`);
    return { ...common, fieldId, sampleId: samples[0].id, photoId: photo.body.id, actionId: action.id };
  };
  own = await idsOn(ids['Mill Hill']);
  other = await idsOn(ids['Long Slope']);
}, 120_000);

function fill(route: string, values: Ids): string {
  return route.replace(/:([A-Za-z]+)/g, (_m, name: string) => {
    if (!(name in values)) throw new Error(`no value for :${name} in ${route}`);
    return String(values[name]);
  });
}

async function call(actor: Actor, key: string) {
  const [method, route] = key.split(' ');
  const url = fill(route, actor === 'landowner on their field' ? own : other);
  const agent = agents[actor];
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  return m === 'get' ? agent.get(url) : agent[m](url).send({});
}

describe('authorization matrix', () => {
  it('has a rule for every route the app answers, and no rule for a route that is gone', () => {
    const table = routeTable(ctx.app);
    expect(table.length).toBeGreaterThan(80);
    expect(table.filter((r) => !(r in RULES)), 'routes without a rule').toEqual([]);
    expect(Object.keys(RULES).filter((r) => !table.includes(r)), 'rules without a route').toEqual([]);
  });

  for (const [key, rule] of Object.entries(RULES)) {
    it(`${key}: each caller gets what the role table says`, async () => {
      const got: Partial<Record<Actor, number>> = {};
      const want: Partial<Record<Actor, number>> = {};
      for (const actor of ACTORS) {
        const status = expected(rule, actor);
        // Allowed callers of a destructive route are not sent here: its own tests (rule.coveredBy) cover them.
        if (status === 'not-called') continue;
        want[actor] = status;
        const res = await call(actor, key);
        got[actor] = res.status;
        if (res.status >= 400 && res.status !== 503) expect(res.body, `${key} as ${actor}: error body`).toMatchObject({ error: expect.any(String), message: expect.any(String) });
      }
      expect(got).toEqual(want);
    });
  }
});
