// The Risk tab's "What to do about it": the worst field of the demo scenario (steep, ploughed
// continuous corn; data/demo) gets options under T with their amounts and cost, and ticking a
// treatment in the what-if changes A on screen at once (the engine runs in the browser).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { DEMO_LIKE_FIELDS, makeDemoLikeFarm } from '../helpers/demo-like-farm';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

const number = (text: string) => Number(/[\d,]+(\.\d+)?/.exec(text)![0].replace(/,/g, ''));

describe('what to do about a field, in Chromium', () => {
  it('shows the cheapest way under T with amounts and cost, and the what-if moves A', async () => {
    const { farm, users, ids, season } = await makeDemoLikeFarm(app.sequelize, DEMO_LIKE_FIELDS.slice(0, 1));
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${ids['Long Slope']}?tab=risk&season=${season}`);
    await page.getByTestId('what-to-do').waitFor({ timeout: 15_000 });

    // Over T now (the board's worst field), so one option is marked the cheapest way under T.
    const cheapest = page.getByTestId('cheapest-under-t');
    await cheapest.waitFor({ timeout: 15_000 });
    expect((await page.getByTestId('cheapest-title').innerText()).length).toBeGreaterThan(0);
    expect(await page.getByTestId('cheapest-cost').innerText()).toMatch(/^\$[\d,]+(\.\d\d)?$/);
    expect(await cheapest.getByTestId('treatment-quantities').locator('li').count()).toBeGreaterThan(0);
    expect(await page.getByTestId('treatment-option').count()).toBeGreaterThan(1);
    expect(await page.getByTestId('treatment-options').getByText('cheapest way under T').count()).toBe(1);

    // The what-if: nothing ticked, then a cover crop.
    const before = number(await page.getByTestId('whatif-now-a').innerText());
    await page.getByTestId('whatif-none').waitFor();
    await page.getByTestId('whatif-cover-crop').locator('input').check();
    const after = number(await page.getByTestId('whatif-with-a').innerText());
    expect(after).toBeLessThan(before);
    expect(await page.getByTestId('whatif-cost').innerText()).toMatch(/^\$/);

    // Moving to no-till lowers it further; taking the cover crop away again raises it.
    await page.getByTestId('whatif-no-till').locator('input').check();
    const both = number(await page.getByTestId('whatif-with-a').innerText());
    expect(both).toBeLessThan(after);
    await page.getByTestId('whatif-cover-crop').locator('input').uncheck();
    expect(number(await page.getByTestId('whatif-with-a').innerText())).toBeGreaterThan(both);

    await page.getByTestId('what-to-do').screenshot({ path: 'test-results/field-what-to-do-desktop.png' });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByTestId('whatif').screenshot({ path: 'test-results/field-what-if-phone.png' });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('shows the landowner no treatments', async () => {
    const { farm, users, ids, season, memberships } = await makeDemoLikeFarm(app.sequelize, DEMO_LIKE_FIELDS.slice(2, 3));
    const { Field } = await import('../../server/models');
    await Field.update({ ownerMembershipId: memberships.landowner.id }, { where: { id: ids['Hay Ground'] } });
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.landowner.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${ids['Hay Ground']}?tab=risk&season=${season}`);
    await page.getByTestId('risk-tab').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('what-to-do').count()).toBe(0);
    expect(await page.getByTestId('nav-budget').count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });
});
