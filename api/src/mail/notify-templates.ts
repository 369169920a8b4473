/**
 * The notification e-mails (safety flags, marks and replies, weekly check-ins, reminders, the
 * weekly summary). Every one has a plain-text part and our own HTML layout, one button to the
 * screen it is about, and a line saying how to stop that kind of e-mail.
 */
import { NOTIFICATION_LABELS, type NotificationKind } from '@driftmark/shared';
import { html, oneLine, renderHtmlLayout, renderTextLayout, type SafeHtml } from './layout.js';
import type { RenderedMail } from './templates.js';

export interface NotifyMailBase {
  /** The recipient's name. */
  name: string;
  /** The screen the button opens (absolute http(s) URL). */
  link: string;
  /** Settings page where preferences are changed. */
  settingsLink: string;
  /** One-click unsubscribe page for this kind (carries a signed token). */
  unsubscribeLink: string;
}

interface Parts {
  kind: NotificationKind;
  subject: string;
  title: string;
  preheader: string;
  /** Plain paragraphs; the HTML part escapes them. */
  intro: string[];
  action: string;
  after?: string[];
}

function render(base: NotifyMailBase, parts: Parts): RenderedMail {
  const stop =
    `You get this e-mail because "${NOTIFICATION_LABELS[parts.kind]}" is on in your Driftmark settings. ` +
    `Change your e-mail settings: ${base.settingsLink} — or stop this kind with one click: ${base.unsubscribeLink}`;
  const paragraphs = [`Hello ${base.name},`, ...parts.intro];
  const text = renderTextLayout({
    title: parts.title,
    intro: paragraphs,
    action: { label: parts.action, url: base.link },
    after: parts.after ?? [],
    reason: stop,
  });
  const htmlStop: SafeHtml = html`You get this e-mail because “${NOTIFICATION_LABELS[parts.kind]}” is on in
    your settings. <a href="${base.settingsLink}">Change your e-mail settings</a> or
    <a href="${base.unsubscribeLink}">stop this kind of e-mail</a>.`;
  const htmlBody = renderHtmlLayout({
    title: parts.title,
    preheader: parts.preheader,
    intro: paragraphs.map((p) => html`${p}`),
    action: { label: parts.action, url: base.link },
    after: [...(parts.after ?? []).map((p) => html`${p}`), htmlStop],
    reason: 'You can change which e-mails you get in Settings.',
  });
  return { subject: oneLine(parts.subject), text, html: htmlBody };
}

export function renderSafetyFlagMail(
  input: NotifyMailBase & { athleteName: string; date: string; message: string },
): RenderedMail {
  return render(input, {
    kind: 'safety_flag',
    subject: `Safety flag: ${input.athleteName}`,
    title: `Safety flag for ${input.athleteName}`,
    preheader: input.message,
    intro: [
      `${input.athleteName} raised a safety flag on ${input.date}:`,
      input.message,
      'Please look at their day and get in touch with them.',
    ],
    action: "Open the athlete's day",
  });
}

export function renderMarkCreatedMail(
  input: NotifyMailBase & { authorName: string; fromDate: string; toDate: string; note: string },
): RenderedMail {
  const span = input.fromDate === input.toDate ? input.fromDate : `${input.fromDate} to ${input.toDate}`;
  return render(input, {
    kind: 'coach_note',
    subject: `${input.authorName} left a note on your chart`,
    title: `A new note from ${input.authorName}`,
    preheader: input.note,
    intro: [`${input.authorName} left a note on your chart for ${span}:`, input.note],
    action: 'Read it and reply',
  });
}

export function renderMarkReplyMail(
  input: NotifyMailBase & {
    kind: 'mark_reply' | 'coach_note';
    replierName: string;
    note: string;
    body: string;
  },
): RenderedMail {
  return render(input, {
    kind: input.kind,
    subject: `${input.replierName} replied to a note`,
    title: `${input.replierName} replied`,
    preheader: input.body,
    intro: [`${input.replierName} replied to the note “${input.note}”:`, input.body],
    action: 'Open the thread',
  });
}

export function renderWeeklyCheckInReceivedMail(
  input: NotifyMailBase & { athleteName: string; dueDate: string; questionsForCoach: string | null },
): RenderedMail {
  return render(input, {
    kind: 'weekly_check_in_received',
    subject: `Weekly check-in from ${input.athleteName}`,
    title: `${input.athleteName} sent their weekly check-in`,
    preheader: `The check-in for the week up to ${input.dueDate}.`,
    intro: [
      `${input.athleteName} sent the weekly check-in for the week up to ${input.dueDate}.`,
      ...(input.questionsForCoach ? [`Their questions for you: ${input.questionsForCoach}`] : []),
    ],
    action: 'Read and reply',
  });
}

export function renderWeeklyCheckInRepliedMail(
  input: NotifyMailBase & { coachName: string; dueDate: string; body: string },
): RenderedMail {
  return render(input, {
    kind: 'coach_note',
    subject: `${input.coachName} answered your weekly check-in`,
    title: 'Your weekly check-in has an answer',
    preheader: input.body,
    intro: [`${input.coachName} answered your check-in for the week up to ${input.dueDate}:`, input.body],
    action: 'Read the answer',
  });
}

export function renderMorningReminderMail(input: NotifyMailBase & { date: string }): RenderedMail {
  return render(input, {
    kind: 'morning_reminder',
    subject: 'No weigh-in yet today',
    title: 'Time for your weigh-in',
    preheader: `Nothing is logged for ${input.date} yet.`,
    intro: [
      `There is no weigh-in for today (${input.date}) yet.`,
      'Weigh in the usual way (after waking, before eating or drinking) and log it in Driftmark.',
    ],
    action: 'Log today',
  });
}

export function renderWeeklyCheckInDueMail(input: NotifyMailBase & { dueDate: string }): RenderedMail {
  return render(input, {
    kind: 'weekly_check_in_due',
    subject: 'Your weekly check-in is due',
    title: 'Your weekly check-in is due',
    preheader: `The check-in for the week up to ${input.dueDate}.`,
    intro: [
      `Your weekly check-in for the week up to ${input.dueDate} is due today.`,
      'Your figures for the week are filled in already; answer your coach’s questions and send it.',
    ],
    action: 'Open the weekly check-in',
  });
}

export interface SummaryLine {
  athleteName: string;
  weighIns: number;
  flags: number;
  checkIn: 'submitted' | 'missing' | 'not due';
}

export function renderWeeklySummaryMail(
  input: NotifyMailBase & { week: string; lines: SummaryLine[] },
): RenderedMail {
  const lines = input.lines.map(
    (l) =>
      `${l.athleteName}: ${l.weighIns}/7 weigh-ins, ${l.flags} safety flag${l.flags === 1 ? '' : 's'}, ` +
      `weekly check-in ${l.checkIn}`,
  );
  const flagged = input.lines.filter((l) => l.flags > 0).length;
  return render(input, {
    kind: 'weekly_summary',
    subject: `Your roster, week ${input.week}`,
    title: `Your roster, week ${input.week}`,
    preheader: `${input.lines.length} athletes, ${flagged} with safety flags in the last 7 days.`,
    intro: [
      `The last 7 days of your ${input.lines.length} athlete${input.lines.length === 1 ? '' : 's'}:`,
      ...lines,
    ],
    action: 'Open the review queue',
  });
}

export function renderOverLimitMail(
  input: NotifyMailBase & { athleteName: string; summary: string; weighInDate: string },
): RenderedMail {
  return render(input, {
    kind: 'over_limit',
    subject: `Projected over the limit: ${input.athleteName}`,
    title: `${input.athleteName} is projected over the weigh-in limit`,
    preheader: input.summary,
    intro: [
      `${input.athleteName}'s weight trend now projects over the limit for the weigh-in on ${input.weighInDate}:`,
      `${input.summary}.`,
      'Look at the cut plan with them. The commission’s rules decide the weigh-in; agree any acute loss with a physician.',
    ],
    action: "Open the athlete's page",
  });
}
