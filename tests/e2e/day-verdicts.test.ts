import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, openSession, screenshot, signIn, type Session } from './support/browser.js';

/** metric → state, from elements carrying data-metric and data-state. */
async function statesIn(page: Page, selector: string): Promise<Record<string, string>> {
  const pairs = await page
    .locator(selector)
    .evaluateAll((els) =>
      els.map((el) => [el.getAttribute('data-metric') ?? '', el.getAttribute('data-state') ?? '']),
    );
  return Object.fromEntries(pairs.filter(([m]) => m !== '' && m !== 'cutoff'));
}

/** The athlete's targets card: one row per metric with a target, with the server's state. */
async function targetCardStates(page: Page): Promise<Record<string, string>> {
  await page.getByRole('list', { name: 'Targets and progress' }).waitFor();
  return statesIn(page, 'ul[aria-label="Targets and progress"] li[data-metric]');
}

/** Moves across a chart from its right edge until the tooltip shows `date`; returns that tooltip's states. */
async function tooltipStates(page: Page, chartName: string, date: string): Promise<Record<string, string>> {
  const chart = page.getByRole('figure', { name: chartName });
  const area = chart.locator('.recharts-wrapper').first();
  await area.scrollIntoViewIfNeeded();
  const box = await area.boundingBox();
  if (!box) throw new Error(`${chartName} chart has no box`);
  const tooltip = page.locator(`[data-day-tooltip="${date}"]`);
  const y = box.y + box.height / 2;
  for (let x = box.x + box.width - 2; x > box.x; x -= 4) {
    await page.mouse.move(x, y);
    if ((await tooltip.count()) > 0) break;
  }
  await tooltip.waitFor();
  return statesIn(page, `[data-day-tooltip="${date}"] li[data-metric]`);
}

// The countdown athlete mid-day: their Today, the coach's day table and a chart tooltip read the
// same verdict for today ("so far", never on or off plan) and for yesterday (a finished day).
describe('one verdict per day on every screen', () => {
  let phone: Session;
  let desktop: Session;
  let athleteId = '';
  let today = '';
  let yesterday = '';
  const athlete: Record<string, Record<string, string>> = {};

  beforeAll(async () => {
    phone = await openSession(375);
    desktop = await openSession(1280);
  });
  afterAll(async () => {
    await phone?.close();
    await desktop?.close();
  });

  it('shows the athlete today’s targets "so far", with nothing judged before the day ends', async () => {
    const { page } = phone;
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');
    const me = await page.request.get('/api/me');
    athleteId = ((await me.json()) as { data: { athleteId: string } }).data.athleteId;
    // The server says which date is the athlete's today (their time zone, the server's clock).
    const probe = await page.request.get(`/api/athletes/${athleteId}/trend?from=2026-01-01&to=2026-01-02`);
    today = ((await probe.json()) as { data: { today: string } }).data.today;
    const d = new Date(`${today}T00:00:00Z`);
    d.setUTCDate(d.getUTCDate() - 1);
    yesterday = d.toISOString().slice(0, 10);

    // A first meal of the day, so today has figures to show.
    const meal = await page.request.post(`/api/athletes/${athleteId}/days/${today}/meals`, {
      headers: { Origin: baseUrl },
      data: {
        clientId: crypto.randomUUID(),
        time: '00:01',
        name: 'Early snack',
        source: 'macros',
        proteinG: 20,
        carbohydrateG: 30,
        fatG: 5,
      },
    });
    expect(meal.status()).toBeLessThan(300);

    await page.goto('/athlete');
    athlete[today] = await targetCardStates(page);
    expect(Object.keys(athlete[today]!).length).toBeGreaterThan(0);
    expect(new Set(Object.values(athlete[today]!))).toEqual(new Set(['in_progress']));
    await expect(page.getByRole('list', { name: 'Targets and progress' }).innerText()).resolves.not.toMatch(
      /Off plan|Drifting/,
    );
    await screenshot(page, 'verdicts-today-375');
    await page.setViewportSize({ width: 1280, height: 860 });
    await screenshot(page, 'verdicts-today-1280');
    await page.setViewportSize({ width: 375, height: 812 });

    await page.goto(`/athlete/days/${yesterday}`);
    athlete[yesterday] = await targetCardStates(page);
    expect(Object.values(athlete[yesterday]!)).not.toContain('in_progress');
  });

  it('the coach’s day table reads the same verdicts for today and yesterday', async () => {
    const { page } = desktop;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach');
    await page.goto(`/coach/athletes/${athleteId}/trends?range=2w`);
    const table = page.getByRole('region', { name: 'Days, newest first' });
    await table.waitFor();
    for (const date of [today, yesterday]) {
      await table.locator(`tr[data-date="${date}"]`).waitFor();
      const row = await statesIn(page, `tr[data-date="${date}"] td[data-metric]`);
      expect(row, date).toEqual(athlete[date]);
    }
    await expect(table.locator(`tr[data-date="${today}"]`).innerText()).resolves.toMatch(/So far/);
    await expect(page.getByText('Today so far').first().isVisible()).resolves.toBe(true);
  });

  it('a chart tooltip reads the same verdicts for the same days', async () => {
    const { page } = desktop;
    for (const date of [today, yesterday]) {
      const energy = await tooltipStates(page, 'Energy', date);
      expect(energy, date).toEqual({ energy: athlete[date]!.energy });
    }
    await page.mouse.move(0, 0);
    await screenshot(page, 'verdicts-coach-trends-1280');
    await page.setViewportSize({ width: 375, height: 812 });
    await page.getByRole('region', { name: 'Days, newest first' }).waitFor();
    await screenshot(page, 'verdicts-coach-trends-375');
  });
});
