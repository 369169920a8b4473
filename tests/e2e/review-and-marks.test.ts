import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';
import { anyLinkIn, appPath, waitForMail } from './support/mail.js';

// The head coach starts from the review queue, opens the countdown athlete, drags across the weight
// chart to pin a mark on a date range; the athlete reads it on their own chart and replies; the coach
// sees the reply come back through the queue.
describe('review queue, charts and marks', () => {
  let desktop: Session;
  let phone: Session;
  const note = 'Scale down across these days as planned; keep the water steady.';
  let pinnedAt = new Date();
  const reply = 'Felt flat on the second day, better after the evening meal.';

  beforeAll(async () => {
    desktop = await openSession(1280);
    phone = await openSession(375);
  });
  afterAll(async () => {
    await desktop?.close();
    await phone?.close();
  });

  it('puts the countdown athlete and the flagged athlete at the top, each with a reason', async () => {
    const { page } = desktop;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach');
    const queue = page.getByRole('list', { name: 'Athletes to review' });
    await queue.waitFor();
    const names = await queue.getByRole('heading', { level: 2 }).allInnerTexts();
    // The demo's safety cases come first: Mateo (countdown, dizziness reported), Aroha (a 2 % overnight
    // drop) and Priya (a rate beyond 1.4 %/week), ordered among themselves by how long they have waited.
    const safetyRows: string[] = [];
    for (const name of names) {
      const reasons = await page.getByRole('list', { name: `Why ${name} is here` }).innerText();
      if (!/Safety/.test(reasons)) break;
      safetyRows.push(name);
    }
    expect([...safetyRows].sort()).toEqual(['Aroha Tane', 'Mateo Castellanos', 'Priya Raman']);
    for (const name of ['Mateo Castellanos', 'Aroha Tane']) {
      const reasons = page.getByRole('list', { name: `Why ${name} is here` });
      await expect(reasons.getByRole('listitem').count()).resolves.toBeGreaterThan(0);
    }
    await expect(
      page.getByRole('list', { name: 'Why Mateo Castellanos is here' }).innerText(),
    ).resolves.toMatch(/E-4|countdown/i);
    await screenshot(page, 'review-queue-1280');
  });

  it('pins a mark on a date range of the weight chart', async () => {
    const { page } = desktop;
    await page
      .getByRole('list', { name: 'Athletes to review' })
      .getByRole('link', { name: 'Mateo Castellanos' })
      .click();
    await page.getByRole('link', { name: 'Trends', exact: true }).click();
    const chart = page.getByRole('figure', { name: 'Weight' });
    await chart.waitFor();
    // Pinning switches on once the marks list says the viewer may write marks.
    await page.getByRole('list', { name: 'Marks on this athlete' }).waitFor();
    const area = chart.locator('.recharts-wrapper').first();
    await area.waitFor();
    await area.scrollIntoViewIfNeeded();
    const box = await area.boundingBox();
    if (!box) throw new Error('weight chart has no box');
    const y = box.y + box.height / 2;
    await page.mouse.move(box.x + box.width * 0.35, y);
    await page.waitForTimeout(100);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.6, y, { steps: 12 });
    await page.mouse.up();

    const composer = page.getByRole('dialog', { name: 'Pin a mark' });
    await composer.waitFor();
    const from = await composer.getByLabel('From').inputValue();
    const to = await composer.getByLabel('To').inputValue();
    expect(from).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(to > from).toBe(true);
    await composer.getByLabel('Note').fill(note);
    pinnedAt = new Date();
    await composer.getByRole('button', { name: 'Pin mark' }).click();
    await composer.waitFor({ state: 'hidden' });

    const marks = page.getByRole('list', { name: 'Marks on this athlete' });
    await marks.getByText(note).waitFor();
    await expect(page.locator('[data-pin-mark-id]').count()).resolves.toBeGreaterThan(0);
    await screenshot(page, 'coach-athlete-trends-1280');
  });

  it('shows the mark to the athlete on their own chart; the athlete replies', async () => {
    const { page } = phone;
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');
    // The athlete is told by e-mail; its link opens their Trends on that mark.
    const mail = await waitForMail({
      to: 'athlete@driftmark.test',
      subject: 'left a note on your chart',
      since: pinnedAt,
    });
    expect(mail.text).toContain(note);
    await page.goto(appPath(anyLinkIn(mail, '/athlete/trends')));
    await page.getByRole('figure', { name: 'Your weight' }).waitFor();
    await expect(page.locator('[data-pin-mark-id]').count()).resolves.toBeGreaterThan(0);

    const mark = page.getByRole('article').filter({ hasText: note });
    await mark.waitFor();
    await mark.getByText('On the chart').waitFor();
    await mark.getByRole('button', { name: 'Reply' }).click();
    await mark.getByRole('textbox', { name: 'Your reply' }).fill(reply);
    await mark.getByRole('button', { name: 'Send reply' }).click();
    await mark.getByText(reply).waitFor();
    await screenshot(page, 'athlete-trends-375');
  });

  it('brings the reply back to the coach through the queue', async () => {
    const { page } = desktop;
    await page.goto('/coach');
    const reasons = page.getByRole('list', { name: 'Why Mateo Castellanos is here' });
    await reasons.waitFor();
    await expect(reasons.innerText()).resolves.toMatch(/repl/i);
    await page
      .getByRole('list', { name: 'Athletes to review' })
      .getByRole('link', { name: 'Mateo Castellanos' })
      .click();
    await page.getByRole('link', { name: 'Trends', exact: true }).click();
    const mark = page.getByRole('article').filter({ hasText: note });
    await mark.getByText(reply).waitFor();
  });
});
