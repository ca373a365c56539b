// A farmer signs in, opens the farm map, draws a field and sees its area in the list.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeFarm, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { createField } from '../../server/services/fields.service';
import { signInPage, startBrowserApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

describe('farm map in Chromium', () => {
  it('signs in, draws a field and lists it with its area in hectares', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    await createField({ sequelize: app.sequelize }, { userId: users.farmer.id }, farm.id, { geometry: squareFeature(-91.78, 42.31, 300).geometry, name: 'Home Paddock' });
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
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
