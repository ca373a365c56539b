// An advisor opens a client farm's priority board, changes a field's cropping on the Field
// screen, and sees the ranking move.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { createField } from '../../server/services/fields.service';
import { putClimate, putGround } from '../../server/services/climate-ground.service';
import { putCropping } from '../../server/services/seasons.service';
import { createSample } from '../../server/services/soils/soil-samples.service';
import { SoilSampleCreate } from '../../shared/schemas/soils';
import { makeFarm, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { launchChromium, listen } from '../helpers/browser';

const dist = path.resolve('dist');
const sequelize = createSequelize(inject('databaseUrl'));
let browser: Browser;
let server: Server;
let baseUrl = '';

beforeAll(async () => {
  if (!existsSync(path.join(dist, 'index.html'))) throw new Error('dist/ is missing: run `npx vite build` (npm test does it first)');
  initModels(sequelize);
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'e2e-board-secret-xx' });
  ({ url: baseUrl, server } = await listen(createApp({ sequelize, config, clientDir: dist })));
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  server?.close();
  await sequelize.close();
});

const rowNames = async (page: Page) => (await page.getByTestId('board-row').allInnerTexts()).map((t) => (t.includes('Steep corn') ? 'Steep corn' : t.includes('Gentle corn') ? 'Gentle corn' : t));

describe('priority board in Chromium', () => {
  it('moves a field down the board when the advisor gives it permanent cover', async () => {
    const { farm, users } = await makeFarm(['farmer', 'advisor']);
    const actor = { userId: users.farmer.id };
    await putClimate(sequelize, actor, farm.id, { rFrom: 'value', rValue: 2500, designStormMm: 100 });
    const ids: Record<string, number> = {};
    for (const [name, lng, slopePct] of [['Steep corn', -91.78, 12], ['Gentle corn', -91.77, 3]] as const) {
      const f = await createField(sequelize, actor, farm.id, { geometry: squareFeature(lng, 42.31, 300).geometry, name });
      ids[name] = f.id;
      await putGround(sequelize, actor, { id: f.id, farmId: farm.id }, { slopePct, slopeLengthM: 60 });
      await putCropping(sequelize, actor, { id: f.id, farmId: farm.id }, { season: '2027', crop: 'corn', tillage: 'moldboard plough', residuePct: 5, practice: 'none' });
      await createSample(sequelize, actor, f.id, SoilSampleCreate.parse({ kind: 'lab', sandPct: 20, siltPct: 60, clayPct: 20, organicMatterPct: 2.5 }));
    }

    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    page.on('response', (r) => r.status() >= 500 && errors.push(`${r.status()} ${r.url()}`));
    await page.goto(`${baseUrl}/`);
    await page.getByTestId('email').fill(users.advisor.email);
    await page.getByTestId('password').fill(TEST_PASSWORD);
    await page.getByTestId('sign-in').click();
    await page.getByTestId('farm-row').first().waitFor();

    await page.goto(`${baseUrl}/farms/${farm.id}/board?season=2027`);
    await expect.poll(() => page.getByTestId('board-row').count(), { timeout: 15_000 }).toBe(2);
    expect(await rowNames(page)).toEqual(['Steep corn', 'Gentle corn']);
    expect(await page.getByTestId('risk-badge').count()).toBeGreaterThanOrEqual(2);

    await page.goto(`${baseUrl}/farms/${farm.id}/fields/${ids['Steep corn']}?tab=cropping&season=2027`);
    await page.getByTestId('cropping-crop').selectOption('hay or meadow');
    await page.getByTestId('cropping-save').click();
    await page.getByTestId('cropping-saved').waitFor({ timeout: 15_000 });

    await page.goto(`${baseUrl}/farms/${farm.id}/board?season=2027`);
    await expect.poll(() => rowNames(page), { timeout: 15_000 }).toEqual(['Gentle corn', 'Steep corn']);
    await page.screenshot({ path: 'test-results/priority-board.png' });
    expect(errors).toEqual([]);
    await page.close();
  });
});
