import { describe, expect, it } from 'vitest';
import { escapeHtml } from './layout.js';
import {
  renderInvitationMail,
  renderInvitationToExistingAccountMail,
  renderPasswordResetMail,
} from './templates.js';

const link = 'http://127.0.0.1:3000/invite/abcDEF123_-tokenvalue?x=1&y=2';
const expiresAt = new Date('2026-12-10T14:32:00Z');
const hostile = `Zoë <script>alert("x")</script> & 'co'`;

/** Text of the HTML part with the tags removed, to check what a reader sees. */
function visibleText(htmlBody: string): string {
  return htmlBody.replace(/<[^>]*>/g, ' ');
}

describe('escapeHtml', () => {
  it('escapes the five HTML-significant characters', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });
});

describe('renderInvitationMail', () => {
  const mail = renderInvitationMail({
    inviteeName: hostile,
    inviterName: 'Mara <b>Okafor</b>',
    teamName: 'Team "Line" & Co',
    role: 'assistant',
    link,
    expiresAt,
  });

  it('escapes every interpolated value in the HTML part', () => {
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).not.toContain('<b>Okafor</b>');
    expect(mail.html).toContain('Zoë &lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;co&#39;');
    expect(mail.html).toContain('Mara &lt;b&gt;Okafor&lt;/b&gt;');
    expect(mail.html).toContain('Team &quot;Line&quot; &amp; Co');
    expect(mail.html).toContain(`<title>Join Team &quot;Line&quot; &amp; Co on Driftmark</title>`);
  });

  it('keeps the plain-text part unescaped and readable', () => {
    expect(mail.text).toContain(`Hello ${hostile},`);
    expect(mail.text).toContain(
      'Mara <b>Okafor</b> invited you to join Team "Line" & Co on Driftmark. Your role: Assistant coach.',
    );
  });

  it('puts the link in both parts', () => {
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(`href="${link.replace(/&/g, '&amp;')}"`);
  });

  it('names the role with the shared label, the expiry and why the mail was sent', () => {
    expect(visibleText(mail.html)).toContain('Assistant coach');
    expect(mail.text).toContain('expires on 10 December 2026 at 14:32 UTC');
    expect(mail.text).toMatch(/automated message from Driftmark/);
    expect(mail.text).toMatch(/because Mara <b>Okafor<\/b> invited this address/);
    expect(mail.html).toMatch(/automated message from Driftmark/);
  });

  it('has the wordmark and loads nothing remote', () => {
    expect(mail.html).toContain('>Driftmark</td>');
    expect(mail.html).not.toMatch(/<img|src=|url\(|<link|@import/i);
  });

  it('keeps the subject on one line', () => {
    const m = renderInvitationMail({
      inviteeName: 'A',
      inviterName: 'Evil\r\nBcc: x@example.com',
      teamName: 'T',
      role: 'athlete',
      link,
      expiresAt,
    });
    expect(m.subject).toBe('Evil Bcc: x@example.com invited you to T on Driftmark');
  });

  it('refuses a link that is not http(s)', () => {
    expect(() =>
      renderInvitationMail({
        inviteeName: 'A',
        inviterName: 'B',
        teamName: 'T',
        role: 'athlete',
        link: 'javascript:alert(1)',
        expiresAt,
      }),
    ).toThrow(/http/);
  });
});

describe('renderPasswordResetMail', () => {
  const resetLink = 'http://127.0.0.1:3000/reset-password?token=tok_123&from=mail';
  const mail = renderPasswordResetMail({
    name: hostile,
    link: resetLink,
    expiresAt,
    timeZone: 'Pacific/Auckland',
  });

  it('escapes the name and puts the link in both parts', () => {
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('Hello Zoë &lt;script&gt;');
    expect(mail.text).toContain(resetLink);
    expect(mail.html).toContain(`href="${resetLink.replace(/&/g, '&amp;')}"`);
  });

  it('says to ignore it when not asked for, and shows the expiry in the given zone', () => {
    expect(mail.text).toMatch(/If you did not ask for this, ignore this e-mail/);
    expect(visibleText(mail.html)).toMatch(/If you did not ask for this, ignore this e-mail/);
    // 14:32 UTC is 03:32 the next day in Auckland (NZDT, UTC+13).
    expect(mail.text).toContain('11 December 2026 at 03:32');
    expect(mail.subject).toBe('Reset your Driftmark password');
  });
});

describe('renderInvitationToExistingAccountMail', () => {
  const mail = renderInvitationToExistingAccountMail({
    inviteeName: hostile,
    inviterName: 'Mara <b>Okafor</b>',
    teamName: 'Team "Line" & Co',
    role: 'athlete',
    signInLink: 'http://127.0.0.1:3000/sign-in',
  });

  it('escapes every interpolated value in the HTML part', () => {
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).not.toContain('<b>Okafor</b>');
    expect(mail.html).toContain('Team &quot;Line&quot; &amp; Co');
  });

  it('says the address has an account, what to do, and links to sign-in, not to an accept page', () => {
    expect(mail.text).toContain('already has a Driftmark account');
    expect(mail.text).toContain('ask Mara <b>Okafor</b> to invite another e-mail address');
    expect(mail.text).toContain('http://127.0.0.1:3000/sign-in');
    expect(mail.text).not.toContain('/invite/');
  });
});
