import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { makeTestApp, makeUser, TEST_PASSWORD, signedIn } from '../helpers/test-app';

const ctx = makeTestApp();
afterAll(() => ctx.close());

describe('sign-in', () => {
  it('answers health with the database up', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, db: true });
  });

  it('logs in with the right password and sets an httpOnly SameSite cookie', async () => {
    const u = await makeUser();
    const res = await request(ctx.app).post('/api/auth/login').send({ email: u.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: u.id, email: u.email, units: 'ha' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/fieldshed_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('refuses a wrong password with 401 and the same message as an unknown e-mail', async () => {
    const u = await makeUser();
    const a = await request(ctx.app).post('/api/auth/login').send({ email: u.email, password: 'wrong password' });
    const b = await request(ctx.app).post('/api/auth/login').send({ email: 'nobody@example.test', password: 'wrong password' });
    expect(a.status).toBe(401);
    expect(b.status).toBe(401);
    expect(a.body.error).toBe('bad_credentials');
    expect(a.body.message).toBe(b.body.message);
  });

  it('names the field when the login body is invalid', async () => {
    const res = await request(ctx.app).post('/api/auth/login').send({ email: 'not-an-email', password: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^email:/);
  });

  it('rate-limits repeated failed logins for one address and e-mail', async () => {
    const email = `limit-${randomUUID()}@example.test`;
    let last = 0;
    for (let i = 0; i < 22; i++) last = (await request(ctx.app).post('/api/auth/login').send({ email, password: 'nope' })).status;
    expect(last).toBe(429);
  });

  it('tells who is signed in, changes units, and forgets the session on logout', async () => {
    const agent = await signedIn(ctx.app, await makeUser());
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const p = await agent.patch('/api/auth/me').send({ units: 'ac' });
    expect(p.body.user.units).toBe('ac');
    expect((await agent.patch('/api/auth/me').send({ units: 'furlongs' })).status).toBe(400);
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('answers 401 to every farm route without a session, and a forged cookie is not a session', async () => {
    expect((await request(ctx.app).get('/api/farms')).status).toBe(401);
    const res = await request(ctx.app).get('/api/farms').set('Cookie', 'fieldshed_session=eyJhbGciOiJub25lIn0.eyJzdWIiOiIxIn0.');
    expect(res.status).toBe(401);
    expect(res.body).toMatchObject({ error: 'not_signed_in' });
  });

  it('sends security headers', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toBeDefined();
  });
});
