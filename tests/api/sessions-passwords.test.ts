// Sessions end at once (sign-out, a new password); "forgot password" follows the mailed link.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { PasswordReset } from '../../server/models';
import { hashToken } from '../../server/services/one-time-token';
import { makeUser, signedIn, TEST_PASSWORD } from '../helpers/test-app';
import { linkIn, startMailApp } from '../helpers/mail-app';

let ctx: Awaited<ReturnType<typeof startMailApp>>;
beforeAll(async () => {
  ctx = await startMailApp();
});
afterAll(() => ctx?.close());

const tokenOf = (path: string) => decodeURIComponent(new URL(path, 'http://x').searchParams.get('token')!);

describe('sessions and passwords', () => {
  it('sign-out ends the session at once, even for a copy of the cookie', async () => {
    const user = await makeUser();
    const agent = await signedIn(ctx.app, user);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    const cookie = me.request.cookies;
    const copy = request(ctx.app);
    expect((await copy.get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await copy.get('/api/auth/me').set('Cookie', cookie)).status).toBe(401);
    expect((await copy.get('/api/farms').set('Cookie', cookie)).status).toBe(401);
  });

  it('signing out on one device leaves the other signed in', async () => {
    const user = await makeUser();
    const phone = await signedIn(ctx.app, user);
    const laptop = await signedIn(ctx.app, user);
    await phone.post('/api/auth/logout').expect(204);
    expect((await laptop.get('/api/auth/me')).status).toBe(200);
  });

  it('a reset signs the user in with the new password and the old session stops working', async () => {
    const user = await makeUser();
    const old = await signedIn(ctx.app, user);
    const asked = await request(ctx.app).post('/api/auth/forgot').send({ email: user.email.toUpperCase() });
    expect(asked.status).toBe(202);
    const [message] = await ctx.mailTo(user.email);
    expect(message.subject).toBe('Choose a new Fieldshed password');
    const path = linkIn(message, '/reset-password');

    const fresh = request.agent(ctx.app);
    const reset = await fresh.post('/api/auth/reset').send({ token: tokenOf(path), password: 'a brand new password' });
    expect(reset.status).toBe(200);
    expect(reset.body.user.email).toBe(user.email);
    expect((await fresh.get('/api/auth/me')).status).toBe(200);
    expect((await old.get('/api/auth/me')).status).toBe(401);
    expect((await request(ctx.app).post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(401);
    expect((await request(ctx.app).post('/api/auth/login').send({ email: user.email, password: 'a brand new password' })).status).toBe(200);

    const again = await request(ctx.app).post('/api/auth/reset').send({ token: tokenOf(path), password: 'yet another password' });
    expect(again.status).toBe(410);
    expect(again.body.error).toBe('reset_used');
  });

  it('forgot password answers the same for an unknown address and sends nothing', async () => {
    const known = await makeUser();
    const unknown = `nobody-${randomUUID()}@example.test`;
    const a = await request(ctx.app).post('/api/auth/forgot').send({ email: known.email });
    const b = await request(ctx.app).post('/api/auth/forgot').send({ email: unknown });
    expect([a.status, a.body]).toEqual([b.status, b.body]);
    await ctx.mailTo(known.email);
    const caught = await request(ctx.app).get('/api/dev/mailbox').query({ to: unknown });
    expect(caught.body).toEqual([]);
  });

  it('an expired reset link does not work', async () => {
    const user = await makeUser();
    await request(ctx.app).post('/api/auth/forgot').send({ email: user.email }).expect(202);
    const path = linkIn((await ctx.mailTo(user.email))[0], '/reset-password');
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(tokenOf(path)) } });
    const res = await request(ctx.app).post('/api/auth/reset').send({ token: tokenOf(path), password: 'a brand new password' });
    expect(res.status).toBe(410);
    expect(res.body.error).toBe('reset_expired');
  });

  it('changing the password keeps this session and ends the others', async () => {
    const user = await makeUser();
    const here = await signedIn(ctx.app, user);
    const elsewhere = await signedIn(ctx.app, user);
    const wrong = await here.post('/api/auth/password').send({ currentPassword: 'wrong', newPassword: 'a brand new password' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.message).toMatch(/^currentPassword/);
    const short = await here.post('/api/auth/password').send({ currentPassword: TEST_PASSWORD, newPassword: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.message).toMatch(/^newPassword/);
    expect((await here.post('/api/auth/password').send({ currentPassword: TEST_PASSWORD, newPassword: 'a brand new password' })).status).toBe(204);
    expect((await here.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
  });

  it('each person turns each kind of notice on or off', async () => {
    const agent = await signedIn(ctx.app, await makeUser());
    const all = await agent.get('/api/auth/me/notices');
    expect(all.body).toHaveLength(5);
    expect(all.body.every((n: { enabled: boolean }) => n.enabled)).toBe(true);
    const put = await agent.put('/api/auth/me/notices').send({ 'plan-submitted': false });
    expect(put.body.find((n: { kind: string }) => n.kind === 'plan-submitted').enabled).toBe(false);
    expect((await agent.put('/api/auth/me/notices').send({ 'no-such-kind': true })).status).toBe(400);
  });
});
