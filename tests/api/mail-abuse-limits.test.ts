// Abuse limits on mail: per sender, per address (both counted in the database, so they hold across
// API instances) and per IP (in memory, per instance). The limits are this product's own choice.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { Invitation } from '../../server/models';
import { INVITES_PER_ADDRESS_PER_DAY, INVITES_PER_SENDER_PER_HOUR, RESETS_PER_ACCOUNT_PER_HOUR, RESETS_PER_IP } from '../../server/services/people/abuse-limits';
import { makeFarm, makeUser, signedIn } from '../helpers/test-app';
import { startMailApp } from '../helpers/mail-app';

let ctx: Awaited<ReturnType<typeof startMailApp>>;
beforeAll(async () => {
  ctx = await startMailApp();
});
afterAll(() => ctx?.close());

describe('abuse limits', () => {
  it('limits invitations to one address per day, across farms', async () => {
    const email = `target-${randomUUID()}@example.test`;
    for (let i = 0; i < INVITES_PER_ADDRESS_PER_DAY; i++) {
      const { farm, users } = await makeFarm(['farmer']);
      expect((await (await signedIn(ctx.app, users.farmer)).post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' })).status).toBe(201);
    }
    const { farm, users } = await makeFarm(['farmer']);
    const res = await (await signedIn(ctx.app, users.farmer)).post(`/api/farms/${farm.id}/invitations`).send({ email, role: 'advisor' });
    expect(res.status).toBe(429);
    expect(res.body.error).toBe('too_many_invitations');
  });

  it('limits invitations per sender per hour', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    // Rows as if already sent this hour, so the test does not send twenty mails.
    await Invitation.bulkCreate(
      Array.from({ length: INVITES_PER_SENDER_PER_HOUR }, () => ({ farmId: farm.id, email: `x-${randomUUID()}@example.test`, role: 'advisor' as const, tokenHash: randomUUID(), invitedBy: users.farmer.id, expiresAt: new Date(Date.now() + 3600_000) })),
    );
    const res = await (await signedIn(ctx.app, users.farmer)).post(`/api/farms/${farm.id}/invitations`).send({ email: `y-${randomUUID()}@example.test`, role: 'advisor' });
    expect(res.status).toBe(429);
    expect(res.body.message).toContain(String(INVITES_PER_SENDER_PER_HOUR));
  });

  it('limits reset mails per account without telling whether the account exists', async () => {
    const user = await makeUser();
    for (let i = 0; i < RESETS_PER_ACCOUNT_PER_HOUR + 1; i++) {
      expect((await request(ctx.app).post('/api/auth/forgot').send({ email: user.email })).status).toBe(202);
    }
    const caught = await ctx.mailTo(user.email, RESETS_PER_ACCOUNT_PER_HOUR);
    await new Promise((r) => setTimeout(r, 500));
    expect((await request(ctx.app).get('/api/dev/mailbox').query({ to: user.email })).body).toHaveLength(caught.length);
    expect(caught).toHaveLength(RESETS_PER_ACCOUNT_PER_HOUR);
  });

  it('limits reset requests per network address', async () => {
    // A fresh app: its per-IP counters start at zero.
    const own = await startMailApp();
    try {
      for (let i = 0; i < RESETS_PER_IP; i++) await request(own.app).post('/api/auth/forgot').send({ email: `n-${i}@example.test` }).expect(202);
      const res = await request(own.app).post('/api/auth/forgot').send({ email: 'another@example.test' });
      expect(res.status).toBe(429);
    } finally {
      await own.close();
    }
  });
});
