// While the database cannot be reached, every API route answers 503 with Retry-After (RFC 9110
// §15.6.4 and §10.2.3), not a 500: the client and load balancers can tell "wait" from "broken".
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import jwt from 'jsonwebtoken';
import { createServer } from 'node:net';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';

/** A loopback port nothing listens on: connections to it are refused at once. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

const sequelize = createSequelize(`postgres://fieldshed@127.0.0.1:${await closedPort()}/fieldshed`);
initModels(sequelize);
const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'db-down-secret-db-down', DATA_DIR: '/tmp/fieldshed-test-unused' });
const app = createApp({ sequelize, config, clientDir: '/nonexistent' });
afterAll(() => sequelize.close());
// A correctly signed cookie, so the request gets as far as the database.
const cookie = `fieldshed_session=${jwt.sign({ sub: '1', sid: 'some-session' }, config.sessionSecret, { algorithm: 'HS256' })}`;

describe('database down', () => {
  const routes: [string, string, unknown?][] = [
    ['get', '/api/farms'],
    ['get', '/api/auth/me'],
    ['get', '/api/farms/1/fields'],
    ['post', '/api/farms/1/fields', { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [[[0, 0], [0.001, 0], [0.001, 0.001], [0, 0]]] } }],
    ['patch', '/api/fields/1', { version: 0, name: 'x' }],
    ['get', '/api/jobs/00000000-0000-4000-8000-000000000000'],
  ];

  it.each(routes)('answers %s %s with 503 and Retry-After, not 500', async (method, path, body) => {
    const req = (request(app) as unknown as Record<string, (p: string) => request.Test>)[method](path).set('Cookie', cookie);
    const res = body ? await req.send(body as object) : await req;
    expect(res.status).toBe(503);
    expect(res.headers['retry-after']).toBe('5');
    expect(res.body).toEqual({ error: 'database_unavailable', message: expect.stringMatching(/database cannot be reached/) });
  });

  it('answers sign-in, registration and "forgot password" with 503 too', async () => {
    for (const [path, body] of [
      ['/api/auth/login', { email: 'someone@example.test', password: 'whatever' }],
      ['/api/auth/register', { email: 'someone@example.test', password: 'a long password', name: 'A', farmName: 'B' }],
      ['/api/auth/forgot', { email: 'someone@example.test' }],
    ] as const) {
      const res = await request(app).post(path).send(body);
      expect(res.status, path).toBe(503);
      expect(res.headers['retry-after']).toBe('5');
    }
  });

  it('reports the database down on /api/health with Retry-After', async () => {
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ ok: false, db: false });
    expect(res.headers['retry-after']).toBe('5');
  });
});
