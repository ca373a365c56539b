// A farmer uploads an elevation model in the browser, watches the progress bar, then sees the
// layers and the field's slope figures.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import proj4 from 'proj4';
import { createField } from '../../server/services/fields.service';
import { writeGeoTiff } from '../../server/services/terrain';
import { makeFarm, TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';

const UTM15N = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';
let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp({ withJobs: true });
});
afterAll(() => app?.close());

describe('elevation model in Chromium', () => {
  it('uploads a DEM, shows progress, then layers and the field’s slope', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    // A plane rising 5 m per 100 m eastward over 2 km (1000 × 1000 cells of 2 m): slope 5 % (analytic).
    const size = 1000, cell = 2, e0 = 600000, n1 = 4686000;
    const z = new Float32Array(size * size);
    for (let r = 0; r < size; r++) for (let c = 0; c < size; c++) z[r * size + c] = 100 + 0.05 * (c + 0.5) * cell;
    const demPath = path.join(app.tmp, 'plane.tif');
    writeFileSync(demPath, writeGeoTiff({ width: size, height: size, samples: z, originX: e0, originY: n1, cellSizeX: cell, cellSizeY: cell, epsg: 32615, nodata: -9999 }));
    const ring = [[e0 + 500, n1 - 1500], [e0 + 1500, n1 - 1500], [e0 + 1500, n1 - 500], [e0 + 500, n1 - 500], [e0 + 500, n1 - 1500]].map((p) => proj4(UTM15N, 'WGS84', p) as [number, number]);
    await createField({ sequelize: app.sequelize }, { userId: users.farmer.id }, farm.id, { geometry: { type: 'Polygon', coordinates: [ring] }, name: 'Plane field' });

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await page.getByTestId('field-row').first().waitFor();

    await page.getByTestId('dem-file-input').setInputFiles(demPath);
    await page.getByTestId('terrain-progress').waitFor({ timeout: 15_000 });
    // The layers arrive when the job is done.
    await page.getByTestId('layer-switcher').waitFor({ timeout: 30_000 });
    await expect.poll(() => page.locator('[data-testid^="layer-option-"]').count(), { timeout: 30_000 }).toBeGreaterThanOrEqual(4);
    await expect.poll(() => page.locator('.leaflet-image-layer').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(1);

    await page.getByTestId('field-row').first().click();
    const slope = page.getByTestId('terrain-mean-slope');
    await slope.waitFor({ timeout: 15_000 });
    expect(await slope.innerText()).toMatch(/^5\.0\s*%$/);
    await page.screenshot({ path: 'test-results/terrain.png' });
    expect(errors).toEqual([]);
    await page.close();
  });
});
