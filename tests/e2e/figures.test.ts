// What people read on the main screens, in Chromium, on fields made from the demo scenario's
// files: no figure prints raw floating point or more digits than it carries, in hectares and in
// acres; the header says where you are, farm first; the quick estimate takes T in its stated SI.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { makeDemoLikeFarm } from '../helpers/demo-like-farm';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

/** Raw floating point ("12.498867301083864 %", "1466.3499"), or a long figure without thousands separators. */
const RAW_FIGURE = /\d\.\d{4,}|(?<![\d.,:#-])\d{5,}(?!\d)/g;

/** A field's position prints five decimals of a degree (about a metre): the one place such digits belong. */
const withoutPositions = (text: string) => text.replace(/\d+\.\d{5}° [NSEW]/g, '');

/** Raw figures on the page, leaving out the test farm's name (its random hex tag can read as digits). */
async function rawFiguresOn(page: Page, url: string, ready: string, farmName: string): Promise<string[]> {
  await page.goto(url);
  await page.getByTestId(ready).first().waitFor({ timeout: 20_000 });
  return withoutPositions((await page.locator('body').innerText()).replaceAll(farmName, '')).match(RAW_FIGURE) ?? [];
}

describe('figures on the main screens', () => {
  it('prints no raw floating point on the board, the field tabs, the budget and the plan, in either unit system', async () => {
    const { farm, users, ids, season } = await makeDemoLikeFarm(app.sequelize);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    const field = `${app.baseUrl}/farms/${farm.id}/fields/${ids['Long Slope']}`;
    const screens: [string, string][] = [
      [`${app.baseUrl}/farms/${farm.id}/board?season=${season}`, 'board-row'],
      [`${field}?tab=risk&season=${season}`, 'what-to-do'],
      [`${field}?tab=soil`, 'texture-triangle'],
      [`${field}?tab=outline`, 'field-tab-outline'],
      [`${app.baseUrl}/farms/${farm.id}/budget`, 'budget-planner'],
      [`${app.baseUrl}/estimate`, 'estimate-form'],
    ];
    for (const units of ['ha', 'ac'] as const) {
      expect((await page.request.patch(`${app.baseUrl}/api/auth/me`, { data: { units } })).status()).toBe(200);
      for (const [url, ready] of screens) expect([units, url, await rawFiguresOn(page, url, ready, farm.name)]).toEqual([units, url, []]);
    }
    expect(errors).toEqual([]);
    await page.close();
  });

  it('writes the Risk tab’s inputs in the reader’s units: metres and mm for hectares, feet and inches for acres', async () => {
    const { farm, users, ids } = await makeDemoLikeFarm(app.sequelize);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    const risk = `${app.baseUrl}/farms/${farm.id}/fields/${ids['Mill Hill']}?tab=risk`;
    const seen: Record<string, string[]> = {};
    for (const units of ['ha', 'ac'] as const) {
      expect((await page.request.patch(`${app.baseUrl}/api/auth/me`, { data: { units } })).status()).toBe(200);
      await page.goto(risk);
      await page.getByTestId('input-length').waitFor({ timeout: 20_000 });
      seen[units] = await Promise.all(['input-length', 'input-storm', 'input-t'].map((id) => page.getByTestId(id).locator('.num').innerText()));
    }
    expect(seen.ha[0]).toMatch(/^\d[\d,]* m$/);
    expect(seen.ac[0]).toMatch(/^\d[\d,]* ft$/);
    expect(seen.ha[1]).toMatch(/ mm$/);
    expect(seen.ac[1]).toMatch(/ in$/);
    expect(seen.ha[2]).toMatch(/ t\/ha\/yr$/);
    expect(seen.ac[2]).toMatch(/ t\/ac\/yr$/);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('names the farm, then the field, in the header of a field', async () => {
    const { farm, users, ids } = await makeDemoLikeFarm(app.sequelize);
    const { page } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${ids['Mill Hill']}`);
    const nav = page.getByRole('navigation', { name: 'Where you are' });
    await expect.poll(() => nav.getByTestId('screen-name').innerText(), { timeout: 15_000 }).toBe('Mill Hill');
    // The farm's name arrives with its own query, a moment after the field's.
    await expect.poll(async () => (await nav.innerText()).replace(/\s+/g, ' ').trim(), { timeout: 15_000 }).toBe(`/ ${farm.name} / Mill Hill`);
    await page.close();
  });

  it('takes T in t/ha/yr on the quick estimate, whose inputs are SI, and converts it for the engine', async () => {
    const { users } = await makeDemoLikeFarm(app.sequelize, []);
    const { page } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/estimate`);
    const input = page.getByTestId('input-t');
    const group = page.getByTestId('estimate-t');
    await input.waitFor({ timeout: 15_000 });
    expect(await group.innerText()).toContain('Soil-loss tolerance T (t/ha/yr)');
    await input.fill('11.2');
    // 11.2 t/ha/yr ÷ 2.2417 (t/ha per US t/ac, AH-703 app. A) = 5.0 US t/ac/yr.
    await expect.poll(() => group.innerText()).toContain('= 5.00 US t/ac/yr');
    // T beyond what the estimate takes (10 US t/ac/yr = 22.4 t/ha/yr) is named beside the input, in t/ha/yr.
    await input.fill('30');
    await expect.poll(() => group.innerText()).toContain('Soil-loss tolerance T must be between 1.12 and 22.4 t/ha/yr');
    // No wording about the machinery behind the page.
    expect(await page.locator('body').innerText()).not.toMatch(/server/i);
    await page.close();
  });
});
