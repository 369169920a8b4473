import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeBarcodeY4m } from './support/barcode-video.js';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

// Mateo scans a packaged food with his phone's camera: Chromium's fake camera plays a Y4M clip of an
// EAN-13 drawn by bwip-js (tests/e2e/support/barcode-video.ts), ZXing reads it in the page, the
// server looks it up in the food-products fake and the product becomes his own food. Typing a
// number works too, and a label whose energy is off its macros gets the server's warning. The
// coach copies a team food from a label.
const OATS_BODY = '200482100001'; // → 2004821000018, "Harbourline oat clusters" in the fake
const BAR = '2004821000032'; // printed energy 22 % above its macros

describe('packaged foods: barcode and label', () => {
  let scratch: string;
  let phone: Session;
  let desktop: Session;

  beforeAll(async () => {
    scratch = await mkdtemp(path.join(tmpdir(), 'driftmark-barcode-'));
    const clip = path.join(scratch, 'barcode.y4m');
    await writeBarcodeY4m(clip, OATS_BODY);
    phone = await openSession(375, 812, { fakeCameraFile: clip });
    desktop = await openSession(1280);
  });
  afterAll(async () => {
    await phone?.close();
    await desktop?.close();
    if (scratch) await rm(scratch, { recursive: true, force: true });
  });

  it('Today loads without the barcode reader; the athlete scans a barcode at 375 px and gets the product', async () => {
    const { page } = phone;
    const scripts: string[] = [];
    page.on('response', (r) => {
      if (r.url().endsWith('.js')) scripts.push(r.url());
    });
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');
    await page.waitForLoadState('networkidle');
    expect(scripts.filter((u) => /barcode-scanner/.test(u))).toEqual([]);

    await page.goto('/athlete/foods/new');
    await page.getByRole('heading', { name: 'Add a packaged food' }).waitFor();
    await page.getByRole('button', { name: 'Scan with the camera' }).click();
    const result = page.getByTestId('label-food-result');
    await result.waitFor({ timeout: 30_000 });
    await expect(result.innerText()).resolves.toMatch(/(Added to|Already in) your foods/);
    await expect(result.innerText()).resolves.toMatch(/Harbourline oat clusters/);
    await expect(result.innerText()).resolves.toMatch(/Barcode 2004821000018/);
    await expect(result.innerText()).resolves.toMatch(/protein 13\sg · carbohydrate 60\sg · fat 7\sg/);
    expect(scripts.some((u) => /barcode-scanner/.test(u))).toBe(true);
    await screenshot(page, 'packaged-food-scan-375');
  });

  it('types a barcode number; the server warns that the label’s energy is off its macros', async () => {
    const { page } = phone;
    const box = page.getByLabel('Or type the number under the barcode');
    await box.fill('2004821000039');
    await page.getByRole('button', { name: 'Look up' }).click();
    await expect(page.getByRole('alert').filter({ hasText: 'last digit' }).count()).resolves.toBe(1);
    await box.fill(BAR);
    await page.getByRole('button', { name: 'Look up' }).click();
    const result = page.getByTestId('label-food-result');
    await result.getByText('Kestrel Hill protein bar, salted caramel').waitFor();
    await expect(result.innerText()).resolves.toMatch(/22 % more than the 368 kcal its macros give/);
    await screenshot(page, 'packaged-food-warning-375');
    await page.setViewportSize({ width: 1280, height: 860 });
    await screenshot(page, 'packaged-food-warning-1280');
  });

  it('the coach adds a team food from a label, per serving, at 1280 px', async () => {
    const { page } = desktop;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    await page.getByRole('link', { name: 'Team foods' }).click();
    await page.getByRole('heading', { name: 'Add a team food' }).waitFor();
    const form = page.getByRole('form', { name: 'Food from a nutrition label' });
    await form.getByLabel('Name').fill('Rice cakes, lightly salted');
    await form.getByRole('radio', { name: 'Per serving' }).check();
    await form.getByLabel('Serving size').fill('9');
    // 9 g serving: 35 kcal, P 0.7, C 7.3, F 0.3 → per 100 g 388.9 kcal; 4·7.8 + 4·81.1 + 9·3.3 ≈ 385 kcal.
    await form.getByLabel('Energy', { exact: true }).fill('35');
    await form.getByLabel('Protein').fill('0.7');
    await form.getByLabel('Carbohydrate').fill('7.3');
    await form.getByLabel('Fat', { exact: true }).fill('0.3');
    await form.getByRole('button', { name: 'Save food' }).click();
    const result = page.getByTestId('label-food-result');
    await result.getByText('Added to the team’s foods').waitFor();
    await expect(result.innerText()).resolves.toMatch(/Rice cakes, lightly salted/);
    await expect(result.innerText()).resolves.toMatch(/389\skcal on the label/);
    await expect(page.getByText('Check the label').count()).resolves.toBe(0);
    await screenshot(page, 'team-food-label-1280');
    await page.setViewportSize({ width: 375, height: 812 });
    await screenshot(page, 'team-food-label-375');
  });
});
