// An advisor opens a client farm's priority board, changes a field's cropping on the Field
// screen, and sees the ranking move.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
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

const rowNames = async (page: Page) => (await page.getByTestId('board-row').allInnerTexts()).map((t) => (t.includes('Steep corn') ? 'Steep corn' : t.includes('Gentle corn') ? 'Gentle corn' : t));

describe('priority board in Chromium', () => {
  it('moves a field down the board when the advisor gives it permanent cover', async () => {
    const { farm, users } = await makeFarm(['farmer', 'advisor']);
    const actor = { userId: users.farmer.id };
    await putClimate(app.sequelize, actor, farm.id, { rFrom: 'value', rValue: 2500, designStormMm: 100 });
    const ids: Record<string, number> = {};
    for (const [name, lng, slopePct] of [['Steep corn', -91.78, 12], ['Gentle corn', -91.77, 3]] as const) {
      const f = await createField({ sequelize: app.sequelize }, actor, farm.id, { geometry: squareFeature(lng, 42.31, 300).geometry, name });
      ids[name] = f.id;
      await putGround(app.sequelize, actor, { id: f.id, farmId: farm.id }, { slopePct, slopeLengthM: 60 });
      await putCropping(app.sequelize, actor, { id: f.id, farmId: farm.id }, { season: '2027', crop: 'corn', tillage: 'moldboard plough', residuePct: 5, practice: 'none' });
      await createSample(app.sequelize, actor, f.id, SoilSampleCreate.parse({ kind: 'lab', sandPct: 20, siltPct: 60, clayPct: 20, organicMatterPct: 2.5 }));
    }

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.advisor.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/board?season=2027`);
    await expect.poll(() => page.getByTestId('board-row').count(), { timeout: 15_000 }).toBe(2);
    expect(await rowNames(page)).toEqual(['Steep corn', 'Gentle corn']);
    expect(await page.getByTestId('risk-badge').count()).toBeGreaterThanOrEqual(2);

    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${ids['Steep corn']}?tab=cropping&season=2027`);
    await page.getByTestId('cropping-crop').selectOption('hay or meadow');
    await page.getByTestId('cropping-save').click();
    await page.getByTestId('cropping-saved').waitFor({ timeout: 15_000 });

    await page.goto(`${app.baseUrl}/farms/${farm.id}/board?season=2027`);
    await expect.poll(() => rowNames(page), { timeout: 15_000 }).toEqual(['Gentle corn', 'Steep corn']);
    await page.screenshot({ path: 'test-results/priority-board.png' });
    expect(errors).toEqual([]);
    await page.close();
  });
});
