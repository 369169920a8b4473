import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';

/**
 * Signed-in devices and the end of a session while the app is open. Leilani (a demo athlete no
 * other browser test signs in) is signed in on a phone and a laptop.
 */
const EMAIL = 'leilani.akana@driftmark.test';

describe('signed-in devices and a session that ends', () => {
  let phone: Session;
  let laptop: Session;

  beforeAll(async () => {
    phone = await openSession(375);
    laptop = await openSession(1280);
  });
  afterAll(async () => {
    await phone?.close();
    await laptop?.close();
  });

  it('lists both devices, this one marked, and signs the other out from Settings', async () => {
    await signIn(phone.page, EMAIL);
    await phone.page.waitForURL('**/athlete**');
    await signIn(laptop.page, EMAIL);
    await laptop.page.waitForURL('**/athlete**');

    await phone.page.goto('/settings');
    const phoneList = phone.page.getByRole('list', { name: 'Signed-in devices' });
    await phoneList.getByText('This device').waitFor();
    await expect(phoneList.getByRole('listitem').count()).resolves.toBeGreaterThanOrEqual(2);
    await phone.page.getByRole('heading', { name: 'Signed-in devices' }).scrollIntoViewIfNeeded();
    await screenshot(phone.page, 'settings-devices-375');
    // The phone leaves the app open on its trends.
    await phone.page.getByRole('link', { name: 'Trends' }).first().click();
    await phone.page.waitForURL('**/athlete/trends');

    await laptop.page.goto('/settings');
    const list = laptop.page.getByRole('list', { name: 'Signed-in devices' });
    await list.getByText('This device').waitFor();
    await screenshot(laptop.page, 'settings-devices-1280');
    const others = list.getByRole('listitem').filter({ hasNotText: 'This device' });
    const before = await others.count();
    expect(before).toBeGreaterThanOrEqual(1);
    await others
      .first()
      .getByRole('button', { name: /^Sign out/ })
      .click();
    await expect.poll(() => others.count()).toBe(before - 1);
  });

  it('the phone, signed out from the laptop, says so and returns to the same page after sign-in', async () => {
    const { page } = phone;
    // Still open on trends: the next move meets the signed-out session.
    await page.getByRole('link', { name: 'History' }).first().click();
    await page.waitForURL('**/sign-in?**');
    // The page it was on when the answer came: the one left or the one being opened.
    const next = new URL(page.url()).searchParams.get('next');
    expect(['/athlete/trends', '/athlete/history']).toContain(next);
    await page.getByText('This device was signed out from another device').waitFor();
    await screenshot(page, 'session-signed-out-375');

    await page.getByLabel('E-mail').fill(EMAIL);
    await page.getByLabel('Password', { exact: true }).fill('driftmark-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`**${next}`);
    await expect(page.getByText('This device was signed out from another device').count()).resolves.toBe(0);
  });

  it('a session that ended (a cookie the server no longer honours) says so and comes back', async () => {
    const { page, context } = laptop;
    await page.goto('/athlete/trends');
    await page.getByRole('link', { name: 'History' }).first().waitFor();
    // The trends page's own reads must be answered first: one still in flight when the cookie goes
    // stale would end the session (and leave the page) before the click.
    await page.waitForLoadState('networkidle');
    const [cookie] = (await context.cookies()).filter((c) => c.name === 'dm_session');
    expect(cookie).toBeDefined();
    await context.addCookies([{ ...cookie!, value: 'a.stale.token' }]);

    await page.getByRole('link', { name: 'History' }).first().click();
    await page.waitForURL('**/sign-in?**');
    const next = new URL(page.url()).searchParams.get('next');
    expect(['/athlete/trends', '/athlete/history']).toContain(next);
    await page.getByText('Your session ended').waitFor();
    await screenshot(page, 'session-ended-1280');
    await page.getByLabel('E-mail').fill(EMAIL);
    await page.getByLabel('Password', { exact: true }).fill('driftmark-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`**${next}`);
  });

  it('the demo inbox page is not there outside demo mode', async () => {
    const { page } = laptop;
    const res = await page.goto('/dev/inbox');
    expect(res?.status()).toBe(404);
  });
});
