import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

const ENERGY_ROW = 'ul[aria-label="Targets and progress"] li[data-metric="energy"]';

/** A screenshot of one part of the page (beside the full-page ones), to look at it closely. */
async function partShot(part: Locator, name: string): Promise<void> {
  await part.screenshot({ path: path.join(process.env.E2E_SCREENSHOT_DIR ?? 'screenshots', `${name}.png`) });
}

/** Opens the plan editor's disclosure of a day type (the first one may already be open). */
async function openDayType(page: Page, name: string): Promise<void> {
  const details = page.locator('details', { has: page.locator('summary', { hasText: name }) }).first();
  await details.waitFor();
  if (!(await details.evaluate((el) => (el as unknown as { open: boolean }).open))) {
    await details.locator('summary').first().click();
  }
}

async function energyRow(page: Page): Promise<string> {
  await page.locator(ENERGY_ROW).waitFor();
  return page.locator(ENERGY_ROW).innerText();
}

// The head coach refits the diet day of the long-diet athlete's meal plan and saves a version; the
// athlete logs a planned meal from Today in one tap on a phone; the day's energy moves on both sides.
describe('meal plans: fit, save, log in one tap', () => {
  let coach: Session;
  let phone: Session;
  let athleteId = '';

  beforeAll(async () => {
    coach = await openSession(1280);
    phone = await openSession(375);
  });
  afterAll(async () => {
    await coach?.close();
    await phone?.close();
  });

  it('the coach fits the quantities of a day type and saves the version', async () => {
    const { page } = coach;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Hannah Kowalski' }).click();
    await page.waitForURL(/\/coach\/athletes\/[0-9a-f-]+/);
    athleteId = /athletes\/([0-9a-f-]{36})/.exec(page.url())?.[1] ?? '';
    await page.getByRole('link', { name: 'Plan', exact: true }).click();
    await page.getByRole('heading', { name: 'This week' }).waitFor();

    await openDayType(page, 'Diet day');
    const meals = page
      .getByRole('group', { name: 'Targets for Diet day' })
      .getByRole('region', { name: 'Meal plan' });
    await meals.waitFor();
    // The demo's diet day is planned within every tolerance; halve the eggs to leave it drifting.
    const eggs = meals.getByLabel(/^Egg, poultry, whole, raw, grams$/).first();
    await eggs.fill('50');
    const verdicts = meals.getByRole('list', { name: 'Planned day against the targets' });
    await expect(verdicts.innerText()).resolves.toMatch(/Drifting|Off plan/);

    await meals.getByRole('button', { name: 'Fit the quantities' }).click();
    await meals.getByText('Fitted: every target is within its tolerance.').waitFor();
    await expect(verdicts.innerText()).resolves.not.toMatch(/Drifting|Off plan/);
    await screenshot(page, 'meal-plan-editor-1280');
    await partShot(meals, 'meal-plan-editor-section-1280');

    await page.getByLabel('Reason').fill('Meal plan refitted to the diet day');
    await page.getByRole('button', { name: 'Review and save' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.waitFor();
    const boxes = dialog.getByRole('checkbox');
    for (let i = 0; i < (await boxes.count()); i += 1) await boxes.nth(i).check();
    await dialog.getByRole('button', { name: /^(Save version|Acknowledge and save)$/ }).click();
    await dialog.waitFor({ state: 'hidden' });
  });

  it('the athlete logs a planned meal in one tap at 375 px; the drift moves on both sides', async () => {
    expect(athleteId).not.toBe('');
    const { page } = phone;
    await signIn(page, 'hannah.kowalski@driftmark.test');
    await page.waitForURL('**/athlete**');
    const card = page.locator('#planned-meals');
    await card.waitFor();
    const before = await energyRow(page);
    const adherenceBefore = await card.getByLabel('Meal plan adherence').innerText();

    const first = card.getByTestId('planned-meal-row').first();
    await first.getByRole('button', { name: /as eaten$/ }).click();
    await first.getByText('Logged').waitFor();
    await expect.poll(() => energyRow(page)).not.toBe(before);
    const after = await energyRow(page);
    await expect(card.getByLabel('Meal plan adherence').innerText()).resolves.not.toBe(adherenceBefore);
    await screenshot(page, 'meal-plan-today-375');
    await partShot(card, 'meal-plan-today-card-375');

    // The coach's page of the athlete reads the same day from the server.
    await coach.page.goto(`/coach/athletes/${athleteId}`);
    await expect.poll(() => energyRow(coach.page)).toBe(after);
    await coach.page.locator('#planned-meals').getByText('Logged').first().waitFor();
    await screenshot(coach.page, 'meal-plan-coach-day-1280');
  });

  it('screenshots: the editor at 375 px and the athlete view at 1280 px', async () => {
    const narrow = await openSession(375);
    try {
      await signIn(narrow.page, 'coach@driftmark.test');
      await narrow.page.waitForURL('**/coach**');
      await narrow.page.goto(`/coach/athletes/${athleteId}/plan`);
      await narrow.page.getByRole('heading', { name: 'This week' }).waitFor();
      await openDayType(narrow.page, 'Diet day');
      await narrow.page.getByRole('region', { name: 'Meal plan' }).first().waitFor();
      await screenshot(narrow.page, 'meal-plan-editor-375');
      await partShot(
        narrow.page.getByRole('region', { name: 'Meal plan' }).first(),
        'meal-plan-editor-section-375',
      );
    } finally {
      await narrow.close();
    }
    const wide = await openSession(1280);
    try {
      await signIn(wide.page, 'hannah.kowalski@driftmark.test');
      await wide.page.waitForURL('**/athlete**');
      await wide.page.locator('#planned-meals').getByText('Logged').first().waitFor();
      await screenshot(wide.page, 'meal-plan-today-1280');
    } finally {
      await wide.close();
    }
  });
});
