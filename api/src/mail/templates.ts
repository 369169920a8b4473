/**
 * The e-mails Driftmark sends. Each renderer returns the subject, the plain-text part and the
 * HTML part; values are escaped in the HTML (see layout.ts) and links must be http(s).
 */
import { ROLE_LABELS, type Role } from '@driftmark/shared';
import { formatDateTime, html, oneLine, renderHtmlLayout, renderTextLayout } from './layout.js';

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

export interface InvitationMailInput {
  inviteeName: string;
  inviterName: string;
  teamName: string;
  role: Role;
  /** The accept link, carrying the one-time token. */
  link: string;
  expiresAt: Date;
  /** Used to show the expiry time; the invitee's own zone is not known yet. */
  timeZone?: string;
}

export interface InvitationToExistingAccountMailInput {
  inviteeName: string;
  inviterName: string;
  teamName: string;
  role: Role;
  /** The app's sign-in page. */
  signInLink: string;
}

/**
 * The invitation sent instead of the usual one when the address already has an account: an
 * account belongs to one team, so it carries no accept link and says what the recipient can do.
 * The inviter gets the same answer either way, so inviting never reveals who has an account.
 */
export function renderInvitationToExistingAccountMail(
  input: InvitationToExistingAccountMailInput,
): RenderedMail {
  const role = ROLE_LABELS[input.role];
  const title = `Your invitation to ${input.teamName}`;
  const reason =
    `You received it because ${input.inviterName} invited this address to ${input.teamName}. ` +
    'Nothing changes on your account unless you act.';
  const subject = oneLine(`${input.inviterName} invited you to ${input.teamName} on Driftmark`);
  const lines = {
    invited: `${input.inviterName} invited you to join ${input.teamName} on Driftmark. Your role: ${role}.`,
    taken:
      'This e-mail address already has a Driftmark account, and an account belongs to one team, so the ' +
      'invitation cannot be accepted with it.',
    same: `If your account is already with ${input.teamName}, there is nothing to do: sign in as usual.`,
    other:
      `If your account is with another team, ask ${input.inviterName} to invite another e-mail address ` +
      'of yours; or, as an athlete, delete your account in Settings there first (download your data ' +
      `before you do) and ask ${input.inviterName} for a new invitation.`,
  };
  const text = renderTextLayout({
    title,
    intro: [`Hello ${input.inviteeName},`, lines.invited, lines.taken, lines.same, lines.other],
    action: { label: 'Sign in', url: input.signInLink },
    after: [],
    reason,
  });
  const htmlBody = renderHtmlLayout({
    title,
    preheader: `${input.inviterName} invited you to join ${input.teamName} (${role}).`,
    intro: [
      html`Hello ${input.inviteeName},`,
      html`${lines.invited}`,
      html`${lines.taken}`,
      html`${lines.same}`,
      html`${lines.other}`,
    ],
    action: { label: 'Sign in', url: input.signInLink },
    after: [],
    reason,
  });
  return { subject, text, html: htmlBody };
}

export function renderInvitationMail(input: InvitationMailInput): RenderedMail {
  const role = ROLE_LABELS[input.role];
  const expires = formatDateTime(input.expiresAt, input.timeZone);
  const title = `Join ${input.teamName} on Driftmark`;
  const reason =
    `You received it because ${input.inviterName} invited this address to ${input.teamName}. ` +
    'If you did not expect it, ignore it: no account is created unless you accept.';

  const subject = oneLine(`${input.inviterName} invited you to ${input.teamName} on Driftmark`);
  const text = renderTextLayout({
    title,
    intro: [
      `Hello ${input.inviteeName},`,
      `${input.inviterName} invited you to join ${input.teamName} on Driftmark. Your role: ${role}.`,
      'Open the link below to set your password and finish setting up your account.',
    ],
    action: { label: 'Accept the invitation', url: input.link },
    after: [`The link can be used once and expires on ${expires}.`],
    reason,
  });
  const htmlBody = renderHtmlLayout({
    title,
    preheader: `${input.inviterName} invited you to join ${input.teamName} (${role}).`,
    intro: [
      html`Hello ${input.inviteeName},`,
      html`<strong>${input.inviterName}</strong> invited you to join <strong>${input.teamName}</strong> on
        Driftmark. Your role: <strong>${role}</strong>.`,
      html`Open the link below to set your password and finish setting up your account.`,
    ],
    action: { label: 'Accept the invitation', url: input.link },
    after: [html`The link can be used once and expires on ${expires}.`],
    reason,
  });
  return { subject, text, html: htmlBody };
}

export interface PasswordResetMailInput {
  name: string;
  /** The reset link, carrying the one-time token. */
  link: string;
  expiresAt: Date;
  /** The account's time zone, for the expiry time (UTC when not given). */
  timeZone?: string;
}

export function renderPasswordResetMail(input: PasswordResetMailInput): RenderedMail {
  const expires = formatDateTime(input.expiresAt, input.timeZone);
  const title = 'Reset your Driftmark password';
  const reason =
    'You received it because a password reset was requested for the Driftmark account of this address.';
  const ignore =
    'If you did not ask for this, ignore this e-mail: your password stays as it is and no one can use this link without access to your inbox.';

  const text = renderTextLayout({
    title,
    intro: [
      `Hello ${input.name},`,
      'Someone asked to reset the password of your Driftmark account. Open the link below to choose a new one.',
    ],
    action: { label: 'Choose a new password', url: input.link },
    after: [
      `The link can be used once and expires on ${expires}. Choosing a new password signs you out everywhere.`,
      ignore,
    ],
    reason,
  });
  const htmlBody = renderHtmlLayout({
    title,
    preheader: 'A link to choose a new password. Ignore it if you did not ask.',
    intro: [
      html`Hello ${input.name},`,
      html`Someone asked to reset the password of your Driftmark account. Open the link below to choose a new
      one.`,
    ],
    action: { label: 'Choose a new password', url: input.link },
    after: [
      html`The link can be used once and expires on ${expires}. Choosing a new password signs you out
      everywhere.`,
      html`${ignore}`,
    ],
    reason,
  });
  return { subject: title, text, html: htmlBody };
}
