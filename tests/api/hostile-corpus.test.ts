// The hostile corpus: every file and payload in tests/fixtures/hostile/cases.json is sent by a
// farmer, who may use each route, so only the content is on trial. Each must be answered 4xx
// with a message for a person, store nothing (every table's row count unchanged), leave no
// file behind, and leave the server answering.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { inject } from 'vitest';
import request from 'supertest';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { LocalFileStorage } from '../../server/services/storage/file-storage';
import type { JobQueue } from '../../server/services/jobs/job-queue';
import { makeFarm, signedIn, squareFeature } from '../helpers/test-app';

type Case = {
  name: string;
  route: string;
  file?: string;
  fields?: Record<string, string>;
  json?: unknown;
  raw?: { contentType: string; body: string; leadingSpaces?: number };
};

const corpusDir = path.resolve('tests/fixtures/hostile');
const { cases } = JSON.parse(readFileSync(path.join(corpusDir, 'cases.json'), 'utf8')) as { cases: Case[] };

const sequelize = createSequelize(inject('databaseUrl'));
initModels(sequelize);
const uploads = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-hostile-'));
// Nothing hostile may reach the queue: a case that gets that far fails loudly.
const jobs = {
  enqueue: async () => {
    throw new Error('a hostile upload reached the job queue');
  },
  sendMail: async () => undefined,
} as unknown as JobQueue;
const app = createApp({
  sequelize,
  config: loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'hostile-corpus-secret', DATA_DIR: uploads }),
  storage: new LocalFileStorage(path.join(uploads, 'files')),
  jobs,
  clientDir: '/nonexistent',
});

let farmer: ReturnType<typeof request.agent>;
let ids: Record<string, number> = {};

beforeAll(async () => {
  const { farm, users } = await makeFarm(['farmer']);
  farmer = await signedIn(app, users.farmer);
  const field = await farmer.post(`/api/farms/${farm.id}/fields`).send(squareFeature(-91.6, 42.3, 300, 'Target'));
  const plan = await farmer.post(`/api/farms/${farm.id}/plans`).send({ season: '2027' });
  if (field.status !== 201 || plan.status !== 201) throw new Error('corpus set-up failed');
  ids = { farmId: farm.id, fieldId: field.body.id, planId: plan.body.id };
});
afterAll(async () => {
  await sequelize.close();
  rmSync(uploads, { recursive: true, force: true });
});

/** Row counts of every table the app has a model for. */
async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const [name, model] of Object.entries(sequelize.models)) out[name] = await model.count();
  return out;
}

const filesLeft = () => readdirSync(uploads, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).length;

function send(c: Case) {
  const [method, route] = c.route.split(' ');
  const url = route.replace(/:([A-Za-z]+)/g, (_m, k: string) => String(ids[k]));
  const req = farmer[method.toLowerCase() as 'post' | 'put' | 'patch'](url);
  if (c.file) {
    const body = readFileSync(path.join(corpusDir, c.file));
    for (const [k, v] of Object.entries(c.fields ?? {})) req.field(k, v);
    return req.attach('file', body, path.basename(c.file));
  }
  if (c.raw) return req.set('Content-Type', c.raw.contentType).send(' '.repeat(c.raw.leadingSpaces ?? 0) + c.raw.body);
  return req.send(c.json as object);
}

describe('hostile files and payloads', () => {
  it('holds at least 100 cases', () => {
    expect(cases.length).toBeGreaterThanOrEqual(100);
  });

  for (const c of cases) {
    it(`${c.name}: refused with a message, nothing stored, no file left`, async () => {
      const rowsBefore = await rowCounts();
      const filesBefore = filesLeft();
      const res = await send(c);
      expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.body).toMatchObject({ error: expect.any(String), message: expect.any(String) });
      expect(res.body.message.length).toBeGreaterThan(10);
      expect(await rowCounts()).toEqual(rowsBefore);
      expect(filesLeft()).toBe(filesBefore);
      expect((await request(app).get('/api/health')).status).toBe(200);
    });
  }
});
