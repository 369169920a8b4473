import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { URGENT_SYMPTOM_MESSAGE } from '@driftmark/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

// The countdown athlete's day at 375 px: weigh-in in lb, two drinks, a meal from the food list,
// a supplement, an urgent symptom, a photo compared with an earlier one; then the coach reads the day.
describe('the daily check-in on a phone', () => {
  let phone: Session;
  let desktop: Session;
  let scratch: string;
  let photoFile: string;

  beforeAll(async () => {
    scratch = await mkdtemp(path.join(tmpdir(), 'driftmark-photo-'));
    photoFile = path.join(scratch, 'front.jpg');
    await sharp({ create: { width: 600, height: 800, channels: 3, background: '#5d7f86' } })
      .composite([
        {
          input: Buffer.from(
            '<svg width="600" height="800"><circle cx="300" cy="300" r="120" fill="#e8d9b0"/></svg>',
          ),
        },
      ])
      .jpeg()
      .toFile(photoFile);
    phone = await openSession(375);
    desktop = await openSession(1280);
  });
  afterAll(async () => {
    await phone?.close();
    await desktop?.close();
    await rm(scratch, { recursive: true, force: true });
  });

  it('logs the morning and the day, and sees the stop-and-seek-care message', async () => {
    const { page } = phone;
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');

    const weighIn = page.getByRole('form', { name: 'Weigh-in' });
    await weighIn.getByRole('radio', { name: 'lb' }).check();
    await weighIn.getByLabel('Weight', { exact: true }).fill('176.4');
    await weighIn.getByLabel('After waking and voiding, before food and drink').check();
    await weighIn.getByRole('button', { name: 'Save weigh-in' }).click();
    await page.getByRole('button', { name: 'Edit weigh-in' }).waitFor();
    await expect(page.getByText('176.4').count()).resolves.toBeGreaterThan(0);

    const drinks = page.getByRole('form', { name: 'Add a drink' });
    await drinks.getByRole('button', { name: '+250 mL' }).click();
    await page.getByRole('button', { name: /^Edit 250\smL water at/ }).waitFor();
    await drinks.getByRole('radio', { name: 'Coffee or tea' }).check();
    await drinks.getByRole('button', { name: '+500 mL' }).click();
    await page.getByRole('button', { name: /^Edit 500\smL coffee or tea at/i }).waitFor();
    // The drink shows at once from the write's answer; the total comes with the day the server sums.
    await page.getByTestId('fluid-total').filter({ hasText: /750/ }).waitFor();

    await page.getByRole('button', { name: 'Add a meal' }).click();
    const meal = page.getByRole('form', { name: 'Add a meal' });
    await meal.getByLabel('Meal name').fill('Breakfast');
    // Two foods in one meal: one by its portion (a cup of oats comes with 1 cup), one in grams.
    await meal.getByLabel('Add a food').fill('oats');
    await meal
      .getByRole('list', { name: 'Foods found' })
      .getByRole('button', { name: /Oats, rolled, dry/ })
      .first()
      .click();
    await meal.getByLabel('Add a food').fill('rice flakes');
    await meal
      .getByRole('list', { name: 'Foods found' })
      .getByRole('button', { name: /Rice flakes/ })
      .first()
      .click();
    await meal.getByLabel('Amount of Rice flakes').fill('80');
    // The meal's live total is the two foods' sum, by the shared rule the server stores.
    await meal.getByText('Meal total').waitFor();
    await screenshot(page, 'meal-form-375');
    await page.setViewportSize({ width: 1280, height: 860 });
    await screenshot(page, 'meal-form-1280');
    await page.setViewportSize({ width: 375, height: 812 });
    await meal.getByRole('button', { name: 'Save meal' }).click();
    await page.getByRole('list', { name: 'Meals logged' }).getByText('Breakfast').waitFor();
    await page
      .getByRole('list', { name: 'Foods in Breakfast' })
      .getByText(/Rice flakes/)
      .waitFor();

    await page.getByRole('button', { name: 'Add a supplement' }).click();
    const supplement = page.getByRole('form', { name: 'Add a supplement' });
    await supplement.getByLabel('Supplement').fill('Creatine monohydrate');
    await supplement.getByLabel('Dose', { exact: true }).fill('5');
    await supplement.getByLabel('Dose unit').fill('g');
    await supplement.getByRole('button', { name: 'Tick as taken' }).click();
    await page.getByRole('list', { name: 'Supplements taken' }).getByText('Creatine monohydrate').waitFor();

    await page.getByRole('button', { name: 'Report a symptom' }).click();
    const symptoms = page.getByRole('form', { name: 'Report a symptom' });
    await symptoms.getByLabel('Dizziness').check();
    await symptoms.getByRole('button', { name: 'Send report' }).click();
    const alert = page.getByRole('alert', { name: 'Stop and seek medical care' });
    await alert.waitFor();
    await expect(alert.innerText()).resolves.toContain(URGENT_SYMPTOM_MESSAGE.slice(0, 60));
    await page.getByRole('list', { name: 'Symptoms reported' }).waitFor();
    await screenshot(page, 'check-in-today-375');
  });

  it('uploads a condition photo and compares it with an earlier one', async () => {
    const { page } = phone;
    await page.getByRole('navigation', { name: 'Athlete' }).getByRole('link', { name: 'Photos' }).click();
    await page.getByRole('navigation', { name: 'Photo views' }).getByRole('link', { name: 'Upload' }).click();
    await page.getByLabel('Choose photos').setInputFiles(photoFile);
    await page.getByLabel('Pose').selectOption('Front relaxed');
    const uploaded = page.waitForResponse(
      (r) => r.url().includes('/photos') && r.request().method() === 'POST',
    );
    await page.getByRole('button', { name: 'Upload photo' }).click();
    expect((await uploaded).status()).toBe(201);

    await page
      .getByRole('navigation', { name: 'Photo views' })
      .getByRole('link', { name: 'Compare' })
      .click();
    await page.getByLabel('Pose').selectOption('Front relaxed');
    const comparison = page.getByRole('region', { name: 'Comparison' });
    const earlier = comparison.getByRole('img', { name: /^Earlier: Front relaxed/ });
    const later = comparison.getByRole('img', { name: /^Later: Front relaxed/ });
    await earlier.waitFor();
    await later.waitFor();
    for (const img of [earlier, later]) {
      await expect
        .poll(() => img.evaluate((el) => (el as unknown as { naturalWidth: number }).naturalWidth), {
          timeout: 10_000,
        })
        .toBeGreaterThan(0);
    }
    await screenshot(page, 'photos-compare-375');
  });

  it('the coach opens the athlete and reads that day, flag included', async () => {
    const { page } = desktop;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Mateo Castellanos' }).click();
    await page.waitForURL('**/coach/athletes/**');
    await page
      .getByRole('region', { name: 'Safety flags' })
      .getByText('Urgent symptom reported')
      .first()
      .waitFor();
    // 176.4 lb typed by the athlete is 80.0 kg in the coach's units (0.45359237 kg/lb, NIST SP 811).
    await page.getByText('80.0').first().waitFor();
    await page.getByText('Breakfast').first().waitFor();
    await expect(page.getByRole('form', { name: 'Weigh-in' }).count()).resolves.toBe(0);
    await screenshot(page, 'coach-athlete-day-1280');
  });
});
