// GET /api/places: place search by name through the geocoding service (here the local fake with
// its invented gazetteer), and what a person is told when the service is off, down or confused.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import request from 'supertest';
import { createServer, type Server } from 'node:http';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { startFakeGeocoder, type FakeGeocoder } from '../../server/services/places/fake-geocoder-server';
import { PLACE_SEARCHES_PER_MINUTE } from '../../server/routes/places.routes';
import { makeUser, signedIn } from '../helpers/test-app';

const sequelize = createSequelize(inject('databaseUrl'));
initModels(sequelize);
const appWith = (env: Record<string, string>) =>
  createApp({ sequelize, config: loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'places-secret-places', ...env }), clientDir: '/nonexistent' });

/** A port nothing listens on: a server started and closed again. */
async function closedPort(): Promise<number> {
  const s = createServer();
  await new Promise<void>((r) => s.listen(0, '127.0.0.1', () => r()));
  const { port } = s.address() as { port: number };
  await new Promise<void>((r) => s.close(() => r()));
  return port;
}

let fake: FakeGeocoder;
let broken: Server;
let brokenUrl: string;
beforeAll(async () => {
  fake = await startFakeGeocoder();
  // A service that answers every search with a server error page.
  broken = createServer((_req, res) => res.writeHead(500, { 'content-type': 'text/html' }).end('<h1>oops</h1>'));
  await new Promise<void>((r) => broken.listen(0, '127.0.0.1', () => r()));
  brokenUrl = `http://127.0.0.1:${(broken.address() as { port: number }).port}`;
});
afterAll(async () => {
  await fake.close();
  broken.close();
  await sequelize.close();
});

describe('GET /api/places', () => {
  it('answers only signed-in people', async () => {
    const res = await request(appWith({ GEOCODER_URL: fake.url })).get('/api/places?q=Marrowby');
    expect(res.status).toBe(401);
    expect(res.body.error).toBe('not_signed_in');
  });

  it('finds a place by name, with where it is as [lng, lat]', async () => {
    const app = appWith({ GEOCODER_URL: fake.url });
    const agent = await signedIn(app, await makeUser());
    const before = fake.requests();
    const res = await agent.get('/api/places').query({ q: 'marrowby' });
    expect(res.status).toBe(200);
    expect(res.body.places[0]).toEqual({ name: 'Marrowby', detail: 'Sedge County', position: [-91.805, 42.342] });
    expect(fake.requests()).toBe(before + 1);
  });

  it('finds an address by its words, the farm first', async () => {
    const agent = await signedIn(appWith({ GEOCODER_URL: fake.url }), await makeUser());
    const res = await agent.get('/api/places').query({ q: '1420 Quillan Road' });
    expect(res.status).toBe(200);
    expect(res.body.places).toHaveLength(1);
    expect(res.body.places[0].name).toBe('Alder Run Farm');
    expect(res.body.places[0].detail).toBe('1420 Quillan Road, Quillan, Sedge County');
  });

  it('answers an empty list when nothing matches', async () => {
    const agent = await signedIn(appWith({ GEOCODER_URL: fake.url }), await makeUser());
    const res = await agent.get('/api/places').query({ q: 'Nowhere Special' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ places: [] });
  });

  it('refuses a missing or too short search, naming q', async () => {
    const agent = await signedIn(appWith({ GEOCODER_URL: fake.url }), await makeUser());
    const missing = await agent.get('/api/places');
    expect(missing.status).toBe(400);
    expect(missing.body.error).toBe('invalid_input');
    expect(missing.body.message).toMatch(/^q: /);
    const short = await agent.get('/api/places').query({ q: ' a ' });
    expect(short.status).toBe(400);
    expect(short.body.message).toBe('q: type at least 2 letters of a place name or an address');
    const long = await agent.get('/api/places').query({ q: 'x'.repeat(201) });
    expect(long.status).toBe(400);
    expect(long.body.message).toMatch(/^q: keep the search under 200/);
  });

  it('says 503 with a clear message when the service cannot be reached', async () => {
    const agent = await signedIn(appWith({ GEOCODER_URL: `http://127.0.0.1:${await closedPort()}` }), await makeUser());
    const res = await agent.get('/api/places').query({ q: 'Marrowby' });
    expect(res.status).toBe(503);
    expect(res.body.error).toBe('geocoder_unreachable');
    expect(res.body.message).toMatch(/could not be reached.*coordinates still work/);
  });

  it('says 502 when the service answers with an error', async () => {
    const agent = await signedIn(appWith({ GEOCODER_URL: brokenUrl }), await makeUser());
    const res = await agent.get('/api/places').query({ q: 'Marrowby' });
    expect(res.status).toBe(502);
    expect(res.body.error).toBe('geocoder_failed');
    expect(res.body.message).toMatch(/could not be read/);
  });

  it('says 503 when no service is set up', async () => {
    const agent = await signedIn(appWith({}), await makeUser());
    const res = await agent.get('/api/places').query({ q: 'Marrowby' });
    expect(res.status).toBe(503);
    expect(res.body.error).toBe('place_search_off');
  });

  it(`stops a person after ${PLACE_SEARCHES_PER_MINUTE} searches in a minute`, async () => {
    const agent = await signedIn(appWith({ GEOCODER_URL: fake.url }), await makeUser());
    for (let i = 0; i < PLACE_SEARCHES_PER_MINUTE; i++) expect((await agent.get('/api/places').query({ q: 'Quillan' })).status).toBe(200);
    const res = await agent.get('/api/places').query({ q: 'Quillan' });
    expect(res.status).toBe(429);
    expect(res.body.error).toBe('too_many_requests');
  });
});

describe('GET /api/config and the basemaps', () => {
  it('lists the configured basemaps in order and lets their hosts through the Content-Security-Policy', async () => {
    const app = appWith({
      STREET_TILE_URL: 'https://tile.openstreetmap.org/{z}/{x}/{y}.png',
      TOPO_TILE_URL: 'https://{s}.tile.opentopomap.org/{z}/{x}/{y}.png',
      TILE_URL: 'https://imagery.example.test/tiles/{z}/{y}/{x}.jpg',
      TILE_ATTRIBUTION: '© Example imagery',
    });
    const res = await request(app).get('/api/config');
    expect(res.body.basemaps.map((b: { key: string; name: string }) => [b.key, b.name])).toEqual([
      ['streets', 'Roads and places'],
      ['topo', 'Hills and contours'],
      ['imagery', 'Aerial photos'],
    ]);
    expect(res.body.basemaps[0].attribution).toBe('© OpenStreetMap contributors');
    const imgSrc = /img-src ([^;]*)/.exec(res.headers['content-security-policy'])![1].split(' ');
    expect(imgSrc).toEqual(expect.arrayContaining(['https://tile.openstreetmap.org', 'https://*.tile.opentopomap.org', 'https://imagery.example.test']));
  });

  it('leaves the public tile services out under NODE_ENV=test unless named, and "off" leaves a base out', async () => {
    expect((await request(appWith({})).get('/api/config')).body.basemaps).toEqual([]);
    const res = await request(appWith({ STREET_TILE_URL: 'off', TOPO_TILE_URL: 'http://127.0.0.1:9/{z}/{x}/{y}.png' })).get('/api/config');
    expect(res.body.basemaps.map((b: { key: string }) => b.key)).toEqual(['topo']);
  });

  it('refuses a tile URL without {z}, {x} and {y}, naming the setting', () => {
    expect(() => loadConfig({ NODE_ENV: 'test', TILE_URL: 'https://imagery.example.test/tiles.png' })).toThrow(/TILE_URL must be an http\(s\) URL with \{z\}, \{x\} and \{y\}/);
  });
});
