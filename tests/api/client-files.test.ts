// The client build as the browser gets it: the brotli or gzip copy made at build time when the
// browser accepts one, the plain file otherwise; hashed assets cached for a year, the rest
// revalidated; client-side routes answered with the app shell.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import request from 'supertest';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createSequelize } from '../../server/db/sequelize';
import { initModels } from '../../server/models';

const script = `export const hello = ${JSON.stringify('x'.repeat(4000))};\n`;
let dist: string;
let app: Express;
let sequelize: Sequelize;

beforeAll(() => {
  dist = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-dist-'));
  mkdirSync(path.join(dist, 'assets'));
  writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Fieldshed</title>');
  writeFileSync(path.join(dist, 'assets/app-Ab12Cd34.js'), script);
  writeFileSync(path.join(dist, 'assets/app-Ab12Cd34.js.br'), brotliCompressSync(script));
  writeFileSync(path.join(dist, 'assets/app-Ab12Cd34.js.gz'), gzipSync(script));
  writeFileSync(path.join(dist, 'assets/font-Zz99.woff2'), Buffer.from([0x77, 0x4f, 0x46, 0x32]));
  writeFileSync(path.join(dist, 'icon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  writeFileSync(path.join(dist, 'sw.js'), script);
  writeFileSync(path.join(dist, 'sw.js.br'), brotliCompressSync(script));
  writeFileSync(path.join(dist, 'manifest.webmanifest'), JSON.stringify({ name: 'Fieldshed', start_url: '/farms' }));
  sequelize = createSequelize(inject('databaseUrl'));
  initModels(sequelize);
  app = createApp({ sequelize, config: loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'client-files-test' }), clientDir: dist });
});
afterAll(async () => {
  await sequelize.close();
  rmSync(dist, { recursive: true, force: true });
});

// supertest (superagent) decodes a brotli or gzip body by its Content-Encoding: a body that
// reads back as the script was sent in the encoding the header names.
describe('client files', () => {
  it('sends the brotli copy of a hashed script to a browser that accepts brotli, cached for a year', async () => {
    const res = await request(app).get('/assets/app-Ab12Cd34.js').set('Accept-Encoding', 'gzip, deflate, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
    expect(res.text).toBe(script);
  });

  it('sends the gzip copy when only gzip is accepted, and the plain file when neither is', async () => {
    const gz = await request(app).get('/assets/app-Ab12Cd34.js').set('Accept-Encoding', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.text).toBe(script);
    const plain = await request(app).get('/assets/app-Ab12Cd34.js').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(script);
    expect(plain.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('sends files without a compressed copy as they are; unhashed files are revalidated', async () => {
    const font = await request(app).get('/assets/font-Zz99.woff2').set('Accept-Encoding', 'br');
    expect(font.status).toBe(200);
    expect(font.headers['content-encoding']).toBeUndefined();
    expect(font.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const icon = await request(app).get('/icon.svg').set('Accept-Encoding', 'br');
    expect(icon.headers['cache-control']).toBe('no-cache');
  });

  // Service Workers (W3C): a worker's scope is its script's folder, and the browser checks the script for a new
  // version on navigation; a long cache on it would keep an old app running.
  it('serves the service worker from the root as JavaScript, revalidated every time, and the web app manifest', async () => {
    const sw = await request(app).get('/sw.js').set('Accept-Encoding', 'br');
    expect(sw.status).toBe(200);
    expect(sw.headers['content-type']).toMatch(/javascript/);
    expect(sw.headers['cache-control']).toBe('no-cache');
    expect(sw.text).toBe(script);
    const manifest = await request(app).get('/manifest.webmanifest');
    expect(manifest.headers['content-type']).toMatch(/^application\/manifest\+json/);
    expect(manifest.headers['cache-control']).toBe('no-cache');
    expect(JSON.parse(manifest.text).start_url).toBe('/farms');
  });

  it('answers client-side routes with the app shell and never reads outside the build', async () => {
    const shell = await request(app).get('/farms/1/map');
    expect(shell.status).toBe(200);
    expect(shell.text).toContain('<title>Fieldshed</title>');
    const escape = await request(app).get('/assets/..%2F..%2Fetc%2Fpasswd').set('Accept-Encoding', 'br');
    expect(escape.text).not.toMatch(/root:/);
  });
});
