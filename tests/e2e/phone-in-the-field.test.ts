// A farmer with a phone (390 × 844) in Chromium: the board and the soil samples as cards, the farm
// map filling the screen with the fields in a sheet, and a soil check made with the network off
// (the browser's own switch) that waits on the phone, is sent when the network is back and shows
// on the field; the installed app's service worker keeps the field screen, the board and the map
// opening offline.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { createField } from '../../server/services/fields.service';
import { putClimate, putGround } from '../../server/services/climate-ground.service';
import { putCropping } from '../../server/services/seasons.service';
import { createSample } from '../../server/services/soils/soil-samples.service';
import { SoilPhoto, SoilSample } from '../../server/models';
import { SoilSampleCreate } from '../../shared/schemas/soils';
import { makeFarm, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
let page: Page;
let errors: string[];
let farmId: number;
let fieldId: number;
/** Where the phone says it is: inside the test field. */
const HERE = { latitude: 42.3101, longitude: -91.7799, accuracy: 8 };

beforeAll(async () => {
  app = await startBrowserApp();
  const { farm, users } = await makeFarm(['farmer']);
  farmId = farm.id;
  const actor = { userId: users.farmer.id };
  await putClimate(app.sequelize, actor, farm.id, { rFrom: 'value', rValue: 2500, designStormMm: 100 });
  for (const [name, lng, slopePct] of [['Ridge corn', -91.78, 10], ['Flat corn', -91.77, 2]] as const) {
    const f = await createField({ sequelize: app.sequelize }, actor, farm.id, { geometry: squareFeature(lng, 42.31, 300).geometry, name });
    fieldId ??= f.id;
    await putGround(app.sequelize, actor, { id: f.id, farmId: farm.id }, { slopePct, slopeLengthM: 60 });
    await putCropping(app.sequelize, actor, { id: f.id, farmId: farm.id }, { season: '2027', crop: 'corn', tillage: 'moldboard plough', residuePct: 5, practice: 'none' });
    await createSample(app.sequelize, actor, f.id, SoilSampleCreate.parse({ kind: 'lab', label: `${name} lab`, sandPct: 20, siltPct: 60, clayPct: 20, organicMatterPct: 2.5 }));
  }
  ({ page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD, {
    viewport: { width: 390, height: 844 },
    isMobile: true,
    hasTouch: true,
    geolocation: HERE,
    permissions: ['geolocation'],
    serviceWorkers: 'allow',
  }));
});
afterAll(() => app?.close());

/** How far the page runs past the right edge of the screen, px. */
const overflowPx = () => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
const offline = (on: boolean) => page.context().setOffline(on);
/** A network switched off shows as failed loads in the console; those are expected here. */
const unexpected = () => errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|net::ERR_FAILED|Failed to fetch/.test(e));

describe('a phone in the field', () => {
  it('shows the priority board and the soil samples as cards, with nothing running off the screen', async () => {
    await page.goto(`${app.baseUrl}/farms/${farmId}/board?season=2027`);
    await expect.poll(() => page.getByTestId('board-card').count(), { timeout: 15_000 }).toBe(2);
    expect(await page.getByTestId('board-table').count()).toBe(0);
    expect(await page.getByTestId('board-card').first().innerText()).toMatch(/Ridge corn[\s\S]*A\/T/);
    expect(await overflowPx()).toBeLessThanOrEqual(0);

    await page.goto(`${app.baseUrl}/farms/${farmId}/fields/${fieldId}?tab=soil`);
    await page.getByTestId('soil-sample-card').first().waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('soil-sample-table').count()).toBe(0);
    expect(await page.getByTestId('soil-sample-card').first().innerText()).toMatch(/Ridge corn lab[\s\S]*silt loam/);
    expect(await overflowPx()).toBeLessThanOrEqual(0);
    await page.screenshot({ path: 'test-results/phone-soil-cards.png' });
    expect(unexpected()).toEqual([]);
  });

  it('fills the screen with the farm map and keeps the fields in a sheet that opens and closes by touch and keyboard', async () => {
    await page.goto(`${app.baseUrl}/farms/${farmId}`);
    const map = page.getByTestId('farm-map');
    await map.locator('.leaflet-container').waitFor({ timeout: 15_000 });
    const box = (await map.boundingBox())!;
    expect(box.width).toBe(390);
    expect(box.height).toBeGreaterThan(500);
    const bar = page.getByTestId('field-sheet-bar');
    expect(await bar.getAttribute('aria-expanded')).toBe('false');
    expect(await page.getByTestId('field-sheet').getByText('Flat corn').first().isVisible()).toBe(false);

    await bar.tap();
    expect(await bar.getAttribute('aria-expanded')).toBe('true');
    await page.getByTestId('field-sheet').getByText('Flat corn').first().waitFor();
    await page.screenshot({ path: 'test-results/phone-map-sheet.png' });
    await page.keyboard.press('Escape');
    expect(await bar.getAttribute('aria-expanded')).toBe('false');
    expect(await bar.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.keyboard.press('Enter');
    expect(await bar.getAttribute('aria-expanded')).toBe('true');
    expect(await overflowPx()).toBeLessThanOrEqual(0);
    expect(unexpected()).toEqual([]);
  });

  it('keeps a soil check made offline on the phone, counts it as waiting, and sends it when the network is back', async () => {
    await page.goto(`${app.baseUrl}/farms/${farmId}/fields/${fieldId}?tab=soil`);
    await page.getByTestId('soil-sample-card').first().waitFor({ timeout: 15_000 });
    // The installed app's worker takes over the page (it claims open pages when it starts). Installing it means
    // storing every built file, which a busy machine makes slow: wait for it to be active, and open the page again
    // if it had not claimed this one yet.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    if (!(await page.evaluate(() => Boolean(navigator.serviceWorker.controller)))) {
      await page.reload();
      await page.getByTestId('soil-sample-card').first().waitFor({ timeout: 15_000 });
    }
    await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller)), { timeout: 20_000 }).toBe(true);

    await offline(true);
    await page.getByTestId('add-feel-test').click();
    // Thien (1979) key: balls, medium ribbon (2.5–5 cm), very smooth → silty clay loam.
    await page.getByTestId('feel-balls-yes').click();
    await page.getByTestId('feel-ribbon-medium').click();
    await page.getByTestId('feel-grit-smooth').click();
    await expect.poll(() => page.getByTestId('feel-result').innerText()).toMatch(/silty clay loam/);
    await page.getByTestId('sample-label').fill('Phone pit');
    await page.getByTestId('sample-depthToGrayCm').fill('30');
    await page.getByTestId('check-find-position').click();
    await expect.poll(() => page.getByTestId('check-position').innerText()).toMatch(/42\.31010°, -91\.77990° · within about 8 m/);
    const photo = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 120, g: 90, b: 60 } } }).jpeg().toBuffer();
    await page.getByTestId('check-photo').setInputFiles({ name: 'pit.jpg', mimeType: 'image/jpeg', buffer: photo });
    await page.screenshot({ path: 'test-results/phone-feel-test.png', fullPage: true });
    await page.getByTestId('feel-save').click();

    await expect.poll(() => page.getByTestId('waiting-checks-count').innerText(), { timeout: 10_000 }).toMatch(/1 soil check waiting to be sent/);
    expect(await SoilSample.count({ where: { fieldId, label: 'Phone pit' } })).toBe(0);

    await offline(false);
    await expect.poll(() => page.getByTestId('waiting-checks').count(), { timeout: 20_000 }).toBe(0);
    await expect.poll(() => page.getByTestId('soil-sample-card').filter({ hasText: 'Phone pit' }).count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByTestId('soil-sample-card').filter({ hasText: 'Phone pit' }).innerText()).toMatch(/silty clay loam[\s\S]*gray from 30 cm/);

    const stored = await SoilSample.findAll({ where: { fieldId, label: 'Phone pit' } });
    expect(stored).toHaveLength(1);
    expect(stored[0].position?.coordinates).toEqual([HERE.longitude, HERE.latitude]);
    expect(stored[0].positionAccuracyM).toBe(HERE.accuracy);
    expect(await SoilPhoto.count({ where: { sampleId: stored[0].id } })).toBe(1);
    expect(unexpected()).toEqual([]);
  }, 90_000);

  it('opens the field screen, the last board and the farm map again with no network, from what the service worker kept', async () => {
    expect(await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.scope)).toBe(`${app.baseUrl}/`);
    // Opened once while the worker runs: the board and the map as the farmer last saw them.
    await page.goto(`${app.baseUrl}/farms/${farmId}/board?season=2027`);
    await expect.poll(() => page.getByTestId('board-card').count(), { timeout: 15_000 }).toBe(2);
    await page.goto(`${app.baseUrl}/farms/${farmId}`);
    await expect.poll(() => page.getByTestId('farm-map').locator('path.leaflet-interactive').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
    await page.goto(`${app.baseUrl}/farms/${farmId}/fields/${fieldId}?tab=soil`);
    await page.getByTestId('soil-sample-card').filter({ hasText: 'Phone pit' }).waitFor({ timeout: 15_000 });

    await offline(true);
    await page.reload();
    await page.getByTestId('soil-sample-card').filter({ hasText: 'Phone pit' }).waitFor({ timeout: 15_000 });
    await page.goto(`${app.baseUrl}/farms/${farmId}/board?season=2027`);
    await expect.poll(() => page.getByTestId('board-card').count(), { timeout: 15_000 }).toBe(2);
    await page.goto(`${app.baseUrl}/farms/${farmId}`);
    await expect.poll(() => page.getByTestId('farm-map').locator('path.leaflet-interactive').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
    await offline(false);
    expect(unexpected()).toEqual([]);
  });
});
