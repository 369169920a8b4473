import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

// Hannah's coach (the head coach) opens her Body tab: the demo's skinfolds give a % fat, lean and
// fat mass with the method-error caution. The coach enters today's skinfolds, then sets protein per
// kg of lean mass in the plan editor and reads the grams the server resolves, with their basis.
describe('body composition and a lean-mass protein target', () => {
  let desktop: Session;
  let phone: Session;

  beforeAll(async () => {
    desktop = await openSession(1280);
    phone = await openSession(375);
  });
  afterAll(async () => {
    await desktop?.close();
    await phone?.close();
  });

  it("shows Hannah's % fat, lean mass and the method error; the coach enters today's skinfolds", async () => {
    const { page } = desktop;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Hannah Kowalski' }).click();
    await page.getByRole('link', { name: 'Body', exact: true }).click();

    const latest = page.getByRole('region', { name: 'Latest estimate' });
    await latest.waitFor();
    await expect(latest.getByText('Body fat').count()).resolves.toBe(1);
    await expect(latest.innerText()).resolves.toMatch(/\d+\.\d\s%/);
    await expect(latest.innerText()).resolves.toMatch(/Lean mass\s+\d+\.\d\s(kg|lb)/i);
    await expect(latest.innerText()).resolves.toMatch(/Jackson, Pollock & Ward 3-site, Siri/);
    await expect(latest.innerText()).resolves.toMatch(/±3–4 % fat points/);
    await page.getByRole('figure', { name: 'Lean mass' }).waitFor();
    await page.getByRole('figure', { name: 'Fat mass' }).waitFor();
    await screenshot(page, 'body-composition-1280');

    const list = page.getByRole('region', { name: 'Measurements' }).getByRole('listitem');
    const before = await list.count();
    const form = page.getByRole('region', { name: 'New measurement' });
    // A woman's 3 sites (Jackson, Pollock & Ward): triceps, suprailiac, thigh.
    await form.getByLabel('Triceps').fill('16');
    await form.getByLabel('Suprailiac').fill('12,5');
    await form.getByLabel('Thigh').fill('24');
    await form.getByRole('button', { name: 'Save measurement' }).click();
    await expect.poll(() => list.count()).toBe(before + 1);
    // Newest first: today's measurement, its sum and the lean mass from today's trend weight.
    await expect(list.first().innerText()).resolves.toMatch(/sum 52\.5/);
    await expect(list.first().innerText()).resolves.toMatch(/% fat · lean \d+\.\d\s(kg|lb)/);
    await expect(latest.innerText()).resolves.toMatch(/Lean mass\s+\d+\.\d\s(kg|lb)/i);
  });

  it('sets protein per kg of lean mass in the plan editor; the server resolves it to grams', async () => {
    const { page } = desktop;
    await page.getByRole('link', { name: 'Plan', exact: true }).click();
    await page.getByRole('heading', { name: /Edit: a new version/ }).waitFor();
    const dietDay = page.locator('details').filter({ hasText: 'Diet day' }).first();
    // The first day type may already be open; a click on its summary would close it.
    if ((await dietDay.getAttribute('open')) === null) await dietDay.locator('summary').click();
    const kind = dietDay.getByLabel('Protein: set as');
    await kind.selectOption('g_per_kg_lean');
    // The figure carries over: the same grams per kg of the latest lean mass.
    const perKg = dietDay.getByLabel('Protein, g/kg lean mass');
    await expect(perKg.inputValue()).resolves.toMatch(/^\d+(\.\d+)?$/);
    await expect(dietDay.getByText(/lean \d+\.\d\skg/).count()).resolves.toBeGreaterThan(0);
    await screenshot(page, 'plan-lean-protein-1280');

    await page.getByLabel('Reason').fill('Protein per kg of lean mass from the skinfolds');
    await page.getByRole('button', { name: 'Review and save' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.waitFor();
    const boxes = dialog.getByRole('checkbox');
    for (let i = 0; i < (await boxes.count()); i += 1) await boxes.nth(i).check();
    await dialog.getByRole('button', { name: /save/i }).last().click();
    const saved = page.getByText(/Version \d+ saved/);
    await saved.waitFor();
    await page.getByRole('link', { name: /View version \d+/ }).click();
    await expect
      .poll(() => page.getByText(/g\/kg × \d+\.\d kg lean mass, measured/).count())
      .toBeGreaterThan(0);
    await screenshot(page, 'plan-lean-protein-version-1280');
  });

  it('reads on a phone', async () => {
    const { page } = phone;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    await page.goto('/coach/roster');
    await page.getByRole('link', { name: 'Hannah Kowalski' }).first().click();
    await page.getByRole('link', { name: 'Body', exact: true }).click();
    await page.getByRole('region', { name: 'Latest estimate' }).waitFor();
    await page.getByRole('figure', { name: 'Lean mass' }).waitFor();
    await screenshot(page, 'body-composition-375');
  });
});
