// Notices by mail on a season plan's review, reminders before planned work and the farmer's digest
// of an advisor's changes, read back from the local fake mail server.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { Membership, OutgoingMail } from '../../server/models';
import { sendActionReminders } from '../../server/services/notices/action-reminders';
import { sendAdvisorDigests } from '../../server/services/notices/advisor-digest';
import { makeFarm, makeUser, signedIn, squareFeature } from '../helpers/test-app';
import { PUBLIC_URL, startMailApp } from '../helpers/mail-app';

let ctx: Awaited<ReturnType<typeof startMailApp>>;
beforeAll(async () => {
  ctx = await startMailApp();
});
afterAll(() => ctx?.close());

async function planFarm() {
  const made = await makeFarm(['farmer', 'advisor', 'landowner']);
  const bystander = await makeUser({ name: 'Other owner' });
  await Membership.create({ userId: bystander.id, farmId: made.farm.id, role: 'landowner' });
  const farmer = await signedIn(ctx.app, made.users.farmer);
  const rentedFeature = squareFeature(-91.78, 42.31, 200, 'Rented');
  (rentedFeature.properties as Record<string, unknown>).ownerMembershipId = made.memberships.landowner.id;
  const rented = (await farmer.post(`/api/farms/${made.farm.id}/fields`).send(rentedFeature)).body.id as number;
  const plan = (await farmer.post(`/api/farms/${made.farm.id}/plans`).send({ season: '2027' })).body as { id: number };
  const added = await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: rented, treatment: 'no-till', quantity: 4, unit: 'ha', cost: 180, plannedOn: '2027-04-20' });
  expect(added.status).toBe(201);
  return { ...made, bystander, farmer, advisor: await signedIn(ctx.app, made.users.advisor), planId: plan.id, version: added.body.plan.version as number, rented };
}

describe('plan notices', () => {
  it('a plan submitted by the farmer produces the advisor notice, with a link to the plan', async () => {
    const f = await planFarm();
    expect((await f.farmer.post(`/api/plans/${f.planId}/submit`).send({ version: f.version })).status).toBe(200);
    const [notice] = await ctx.mailTo(f.users.advisor.email);
    expect(notice.subject).toBe(`Season plan 2027 of ${f.farm.name} is ready for your review`);
    expect(notice.text).toContain(`${PUBLIC_URL}/farms/${f.farm.id}/plan?season=2027`);
    expect(notice.text).toContain('Test farmer has submitted');
    // Nobody else is told, and the farmer who acted gets nothing.
    expect(await OutgoingMail.count({ where: { farmId: f.farm.id } })).toBe(1);
  });

  it('a returned plan tells the farmer with the note; an approved one tells the farmer and the plan’s landowner only', async () => {
    const f = await planFarm();
    const submitted = await f.farmer.post(`/api/plans/${f.planId}/submit`).send({ version: f.version });
    const returned = await f.advisor.post(`/api/plans/${f.planId}/return`).send({ version: submitted.body.version, comment: 'Price the drill hire again.' });
    expect(returned.status).toBe(200);
    const [back] = await ctx.mailTo(f.users.farmer.email);
    expect(back.subject).toContain('came back with notes');
    expect(back.text).toContain('Price the drill hire again.');

    const again = await f.farmer.post(`/api/plans/${f.planId}/submit`).send({ version: returned.body.version });
    expect((await f.advisor.post(`/api/plans/${f.planId}/approve`).send({ version: again.body.version })).status).toBe(200);
    const farmerMail = await ctx.mailTo(f.users.farmer.email, 2);
    expect(farmerMail[0].subject).toContain('is approved');
    const [ownerMail] = await ctx.mailTo(f.users.landowner.email);
    expect(ownerMail.text).toContain('fields that are yours');
    const bystander = await request(ctx.app).get('/api/dev/mailbox').query({ to: f.bystander.email });
    expect(bystander.body).toEqual([]);
  });

  it('an advisor who turned plan notices off gets none', async () => {
    const f = await planFarm();
    await f.advisor.put('/api/auth/me/notices').send({ 'plan-submitted': false }).expect(200);
    await f.farmer.post(`/api/plans/${f.planId}/submit`).send({ version: f.version }).expect(200);
    expect(await OutgoingMail.count({ where: { farmId: f.farm.id, kind: 'plan-submitted' } })).toBe(0);
  });
});

describe('reminders and the daily digest', () => {
  it('reminds the farmer a set number of days before a planned action, once', async () => {
    const f = await planFarm();
    await f.farmer.post(`/api/plans/${f.planId}/submit`).send({ version: f.version }).expect(200);
    const now = new Date('2027-04-13T06:00:00Z');
    expect(await sendActionReminders(ctx.sequelize, { reminderDays: 7 }, now)).toBeGreaterThanOrEqual(1);
    await sendActionReminders(ctx.sequelize, { reminderDays: 7 }, now);
    const mail = await OutgoingMail.findAll({ where: { farmId: f.farm.id, kind: 'action-reminder' } });
    expect(mail).toHaveLength(1);
    const [caught] = await ctx.mailTo(f.users.farmer.email);
    expect(caught.subject).toBe(`Coming up on ${f.farm.name} in 7 days`);
    expect(caught.text).toContain('2027-04-20: No-till on Rented');
  });

  it('sends the farmer a digest of what the advisor changed the day before', async () => {
    const f = await planFarm();
    // The advisor's change (a comment on the plan) is recorded now; the digest for today covers it tomorrow.
    await f.advisor.post(`/api/plans/${f.planId}/comments`).send({ body: 'Looks good so far.' }).expect(201);
    const tomorrow = new Date(Date.now() + 24 * 3600 * 1000);
    await sendAdvisorDigests(ctx.sequelize, { publicUrl: PUBLIC_URL }, tomorrow);
    const [digest] = await ctx.mailTo(f.users.farmer.email);
    expect(digest.subject).toContain(`Changes by your advisor on ${f.farm.name}`);
    expect(digest.text).toContain('Test advisor: comments on the season plan, created (1 time)');
  });
});
