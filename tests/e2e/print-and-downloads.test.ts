// Paper and files from the screens: the Field screen's Risk tab and the priority board print
// whole (Chromium's own print to PDF, read back with PDF.js); the board saves as CSV from its
// screen; the farm map hands out the fields as CSV and the season plan as PDF, with progress
// shown while the server makes the report.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { makePlanFarm } from '../helpers/plan-farm';
import { pdfPageTexts } from '../helpers/pdf-text';
import { TEST_PASSWORD } from '../helpers/test-app';
import { CAUTION_SHEET_AND_RILL } from '../../shared/erosion/estimate';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
let farm: Awaited<ReturnType<typeof makePlanFarm>>;
beforeAll(async () => {
  app = await startBrowserApp();
  farm = await makePlanFarm(app.baseUrl, app.sequelize);
  mkdirSync('test-results', { recursive: true });
});
afterAll(() => app?.close());

const squash = (s: string) => s.replace(/\s+/g, ' ');

/** Prints the page as Chromium does (print media, A4) and reads the pages' text back. */
async function printed(page: Page, path: string): Promise<string[]> {
  const pdf = await page.pdf({ format: 'A4', printBackground: true, path });
  return (await pdfPageTexts(pdf)).map(squash);
}

async function saved(page: Page, click: () => Promise<void>): Promise<{ name: string; body: Buffer }> {
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 20_000 }), click()]);
  return { name: download.suggestedFilename(), body: readFileSync((await download.path())!) };
}

describe('printing and downloads in Chromium', () => {
  it('prints the Risk tab whole, down to its cautions', async () => {
    const { page, errors } = await signInPage(app.browser, app.baseUrl, farm.users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.farm.id}/fields/${farm.ids['Long Slope']}?tab=risk&season=${farm.season}`);
    await page.getByTestId('assessment-soil-loss').waitFor({ timeout: 15_000 });
    await page.getByTestId('factor-table').waitFor();
    const pages = await printed(page, 'test-results/risk-tab-print.pdf');
    const all = pages.join(' ');
    // On screen the tab scrolls inside its pane; on paper it runs over more than one page, to the end.
    expect(pages.length).toBeGreaterThan(1);
    expect(all).toContain('Where the figures come from');
    expect(all).toContain('Before you act on these figures');
    expect(all).toContain(CAUTION_SHEET_AND_RILL);
    // Controls that do nothing on paper are left off.
    expect(all).not.toContain('Area in');
    expect(errors).toEqual([]);
    await page.close();
  });

  it('prints the board whole and saves it as CSV from its screen', async () => {
    const { page, errors } = await signInPage(app.browser, app.baseUrl, farm.users.advisor.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.farm.id}/board?season=${farm.season}`);
    await page.getByTestId('board-csv').waitFor({ timeout: 15_000 });
    // The chart loads on demand: print once it is there.
    await page.getByTestId('board-chart').waitFor({ timeout: 15_000 });
    const all = (await printed(page, 'test-results/board-print.pdf')).join(' ');
    for (const name of ['Long Slope', 'Mill Hill', 'Hay Ground']) expect(all).toContain(name);
    expect(all).toContain('Soil lost against what the soil can stand');
    expect(all).not.toContain('Save the board as CSV');

    const csv = await saved(page, () => page.getByTestId('board-csv').click());
    expect(csv.name).toBe(`${farm.farm.name.toLowerCase().replace(/[^a-z0-9]+/g, '-')}-${farm.season}-board.csv`);
    const rows = parse(csv.body, { columns: true, bom: true }) as Record<string, string>[];
    expect(rows.map((r) => r.field)).toEqual(['Long Slope', 'Mill Hill', 'Hay Ground']);
    expect(rows[0].rank).toBe('1');
    expect(Number(rows[0].a_over_t)).toBeGreaterThan(Number(rows[1].a_over_t));

    // The season has an approved plan: its report is offered beside the season.
    await page.getByTestId('plan-report-button').waitFor();
    expect(errors).toEqual([]);
    await page.close();
  });

  it('hands out the fields as CSV and the season plan as PDF from the farm map, with progress while the report is made', async () => {
    const { page, errors } = await signInPage(app.browser, app.baseUrl, farm.users.landowner.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.farm.id}`);
    await page.getByTestId('farm-files').waitFor({ timeout: 15_000 });
    const csv = await saved(page, () => page.getByTestId('export-csv').getByRole('button').click());
    expect(csv.name).toMatch(/-2027-fields\.csv$/);
    const rows = parse(csv.body, { columns: true, bom: true }) as Record<string, string>[];
    expect(rows.map((r) => r.name)).toEqual(['Mill Hill']);

    // Hold the report back a moment, as a large farm's would be, to see the progress line.
    await page.route('**/report.pdf', async (route) => {
      const answer = await route.fetch();
      await new Promise((r) => setTimeout(r, 1500));
      await route.fulfill({ response: answer });
    });
    const report = saved(page, () => page.getByTestId('plan-report-button').getByRole('button').click());
    await expect.poll(() => page.getByTestId('plan-report-button-progress').textContent(), { timeout: 10_000 }).toMatch(/Making the report…|Receiving/);
    const pdf = await report;
    expect(pdf.name).toMatch(/-2027-season-plan\.pdf$/);
    expect(pdf.body.subarray(0, 5).toString()).toBe('%PDF-');
    expect(squash((await pdfPageTexts(pdf.body)).join(' '))).toContain('Mill Hill');
    expect(errors).toEqual([]);
    await page.close();
  });
});
