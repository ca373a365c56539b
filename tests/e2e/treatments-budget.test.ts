// Treatments and budget in Chromium, on fields made from the demo scenario's files (data/demo):
// the board's treatments view gives each field its best option and cost; the budget screen gives
// a plan for a typed budget, within it, with its reasons and chart; a price is changed and loses
// its "example value" words.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { makeDemoLikeFarm } from '../helpers/demo-like-farm';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

const money = (text: string) => Number(text.replace(/[^\d.]/g, ''));

describe('treatments and budget in Chromium', () => {
  it('shows each field’s best treatment and cost on the board', async () => {
    const { farm, users, season } = await makeDemoLikeFarm(app.sequelize);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.advisor.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/board?season=${season}`);
    await expect.poll(() => page.getByTestId('board-row').count(), { timeout: 15_000 }).toBe(3);
    await page.getByTestId('board-view-treatments').click();
    await page.getByTestId('board-best-treatment').first().waitFor({ timeout: 15_000 });
    // The worst field ranks first and has a best option with a cost.
    const first = page.getByTestId('board-row').first();
    expect(await first.innerText()).toContain('Long Slope');
    expect(await first.getByTestId('board-best-cost').innerText()).toMatch(/^\$[\d,]+/);
    await page.screenshot({ path: 'test-results/board-treatments.png', fullPage: true });
    await page.getByTestId('board-budget-link').click();
    await page.getByTestId('budget-planner').waitFor({ timeout: 15_000 });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('plans a typed budget and changes a price', async () => {
    const { farm, users } = await makeDemoLikeFarm(app.sequelize);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}`);
    await page.getByTestId('nav-budget').click();
    await page.getByTestId('price-form').waitFor({ timeout: 15_000 });

    // Every price starts as an example value.
    const examples = await page.getByTestId('price-example').count();
    expect(examples).toBeGreaterThan(0);
    await expect.poll(() => page.getByTestId('price-example').first().innerText()).toBe('example value — replace with your local figure');

    await page.getByTestId('budget-amount').fill('2500');
    await page.getByTestId('budget-submit').click();
    await page.getByTestId('budget-plan').waitFor({ timeout: 15_000 });
    expect(money(await page.getByTestId('budget-spent').innerText())).toBeLessThanOrEqual(2500);
    expect(await page.getByTestId('budget-plan-row').count()).toBeGreaterThan(0);
    expect(await page.getByTestId('budget-explanation').locator('li').count()).toBeGreaterThan(0);
    await page.getByTestId('budget-chart').waitFor();
    expect(await page.getByTestId('budget-saved').innerText()).toMatch(/t\/yr$/);

    // The other goal is a plan too.
    await page.getByTestId('budget-goal').getByText('Bring the most fields under T').click();
    await page.getByTestId('budget-submit').click();
    await expect.poll(async () => (await page.getByTestId('budget-fields-under-t').innerText()).length, { timeout: 15_000 }).toBeGreaterThan(0);

    // A price changed by the farmer is no longer an example value.
    await page.getByTestId('price-cover-crop-per-ha').fill('95');
    await page.getByTestId('price-save').click();
    await page.getByTestId('prices-saved').waitFor({ timeout: 15_000 });
    await expect.poll(() => page.getByTestId('price-example').count()).toBe(examples - 1);
    expect(await page.getByTestId('price-cover-crop-per-ha').inputValue()).toBe('95');
    await page.screenshot({ path: 'test-results/budget.png', fullPage: true });

    // A bad price is refused with the field named, and nothing is sent.
    await page.getByTestId('price-lime-per-t').fill('-4');
    await page.getByTestId('price-save').click();
    await page.getByText('Must be at least 0').waitFor();
    expect(errors).toEqual([]);
    await page.close();
  });

  it('keeps the landowner out of the budget', async () => {
    const { farm, users } = await makeDemoLikeFarm(app.sequelize, []);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.landowner.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/budget`);
    await page.getByTestId('budget-not-for-landowner').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('price-form').count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });
});
