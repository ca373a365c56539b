// Accounts under abuse: answers that do not tell whether an address has an account, limits keyed
// on the address as a person means it (trim, NFKC, lower case) and on the network address, and the
// password rules (NIST SP 800-63B §5.1.1.2; bcrypt reads 72 bytes, Provos & Mazières 1999).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { RegistrationRequest } from '../../server/models';
import { makeUser } from '../helpers/test-app';
import { linkIn, startMailApp } from '../helpers/mail-app';

let ctx: Awaited<ReturnType<typeof startMailApp>>;
beforeAll(async () => {
  ctx = await startMailApp();
});
afterAll(() => ctx?.close());

const tokenOf = (path: string) => decodeURIComponent(new URL(path, 'http://x').searchParams.get('token')!);
const newAccount = (email: string, password = 'a long password') => ({ email, password, name: 'New Grower', farmName: 'Hilltop' });
// Each test its own network address, so the per-network limits of one test do not touch another.
const fromIp = () => `10.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;

describe('accounts: nothing tells whether an address has an account', () => {
  it('answers registration for an address in use exactly as for a new one, and mails the owner that someone tried', async () => {
    const owner = await makeUser();
    const ip = fromIp();
    const taken = await request(ctx.app).post('/api/auth/register').set('X-Forwarded-For', ip).send(newAccount(` ${owner.email.toUpperCase()}`));
    const fresh = await request(ctx.app).post('/api/auth/register').set('X-Forwarded-For', ip).send(newAccount(`new-${randomUUID()}@example.test`));
    expect(taken.status).toBe(202);
    expect(fresh.status).toBe(202);
    expect(taken.body).toEqual(fresh.body);
    expect(taken.headers['set-cookie']).toBeUndefined();
    const [notice] = await ctx.mailTo(owner.email);
    expect(notice.subject).toBe('Someone tried to create a Fieldshed account with your address');
    expect(notice.text).toMatch(/nothing was changed/);
  });

  it('creates the account and its farm only when the mailed link is used, once', async () => {
    const email = `new-${randomUUID()}@example.test`;
    expect((await request(ctx.app).post('/api/auth/register').set('X-Forwarded-For', fromIp()).send(newAccount(email))).status).toBe(202);
    expect((await request(ctx.app).post('/api/auth/login').send({ email, password: 'a long password' })).status).toBe(401);
    const [mail] = await ctx.mailTo(email);
    expect(mail.subject).toBe('Finish creating your Fieldshed account');
    const token = tokenOf(linkIn(mail, '/confirm-account'));
    const agent = request.agent(ctx.app);
    const done = await agent.post('/api/auth/register/confirm').send({ token });
    expect(done.status).toBe(201);
    expect(done.body.user.email).toBe(email);
    expect((await agent.get('/api/farms')).body).toEqual([{ id: expect.any(Number), name: 'Hilltop', role: 'farmer' }]);
    const again = await request(ctx.app).post('/api/auth/register/confirm').send({ token });
    expect(again.status).toBe(410);
    expect(again.body.message).toMatch(/used/);
  });

  it('answers eight simultaneous registrations of one address without a 500, and mails it at most three times', async () => {
    const email = `burst-${randomUUID()}@example.test`;
    const ip = fromIp();
    const answers = await Promise.all(Array.from({ length: 8 }, () => request(ctx.app).post('/api/auth/register').set('X-Forwarded-For', ip).send(newAccount(email))));
    expect(answers.map((a) => a.status)).toEqual(Array(8).fill(202));
    expect(await RegistrationRequest.count({ where: { email } })).toBe(3);
  });
});

describe('accounts: limits on the normalised address and the network address', () => {
  it('counts sign-in attempts per address across spaces, case, full-width letters and networks', async () => {
    const user = await makeUser();
    const [local, domain] = user.email.split('@');
    // NFKC folds full-width letters (U+FF21…) to ASCII.
    const fullWidth = [...local.slice(0, 1)].map((c) => String.fromCodePoint(c.toUpperCase().codePointAt(0)! - 0x41 + 0xff21)).join('') + local.slice(1);
    const spellings = [user.email, `  ${user.email}`, user.email.toUpperCase(), `${fullWidth}@${domain}`];
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++) {
      const res = await request(ctx.app).post('/api/auth/login').set('X-Forwarded-For', fromIp()).send({ email: spellings[i % spellings.length], password: 'wrong password' });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 20)).toEqual(Array(20).fill(401));
    expect(statuses[20]).toBe(429);
    const right = await request(ctx.app).post('/api/auth/login').set('X-Forwarded-For', fromIp()).send({ email: user.email, password: 'correct horse battery' });
    expect(right.status).toBe(429);
    expect(right.body.message).toMatch(/this address/);
  });

  it('counts sign-in attempts per network address whatever the address typed', async () => {
    const ip = fromIp();
    let last = 0;
    for (let i = 0; i < 201; i++) last = (await request(ctx.app).post('/api/auth/login').set('X-Forwarded-For', ip).send({ password: 'x' })).status;
    expect(last).toBe(429);
  });

  it('limits registrations per network address', async () => {
    const ip = fromIp();
    let last = 0;
    for (let i = 0; i < 21; i++) last = (await request(ctx.app).post('/api/auth/register').set('X-Forwarded-For', ip).send({})).status;
    expect(last).toBe(429);
  });

  it('limits "forgot password" per address across networks', async () => {
    const email = `forgot-${randomUUID()}@example.test`;
    let last = 0;
    for (let i = 0; i < 11; i++) last = (await request(ctx.app).post('/api/auth/forgot').set('X-Forwarded-For', fromIp()).send({ email: i % 2 ? email.toUpperCase() : ` ${email}` })).status;
    expect(last).toBe(429);
  });
});

describe('accounts: password rules', () => {
  const refused = async (password: string) => {
    const res = await request(ctx.app).post('/api/auth/register').set('X-Forwarded-For', fromIp()).send(newAccount(`pw-${randomUUID()}@example.test`, password));
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('invalid_input');
    return res.body.message as string;
  };

  it('refuses a password shorter than 10 characters', async () => {
    expect(await refused('short one')).toBe('password: password must be at least 10 characters');
  });

  it('refuses a repeated-character password', async () => {
    expect(await refused('aaaaaaaaaa')).toMatch(/^password: .*at least 4 different characters/);
    expect(await refused('abababababab')).toMatch(/at least 4 different characters/);
  });

  it('refuses a common password from the shipped list (SecLists top 10,000), whatever its case', async () => {
    expect(await refused('Password123')).toMatch(/^password: .*most common passwords/);
    expect(await refused('qwertyuiop')).toMatch(/most common passwords/);
  });

  it('refuses a password over 72 bytes with a 400 naming the limit, counting bytes not characters', async () => {
    expect(await refused('correct horse battery staple '.repeat(3))).toMatch(/^password: password must be at most 72 bytes/);
    // 37 characters, 74 bytes in UTF-8.
    expect(await refused('é'.repeat(36) + 'x')).toMatch(/72 bytes/);
  });
});
