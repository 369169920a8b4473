import { NOT_MEDICAL_ADVICE_TEXT, STOP_SIGNS_TEXT } from '@driftmark/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

// The head coach applies the show template to the countdown athlete: the preview lists the dated
// targets and the guardrail warnings, nothing can be applied until each warning is ticked, and the
// athlete then reads today's targets from the new version with the countdown caution.
describe('a countdown from a template, with guardrails', () => {
  let desktop: Session;
  let phone: Session;
  let appliedVersion = 0;

  beforeAll(async () => {
    desktop = await openSession(1280);
    phone = await openSession(375);
  });
  afterAll(async () => {
    await desktop?.close();
    await phone?.close();
  });

  it('previews the template, refuses to apply until every warning is acknowledged, then applies', async () => {
    const { page } = desktop;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Mateo Castellanos' }).click();
    await page.getByRole('link', { name: 'Plan', exact: true }).click();
    await page.getByRole('heading', { name: 'This week' }).waitFor();
    await screenshot(page, 'plan-editor-1280');

    await page.getByRole('link', { name: 'Apply countdown' }).click();
    await page.getByRole('radio', { name: /Classic show week/ }).check();
    await page.getByRole('button', { name: 'Preview the countdown' }).click();

    const table = page.getByRole('table', { name: /Countdown days for the event/ });
    await table.waitFor();
    // E-7 … E+1: nine dated days, the past ones shown but not changed.
    await expect(table.getByRole('row').count()).resolves.toBeGreaterThanOrEqual(10);
    await expect(table.getByText('E-4').count()).resolves.toBeGreaterThan(0);
    await expect(page.getByText(/already past, not changed/).count()).resolves.toBeGreaterThan(0);

    const acknowledge = page.getByRole('group', { name: /Acknowledge each warning/ });
    const boxes = acknowledge.getByRole('checkbox');
    const count = await boxes.count();
    // The show template's carbohydrate-up days raise a carbohydrate-load warning each.
    expect(count).toBeGreaterThan(0);
    await expect(acknowledge.getByText(/carbohydrate load/i).count()).resolves.toBeGreaterThan(0);

    const apply = page.getByRole('button', { name: 'Acknowledge and apply countdown' });
    await expect(apply.isDisabled()).resolves.toBe(true);
    for (let i = 0; i < count - 1; i += 1) await boxes.nth(i).check();
    // One warning still unticked: still refused.
    await expect(apply.isDisabled()).resolves.toBe(true);
    await screenshot(page, 'countdown-preview-1280');
    await boxes.nth(count - 1).check();
    await expect(apply.isEnabled()).resolves.toBe(true);
    await apply.click();

    const done = page.getByText(/Countdown applied as version (\d+)/);
    await done.waitFor();
    appliedVersion = Number((await done.innerText()).match(/version (\d+)/)?.[1]);
    expect(appliedVersion).toBeGreaterThan(1);

    // The history names the new version with its acknowledgements, stored with who and when.
    await page.getByRole('link', { name: `View version ${appliedVersion}` }).click();
    await page.waitForURL(/\/plan\/history\/[0-9a-f-]+$/);
    const acknowledged = page.getByRole('heading', { name: /Acknowledged warnings \(\d+\)/ });
    await acknowledged.waitFor();
    await expect(acknowledged.innerText()).resolves.toContain(`(${count})`);
    await expect(page.getByText(/Acknowledged by Mara Lindqvist/).count()).resolves.toBe(count);
    await screenshot(page, 'plan-version-1280');
  });

  it("shows the athlete today's targets from the new version and the countdown caution", async () => {
    expect(appliedVersion).toBeGreaterThan(1);
    const { page } = phone;
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');

    await page.getByText(`plan version ${appliedVersion}`, { exact: false }).waitFor();
    await page.getByText('E-4', { exact: true }).first().waitFor();
    await page.getByText(STOP_SIGNS_TEXT).first().waitFor();
    await page.getByText(NOT_MEDICAL_ADVICE_TEXT).first().waitFor();
    for (const metric of ['Energy', 'Protein', 'Carbohydrate', 'Fat', 'Water', 'Sodium']) {
      await expect(page.getByText(metric, { exact: true }).count()).resolves.toBeGreaterThan(0);
    }
    await screenshot(page, 'athlete-today-countdown-375');

    // Tomorrow (E-3) carries the acknowledged carbohydrate-load caution as well.
    const tomorrow = await page.evaluate(async () => {
      const me = (await (await fetch('/api/me')).json()) as { data: { athleteId: string } };
      const id = me.data.athleteId;
      const plan = (await (await fetch(`/api/athletes/${id}/plan`)).json()) as { data: { today: string } };
      const next = new Date(`${plan.data.today}T00:00:00Z`);
      next.setUTCDate(next.getUTCDate() + 1);
      const date = next.toISOString().slice(0, 10);
      const day = (await (await fetch(`/api/athletes/${id}/days/${date}`)).json()) as {
        data: { countdown: { dayLabel: string } | null; cautions: { code: string }[] };
      };
      return day.data;
    });
    expect(tomorrow.countdown?.dayLabel).toBe('E-3');
    expect(tomorrow.cautions.map((c) => c.code)).toEqual(expect.arrayContaining(['countdown', 'carb_load']));
  });

  it('warns live in the plan editor and saves a new version only once the warning is acknowledged', async () => {
    const { page } = desktop;
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Leilani Akana' }).click();
    await page.getByRole('link', { name: 'Plan', exact: true }).click();
    const editor = page.getByRole('form', { name: 'New plan version' });
    await editor.waitFor();
    const history = page.getByRole('link', { name: /^History \((\d+)\)$/ });
    const before = Number((await history.innerText()).match(/\d+/)?.[0]);

    // 1,200 mg of sodium is under the NASEM 2019 adequate intake: the editor says so before saving.
    await editor.getByLabel('Sodium, mg').first().fill('1200');
    await editor
      .getByText(/1,200 mg/)
      .first()
      .waitFor();
    await editor.getByLabel('Reason').fill('Lower sodium on training days');
    await editor.getByRole('button', { name: 'Review and save' }).click();

    const dialog = page.getByRole('dialog');
    await dialog.getByRole('heading', { name: /Acknowledge/ }).waitFor();
    await expect(dialog.getByText(/sodium/i).count()).resolves.toBeGreaterThan(0);
    const save = dialog.getByRole('button', { name: 'Acknowledge and save' });
    await expect(save.isDisabled()).resolves.toBe(true);
    const boxes = dialog.getByRole('checkbox');
    for (let i = 0; i < (await boxes.count()); i += 1) await boxes.nth(i).check();
    await save.click();

    await page.getByText(/Version \d+ saved, in force from/).waitFor();
    await expect(history.innerText()).resolves.toBe(`History (${before + 1})`);
    const athleteId = new URL(page.url()).pathname.split('/')[3];
    const latest = await page.evaluate(async (id) => {
      const plan = (await (await fetch(`/api/athletes/${id}/plan`)).json()) as {
        data: { latest: { acknowledgements: { code: string; by: { name: string } }[] } };
      };
      return plan.data.latest.acknowledgements;
    }, athleteId);
    expect(latest).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          code: 'sodium_low',
          by: expect.objectContaining({ name: 'Mara Lindqvist' }),
        }),
      ]),
    );
  });
  it('keeps saying the countdown aims at another day after the event moves, until one click moves it', async () => {
    const { page } = desktop;
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Mateo Castellanos' }).click();
    await page.getByRole('link', { name: 'Plan', exact: true }).click();
    await page.getByRole('button', { name: 'Change event date' }).click();
    const box = page.getByLabel('New event date');
    const current = await box.inputValue();
    const later = new Date(Date.parse(`${current}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
    await box.fill(later);
    await page.getByRole('button', { name: 'Save the date' }).click();
    const notice = page.getByText(/The countdown is aimed at .*, the event is /);
    await notice.waitFor();
    // The server says so after a reload too, and on the athlete's other coach pages.
    await page.reload();
    await notice.waitFor();
    await page.getByRole('link', { name: 'Trends', exact: true }).click();
    await notice.waitFor();
    await screenshot(page, 'countdown-mismatch-1280');
    await page.getByRole('button', { name: /Move the countdown to/ }).click();
    const confirm = page.getByRole('button', { name: /move countdown$/i });
    await confirm.waitFor();
    const boxes = page.getByRole('group', { name: /Acknowledge each warning/ }).getByRole('checkbox');
    for (let i = 0; i < (await boxes.count()); i += 1) await boxes.nth(i).check();
    await confirm.click();
    await page.getByText(/Countdown moved to/).waitFor();
    await page.reload();
    await page.getByRole('heading', { name: 'Trends' }).waitFor();
    await expect(notice.count()).resolves.toBe(0);
  });
});
