import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

describe('sign-in and access', () => {
  let phone: Session;
  let desktop: Session;

  beforeAll(async () => {
    phone = await openSession(375);
    desktop = await openSession(1280);
  });
  afterAll(async () => {
    await phone?.close();
    await desktop?.close();
  });

  it('a wrong password shows a clear message and keeps the user on sign-in', async () => {
    const { page } = desktop;
    await page.goto('/sign-in');
    await screenshot(page, 'sign-in-1280');
    await signIn(page, 'coach@driftmark.test', 'not-the-password');
    await page.getByRole('alert').getByText('E-mail or password is incorrect.').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await expect(page.getByLabel('E-mail').inputValue()).resolves.toBe('coach@driftmark.test');
  });

  it('the countdown athlete lands on the athlete home and is refused a coach page', async () => {
    const { page } = phone;
    await page.goto('/sign-in');
    await screenshot(page, 'sign-in-375');
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');
    await page.getByRole('navigation', { name: 'Athlete' }).waitFor();
    await screenshot(page, 'athlete-home-375');

    await page.goto('/coach');
    await page.getByText('This page is for coaches').waitFor();
    await expect(page.getByRole('table').count()).resolves.toBe(0);

    const roster = await page.request.get('/api/roster');
    expect([403, 404]).toContain(roster.status());
    const body = (await roster.json()) as { error?: { code: string }; data?: unknown };
    expect(body.data).toBeUndefined();
    expect(body.error?.code).toBeTruthy();
  });
});
