import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSession, screenshot, signIn, type Session } from './support/browser.js';
import { appPath, anyLinkIn, waitForMail } from './support/mail.js';

// The countdown athlete's weekly check-in is due today: he answers the coach's questions on his
// phone; the coach gets the e-mail, follows its link and replies; the reply reaches the athlete by
// e-mail and on the weekly screen. Then the printable weekly report.
describe('the weekly check-in with e-mail both ways', () => {
  let phone: Session;
  let desktop: Session;
  const question = 'Anything you want me to look at before the show?';
  const answer = 'Slept badly on Monday; otherwise on track.';
  const coachReply = 'Thanks Mateo. Keep the water as planned and rest well tonight.';

  beforeAll(async () => {
    phone = await openSession(375);
    desktop = await openSession(1280);
  });
  afterAll(async () => {
    await phone?.close();
    await desktop?.close();
  });

  it('the athlete answers the weekly form; the coach is e-mailed, follows the link and replies', async () => {
    const { page } = phone;
    await signIn(page, 'athlete@driftmark.test');
    await page.waitForURL('**/athlete**');
    await page.getByRole('link', { name: 'Open the weekly check-in' }).click();
    const form = page.getByRole('form', { name: 'Weekly check-in' });
    await form.waitFor();
    await page.getByText('Your week in figures').waitFor();

    // Every question of the team's list, by kind: 3 of 5 on scales, Yes on yes/no, a word on text.
    const scales = await form.getByRole('radio', { name: '3 of 5' }).all();
    const yesNo = await form.getByRole('radio', { name: 'Yes', exact: true }).all();
    expect(scales.length + yesNo.length).toBeGreaterThan(0);
    for (const radio of [...scales, ...yesNo]) await radio.check();
    for (const box of await form.getByRole('textbox').all()) {
      const label = await box.getAttribute('aria-label');
      if (label === 'Questions for your coach') continue;
      if (!(await box.inputValue())) await box.fill(answer);
    }
    await form.getByLabel('Questions for your coach').fill(question);
    await screenshot(page, 'weekly-form-375');
    const sentAt = new Date();
    await form.getByRole('button', { name: 'Send to my coach' }).click();
    await page.getByText('Sent — your coach will reply here').waitFor();

    const mail = await waitForMail({
      to: 'coach@driftmark.test',
      subject: 'Weekly check-in from',
      since: sentAt,
    });
    expect(mail.subject).toContain('Mateo Castellanos');
    expect(mail.text).toContain(question);
    const link = appPath(anyLinkIn(mail, '/weekly/'));

    const coach = desktop.page;
    await signIn(coach, 'coach@driftmark.test');
    await coach.waitForURL('**/coach');
    await coach.goto(link);
    await coach.getByRole('heading', { name: 'Answers' }).waitFor();
    await expect(coach.getByText(question).count()).resolves.toBeGreaterThan(0);
    const reply = coach.getByRole('form', { name: 'Reply' });
    await reply.getByLabel('Your reply').fill(coachReply);
    const repliedAt = new Date();
    await reply.getByRole('button', { name: 'Send the reply' }).click();
    await coach.getByText(coachReply).first().waitFor();

    const back = await waitForMail({
      to: 'athlete@driftmark.test',
      subject: 'answered your weekly check-in',
      since: repliedAt,
    });
    expect(back.text).toContain(coachReply);
    await page.goto(appPath(anyLinkIn(back, '/athlete/weekly')));
    await page.getByText(coachReply).waitFor();
  });

  it('prints the weekly report', async () => {
    const { page } = desktop;
    await page.goto('/coach/roster');
    await page.getByRole('table').getByRole('link', { name: 'Mateo Castellanos' }).click();
    await page.getByRole('link', { name: 'Trends', exact: true }).click();
    await page.getByRole('link', { name: 'Weekly report' }).click();
    await page.getByRole('heading', { level: 1, name: 'Mateo Castellanos' }).waitFor();
    await page.getByRole('img', { name: 'Weight and trend this week' }).waitFor();
    // The coach's reply from the check-in above is part of the report.
    await page.getByText(coachReply).waitFor();
    // Scale and yes/no answers come back as the athlete gave them.
    await expect(page.getByText('3 of 5').count()).resolves.toBeGreaterThan(0);
    await page.emulateMedia({ media: 'print' });
    await screenshot(page, 'weekly-report-print-1280');
    await page.emulateMedia({ media: 'screen' });
  });
});
