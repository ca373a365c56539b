// Cross-site request forgery: changes are taken only from the product's own pages (Origin, else
// Referer, checked against PUBLIC_URL, ALLOWED_ORIGINS and the request's own host; OWASP CSRF
// Prevention Cheat Sheet, "Verifying origin with standard headers").
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { inject } from 'vitest';
import request from 'supertest';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { Field, initModels } from '../../server/models';
import { makeFarm, signedIn, squareFeature } from '../helpers/test-app';

const sequelize = createSequelize(inject('databaseUrl'));
initModels(sequelize);
const config = loadConfig({
  NODE_ENV: 'test',
  SESSION_SECRET: 'csrf-test-secret-csrf',
  PUBLIC_URL: 'https://fieldshed.example',
  ALLOWED_ORIGINS: 'https://staging.fieldshed.example',
  DATA_DIR: '/tmp/fieldshed-test-unused',
});
const app = createApp({ sequelize, config, clientDir: '/nonexistent' });
afterAll(() => sequelize.close());
const geojson = readFileSync(path.join('tests/fixtures/imports', 'three-fields.geojson'));

async function farmer() {
  const { farm, users } = await makeFarm(['farmer']);
  return { farmId: farm.id, agent: await signedIn(app, users.farmer) };
}

describe('cross-site requests', () => {
  it('refuses a cross-site multipart import that carries the session cookie with 403 and a message, storing nothing', async () => {
    const { farmId, agent } = await farmer();
    const res = await agent.post(`/api/farms/${farmId}/fields/import`).set('Origin', 'https://evil.example').attach('file', geojson, 'three.geojson');
    expect(res.status).toBe(403);
    expect(res.body.error).toBe('cross_site_request');
    expect(res.body.message).toMatch(/another site \(https:\/\/evil\.example\)/);
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });

  it('refuses cross-site JSON changes, by Origin, by Referer alone, and a hidden ("null") origin', async () => {
    const { farmId, agent } = await farmer();
    const post = () => agent.post(`/api/farms/${farmId}/fields`);
    expect((await post().set('Origin', 'https://evil.example').send(squareFeature(-93, 42))).status).toBe(403);
    expect((await post().set('Referer', 'https://evil.example/page').send(squareFeature(-93, 42))).status).toBe(403);
    expect((await post().set('Origin', 'null').send(squareFeature(-93, 42))).status).toBe(403);
    expect((await agent.delete(`/api/farms/${farmId}`).set('Origin', 'http://fieldshed.example.evil.example')).status).toBe(403);
    expect((await request(app).post('/api/auth/logout').set('Origin', 'https://evil.example')).status).toBe(403);
    expect(await Field.count({ where: { farmId } })).toBe(0);
  });

  it('takes changes from PUBLIC_URL, ALLOWED_ORIGINS and the server\'s own host', async () => {
    const { farmId, agent } = await farmer();
    const post = () => agent.post(`/api/farms/${farmId}/fields`);
    expect((await post().set('Origin', 'https://fieldshed.example').send(squareFeature(-93, 42))).status).toBe(201);
    expect((await post().set('Origin', 'https://staging.fieldshed.example').send(squareFeature(-93.01, 42))).status).toBe(201);
    const own = await post().set('Host', 'farm-server.local:8080').set('Origin', 'http://farm-server.local:8080').send(squareFeature(-93.02, 42));
    expect(own.status).toBe(201);
    const page = await post().set('Referer', 'https://fieldshed.example/farms/1').send(squareFeature(-93.03, 42));
    expect(page.status).toBe(201);
  });

  it('passes a request with neither Origin nor Referer (a script, not a browser page)', async () => {
    const { farmId, agent } = await farmer();
    expect((await agent.post(`/api/farms/${farmId}/fields/import`).attach('file', geojson, 'three.geojson')).status).toBe(201);
  });

  it('lets reads through from anywhere (they change nothing)', async () => {
    const { farmId, agent } = await farmer();
    expect((await agent.get(`/api/farms/${farmId}/fields`).set('Origin', 'https://evil.example')).status).toBe(200);
  });
});
