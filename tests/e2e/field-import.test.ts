// A farmer imports a zipped shapefile through the preview: sees its features, picks another
// attribute for the names, unticks one, imports, and finds the fields on the map. Nothing is
// stored before the import is confirmed.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import path from 'node:path';
import { readFileSync } from 'node:fs';
import { makeFarm, TEST_PASSWORD } from '../helpers/test-app';
import { Field } from '../../server/models';
import { createField } from '../../server/services/fields.service';
import { signInPage, startBrowserApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

describe('importing outlines in Chromium', () => {
  it('previews a shapefile, renames from another attribute, leaves one out and imports the rest', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await page.getByTestId('import-button').click();
    await page.getByTestId('import-file-input').setInputFiles(path.resolve('tests/fixtures/imports/named-fields-shp.zip'));

    const rows = page.getByTestId('import-feature');
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(3);
    expect(await page.getByTestId('import-feature-name').allInnerTexts()).toEqual(['Mill Hill', 'Hay Ground', 'Upper Flat']);
    expect(await rows.first().innerText()).toMatch(/\d[\d.,]* ha/);
    // The small map draws the three outlines.
    await expect.poll(() => page.locator('[data-testid="import-preview-map"] .leaflet-overlay-pane path').count()).toBe(3);
    expect(await Field.count({ where: { farmId: farm.id } })).toBe(0);

    await page.getByTestId('import-name-attribute').selectOption('PLOT');
    expect(await page.getByTestId('import-feature-name').allInnerTexts()).toEqual(['A1', 'A2', 'A3']);
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.screenshot({ path: 'test-results/import-preview-desktop.png' });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: 'test-results/import-preview-phone.png' });
    await page.setViewportSize({ width: 1280, height: 900 });

    // Keyboard: the tick box takes focus and Space unticks it.
    const second = rows.nth(1).getByRole('checkbox');
    await second.focus();
    await page.keyboard.press('Space');
    expect(await second.isChecked()).toBe(false);
    await expect.poll(() => page.getByTestId('import-confirm').innerText()).toBe('Import 2 fields');
    await page.getByTestId('import-confirm').click();

    await expect.poll(() => page.getByTestId('import-result').innerText(), { timeout: 15_000 }).toMatch(/Imported 2 fields: A1, A3/);
    await page.getByRole('button', { name: 'Done' }).click();
    await expect.poll(() => page.getByTestId('field-row').allInnerTexts(), { timeout: 15_000 }).toEqual([
      expect.stringContaining('A1'),
      expect.stringContaining('A3'),
    ]);
    expect(await Field.count({ where: { farmId: farm.id } })).toBe(2);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('leaves a repaired outline and a field already on the farm unticked, and takes the repair in one click', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const file = path.resolve('tests/fixtures/imports/bow-tie-field.geojson');
    const upper = JSON.parse(readFileSync(file, 'utf8')).features[1];
    await createField({ sequelize: app.sequelize }, { userId: users.farmer.id }, farm.id, { geometry: upper.geometry, name: 'Upper Flat' });
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await page.getByTestId('import-button').click();
    await page.getByTestId('import-file-input').setInputFiles(file);

    const rows = page.getByTestId('import-feature');
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(2);
    expect(await rows.nth(0).innerText()).toMatch(/crosses itself/);
    expect(await rows.nth(1).innerText()).toMatch(/the same as your field "Upper Flat"/);
    expect(await rows.nth(0).getByRole('checkbox').isChecked()).toBe(false);
    expect(await rows.nth(1).getByRole('checkbox').isChecked()).toBe(false);
    // The farm's field in grey, the repaired outline over its dashed original, and the duplicate.
    await expect.poll(() => page.locator('[data-testid="import-preview-map"] .leaflet-overlay-pane path').count()).toBe(4);
    await page.screenshot({ path: 'test-results/import-preview-warnings.png' });

    await rows.nth(0).getByRole('button', { name: 'Accept the repaired outline' }).click();
    expect(await rows.nth(0).getByRole('checkbox').isChecked()).toBe(true);
    await page.getByTestId('import-confirm').click();
    await expect.poll(() => page.getByTestId('import-result').innerText(), { timeout: 15_000 }).toMatch(/Imported 1 field: Crossed Corner/);
    expect(await Field.count({ where: { farmId: farm.id } })).toBe(2);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('says plainly when a file cannot be read, and stores nothing', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    const { page } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await page.getByTestId('import-button').click();
    await page.getByTestId('import-file-input').setInputFiles(path.resolve('tests/fixtures/imports/malformed.geojson'));
    await expect.poll(() => page.getByTestId('import-error').innerText(), { timeout: 15_000 }).toMatch(/cannot be imported[\s\S]*not valid JSON/);
    expect(await Field.count({ where: { farmId: farm.id } })).toBe(0);
    await page.close();
  });
});
