// The season plan loop in Chromium, on farms made from the demo scenario's files (data/demo):
// the advisor approves the plan the farmer sent; a plan sent back reaches the farmer with the
// advisor's comment; the landowner reads the approved plan for their own fields only; a field's
// treatment option goes into the plan in one click from its Risk tab; work recorded done (with
// a photo) and checked leaves the plan approved; and a change made after someone else's shows
// what they changed and is made again on top.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD } from '../helpers/test-app';
import { signInPage, startBrowserApp } from '../helpers/browser';
import { makeDemoLikeFarm } from '../helpers/demo-like-farm';

let app: Awaited<ReturnType<typeof startBrowserApp>>;
beforeAll(async () => {
  app = await startBrowserApp();
});
afterAll(() => app?.close());

/** A demo-like farm whose farmer has written the season's plan (work on two fields) and sent it to the advisor. */
async function submittedPlan() {
  const made = await makeDemoLikeFarm(app.sequelize);
  const { createPlan } = await import('../../server/services/plans/plans.service');
  const { addAction } = await import('../../server/services/plans/plan-actions.service');
  const { submitPlan } = await import('../../server/services/plans/plan-review.service');
  const { PlanActionCreate } = await import('../../shared/schemas/plans');
  const actor = { userId: made.users.farmer.id };
  const { plan } = await createPlan(app.sequelize, actor, made.farm.id, made.season);
  await addAction(app.sequelize, actor, plan.id, PlanActionCreate.parse({ fieldId: made.ids['Long Slope'], treatment: 'no-till', quantity: 4, unit: 'ha', cost: 180, plannedOn: '2027-04-20' }));
  const last = await addAction(app.sequelize, actor, plan.id, PlanActionCreate.parse({ fieldId: made.ids['Mill Hill'], treatment: 'cover-crop', quantity: 4, unit: 'ha', cost: 280, plannedFrom: '2027-09-01', plannedTo: '2027-09-30' }));
  await submitPlan(app.sequelize, actor, plan.id, last.plan.version);
  return { ...made, planId: plan.id };
}

const planUrl = (farmId: number, season: string) => `${app.baseUrl}/farms/${farmId}/plan?season=${season}`;

describe('the season plan in Chromium', () => {
  it('lets the advisor approve the plan the farmer sent', async () => {
    const { farm, users, season } = await submittedPlan();
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.advisor.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}`);
    await page.getByTestId('nav-plan').click();
    const bar = page.getByTestId('review-bar');
    await bar.getByTestId('plan-state').waitFor({ timeout: 15_000 });
    expect(await bar.getByTestId('plan-state').getAttribute('data-state')).toBe('submitted');
    expect(await page.getByTestId('plan-field').count()).toBe(2);
    // The farm's figures come from the server: the cost of the work and the soil it saves.
    expect(await page.getByTestId('plan-total-cost').innerText()).toBe('$460');
    expect(await page.getByTestId('plan-tonnes-saved').innerText()).toMatch(/t\/yr$/);
    // Work cannot be changed while it is with the advisor.
    expect(await page.getByTestId('action-edit').count()).toBe(0);

    await page.getByTestId('plan-approve-open').click();
    await page.getByTestId('review-comment').fill('Good. Drill the no-till before the end of April.');
    await page.getByTestId('plan-approve').click();
    await expect.poll(() => bar.getByTestId('plan-state').getAttribute('data-state'), { timeout: 15_000 }).toBe('approved');
    expect(await page.getByTestId('plan-stamp').innerText()).toContain('Approved by Test advisor');
    expect(await page.getByTestId('plan-comments').innerText()).toContain('Drill the no-till before the end of April.');
    expect(await page.getByTestId('plan-version').count()).toBe(1);
    // The screen opened on the season in progress.
    expect(await page.getByTestId('season-select').inputValue()).toBe(season);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('sends a plan back to the farmer with the advisor’s comment in view', async () => {
    const { farm, users, season } = await submittedPlan();
    const advisor = await signInPage(app.browser, app.baseUrl, users.advisor.email, TEST_PASSWORD);
    await advisor.page.goto(planUrl(farm.id, season));
    await advisor.page.getByTestId('plan-return-open').click({ timeout: 15_000 });
    // Sending back needs a comment: the farmer reads it.
    await advisor.page.getByTestId('plan-return').click();
    await advisor.page.getByRole('alert').filter({ hasText: 'Say what to change' }).waitFor();
    await advisor.page.getByTestId('review-comment').fill('Add a filter strip along the creek on Mill Hill.');
    await advisor.page.getByTestId('plan-return').click();
    await expect.poll(() => advisor.page.getByTestId('review-bar').getByTestId('plan-state').getAttribute('data-state'), { timeout: 15_000 }).toBe('returned');
    expect(advisor.errors).toEqual([]);
    await advisor.page.close();

    const farmer = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await farmer.page.goto(planUrl(farm.id, season));
    const bar = farmer.page.getByTestId('review-bar');
    await bar.getByTestId('plan-state').waitFor({ timeout: 15_000 });
    expect(await bar.getByTestId('plan-state').innerText()).toContain('Sent back');
    const sentBack = farmer.page.getByTestId('plan-comment').filter({ hasText: 'filter strip' });
    expect(await sentBack.getAttribute('data-kind')).toBe('return');
    expect(await sentBack.innerText()).toContain('Test advisor');
    // The farmer may change the work again and send it back.
    expect(await farmer.page.getByTestId('action-edit').count()).toBe(2);
    expect(await farmer.page.getByTestId('plan-submit').isEnabled()).toBe(true);
    await farmer.page.screenshot({ path: 'test-results/plan-returned.png', fullPage: true });
    expect(farmer.errors).toEqual([]);
    await farmer.page.close();
  });

  it('shows the landowner the approved plan for their fields only', async () => {
    const { farm, users, memberships, ids, season, planId } = await submittedPlan();
    const { Field } = await import('../../server/models');
    const { approvePlan } = await import('../../server/services/plans/plan-review.service');
    const { livePlan } = await import('../../server/services/plans/plan-read.service');
    await Field.update({ ownerMembershipId: memberships.landowner.id }, { where: { id: ids['Mill Hill'] } });
    await approvePlan(app.sequelize, { userId: users.advisor.id }, planId, { version: (await livePlan(planId)).version });

    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.landowner.email, TEST_PASSWORD);
    // A landowner lands on the approved plan straight from the farm list.
    await page.getByTestId('farm-row').filter({ hasText: farm.name }).click();
    await page.getByTestId('landowner-plan').waitFor({ timeout: 15_000 });
    expect(page.url()).toContain(`/farms/${farm.id}/approved-plan`);
    expect(await page.getByTestId('landowner-field').count()).toBe(1);
    expect(await page.getByTestId('landowner-field').innerText()).toContain('Mill Hill');
    expect(await page.getByTestId('landowner-action').innerText()).toContain('Cover crop');
    expect(await page.getByTestId('landowner-approved-by').innerText()).toContain('Test advisor');
    // Nothing of the other fields, and no review conversation.
    const text = await page.locator('main').innerText();
    expect(text).not.toContain('Long Slope');
    expect(text).not.toContain('No-till');
    expect(await page.getByTestId('plan-conversation').count()).toBe(0);
    // Both maps draw the one field, labelled in words beside the colours.
    await expect.poll(() => page.getByTestId('landowner-map-now').locator('path.leaflet-interactive').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByTestId('landowner-map-after').locator('.fs-label').innerText()).toContain('Mill Hill');
    expect(await page.getByTestId('board-legend').count()).toBe(1);
    // The season plan's own screen sends a landowner here.
    await page.goto(planUrl(farm.id, season));
    await page.getByTestId('landowner-plan').waitFor({ timeout: 15_000 });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: 'test-results/landowner-plan-phone.png', fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('adds a treatment option to the plan in one click from the Risk tab', async () => {
    const { farm, users, ids, season } = await makeDemoLikeFarm(app.sequelize);
    const { page, errors } = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await page.goto(`${app.baseUrl}/farms/${farm.id}/fields/${ids['Long Slope']}?tab=risk&season=${season}`);
    const option = page.getByTestId('treatment-option').first();
    await option.waitFor({ timeout: 15_000 });
    const title = await option.getByTestId('treatment-option-title').innerText();
    await option.getByTestId('option-add-to-plan').click();
    await option.getByTestId('option-added').waitFor({ timeout: 15_000 });
    await option.getByTestId('option-open-plan').click();
    await page.getByTestId('plan-field').waitFor({ timeout: 15_000 });
    // One action per treatment the option combines ("No-till + cover crop" gives two).
    const parts = title.split(' + ').length;
    expect(await page.getByTestId('plan-action').count()).toBe(parts);
    expect(await page.getByTestId('review-bar').getByTestId('plan-state').getAttribute('data-state')).toBe('draft');
    expect(await page.getByTestId('plan-action-changed-by').first().innerText()).toContain('Test farmer');
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe('changing work someone else changed meanwhile', () => {
  it('shows what they changed and makes the person’s change again on top, keeping theirs', async () => {
    const made = await makeDemoLikeFarm(app.sequelize);
    const { createPlan } = await import('../../server/services/plans/plans.service');
    const { addAction, updateAction } = await import('../../server/services/plans/plan-actions.service');
    const { PlanActionCreate } = await import('../../shared/schemas/plans');
    const { plan } = await createPlan(app.sequelize, { userId: made.users.farmer.id }, made.farm.id, made.season);
    const added = await addAction(app.sequelize, { userId: made.users.farmer.id }, plan.id, PlanActionCreate.parse({ fieldId: made.ids['Long Slope'], treatment: 'no-till', quantity: 4, unit: 'ha', cost: 180 }));

    const { page, errors } = await signInPage(app.browser, app.baseUrl, made.users.farmer.email, TEST_PASSWORD);
    await page.goto(planUrl(made.farm.id, made.season));
    await page.getByTestId('action-edit').click({ timeout: 15_000 });
    // The advisor changes the cost while the farmer has the form open.
    await updateAction(app.sequelize, { userId: made.users.advisor.id }, added.action!.id, { version: 1, cost: 240 });
    await page.getByTestId('action-edit-form').getByTestId('action-notes').fill('Hire the drill from the co-op.');
    await page.getByTestId('action-save').click();
    const conflict = page.getByTestId('action-conflict');
    await conflict.waitFor({ timeout: 15_000 });
    expect(await conflict.getByTestId('part-changes').innerText()).toMatch(/cost: 180 → 240/);
    await conflict.getByTestId('action-redo').click();
    await expect.poll(() => page.getByTestId('action-conflict').count(), { timeout: 15_000 }).toBe(0);
    // Both changes stand: their cost and the farmer's notes.
    await expect.poll(() => page.getByTestId('plan-action').innerText(), { timeout: 15_000 }).toContain('Hire the drill from the co-op.');
    expect(await page.getByTestId('plan-action-cost').innerText()).toBe('$240');
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe('follow-up on an approved plan', () => {
  it('records work done with a photo and the advisor’s check, and the plan stays approved', async () => {
    const { farm, users, season, planId } = await submittedPlan();
    const { approvePlan } = await import('../../server/services/plans/plan-review.service');
    const { livePlan } = await import('../../server/services/plans/plan-read.service');
    await approvePlan(app.sequelize, { userId: users.advisor.id }, planId, { version: (await livePlan(planId)).version });
    const sharp = (await import('sharp')).default;
    const photo = await sharp({ create: { width: 120, height: 80, channels: 3, background: '#6b7f3a' } }).jpeg().toBuffer();

    const farmer = await signInPage(app.browser, app.baseUrl, users.farmer.email, TEST_PASSWORD);
    await farmer.page.goto(planUrl(farm.id, season));
    const first = farmer.page.getByTestId('plan-action').first();
    await first.getByTestId('action-mark-done').click({ timeout: 15_000 });
    const dialog = farmer.page.getByTestId('done-form');
    await dialog.getByTestId('done-on').fill('2027-04-24');
    await dialog.getByTestId('done-applied').fill('3.8');
    await dialog.getByTestId('done-photo').setInputFiles({ name: 'drilled.jpg', mimeType: 'image/jpeg', buffer: photo });
    await dialog.getByTestId('done-save').click();
    await first.getByTestId('action-follow-up').waitFor({ timeout: 15_000 });
    expect(await first.getAttribute('data-status')).toBe('done');
    expect(await first.getByTestId('action-follow-up').innerText()).toContain('Done 24 Apr 2027');
    await first.getByTestId('action-photo').waitFor();
    expect(await farmer.page.getByTestId('review-bar').getByTestId('plan-state').getAttribute('data-state')).toBe('approved');
    expect(farmer.errors).toEqual([]);
    await farmer.page.close();

    const advisor = await signInPage(app.browser, app.baseUrl, users.advisor.email, TEST_PASSWORD);
    await advisor.page.goto(planUrl(farm.id, season));
    const done = advisor.page.getByTestId('plan-action').first();
    await done.getByTestId('action-check').click({ timeout: 15_000 });
    await done.getByTestId('action-checked-by').waitFor({ timeout: 15_000 });
    expect(await done.getByTestId('action-checked-by').innerText()).toContain('Test advisor');
    expect(await advisor.page.getByTestId('review-bar').getByTestId('plan-state').getAttribute('data-state')).toBe('approved');
    expect(await advisor.page.getByTestId('plan-version').count()).toBe(1);
    expect(advisor.errors).toEqual([]);
    await advisor.page.close();
  });
});
