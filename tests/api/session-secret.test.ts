// The session secret: never a value from the repository; kept in DATA_DIR when none is configured.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import jwt from 'jsonwebtoken';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { inject } from 'vitest';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels, UserSession } from '../../server/models';
import { hashToken } from '../../server/services/one-time-token';
import { makeUser } from '../helpers/test-app';

const dataDir = mkdtempSync(path.join(tmpdir(), 'fieldshed-secret-'));
const other = mkdtempSync(path.join(tmpdir(), 'fieldshed-secret-'));
const sequelize = createSequelize(inject('databaseUrl'));
initModels(sequelize);
afterAll(async () => {
  await sequelize.close();
  for (const dir of [dataDir, other]) rmSync(dir, { recursive: true, force: true });
});

describe('session secret', () => {
  it('generates a random secret on first start and keeps it in DATA_DIR with mode 0600', () => {
    const first = loadConfig({ NODE_ENV: 'development', DATA_DIR: dataDir });
    const file = path.join(dataDir, 'session-secret');
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(first.sessionSecret.length).toBeGreaterThanOrEqual(40);
    expect(readFileSync(file, 'utf8').trim()).toBe(first.sessionSecret);
    expect(loadConfig({ NODE_ENV: 'development', DATA_DIR: dataDir }).sessionSecret).toBe(first.sessionSecret);
    expect(loadConfig({ NODE_ENV: 'development', DATA_DIR: other }).sessionSecret).not.toBe(first.sessionSecret);
  });

  it('refuses to start in production without SESSION_SECRET', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', DATA_DIR: dataDir })).toThrow(/SESSION_SECRET: required in production/);
  });

  it('refuses a token signed with the fixed secret that used to be in the repository', async () => {
    const config = loadConfig({ NODE_ENV: 'development', DATA_DIR: dataDir });
    const app = createApp({ sequelize, config, clientDir: '/nonexistent' });
    const user = await makeUser();
    // A live session row, so only the signature stands between the forger and the account.
    const sid = 'a-session-token-the-forger-chose';
    await UserSession.create({ userId: user.id, tokenHash: hashToken(sid), expiresAt: new Date(Date.now() + 3600_000) });
    const forged = jwt.sign({ sub: String(user.id), sid }, 'fieldshed-development-secret-not-for-production', { algorithm: 'HS256' });
    const res = await request(app).get('/api/auth/me').set('Cookie', `fieldshed_session=${forged}`);
    expect(res.status).toBe(401);
    expect(res.body.error).toBe('not_signed_in');
  });
});
