import { formatDateTime, html, renderHtmlLayout, renderTextLayout } from './layout.js';
import type { RenderedMail } from './templates.js';

export interface DeletionRequestMailInput {
  name: string;
  /** The confirm link, carrying the signed token. */
  link: string;
  expiresAt: Date;
  timeZone?: string;
}

export function renderDeletionRequestMail(input: DeletionRequestMailInput): RenderedMail {
  const expires = formatDateTime(input.expiresAt, input.timeZone);
  const title = 'Confirm deleting your Driftmark account';
  const reason = 'You received it because deleting the Driftmark account of this address was requested.';
  const what =
    'Deleting removes your days, plans, marks, replies, weekly check-ins and photos for good. Download your data first if you want to keep a copy.';
  const ignore = 'If you did not ask for this, ignore this e-mail: nothing is deleted without the link.';
  const action = { label: 'Delete my account', url: input.link };
  const text = renderTextLayout({
    title,
    intro: [`Hello ${input.name},`, what],
    action,
    after: [`The link expires on ${expires}.`, ignore],
    reason,
  });
  const htmlBody = renderHtmlLayout({
    title,
    preheader: 'One more step: confirm with the link. Ignore it if you did not ask.',
    intro: [html`Hello ${input.name},`, html`${what}`],
    action,
    after: [html`The link expires on ${expires}.`, html`${ignore}`],
    reason,
  });
  return { subject: title, text, html: htmlBody };
}

export interface AccountDeletedMailInput {
  name: string;
  /** Where to go now (the sign-in page). */
  link: string;
}

export function renderAccountDeletedMail(input: AccountDeletedMailInput): RenderedMail {
  const title = 'Your Driftmark account has been deleted';
  const reason = 'You received it because the Driftmark account of this address was deleted on request.';
  const done =
    'Your account, your days, plans, marks, replies, weekly check-ins and photos have been deleted. You can no longer sign in.';
  const action = { label: 'Open Driftmark', url: input.link };
  const text = renderTextLayout({ title, intro: [`Hello ${input.name},`, done], action, after: [], reason });
  const htmlBody = renderHtmlLayout({
    title,
    preheader: 'Your account and data are gone.',
    intro: [html`Hello ${input.name},`, html`${done}`],
    action,
    after: [],
    reason,
  });
  return { subject: title, text, html: htmlBody };
}
