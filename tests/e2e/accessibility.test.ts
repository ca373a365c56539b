// Accessibility of the main screens, checked by axe-core (Deque's rule engine for WCAG 2.1 A/AA)
// in Chromium on the real build: no serious or critical violation on any of them. And the parts
// people most often cannot reach without a mouse: a dialog opened, used and closed from the
// keyboard, and the board's rows reachable by Tab.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { makePlanFarm } from '../helpers/plan-farm';
import { TEST_PASSWORD } from '../helpers/test-app';

// Evaluated through the DevTools protocol, which the app's Content-Security-Policy rightly does not allow as a script tag.
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

let app: Awaited<ReturnType<typeof startBrowserApp>>;
let farm: Awaited<ReturnType<typeof makePlanFarm>>;
beforeAll(async () => {
  app = await startBrowserApp();
  farm = await makePlanFarm(app.baseUrl, app.sequelize);
}, 120_000);
afterAll(() => app?.close());

type Violation = { id: string; impact: string | null; help: string; nodes: { target: string[] }[] };

/** axe-core's serious and critical findings on the page as it stands, in words a reviewer can act on. */
async function seriousViolations(page: Page): Promise<string[]> {
  await page.evaluate(axeSource);
  const violations = (await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: unknown[] }> } }).axe;
    return (await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] } })).violations;
  })) as Violation[];
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(' | ')}`);
}

const screens: { name: string; who: 'farmer' | 'advisor' | 'landowner'; href: (f: typeof farm) => string; ready: string }[] = [
  { name: 'Farms', who: 'farmer', href: () => '/farms', ready: 'farm-row' },
  { name: 'Farm map', who: 'farmer', href: (f) => `/farms/${f.farm.id}`, ready: 'field-row' },
  { name: 'Field, Outline tab', who: 'farmer', href: (f) => `/farms/${f.farm.id}/fields/${f.ids['Long Slope']}?tab=outline`, ready: 'outline-tab' },
  { name: 'Field, Soil tab', who: 'farmer', href: (f) => `/farms/${f.farm.id}/fields/${f.ids['Long Slope']}?tab=soil`, ready: 'soil-tab' },
  { name: 'Field, Cropping tab', who: 'farmer', href: (f) => `/farms/${f.farm.id}/fields/${f.ids['Long Slope']}?tab=cropping`, ready: 'cropping-panel' },
  { name: 'Field, Risk tab', who: 'farmer', href: (f) => `/farms/${f.farm.id}/fields/${f.ids['Long Slope']}?tab=risk`, ready: 'risk-tab' },
  { name: 'Priority board', who: 'advisor', href: (f) => `/farms/${f.farm.id}/board`, ready: 'board-row' },
  { name: 'Treatments and budget', who: 'farmer', href: (f) => `/farms/${f.farm.id}/budget`, ready: 'price-list' },
  { name: 'Season plan', who: 'advisor', href: (f) => `/farms/${f.farm.id}/plan`, ready: 'plan-state' },
  { name: 'Landowner view', who: 'landowner', href: (f) => `/farms/${f.farm.id}/approved-plan`, ready: 'landowner-plan' },
  { name: 'People', who: 'farmer', href: (f) => `/farms/${f.farm.id}/people`, ready: 'person-row' },
];

describe('accessibility of the main screens (axe-core, WCAG 2.1 AA rules)', () => {
  for (const s of screens) {
    it(`${s.name}: no serious or critical violation`, async () => {
      const { page, errors } = await signInPage(app.browser, app.baseUrl, farm.users[s.who].email, TEST_PASSWORD);
      await page.goto(`${app.baseUrl}${s.href(farm)}`);
      await page.getByTestId(s.ready).first().waitFor({ timeout: 20_000 });
      await page.waitForLoadState('networkidle');
      expect(await seriousViolations(page)).toEqual([]);
      expect(errors).toEqual([]);
      await page.close();
    });
  }

  it('the sign-in screen has no serious or critical violation', async () => {
    const page = await app.browser.newPage();
    await page.goto(`${app.baseUrl}/sign-in`);
    await page.getByTestId('sign-in').waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await page.close();
  });
});

describe('keyboard use', () => {
  const activeTestId = (page: Page) => page.evaluate(() => document.activeElement?.closest('[data-testid]')?.getAttribute('data-testid') ?? null);

  it('opens the import dialog from the keyboard, keeps Tab inside it, and Escape gives focus back', async () => {
    const { page } = await signInPage(app.browser, app.baseUrl, farm.users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.farm.id}`);
    const opener = page.getByTestId('import-button');
    await opener.focus();
    await page.keyboard.press('Enter');
    await page.getByTestId('import-dialog').waitFor();
    for (let i = 0; i < 12; i++) {
      await page.keyboard.press('Tab');
      expect(await page.evaluate(() => !!document.activeElement?.closest('[role="dialog"]'))).toBe(true);
    }
    await page.keyboard.press('Escape');
    await page.getByTestId('import-dialog').waitFor({ state: 'detached' });
    expect(await activeTestId(page)).toBe('import-button');
    await page.close();
  });

  it('names every map drawing tool and turns drawing on from the keyboard', async () => {
    const { page } = await signInPage(app.browser, app.baseUrl, farm.users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.farm.id}`);
    const draw = page.getByRole('button', { name: 'Draw a field outline point by point' });
    await draw.waitFor();
    // The icon-only tool buttons need a name; their pop-out actions (cancel, finish) carry text.
    expect(await page.locator('.leaflet-pm-toolbar a.leaflet-buttons-control-button:not([aria-label])').count()).toBe(0);
    await draw.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('.leaflet-pm-toolbar .button-container.active').count()).toBe(1);
    await page.keyboard.press('Escape');
    await page.close();
  });

  it('reaches the priority board’s rows with Tab and picks one with Enter', async () => {
    const { page } = await signInPage(app.browser, app.baseUrl, farm.users.advisor.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.farm.id}/board`);
    await page.getByTestId('board-row').first().waitFor();
    let reached = false;
    for (let i = 0; i < 60 && !reached; i++) {
      await page.keyboard.press('Tab');
      reached = (await activeTestId(page)) === 'board-row';
    }
    expect(reached).toBe(true);
    await page.keyboard.press('Enter');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-selected'))).toBe('true');
    await page.close();
  });
});
