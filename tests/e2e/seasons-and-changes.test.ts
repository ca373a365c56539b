// Seasons and who changed what, in Chromium: a new season starts with the last one's cropping
// when the farmer keeps the box ticked; an empty season can be deleted from the picker; the
// advisor's change of a record shows on it and in the farm's recent changes.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { DEMO_LIKE_FIELDS, makeDemoLikeFarm } from '../helpers/demo-like-farm';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

describe('seasons and recent changes in Chromium', () => {
  it('adds a season with the last cropping, deletes an empty one, and shows who changed a record', async () => {
    const { farm, users, ids, season } = await makeDemoLikeFarm(app.sequelize, DEMO_LIKE_FIELDS.slice(0, 1));
    const { putCropping, getCropping } = await import('../../server/services/seasons.service');
    const fieldId = ids['Long Slope'];
    // The advisor corrects the residue cover.
    const before = await getCropping(fieldId, season, farm.id);
    const { season: _s, version, updatedAt: _u, lastChange: _l, fieldId: _f, ...rest } = before;
    await putCropping(app.sequelize, { userId: users.advisor.id }, { id: fieldId, farmId: farm.id }, { ...rest, season, version, residuePct: 25 });

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${fieldId}?tab=cropping`);
    await page.getByTestId('cropping-last-change').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('cropping-last-change').innerText()).toContain('Last changed by Test advisor');

    // A new season, starting with this one's cropping.
    await page.getByTestId('season-add').click();
    await page.getByTestId('season-new-label').fill('2028');
    expect(await page.getByTestId('season-copy-cropping').isChecked()).toBe(true);
    await page.getByTestId('season-create').click();
    await expect.poll(() => page.getByTestId('season-select').inputValue(), { timeout: 15_000 }).toBe('2028');
    await expect.poll(() => page.getByTestId('cropping-last-change').innerText(), { timeout: 15_000 }).toContain('Test farmer');

    // An empty season can be deleted; the picker goes back to the current one.
    await page.getByTestId('season-add').click();
    await page.getByTestId('season-new-label').fill('2029');
    await page.getByTestId('season-copy-cropping').uncheck();
    await page.getByTestId('season-create').click();
    await expect.poll(() => page.getByTestId('season-select').inputValue(), { timeout: 15_000 }).toBe('2029');
    page.once('dialog', (d) => void d.accept());
    await page.getByTestId('season-delete').click();
    await expect.poll(() => page.getByTestId('season-select').locator('option').allInnerTexts(), { timeout: 15_000 }).toEqual(['2028', '2027']);
    expect(await page.getByTestId('season-select').inputValue()).toBe('2028');

    // The farm's recent changes, on the Farm map.
    await page.getByTestId('nav-farm-map').click();
    const changes = page.getByTestId('recent-changes');
    await changes.locator('summary').click({ timeout: 15_000 });
    await changes.getByTestId('change-row').first().waitFor({ timeout: 15_000 });
    const rows = await changes.getByTestId('change-row').allInnerTexts();
    expect(rows[0]).toContain('Test farmer removed season 2029');
    expect(rows.some((r) => r.includes('Test advisor changed the cropping of Long Slope for 2027'))).toBe(true);
    expect(errors).toEqual([]);
    await page.close();
  });
});
