// On the Field screen: overriding C with a note on the Risk tab, strip cropping with its
// rotation in plain words on the Cropping tab, and a drained field on the Ground tab.
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

describe('overrides, strips and drainage in Chromium', () => {
  it('overrides C with a note, and records strips by rotation and a drained field', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const actor = { userId: users.farmer.id };
    await putClimate(app.sequelize, actor, farm.id, { rFrom: 'value', rValue: 2500, designStormMm: 100 });
    const f = await createField({ sequelize: app.sequelize }, actor, farm.id, { geometry: squareFeature(-91.45, 42.31, 300).geometry, name: 'Hill' });
    await putGround(app.sequelize, actor, { id: f.id, farmId: farm.id }, { slopePct: 8, slopeLengthM: 60 });
    await putCropping(app.sequelize, actor, { id: f.id, farmId: farm.id }, { season: '2027', crop: 'corn', tillage: 'no-till', residuePct: 40, practice: 'none' });
    await createSample(app.sequelize, actor, f.id, SoilSampleCreate.parse({ kind: 'lab', sandPct: 20, siltPct: 60, clayPct: 20, organicMatterPct: 2.5 }));

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${f.id}?tab=risk&season=2027`);
    await page.getByTestId('factor-table').waitFor({ timeout: 15_000 });
    await page.getByTestId('override-open-c').click();
    await page.getByTestId('override-value-c').fill('0.05');
    await page.getByTestId('override-save-c').click();
    expect(await page.getByTestId('override-form-c').innerText()).toMatch(/Required/);
    await page.getByTestId('override-note-c').fill('residue counted in May');
    await page.getByTestId('override-save-c').click();
    await page.getByTestId('override-c').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('override-c').innerText()).toBe(`override: residue counted in May, by ${users.farmer.name}`);
    expect(await page.getByTestId('input-c').getByTestId('input-source').innerText()).toMatch(/typed by .*; residue counted in May/);
    await page.getByTestId('factor-table').screenshot({ path: 'test-results/risk-tab-override.png' });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByTestId('override-open-p').click();
    await page.getByTestId('override-form-p').screenshot({ path: 'test-results/risk-tab-override-form-phone.png' });
    await page.setViewportSize({ width: 1280, height: 900 });

    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${f.id}?tab=cropping&season=2027`);
    await page.getByTestId('cropping-practice').selectOption('strip cropping');
    const rotations = await page.getByTestId('cropping-strip-rotation').locator('option').allInnerTexts();
    expect(rotations.slice(1)).toEqual([
      '4-year rotation: row crop, small grain sown with meadow, then 2 years of meadow',
      '4-year rotation: 2 years of row crop, winter grain sown with meadow, then 1 year of meadow',
      'strips of row crop alternating with strips of winter grain',
    ]);
    await page.getByTestId('cropping-save').click();
    expect(await page.getByTestId('cropping-form').innerText()).toMatch(/Required with strip cropping/);
    await page.getByTestId('cropping-strip-rotation').selectOption('B');
    await page.getByTestId('cropping-strip-width').fill('25');
    await page.getByTestId('cropping-save').click();
    await page.getByTestId('cropping-saved').waitFor({ timeout: 15_000 });
    await page.getByTestId('cropping-form').screenshot({ path: 'test-results/cropping-strips.png' });

    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${f.id}?tab=ground&season=2027`);
    await page.getByTestId('ground-drained').check();
    await page.getByTestId('ground-drained-depth').fill('90');
    await page.getByTestId('ground-save').click();
    await page.getByText('Saved. The Risk tab now uses this slope and drainage.').waitFor({ timeout: 15_000 });
    await page.getByTestId('ground-panel').screenshot({ path: 'test-results/ground-drained.png' });

    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${f.id}?tab=risk&season=2027`);
    await page.getByTestId('input-practice').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('input-practice').innerText()).toMatch(/2 years of row crop.*strips 25 m wide/);
    expect(errors).toEqual([]);
    await page.close();
  });
});
