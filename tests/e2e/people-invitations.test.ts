// A farmer invites an advisor on the People screen; the advisor opens the link from the Dev
// mailbox, sets a name and password, and lands on the farm. Screenshots of People and the Dev
// mailbox at desktop and phone widths go to the system temp folder.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { createField } from '../../server/services/fields.service';
import { makeFarm, squareFeature, TEST_PASSWORD } from '../helpers/test-app';
import { signInPage } from '../helpers/browser';
import { startMailBrowserApp } from '../helpers/mail-browser-app';
import path from 'node:path';
import os from 'node:os';
import type { Browser } from 'playwright-core';

let app: Awaited<ReturnType<typeof startMailBrowserApp>>;
let baseUrl: string;
let browser: Browser;

beforeAll(async () => {
  app = await startMailBrowserApp();
  ({ baseUrl, browser } = app);
});
afterAll(() => app?.close());

describe('people and invitations in Chromium', () => {
  it('invites an advisor who accepts from the mailed link and sees the farm', async () => {
    const { farm, users } = await makeFarm(['farmer']);
    for (const [i, name] of ['Long slope', 'Creek bottom'].entries()) {
      await createField({ sequelize: app.sequelize }, { userId: users.farmer.id }, farm.id, { geometry: squareFeature(-91.8 + i * 0.01, 42.3, 200).geometry, name });
    }
    const email = `advisor-${randomUUID().slice(0, 8)}@example.test`;
    const { page, errors } = await signInPage(browser, baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${baseUrl}/farms/${farm.id}/people`);
    await page.getByTestId('invite-email').fill(email);
    await page.getByTestId('invite-send').click();
    await page.getByTestId('invite-sent').waitFor();
    await expect.poll(() => page.getByTestId('invitation-row').count()).toBe(1);
    // A landowner choice shows the farm's fields to pick from.
    await page.getByTestId('invite-role').getByText('Landowner').click();
    await expect.poll(() => page.getByTestId('field-choice').count()).toBe(2);
    await page.getByTestId('invite-role').getByText('Advisor').click();
    for (const [w, h] of [[1280, 800], [390, 844]]) {
      await page.setViewportSize({ width: w, height: h });
      await page.screenshot({ path: path.join(os.tmpdir(), `fieldshed-people-${w}.png`), fullPage: true });
    }

    const mailbox = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    await mailbox.goto(`${baseUrl}/dev/mailbox`);
    const row = mailbox.getByTestId('mail-row').filter({ hasText: email });
    await row.waitFor({ timeout: 15_000 });
    await row.getByRole('button').first().click();
    for (const [w, h] of [[1280, 800], [390, 844]]) {
      await mailbox.setViewportSize({ width: w, height: h });
      await mailbox.screenshot({ path: path.join(os.tmpdir(), `fieldshed-dev-mailbox-${w}.png`), fullPage: true });
    }
    const link = await row.getByTestId('mail-link').getAttribute('href');
    expect(link).toMatch(/\/invitations\//);
    await mailbox.close();

    const invitee = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await invitee.goto(link!);
    await invitee.getByTestId('invitation-summary').waitFor();
    expect(await invitee.getByTestId('invitation-summary').innerText()).toContain(farm.name);
    await invitee.getByTestId('accept-name').fill('Ada Advisor');
    await invitee.getByTestId('accept-password').fill('a good long password');
    await invitee.getByTestId('accept-join').click();
    await invitee.waitForURL(`${baseUrl}/farms/${farm.id}`);
    await invitee.goto(`${baseUrl}/farms`);
    await invitee.getByTestId('farm-row').filter({ hasText: farm.name }).waitFor();
    await invitee.close();

    await page.setViewportSize({ width: 1280, height: 800 });
    await page.reload();
    await expect.poll(() => page.getByTestId('person-row').filter({ hasText: 'Ada Advisor' }).count()).toBe(1);
    expect(await page.getByTestId('invitation-row').count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });
});
