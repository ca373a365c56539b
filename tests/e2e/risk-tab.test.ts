// The Risk tab says where each input came from in plain words and sends a person to the place
// that fills each gap, from the gap's typed tab; it reads well at desktop and phone width.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createField } from '../../server/services/fields.service';
import { putClimate, putGround } from '../../server/services/climate-ground.service';
import { putCropping } from '../../server/services/seasons.service';
import { createSample } from '../../server/services/soils/soil-samples.service';
import { SoilSampleCreate } from '../../shared/schemas/soils';
import { makeFarm, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

describe('Risk tab in Chromium', () => {
  it('names who typed an input and opens the tab that fills a gap', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const actor = { userId: users.farmer.id };
    await putClimate(app.sequelize, actor, farm.id, { rFrom: 'value', rValue: 2500, designStormMm: 100 });
    const done = await createField({ sequelize: app.sequelize }, actor, farm.id, { geometry: squareFeature(-91.5, 42.31, 300).geometry, name: 'Assessed' });
    const open = await createField({ sequelize: app.sequelize }, actor, farm.id, { geometry: squareFeature(-91.49, 42.31, 300).geometry, name: 'No soil yet' });
    for (const f of [done, open]) {
      await putGround(app.sequelize, actor, { id: f.id, farmId: farm.id }, { slopePct: 8, slopeLengthM: 60 });
      await putCropping(app.sequelize, actor, { id: f.id, farmId: farm.id }, { season: '2027', crop: 'corn', tillage: 'no-till', residuePct: 40, practice: 'none' });
    }
    await createSample(app.sequelize, actor, done.id, SoilSampleCreate.parse({ kind: 'lab', sandPct: 20, siltPct: 60, clayPct: 20, organicMatterPct: 2.5 }));

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${done.id}?tab=risk&season=2027`);
    await page.getByTestId('assessment-soil-loss').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('input-slope').getByTestId('input-source').innerText()).toBe(`typed by ${users.farmer.name}`);
    expect(await page.getByTestId('input-k').getByTestId('input-source').innerText()).toMatch(/Sharpley & Williams 1990, eq\. 2\.96; from the mean of 1 lab sample/);
    expect(await page.getByTestId('input-t').getByTestId('input-origin').innerText()).toBe('example value');
    await page.getByTestId('assessment-inputs').screenshot({ path: 'test-results/risk-tab-inputs-desktop.png' });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByTestId('assessment-inputs').screenshot({ path: 'test-results/risk-tab-inputs-phone.png' });

    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${open.id}?tab=risk&season=2027`);
    await page.getByTestId('gap-erodibility').waitFor({ timeout: 15_000 });
    await page.getByTestId('assessment-gaps').screenshot({ path: 'test-results/risk-tab-gaps-desktop.png' });
    await page.getByTestId('gap-erodibility').getByRole('button', { name: 'Open the Soil tab' }).click();
    await expect.poll(() => page.getByTestId('field-tab-soil').getAttribute('aria-selected')).toBe('true');
    expect(errors).toEqual([]);
    await page.close();
  });
});
