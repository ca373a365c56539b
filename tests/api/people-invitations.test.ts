// Invitations by e-mail: the tests read the link from the caught message and follow it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { Invitation } from '../../server/models';
import { hashToken } from '../../server/services/one-time-token';
import { makeFarm, makeUser, signedIn, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { linkIn, startMailApp } from '../helpers/mail-app';

let ctx: Awaited<ReturnType<typeof startMailApp>>;
beforeAll(async () => {
  ctx = await startMailApp();
});
afterAll(() => ctx?.close());

const address = () => `invitee-${randomUUID()}@example.test`;
const tokenOf = (path: string) => path.split('/').pop()!;

async function farmWithFields() {
  const made = await makeFarm(['farmer']);
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const ids: number[] = [];
  for (const [i, name] of ['North slope', 'Creek bottom', 'Top field'].entries()) {
    const res = await farmer.post(`/api/farms/${made.farm.id}/fields`).send(squareFeature(-91.8 + i * 0.01, 42.3, 200, name));
    expect(res.status).toBe(201);
    ids.push(res.body.id);
  }
  return { ...made, farmer, ids };
}

describe('invitations', () => {
  it('an invitation creates an advisor who then sees the farm', async () => {
    const { farm, farmer } = await farmWithFields();
    const email = address();
    const sent = await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' });
    expect(sent.status).toBe(201);
    expect(sent.body).toMatchObject({ email, role: 'advisor', fieldIds: [] });

    const [message] = await ctx.mailTo(email);
    expect(message.subject).toContain(farm.name);
    expect(message.html).toContain('Open the invitation');
    const path = linkIn(message, '/invitations/');

    const view = await request(ctx.app).get(`/api${path}`);
    expect(view.status).toBe(200);
    expect(view.body).toMatchObject({ email, role: 'advisor', farmName: farm.name, hasAccount: false });

    const advisor = request.agent(ctx.app);
    const accepted = await advisor.post(`/api${path}/accept`).send({ name: 'Ada Advisor', password: 'a good long password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ user: { email, name: 'Ada Advisor' }, farmId: farm.id });
    const farms = await advisor.get('/api/farms');
    expect(farms.body).toEqual([{ id: farm.id, name: farm.name, role: 'advisor' }]);
    expect((await advisor.get(`/api/farms/${farm.id}/fields`)).body.features).toHaveLength(3);

    const people = await farmer.get(`/api/farms/${farm.id}/people`);
    expect(people.body.people.map((p: { email: string; role: string }) => [p.email, p.role])).toContainEqual([email, 'advisor']);
    expect(people.body.invitations).toEqual([]);
  });

  it('a landowner invitation shows only the chosen fields', async () => {
    const { farm, farmer, ids } = await farmWithFields();
    const email = address();
    expect((await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'landowner', fieldIds: [ids[1]] })).status).toBe(201);
    const path = linkIn((await ctx.mailTo(email))[0], '/invitations/');
    const owner = request.agent(ctx.app);
    expect((await owner.post(`/api${path}/accept`).send({ name: 'Lee Landowner', password: 'a good long password' })).status).toBe(200);
    const fields = await owner.get(`/api/farms/${farm.id}/fields`);
    expect(fields.body.features.map((f: { id: number }) => f.id)).toEqual([ids[1]]);
    expect((await owner.get(`/api/fields/${ids[0]}`)).status).toBe(404);
  });

  it('a person with an account accepts with their own password and keeps their other farms', async () => {
    const { farm, farmer } = await farmWithFields();
    const other = await makeFarm(['advisor']);
    const advisor = other.users.advisor;
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email: advisor.email, role: 'advisor' });
    const path = linkIn((await ctx.mailTo(advisor.email))[0], '/invitations/');
    expect((await request(ctx.app).get(`/api${path}`)).body.hasAccount).toBe(true);
    const wrong = await request(ctx.app).post(`/api${path}/accept`).send({ password: 'not the password' });
    expect(wrong.status).toBe(401);
    const agent = request.agent(ctx.app);
    expect((await agent.post(`/api${path}/accept`).send({ password: TEST_PASSWORD })).status).toBe(200);
    expect((await agent.get('/api/farms')).body.map((f: { id: number }) => f.id).sort()).toEqual([farm.id, other.farm.id].sort());
  });

  it('a used link and an expired link no longer work, with a reason', async () => {
    const { farm, farmer } = await farmWithFields();
    const email = address();
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' });
    const path = linkIn((await ctx.mailTo(email))[0], '/invitations/');
    expect((await request(ctx.app).post(`/api${path}/accept`).send({ name: 'Once', password: 'a good long password' })).status).toBe(200);
    const again = await request(ctx.app).post(`/api${path}/accept`).send({ password: 'a good long password' });
    expect(again.status).toBe(410);
    expect(again.body.error).toBe('invitation_used');

    const late = address();
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email: late, role: 'advisor' });
    const latePath = linkIn((await ctx.mailTo(late))[0], '/invitations/');
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(tokenOf(latePath)) } });
    const expired = await request(ctx.app).get(`/api${latePath}`);
    expect(expired.status).toBe(410);
    expect(expired.body.error).toBe('invitation_expired');
    expect((await request(ctx.app).get('/api/invitations/not-a-real-token-at-all-xxxxxxxx')).status).toBe(404);
  });

  it('stores only the hash of the token, and a new invitation replaces the open one', async () => {
    const { farm, farmer } = await farmWithFields();
    const email = address();
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' });
    const first = linkIn((await ctx.mailTo(email))[0], '/invitations/');
    const row = await Invitation.findOne({ where: { email } });
    expect(row!.tokenHash).toBe(hashToken(tokenOf(first)));
    expect(row!.tokenHash).not.toContain(tokenOf(first));
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'landowner', fieldIds: [] }).expect(400);
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' }).expect(201);
    expect((await request(ctx.app).get(`/api${first}`)).body.error).toBe('invitation_cancelled');
  });

  it('only a farmer invites, changes roles or removes people', async () => {
    const { farm, users, memberships } = await makeFarm(['farmer', 'advisor', 'landowner']);
    const advisor = await signedIn(ctx.app, users.advisor);
    const landowner = await signedIn(ctx.app, users.landowner);
    expect((await advisor.post(`/api/farms/${farm.id}/invitations`).send({ email: address(), role: 'advisor' })).status).toBe(403);
    expect((await landowner.post(`/api/farms/${farm.id}/invitations`).send({ email: address(), role: 'advisor' })).status).toBe(403);
    expect((await advisor.patch(`/api/farms/${farm.id}/people/${memberships.landowner.id}`).send({ role: 'advisor' })).status).toBe(403);
    expect((await advisor.delete(`/api/farms/${farm.id}/people/${memberships.landowner.id}`)).status).toBe(403);
    expect((await advisor.get(`/api/farms/${farm.id}/people`)).status).toBe(200);
    expect((await landowner.get(`/api/farms/${farm.id}/people`)).status).toBe(403);
    const stranger = await signedIn(ctx.app, await makeUser());
    expect((await stranger.post(`/api/farms/${farm.id}/invitations`).send({ email: address(), role: 'advisor' })).status).toBe(404);
  });

  it('bad input names the field and sends nothing', async () => {
    const { farm, farmer } = await farmWithFields();
    const bad = await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email: 'not-an-address', role: 'advisor' });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^email/);
    const other = await makeFarm(['farmer']);
    const otherField = await (await signedIn(ctx.app, other.users.farmer)).post(`/api/farms/${other.farm.id}/fields`).send(squareFeature(-91.7, 42.3, 200, 'Theirs'));
    const foreign = await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email: address(), role: 'landowner', fieldIds: [otherField.body.id] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.message).toMatch(/^fieldIds/);
  });

  it('removal from a farm takes effect on the next request', async () => {
    const { farm, users, memberships } = await makeFarm(['farmer', 'advisor']);
    const farmer = await signedIn(ctx.app, users.farmer);
    const advisor = await signedIn(ctx.app, users.advisor);
    expect((await advisor.get(`/api/farms/${farm.id}`)).status).toBe(200);
    expect((await farmer.delete(`/api/farms/${farm.id}/people/${memberships.advisor.id}`)).status).toBe(204);
    expect((await advisor.get(`/api/farms/${farm.id}`)).status).toBe(404);
    expect((await farmer.delete(`/api/farms/${farm.id}/people/${memberships.farmer.id}`)).status).toBe(422);
  });

  it('a role change to landowner gives exactly the chosen fields', async () => {
    const { farm, farmer, ids } = await farmWithFields();
    const person = await makeUser();
    const email = person.email;
    await farmer.post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' });
    const path = linkIn((await ctx.mailTo(email))[0], '/invitations/');
    const agent = request.agent(ctx.app);
    await agent.post(`/api${path}/accept`).send({ password: TEST_PASSWORD }).expect(200);
    const people = (await farmer.get(`/api/farms/${farm.id}/people`)).body.people as { membershipId: number; email: string }[];
    const m = people.find((p) => p.email === email)!;
    const changed = await farmer.patch(`/api/farms/${farm.id}/people/${m.membershipId}`).send({ role: 'landowner', fieldIds: [ids[0], ids[2]] });
    expect(changed.status).toBe(200);
    expect(changed.body.people.find((p: { email: string }) => p.email === email)).toMatchObject({ role: 'landowner', fieldIds: [ids[0], ids[2]] });
    expect((await agent.get(`/api/farms/${farm.id}/fields`)).body.features.map((f: { id: number }) => f.id).sort()).toEqual([ids[0], ids[2]].sort());
  });
});
