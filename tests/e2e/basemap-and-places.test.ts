// The farm map on web basemaps served by a local fake tile server (never the internet): the
// default base draws with its attribution, the person switches bases and the choice is kept,
// finds a place by name (through the local fake geocoder) and by typed coordinates, and with a
// base out of reach sees a calm note while the farm's relief and fields still show.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import path from 'node:path';
import { createField } from '../../server/services/fields.service';
import { startFakeGeocoder, type FakeGeocoder } from '../../server/services/places/fake-geocoder-server';
import { makeFarm, TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { startFakeTileServer, tileOf } from '../helpers/fake-tile-server';
import { planeDem, utmSquare } from '../helpers/terrain-fixtures';

/** A port nothing listens on: the "aerial" base there is out of reach. */
async function closedPort(): Promise<number> {
  const s = createServer();
  await new Promise<void>((r) => s.listen(0, '127.0.0.1', () => r()));
  const { port } = s.address() as { port: number };
  await new Promise<void>((r) => s.close(() => r()));
  return port;
}

let app: Awaited<ReturnType<typeof startBrowserApp>>;
let tiles: Awaited<ReturnType<typeof startFakeTileServer>>;
let geocoder: FakeGeocoder;
beforeAll(async () => {
  tiles = await startFakeTileServer();
  geocoder = await startFakeGeocoder();
  app = await startBrowserApp({
    withJobs: true,
    env: {
      STREET_TILE_URL: tiles.template('streets'),
      TOPO_TILE_URL: tiles.template('topo'),
      TILE_URL: `http://127.0.0.1:${await closedPort()}/imagery/{z}/{x}/{y}.png`,
      TILE_ATTRIBUTION: '© Test imagery',
      GEOCODER_URL: geocoder.url,
    },
  });
});
afterAll(async () => {
  await app?.close();
  await tiles?.close();
  await geocoder?.close();
});

/** True once the fake served a tile of `base` at zoom z holding the point. */
const servedTileAt = (base: string, lng: number, lat: number, z: number) => {
  const t = tileOf(lng, lat, z);
  return tiles.requests.some((r) => r.base === base && r.z === z && r.x === t.x && r.y === t.y);
};

describe('basemaps and place search in Chromium', () => {
  it('draws the default base with its credit, switches bases, finds places, and copes with a base out of reach', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    // A 200 m field on a 400 m plane DEM (UTM 15N), so the farm has its own shaded relief.
    const field = utmSquare(600100, 4684100, 200, 'Relief field');
    await createField({ sequelize: app.sequelize }, { userId: users.farmer.id }, farm.id, { geometry: field.geometry as never, name: 'Relief field' });
    const demPath = path.join(app.tmp, 'plane.tif');
    writeFileSync(demPath, planeDem(600000, 4684400));

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await page.getByTestId('field-row').first().waitFor();

    // The default base: roads and places, drawn from the fake, with its credit on the map.
    await expect.poll(() => tiles.count('streets'), { timeout: 15_000 }).toBeGreaterThan(0);
    await expect.poll(() => page.locator('.leaflet-tile-loaded').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    expect(await page.locator('.leaflet-control-attribution').innerText()).toContain('© OpenStreetMap contributors');
    expect(await page.getByTestId('basemap-picker').inputValue()).toBe('streets');

    // The farm's relief, made by a terrain run, under the fields.
    await page.getByTestId('dem-file-input').setInputFiles(demPath);
    await page.locator('img[alt="Shaded relief of the farm"]').waitFor({ timeout: 45_000 });

    // Another base; the choice is kept after a reload.
    const topoBefore = tiles.count('topo');
    await page.getByTestId('basemap-picker').selectOption('topo');
    await expect.poll(() => tiles.count('topo'), { timeout: 15_000 }).toBeGreaterThan(topoBefore);
    await expect.poll(() => page.locator('.leaflet-control-attribution').innerText()).toContain('OpenTopoMap');
    // The old base's credit went with it: OpenStreetMap is named once, in the new base's credit.
    expect((await page.locator('.leaflet-control-attribution').innerText()).match(/OpenStreetMap/g)).toHaveLength(1);
    await page.reload();
    await page.getByTestId('field-row').first().waitFor();
    expect(await page.getByTestId('basemap-picker').inputValue()).toBe('topo');

    // A place by name: the fake geocoder's invented town; choosing it flies there (tiles at zoom 15 around it).
    const searches = geocoder.requests();
    await page.getByTestId('place-search-input').fill('Marrowby');
    await page.getByTestId('place-search-submit').click();
    await page.getByTestId('place-result').first().waitFor();
    expect(await page.getByTestId('place-result').first().innerText()).toContain('Marrowby');
    await page.getByTestId('place-result').first().click();
    await expect.poll(() => servedTileAt('topo', -91.805, 42.342, 15), { timeout: 15_000 }).toBe(true);
    expect(geocoder.requests()).toBe(searches + 1);
    await expect.poll(() => page.locator('.leaflet-tooltip').filter({ hasText: 'Marrowby' }).count()).toBe(1);

    // A name nobody knows.
    await page.getByTestId('place-search-input').fill('Nowhere Special');
    await page.getByTestId('place-search-submit').click();
    await expect.poll(() => page.getByTestId('place-search-message').innerText()).toContain('No place matching “Nowhere Special” was found');

    // Typed coordinates, read in the browser with no service: 42°18'25.6"N 91°46'37.2"W is
    // 42 + 18/60 + 25.6/3600 = 42.307111 N, 91 + 46/60 + 37.2/3600 = 91.777 W (by hand).
    const before = geocoder.requests();
    await page.getByTestId('place-search-input').fill('42°18\'25.6"N 91°46\'37.2"W');
    await page.getByTestId('place-search-submit').click();
    await expect.poll(() => servedTileAt('topo', -91.777, 42.307111, 16), { timeout: 15_000 }).toBe(true);
    expect(geocoder.requests()).toBe(before);
    // Coordinates that cannot be: told what is wrong, the map stays.
    await page.getByTestId('place-search-input').fill('95.5, -91.7');
    await page.getByTestId('place-search-submit').click();
    await expect.poll(() => page.getByTestId('place-search-message').innerText()).toContain('Latitude runs from -90 to 90');

    // Back to the farm, then a base that cannot be reached: a calm note; the relief and the field still show.
    await page.getByTestId('field-row').first().click();
    await page.getByTestId('basemap-picker').selectOption('imagery');
    await page.getByTestId('basemap-unreachable').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('basemap-unreachable').innerText()).toContain('“Aerial photos” could not be reached');
    expect(await page.locator('.leaflet-control-attribution').innerText()).toContain('© Test imagery');
    expect(await page.locator('img[alt="Shaded relief of the farm"]').isVisible()).toBe(true);
    expect(await page.locator('.leaflet-overlay-pane path').count()).toBeGreaterThanOrEqual(1);
    await page.screenshot({ path: 'test-results/basemap-unreachable.png' });
    // Choosing a base that answers takes the note away.
    await page.getByTestId('basemap-picker').selectOption('streets');
    await expect.poll(() => page.getByTestId('basemap-unreachable').count(), { timeout: 15_000 }).toBe(0);

    // Refused connections to the unreachable base are the point of the last step, not faults.
    expect(errors.filter((e) => !/ERR_CONNECTION_REFUSED/.test(e))).toEqual([]);
    await page.close();
  });
});
