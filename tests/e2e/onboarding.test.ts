import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { daysFromToday, openSession, screenshot, signIn, type Session } from './support/browser.js';
import { linkIn, waitForMailTo } from './support/mail.js';

// The journey a new athlete takes: invited by the demo coach, reads the invitation from the captured
// mail, sets a password, fills the intake and lands on the athlete home; the coach then sees them.
describe('invitation to athlete home', () => {
  let coach: Session;
  let invitee: Session;
  const stamp = Date.now().toString(36);
  const email = `new.athlete.${stamp}@example.test`;
  const name = `Ilse Marchetti ${stamp}`;

  beforeAll(async () => {
    coach = await openSession(1280);
    invitee = await openSession(375);
  });
  afterAll(async () => {
    await coach?.close();
    await invitee?.close();
  });

  it('the coach signs in and invites an athlete by e-mail', async () => {
    const { page } = coach;
    await signIn(page, 'coach@driftmark.test');
    await page.waitForURL('**/coach**');
    // The coach's default screen is the review queue; the roster sits beside it in the side bar.
    await page.getByRole('heading', { name: 'Review queue', level: 1 }).waitFor();
    await screenshot(page, 'coach-home-1280');

    await page.getByRole('link', { name: 'Invitations' }).click();
    const form = page.getByRole('form', { name: 'Invite someone' });
    await form.getByLabel('Name').fill(name);
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Role').selectOption('athlete');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByRole('list', { name: 'Pending invitations' }).getByText(email).waitFor();
  });

  it('the invitee follows the e-mailed link, sets a password and fills the intake', async () => {
    const mail = await waitForMailTo(email);
    expect(mail.subject).toMatch(/invit/i);
    const link = linkIn(mail, '/invite/');

    const { page } = invitee;
    await page.goto(link);
    await page.getByText('Northline').first().waitFor();
    await page.getByLabel('Your name').fill(name);
    await page.getByLabel('Password', { exact: true }).fill('a long new passphrase');
    await page.getByRole('button', { name: 'Create account' }).click();

    await page.waitForURL('**/intake');
    await page.getByLabel('Female').check();
    await page.getByLabel('Birth date').fill('1997-08-21');
    await page.getByLabel('Height (cm)').fill('168');
    await page.getByLabel(/Current weight/).fill('64.8');
    await page.getByLabel(/Usual daily water/).fill('2800');
    await page.getByLabel(/Usual daily energy/).fill('2050');
    await page.getByLabel('Goal').selectOption('lose');
    await page.getByLabel('Event type').selectOption('show');
    await page.getByLabel('Event name').fill('Harbour Classic');
    // About five months out, whatever today is.
    await page.getByLabel('Event date').fill(daysFromToday(150));
    await page.getByLabel('Event time').fill('10:00');
    await page.getByLabel('Division or weight class').fill('Figure');
    await page.getByLabel(/I agree that condition photos/).check();
    await page.getByLabel(/I understand that Driftmark/).check();
    await screenshot(page, 'intake-375');
    await page.getByRole('button', { name: 'Save and continue' }).click();

    await page.waitForURL('**/athlete**');
    await page.getByText('Harbour Classic').first().waitFor();
    await screenshot(page, 'athlete-home-new-375');
  });

  it('the coach sees the new athlete on the roster', async () => {
    const { page } = coach;
    await page.goto('/coach');
    await page.getByRole('navigation', { name: 'Coach' }).getByRole('link', { name: 'Roster' }).click();
    await page.waitForURL('**/coach/roster');
    await page.getByRole('heading', { name: 'Roster', level: 1 }).waitFor();
    const row = page.getByRole('row').filter({ hasText: name });
    await row.first().waitFor();
    await expect(row.count()).resolves.toBe(1);
    await expect(row.getByText('Harbour Classic').count()).resolves.toBeGreaterThan(0);
  });
});
