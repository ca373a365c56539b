// A farmer signs in, opens the farm map, draws a field and sees its area in the list.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import { inject } from 'vitest';
import { createSequelize } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { initModels } from '../../server/models';
import { makeFarm, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { createField } from '../../server/services/fields.service';
import { launchChromium, listen } from '../helpers/browser';

const dist = path.resolve('dist');
let browser: Browser;
let server: Server;
let baseUrl = '';
const sequelize = createSequelize(inject('databaseUrl'));

beforeAll(async () => {
  if (!existsSync(path.join(dist, 'index.html'))) throw new Error('dist/ is missing: run `npx vite build` (npm test does it first)');
  initModels(sequelize);
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: 'e2e-secret-e2e-secret' });
  ({ url: baseUrl, server } = await listen(createApp({ sequelize, config, clientDir: dist })));
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  server?.close();
  await sequelize.close();
});

describe('farm map in Chromium', () => {
  it('signs in, draws a field and lists it with its area in hectares', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    await createField(sequelize, { userId: users.farmer.id }, farm.id, { geometry: squareFeature(-91.78, 42.31, 300).geometry, name: 'Home Paddock' });
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    // 4xx answers are part of the API (401 signed out, 404 "no terrain yet") and Chromium logs
    // each as a console error; those are left out, but any 5xx or script error counts.
    page.on('console', (m) => m.type() === 'error' && !/status of 4\d\d/.test(m.text()) && errors.push(m.text()));
    page.on('response', (r) => r.status() >= 500 && errors.push(`${r.status()} ${r.url()}`));

    await page.goto(`${baseUrl}/`);
    await page.getByTestId('email').fill(users.farmer.email);
    await page.getByTestId('password').fill(TEST_PASSWORD);
    await page.getByTestId('sign-in').click();
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await expect.poll(() => page.getByTestId('field-row').count(), { timeout: 15_000 }).toBe(1);

    // Draw a triangle in the map's empty margin with the polygon tool, closing on the first vertex.
    await page.locator('.leaflet-pm-icon-polygon').first().click();
    const box = (await page.locator('.leaflet-container').boundingBox())!;
    const pts = [
      [box.x + box.width * 0.08, box.y + box.height * 0.2],
      [box.x + box.width * 0.18, box.y + box.height * 0.2],
      [box.x + box.width * 0.13, box.y + box.height * 0.45],
    ];
    for (const [x, y] of pts) {
      await page.mouse.click(x, y);
      await page.waitForTimeout(150);
    }
    await page.mouse.click(pts[0][0], pts[0][1]);

    await expect.poll(() => page.getByTestId('field-row').count(), { timeout: 15_000 }).toBe(2);
    const rows = await page.getByTestId('field-row').allInnerTexts();
    const drawn = rows.find((t) => !t.includes('Home Paddock'))!;
    expect(drawn).toMatch(/\d[\d,.]*\s*ha/);
    // The list shows the server's ellipsoidal area; one field drawn, no duplicate from the plugin layer.
    const polygons = await page.locator('.leaflet-overlay-pane path').count();
    expect(polygons).toBe(2);
    expect(errors).toEqual([]);
    await page.screenshot({ path: 'test-results/farm-map.png' });
    await page.close();
  });
});
