// The whole loop through the real UI in Chromium, one person after another: a farmer registers
// and finishes the account from the mailed link, draws and imports fields, types the ground,
// a soil check and the season's cropping, sets the climate, reads the board and the Risk tab,
// puts a treatment into the season plan and sends it; the advisor joins from the mailed
// invitation and approves; a landowner joins for one field, reads the approved plan and saves
// its PDF. A screenshot of each step goes to test-results/journey/.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { startMailBrowserApp } from '../helpers/mail-browser-app';
import { pdfPageTexts } from '../helpers/pdf-text';

const SHOTS = path.resolve('test-results/journey');
const PASSWORD = 'a good long password for the journey';

let app: Awaited<ReturnType<typeof startMailBrowserApp>>;
let baseUrl: string;
let browser: Browser;

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  app = await startMailBrowserApp();
  ({ baseUrl, browser } = app);
});
afterAll(() => app?.close());

/** A fresh page (its own cookies) whose script errors and 5xx answers are collected, as signInPage does. */
async function watchedPage(errors: string[], who: string, viewport = { width: 1280, height: 900 }): Promise<Page> {
  const page = await browser.newPage({ viewport, serviceWorkers: 'block' });
  page.on('pageerror', (e) => errors.push(`${who}: ${e.message}`));
  page.on('console', (m) => m.type() === 'error' && !/status of 4\d\d/.test(m.text()) && errors.push(`${who}: ${m.text()}`));
  page.on('response', (r) => r.status() >= 500 && errors.push(`${who}: ${r.status()} ${r.url()}`));
  return page;
}

let step = 0;
/** A numbered screenshot of the whole page, or of the window only (e.g. scrolled to a part of a long page). */
async function shot(page: Page, name: string, fullPage = true) {
  step += 1;
  await page.screenshot({ path: path.join(SHOTS, `${String(step).padStart(2, '0')}-${name}.png`), fullPage });
}

/** The first link in the newest caught mail to an address, read from the Dev mailbox page. */
async function mailedLink(errors: string[], address: string, pathPart: RegExp): Promise<string> {
  const mailbox = await watchedPage(errors, 'mailbox');
  await mailbox.goto(`${baseUrl}/dev/mailbox`);
  const row = mailbox.getByTestId('mail-row').filter({ hasText: address }).first();
  // The mail goes out through the job queue: reload until it is caught.
  await expect
    .poll(
      async () => {
        if ((await row.count()) > 0) return true;
        await mailbox.reload();
        await mailbox.waitForTimeout(500);
        return (await row.count()) > 0;
      },
      { timeout: 30_000, interval: 500 },
    )
    .toBe(true);
  await row.getByRole('button').first().click();
  await shot(mailbox, `mailbox-${address.split('-')[0]}`);
  const link = await row.getByTestId('mail-link').first().getAttribute('href');
  expect(link).toMatch(pathPart);
  await mailbox.close();
  return link!;
}

describe('the whole loop in Chromium', () => {
  it('registers, maps, assesses, plans, has the plan approved and hands it to a landowner', { timeout: 300_000 }, async () => {
    const errors: string[] = [];
    const tag = randomUUID().slice(0, 8);
    const farmerEmail = `farmer-${tag}@example.test`;
    const advisorEmail = `advisor-${tag}@example.test`;
    const landownerEmail = `landowner-${tag}@example.test`;
    const farmName = `Journey farm ${tag}`;

    // 1. Registration answers "check your mail"; the mailed link finishes the account.
    const farmer = await watchedPage(errors, 'farmer');
    await farmer.goto(`${baseUrl}/register`);
    await farmer.getByTestId('register-name').fill('Fran Farmer');
    await farmer.getByTestId('register-email').fill(farmerEmail);
    await farmer.getByTestId('register-password').fill(PASSWORD);
    await farmer.getByTestId('register-farm-name').fill(farmName);
    await shot(farmer, 'register-form');
    await farmer.getByTestId('register-submit').click();
    await farmer.getByTestId('register-sent').waitFor({ timeout: 15_000 });
    await shot(farmer, 'register-check-your-mail');
    const confirmLink = await mailedLink(errors, farmerEmail, /\/confirm-account\?token=/);
    await farmer.goto(confirmLink);
    await farmer.getByTestId('confirm-account').click();
    const farmRow = farmer.getByTestId('farm-row').filter({ hasText: farmName });
    await farmRow.waitFor({ timeout: 15_000 });
    await shot(farmer, 'signed-in-own-farm');

    // 2. The farm map: import outlines through the preview (the self-crossing one is left unticked,
    // as offered), then draw one more.
    await farmRow.click();
    await farmer.waitForURL(/\/farms\/\d+$/);
    const farmId = Number(new URL(farmer.url()).pathname.split('/')[2]);
    await farmer.getByTestId('import-button').click();
    await farmer.getByTestId('import-file-input').setInputFiles(path.resolve('tests/fixtures/imports/three-fields.geojson'));
    await expect.poll(() => farmer.getByTestId('import-feature').count(), { timeout: 15_000 }).toBe(3);
    await expect.poll(() => farmer.locator('[data-testid="import-preview-map"] .leaflet-overlay-pane path').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(3);
    await shot(farmer, 'import-preview');
    await farmer.getByTestId('import-confirm').click();
    await expect.poll(() => farmer.getByTestId('import-result').innerText(), { timeout: 15_000 }).toMatch(/Imported 2 fields: .*North Ridge/);
    await farmer.getByRole('button', { name: 'Done' }).click();
    await expect.poll(() => farmer.getByTestId('field-row').count(), { timeout: 15_000 }).toBe(2);

    await farmer.locator('.leaflet-pm-icon-polygon').first().click();
    const box = (await farmer.locator('.leaflet-container').boundingBox())!;
    const pts = [
      [box.x + box.width * 0.08, box.y + box.height * 0.2],
      [box.x + box.width * 0.18, box.y + box.height * 0.2],
      [box.x + box.width * 0.13, box.y + box.height * 0.45],
    ];
    for (const [x, y] of pts) {
      await farmer.mouse.click(x, y);
      await farmer.waitForTimeout(150);
    }
    await farmer.mouse.click(pts[0][0], pts[0][1]);
    await expect.poll(() => farmer.getByTestId('field-row').count(), { timeout: 15_000 }).toBe(3);
    await shot(farmer, 'farm-map-three-fields');

    // 3. One field's inputs: typed ground, a feel-test soil check, the season's cropping.
    // The row whose own name is North Ridge (a field that overlaps it names it too).
    await farmer.getByTestId('field-row').filter({ hasText: /^\s*North Ridge/ }).click();
    await farmer.getByTestId('open-field-screen').click();
    await farmer.waitForURL(/\/fields\/\d+/);
    const fieldId = Number(/\/fields\/(\d+)/.exec(farmer.url())![1]);
    const fieldUrl = (tab: string) => `${baseUrl}/farms/${farmId}/fields/${fieldId}?tab=${tab}`;

    await farmer.goto(fieldUrl('ground'));
    await farmer.getByTestId('ground-slope').fill('8');
    await farmer.getByTestId('ground-length').fill('60');
    await farmer.getByTestId('ground-save').click();
    await farmer.getByTestId('ground-last-change').waitFor({ timeout: 15_000 });
    expect(await farmer.getByTestId('ground-missing').count()).toBe(0);
    await shot(farmer, 'ground-typed');

    await farmer.goto(fieldUrl('soil'));
    await farmer.getByTestId('add-feel-test').click({ timeout: 15_000 });
    // Thien (1979) feel key: balls, medium ribbon (2.5–5 cm), very smooth → silty clay loam.
    await farmer.getByTestId('feel-balls-yes').click();
    await farmer.getByTestId('feel-ribbon-medium').click();
    await farmer.getByTestId('feel-grit-smooth').click();
    await expect.poll(() => farmer.getByTestId('feel-result').innerText()).toMatch(/silty clay loam/);
    await farmer.getByTestId('sample-label').fill('Journey pit');
    await shot(farmer, 'soil-feel-test');
    await farmer.getByTestId('feel-save').click();
    await expect.poll(() => farmer.getByTestId('soil-tab').innerText(), { timeout: 15_000 }).toContain('Journey pit');
    await shot(farmer, 'soil-check-kept');

    await farmer.goto(fieldUrl('cropping'));
    await farmer.getByTestId('season-add').click({ timeout: 15_000 });
    await farmer.getByTestId('season-new-label').fill('2027');
    await farmer.getByTestId('season-create').click();
    await expect.poll(() => farmer.getByTestId('season-select').inputValue(), { timeout: 15_000 }).toBe('2027');
    await farmer.getByTestId('cropping-crop').selectOption('corn');
    await farmer.getByTestId('cropping-tillage').selectOption('moldboard plough');
    await farmer.getByTestId('cropping-save').click();
    await farmer.getByTestId('cropping-saved').waitFor({ timeout: 15_000 });
    await shot(farmer, 'cropping-saved');

    // 4. The board: the climate (R typed, as published for the farm's area) and the fields.
    await farmer.goto(`${baseUrl}/farms/${farmId}/board?season=2027`);
    await farmer.getByTestId('climate-form').waitFor({ timeout: 15_000 });
    await farmer.getByTestId('climate-r-from').getByText('Type R').click();
    await farmer.getByTestId('climate-r-value').fill('2500');
    await farmer.getByTestId('climate-storm').fill('100');
    await farmer.getByTestId('climate-save').click();
    // Once saved, the climate panel folds away to its summary.
    await farmer.getByTestId('climate-summary').waitFor({ state: 'attached', timeout: 15_000 });
    expect(await farmer.getByTestId('climate-missing').count()).toBe(0);
    await expect.poll(() => farmer.getByTestId('board-row').count(), { timeout: 15_000 }).toBe(3);
    // The assessed field ranks first; the other two say what they are missing.
    await expect.poll(() => farmer.getByTestId('board-row').first().innerText(), { timeout: 15_000 }).toContain('North Ridge');
    expect(await farmer.getByTestId('board-row').first().innerText()).not.toContain('Not assessed');
    await shot(farmer, 'priority-board');

    // The Risk tab's figures and what to do about them; one option goes into the plan.
    await farmer.goto(`${fieldUrl('risk')}&season=2027`);
    await farmer.getByTestId('assessment-soil-loss').waitFor({ timeout: 15_000 });
    const option = farmer.getByTestId('treatment-option').first();
    await option.waitFor({ timeout: 15_000 });
    await shot(farmer, 'risk-tab-figures');
    await farmer.getByTestId('what-to-do').scrollIntoViewIfNeeded();
    await shot(farmer, 'risk-tab-what-to-do', false);
    await option.getByTestId('option-add-to-plan').click();
    await option.getByTestId('option-added').waitFor({ timeout: 15_000 });

    await farmer.goto(`${baseUrl}/farms/${farmId}/budget?season=2027`);
    await farmer.getByTestId('budget-planner').waitFor({ timeout: 15_000 });
    await shot(farmer, 'treatments-and-budget');

    await farmer.goto(`${baseUrl}/farms/${farmId}/plan?season=2027`);
    await farmer.getByTestId('plan-field').waitFor({ timeout: 15_000 });
    expect(await farmer.getByTestId('plan-action').count()).toBeGreaterThan(0);
    await farmer.getByTestId('plan-submit').click();
    const farmerBar = farmer.getByTestId('review-bar');
    await expect.poll(() => farmerBar.getByTestId('plan-state').getAttribute('data-state'), { timeout: 15_000 }).toBe('submitted');
    await shot(farmer, 'plan-submitted');

    // 5. The advisor is invited on People and joins from the mailed link, then approves.
    await farmer.goto(`${baseUrl}/farms/${farmId}/people`);
    await farmer.getByTestId('invite-email').fill(advisorEmail);
    await farmer.getByTestId('invite-role').getByText('Advisor').click();
    await farmer.getByTestId('invite-send').click();
    await farmer.getByTestId('invite-sent').waitFor({ timeout: 15_000 });
    await shot(farmer, 'people-advisor-invited');
    const advisorLink = await mailedLink(errors, advisorEmail, /\/invitations\//);

    const advisor = await watchedPage(errors, 'advisor');
    await advisor.goto(advisorLink);
    await advisor.getByTestId('invitation-summary').waitFor({ timeout: 15_000 });
    expect(await advisor.getByTestId('invitation-summary').innerText()).toContain(farmName);
    await advisor.getByTestId('accept-name').fill('Ada Advisor');
    await advisor.getByTestId('accept-password').fill(PASSWORD);
    await shot(advisor, 'advisor-accepts');
    await advisor.getByTestId('accept-join').click();
    await advisor.waitForURL(`${baseUrl}/farms/${farmId}`);
    await advisor.goto(`${baseUrl}/farms/${farmId}/plan?season=2027`);
    const advisorBar = advisor.getByTestId('review-bar');
    await expect.poll(() => advisorBar.getByTestId('plan-state').getAttribute('data-state'), { timeout: 15_000 }).toBe('submitted');
    await advisor.getByTestId('plan-approve-open').click();
    await advisor.getByTestId('review-comment').fill('Good plan. Do the work before the spring rains.');
    await advisor.getByTestId('plan-approve').click();
    await expect.poll(() => advisorBar.getByTestId('plan-state').getAttribute('data-state'), { timeout: 15_000 }).toBe('approved');
    expect(await advisor.getByTestId('plan-stamp').innerText()).toContain('Approved by Ada Advisor');
    await shot(advisor, 'plan-approved');
    await advisor.close();

    // 6. A landowner is invited for North Ridge, joins from the mail, reads the plan and its PDF.
    await farmer.goto(`${baseUrl}/farms/${farmId}/people`);
    await farmer.getByTestId('invite-role').getByText('Landowner').click();
    await farmer.getByTestId('invite-fields').getByLabel('North Ridge').check();
    await farmer.getByTestId('invite-email').fill(landownerEmail);
    await farmer.getByTestId('invite-send').click();
    await farmer.getByTestId('invite-sent').waitFor({ timeout: 15_000 });
    await shot(farmer, 'people-landowner-invited');
    const landownerLink = await mailedLink(errors, landownerEmail, /\/invitations\//);

    const landowner = await watchedPage(errors, 'landowner');
    await landowner.goto(landownerLink);
    await landowner.getByTestId('invitation-summary').waitFor({ timeout: 15_000 });
    await landowner.getByTestId('accept-name').fill('Lee Landowner');
    await landowner.getByTestId('accept-password').fill(PASSWORD);
    await landowner.getByTestId('accept-join').click();
    await landowner.waitForURL(new RegExp(`/farms/${farmId}`));
    await landowner.goto(`${baseUrl}/farms/${farmId}/approved-plan?season=2027`);
    await landowner.getByTestId('landowner-plan').waitFor({ timeout: 15_000 });
    expect(await landowner.getByTestId('landowner-field').count()).toBe(1);
    expect(await landowner.getByTestId('landowner-field').innerText()).toContain('North Ridge');
    expect(await landowner.getByTestId('landowner-approved-by').innerText()).toContain('Ada Advisor');
    await shot(landowner, 'landowner-approved-plan');
    const [download] = await Promise.all([
      landowner.waitForEvent('download', { timeout: 30_000 }),
      landowner.getByTestId('plan-report-button').getByRole('button').click(),
    ]);
    const pdf = readFileSync((await download.path())!);
    expect(download.suggestedFilename()).toMatch(/-2027-season-plan\.pdf$/);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect((await pdfPageTexts(pdf)).join(' ').replace(/\s+/g, ' ')).toContain('North Ridge');
    await shot(landowner, 'landowner-pdf-saved');
    await landowner.close();

    expect(errors).toEqual([]);
    await farmer.close();
  });
});
