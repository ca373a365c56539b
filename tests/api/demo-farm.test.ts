// The demo scenario, seeded and processed as `npm start` does, gives the board the design
// asks for: every field ranked with its reasons, the clay bottom flagged.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import request from 'supertest';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels, User } from '../../server/models';
import { JobQueue } from '../../server/services/jobs/job-queue';
import { LocalFileStorage } from '../../server/services/storage/file-storage';
import { terrainJobHandler } from '../../server/services/farm-terrain.service';
import { seedDemoFarm, DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seeders/demo-farm';
import { seedDemoSeason } from '../../server/db/seeders/demo-season';
import { seedDemoSecondFarm } from '../../server/db/seeders/demo-second-farm';
import { seedDemoPlan } from '../../server/db/seeders/demo-plan';
import { seedDemoTerrain } from '../../server/db/seeders/demo-terrain';
import { signedIn } from '../helpers/test-app';

const sequelize = createSequelize(inject('databaseUrl'));
const uploads = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-demo-uploads-'));
const storage = new LocalFileStorage(uploads);
let jobs: JobQueue;
let app: Express;
let seeded = false;

beforeAll(async () => {
  initModels(sequelize);
  jobs = await JobQueue.start(inject('databaseUrl'), { terrain: terrainJobHandler({ sequelize, storage }) }, `t${randomUUID().slice(0, 8)}-`);
  app = createApp({ sequelize, config: loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'demo-secret-demo-secret' }), storage, jobs, clientDir: '/nonexistent' });
  seeded = await seedDemoFarm(sequelize);
  await seedDemoSeason(sequelize);
  await seedDemoPlan(sequelize);
  await seedDemoSecondFarm(sequelize);
  await seedDemoTerrain({ sequelize, storage, jobs });
  const [job] = (await sequelize.query(`SELECT id FROM processing_jobs ORDER BY created_at DESC LIMIT 1`))[0] as { id: string }[];
  await JobQueue.waitFor(job.id);
});
afterAll(async () => {
  await jobs.stop();
  await sequelize.close();
  rmSync(uploads, { recursive: true, force: true });
});

const farmerAgent = async () => signedIn(app, (await User.findOne({ where: { email: DEMO_ACCOUNTS[0].email } }))!, DEMO_PASSWORD);

describe('the demo farm', () => {
  it('seeds once, with the three demo sign-ins working', async () => {
    expect(seeded).toBe(true);
    expect(await seedDemoFarm(sequelize)).toBe(false);
    for (const a of DEMO_ACCOUNTS) expect((await request(app).post('/api/auth/login').send({ email: a.email, password: DEMO_PASSWORD })).status).toBe(200);
  });

  it('ranks every field with figures and reasons from its DEM, soils and cropping', async () => {
    const farmer = await farmerAgent();
    const [farm] = (await farmer.get('/api/farms')).body;
    const board = (await farmer.get(`/api/farms/${farm.id}/board?season=2027`)).body;
    expect(board.rows).toHaveLength(9);
    for (const r of board.rows) {
      expect([r.name, r.gaps]).toEqual([r.name, []]);
      expect(r.aOverT).toBeGreaterThan(0);
    }
    const names = board.rows.map((r: { name: string }) => r.name);
    // The scenario: steep, ploughed continuous corn loses most; permanent grass least (AH-537 ordering of C).
    expect(names[0]).toBe('Long Slope');
    expect(names.indexOf('East Pasture')).toBeGreaterThan(names.indexOf('Mill Hill'));
    expect(board.rows[0].reasons.length).toBeGreaterThan(0);
  });

  it('flags the clay bottom as problem clay and steers it away from amendments', async () => {
    const farmer = await farmerAgent();
    const [farm] = (await farmer.get('/api/farms')).body;
    const board = (await farmer.get(`/api/farms/${farm.id}/board?season=2027`)).body;
    const creek = board.rows.find((r: { name: string }) => r.name === 'Creek Bottom');
    expect(creek.problemClay).toBe(true);
    expect(board.rows.filter((r: { problemClay: boolean }) => r.problemClay).map((r: { name: string }) => r.name)).toEqual(['Creek Bottom']);
    const a = (await farmer.get(`/api/fields/${creek.fieldId}/assessment?season=2027`)).body;
    expect(a.groundAdvice).toMatch(/will not fix/);
    expect(a.lsSource).toBe('elevation model');
  });

  it('finds concentrated flow in the swale field, a grassed-waterway candidate', async () => {
    const farmer = await farmerAgent();
    const [farm] = (await farmer.get('/api/farms')).body;
    const fields = (await farmer.get(`/api/farms/${farm.id}/fields`)).body.features;
    const swale = fields.find((f: { properties: { name: string } }) => f.properties.name === 'Swale Field');
    const t = (await farmer.get(`/api/fields/${swale.id}/terrain`)).body;
    expect(t.concentratedFlow.cellCount).toBeGreaterThan(50);
  });

  it('offers the worst field options that bring its loss under T, with quantities and costs', async () => {
    const farmer = await farmerAgent();
    const [farm] = (await farmer.get('/api/farms')).body;
    const board = (await farmer.get(`/api/farms/${farm.id}/board?season=2027`)).body;
    const worst = board.rows[0];
    const t = (await farmer.get(`/api/fields/${worst.fieldId}/treatments?season=2027`)).body;
    expect(t.ok).toBe(true);
    expect(t.current.aOverT).toBeGreaterThan(1);
    type Option = { reachesT: boolean; cheapestUnderT: boolean; soilLossTPerHaYr: number; quantities: unknown[]; cost: { total: number } };
    const under = (t.options as Option[]).filter((o) => o.reachesT);
    expect(under.length).toBeGreaterThan(0);
    const cheapest = under.find((o) => o.cheapestUnderT)!;
    expect(cheapest.soilLossTPerHaYr).toBeLessThan(t.current.soilLossTPerHaYr / t.current.aOverT + 1e-9);
    expect(cheapest.quantities.length).toBeGreaterThan(0);
    expect(cheapest.cost.total).toBeGreaterThan(0);
  });

  it('gives the advisor one board across both client farms', async () => {
    const advisor = await signedIn(app, (await User.findOne({ where: { email: DEMO_ACCOUNTS[1].email } }))!, DEMO_PASSWORD);
    const farms = (await advisor.get('/api/farms')).body;
    expect(farms.map((f: { role: string }) => f.role)).toEqual(['advisor', 'advisor']);
    const board = (await advisor.get('/api/board?season=2027')).body;
    expect(board.rows).toHaveLength(12);
    expect(new Set(board.rows.map((r: { farmName: string }) => r.farmName))).toEqual(new Set(['Alder Run Farm', 'Birch Hollow']));
    for (const r of board.rows) expect([r.name, r.gaps]).toEqual([r.name, []]);
  });

  it('draws per-cell soil loss from each field’s K, C, P and the DEM’s LS', async () => {
    const farmer = await farmerAgent();
    const [farm] = (await farmer.get('/api/farms')).body;
    const layers = (await farmer.get(`/api/farms/${farm.id}/layers`)).body;
    const loss = layers.find((l: { key: string }) => l.key === 'soil-loss');
    expect(loss.label).toMatch(/2027/);
    expect(loss.legend.map((e: { label: string }) => e.label).join(' ')).toMatch(/t\/ha\/yr/);
    const png = await farmer.get(loss.url);
    expect(png.status).toBe(200);
    expect(png.body.subarray(0, 4).toString('hex')).toBe('89504e47');
  });

  it('has a 2027 plan submitted for review: the advisor sees it all, the landowner nothing until it is approved', async () => {
    const advisor = await signedIn(app, (await User.findOne({ where: { email: DEMO_ACCOUNTS[1].email } }))!, DEMO_PASSWORD);
    const farmId = (await advisor.get('/api/farms')).body.find((f: { name: string }) => f.name === 'Alder Run Farm').id;
    const plan = (await advisor.get(`/api/farms/${farmId}/plans?season=2027`)).body;
    expect(plan).toMatchObject({ season: '2027', state: 'submitted', currency: 'USD', submittedBy: { name: 'Mara Kettleby' } });
    expect(plan.actions.map((a: { fieldName: string; treatment: string }) => `${a.fieldName}: ${a.treatment}`)).toEqual(
      expect.arrayContaining(['Long Slope: no-till', 'Long Slope: cover-crop', 'Swale Field: grassed-waterway']),
    );
    expect(plan.totals.cost).toBeGreaterThan(0);
    // No-till and a cover crop lower C, so Long Slope loses less (AH-703 ch. 5); the farm saves soil.
    const longSlope = plan.prediction.fields.find((f: { fieldName: string }) => f.fieldName === 'Long Slope');
    expect(longSlope.ok).toBe(true);
    expect(longSlope.planned.soilLossTPerHaYr).toBeLessThan(longSlope.current.soilLossTPerHaYr);
    expect(plan.prediction.tonnesSavedPerYr).toBeGreaterThan(0);
    // A waterway changes no RUSLE factor; the prediction says what it does instead.
    const swale = plan.prediction.fields.find((f: { fieldName: string }) => f.fieldName === 'Swale Field');
    expect(swale.tonnesSavedPerYr).toBe(0);
    expect(swale.effects.length).toBeGreaterThan(0);
    const landowner = await signedIn(app, (await User.findOne({ where: { email: DEMO_ACCOUNTS[2].email } }))!, DEMO_PASSWORD);
    expect((await landowner.get(`/api/farms/${farmId}/plans?season=2027`)).status).toBe(404);
  });
});
