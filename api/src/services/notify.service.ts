/**
 * Notification e-mails. Services call these inside their own transaction (pass its manager): the
 * e-mail is queued in the outbox with the change that caused it, so a rolled-back change mails
 * nobody and a committed one is delivered by the mail worker (at the latest on its next sweep).
 *
 * Each function checks the recipient's preferences (kinds not stored count as wanted) and, where
 * a send must happen once per due time, claims a `notification_sends` row first (unique per user,
 * kind and due key): a second claim finds the row and sends nothing.
 */
import {
  inReaderUnits,
  ATHLETE_NOTIFICATION_KINDS,
  NOTIFICATION_KINDS,
  STAFF_NOTIFICATION_KINDS,
  isStaffRole,
  type NotificationKind,
  type NotificationPreferences,
} from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import type { Config } from '../config.js';
import { AthleteShare } from '../entities/athlete-share.entity.js';
import type { User, UserNotificationPrefs } from '../entities/user.entity.js';
import { signUnsubscribeToken } from '../lib/unsubscribe-token.js';
import {
  renderMarkCreatedMail,
  renderMarkReplyMail,
  renderOverLimitMail,
  renderSafetyFlagMail,
  renderWeeklyCheckInReceivedMail,
  renderWeeklyCheckInRepliedMail,
  type NotifyMailBase,
} from '../mail/notify-templates.js';
import type { RenderedMail } from '../mail/templates.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { queueMail } from './mail.service.js';

export type NotifyConfig = Pick<Config, 'appOrigin' | 'jwtSecret'>;

let notifyConfig: NotifyConfig | null = null;

/** Set once by createApp (and the scheduler): where links point and what signs unsubscribe tokens. */
export function configureNotifications(config: NotifyConfig): void {
  notifyConfig = { appOrigin: config.appOrigin, jwtSecret: config.jwtSecret };
}

function settings(): NotifyConfig {
  if (!notifyConfig) throw new Error('configureNotifications() has not run');
  return notifyConfig;
}

/** Default hour (athlete's own time zone) of the morning reminder when none is stored. */
export const DEFAULT_REMINDER_HOUR = 9;

/** The kinds a role may get. */
export function kindsForRole(role: User['role']): readonly NotificationKind[] {
  return isStaffRole(role) ? STAFF_NOTIFICATION_KINDS : ATHLETE_NOTIFICATION_KINDS;
}

/**
 * The stored preferences in API form: every kind present (the shared schema's record is
 * exhaustive; a role only ever gets its own kinds, see `wants`), the reminder hour for athletes.
 */
export function presentPreferences(user: Pick<User, 'role' | 'notificationPrefs'>): NotificationPreferences {
  const stored: UserNotificationPrefs = user.notificationPrefs ?? {};
  const enabled = {} as NotificationPreferences['enabled'];
  for (const kind of NOTIFICATION_KINDS) enabled[kind] = stored.enabled?.[kind] ?? true;
  return {
    enabled,
    reminderHour: isStaffRole(user.role) ? null : (stored.reminderHour ?? DEFAULT_REMINDER_HOUR),
  };
}

export function wants(user: Pick<User, 'role' | 'notificationPrefs'>, kind: NotificationKind): boolean {
  if (!kindsForRole(user.role).includes(kind)) return false;
  return user.notificationPrefs?.enabled?.[kind] ?? true;
}

/** An absolute link to a screen of the web app. */
export function appLink(path: string): string {
  return `${settings().appOrigin}${path}`;
}

export function unsubscribeLink(userId: string, kind: NotificationKind): string {
  return appLink(
    `/unsubscribe?token=${encodeURIComponent(signUnsubscribeToken(userId, kind, settings().jwtSecret))}`,
  );
}

/** RFC 2369 / RFC 8058 headers: one-click POST to the API, the page as a fallback. */
export function listUnsubscribeHeaders(userId: string, kind: NotificationKind): Record<string, string> {
  const token = signUnsubscribeToken(userId, kind, settings().jwtSecret);
  return {
    'List-Unsubscribe': `<${appLink(`/api/unsubscribe?token=${encodeURIComponent(token)}`)}>`,
    'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
  };
}

export function mailBase(
  user: Pick<User, 'id' | 'name'>,
  kind: NotificationKind,
  path: string,
): NotifyMailBase {
  return {
    name: user.name,
    link: appLink(path),
    settingsLink: appLink('/settings'),
    unsubscribeLink: unsubscribeLink(user.id, kind),
  };
}

/**
 * Claims the once-per-due-time slot; true when this call got it (and must send), false when a
 * send for (user, kind, dueKey) exists already. Inside the caller's transaction, so a rollback
 * frees the slot again.
 */
export async function claimSend(
  manager: EntityManager,
  userId: string,
  kind: NotificationKind,
  dueKey: string,
): Promise<boolean> {
  const rows: unknown[] = await manager.query(
    `INSERT INTO notification_sends (user_id, kind, due_key) VALUES ($1, $2, $3)
     ON CONFLICT (user_id, kind, due_key) DO NOTHING RETURNING id`,
    [userId, kind, dueKey.slice(0, 64)],
  );
  return rows.length > 0;
}

/** Whether the (user, kind, due key) send has been claimed already: a cheap look before costly work. */
export async function alreadySent(
  manager: EntityManager,
  userId: string,
  kind: NotificationKind,
  dueKey: string,
): Promise<boolean> {
  const rows: unknown[] = await manager.query(
    `SELECT 1 FROM notification_sends WHERE user_id = $1 AND kind = $2 AND due_key = $3`,
    [userId, kind, dueKey.slice(0, 64)],
  );
  return rows.length > 0;
}

/** Queues one notification e-mail to `user` when wanted (and the due slot is free). */
export async function sendNotification(
  manager: EntityManager,
  user: Pick<User, 'id' | 'name' | 'email' | 'role' | 'notificationPrefs'>,
  kind: NotificationKind,
  mail: RenderedMail,
  opts: { dueKey?: string; listUnsubscribe?: boolean } = {},
): Promise<boolean> {
  if (!wants(user, kind)) return false;
  if (opts.dueKey && !(await claimSend(manager, user.id, kind, opts.dueKey))) return false;
  await queueMail(manager, {
    kind,
    to: user.email,
    ...mail,
    ...(opts.listUnsubscribe ? { headers: listUnsubscribeHeaders(user.id, kind) } : {}),
  });
  return true;
}

/** The athlete's assigned coach and every staff member it is shared with, once each. */
async function athleteStaff(manager: EntityManager, athlete: AthleteWithPeople): Promise<User[]> {
  const shares = await manager.find(AthleteShare, {
    where: { athleteId: athlete.id },
    relations: { user: true },
  });
  const staff = new Map<string, User>([[athlete.coach.id, athlete.coach]]);
  for (const share of shares)
    if (share.user && isStaffRole(share.user.role)) staff.set(share.user.id, share.user);
  return [...staff.values()];
}

const coachDayPath = (athleteId: string, date: string) =>
  `/coach/athletes/${encodeURIComponent(athleteId)}?date=${encodeURIComponent(date)}`;

/** A safety flag was raised: its athlete's coach and shared staff hear at once (once per flag). */
export async function notifySafetyFlag(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  flag: { id: string; localDate: string; message: string },
): Promise<void> {
  for (const staff of await athleteStaff(manager, athlete)) {
    const mail = renderSafetyFlagMail({
      ...mailBase(staff, 'safety_flag', coachDayPath(athlete.id, flag.localDate)),
      athleteName: athlete.user.name,
      date: flag.localDate,
      // Flags are written in kg; each staff member reads their own units.
      message: inReaderUnits(flag.message, { weight: staff.weightUnit, volume: staff.volumeUnit }),
    });
    await sendNotification(manager, staff, 'safety_flag', mail, { dueKey: `flag:${flag.id}` });
  }
}

/**
 * The athlete's projection first crossed above the weigh-in limit: their coach and shared staff hear
 * at once, once per weigh-in date (a later crossing for the same weigh-in does not mail again).
 */
export async function notifyOverLimit(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  gap: { summary: string },
): Promise<void> {
  if (!athlete.eventDate) return;
  for (const staff of await athleteStaff(manager, athlete)) {
    const mail = renderOverLimitMail({
      ...mailBase(staff, 'over_limit', `/coach/athletes/${encodeURIComponent(athlete.id)}`),
      athleteName: athlete.user.name,
      summary: inReaderUnits(gap.summary, { weight: staff.weightUnit, volume: staff.volumeUnit }),
      weighInDate: athlete.eventDate,
    });
    await sendNotification(manager, staff, 'over_limit', mail, {
      dueKey: `${athlete.id}:${athlete.eventDate}`,
    });
  }
}

/** An athlete sent (first submitted) a weekly check-in: their coach and shared staff hear. */
export async function notifyWeeklyCheckInReceived(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  checkIn: { id: string; dueDate: string; questionsForCoach: string | null },
): Promise<void> {
  for (const staff of await athleteStaff(manager, athlete)) {
    const mail = renderWeeklyCheckInReceivedMail({
      ...mailBase(
        staff,
        'weekly_check_in_received',
        `/coach/athletes/${encodeURIComponent(athlete.id)}/weekly/${encodeURIComponent(checkIn.id)}`,
      ),
      athleteName: athlete.user.name,
      dueDate: checkIn.dueDate,
      questionsForCoach: checkIn.questionsForCoach,
    });
    // Once per due date: later edits of the same check-in do not mail again.
    await sendNotification(manager, staff, 'weekly_check_in_received', mail, {
      dueKey: `${athlete.id}:${checkIn.dueDate}`,
    });
  }
}

/** A staff member pinned a mark on the athlete's chart: the athlete hears (coach_note). */
export async function notifyMarkCreated(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  mark: { id: string; authorId: string; fromDate: string; toDate: string; note: string },
  author: Pick<User, 'name'>,
): Promise<void> {
  if (mark.authorId === athlete.userId) return;
  const mail = renderMarkCreatedMail({
    ...mailBase(athlete.user, 'coach_note', `/athlete/trends?mark=${encodeURIComponent(mark.id)}`),
    authorName: author.name,
    fromDate: mark.fromDate,
    toDate: mark.toDate,
    note: mark.note,
  });
  await sendNotification(manager, athlete.user, 'coach_note', mail);
}

/**
 * A reply on a mark's thread. The athlete replying: the mark's author hears (mark_reply). Staff
 * replying: the athlete hears (coach_note). Nobody is mailed about their own reply.
 */
export async function notifyMarkReply(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  mark: {
    id: string;
    note: string;
    author: Pick<User, 'id' | 'name' | 'email' | 'role' | 'notificationPrefs'>;
  },
  reply: { authorId: string; body: string },
  replier: Pick<User, 'name'>,
): Promise<void> {
  if (reply.authorId === athlete.userId) {
    if (mark.author.id === athlete.userId) return;
    const mail = renderMarkReplyMail({
      ...mailBase(
        mark.author,
        'mark_reply',
        `/coach/athletes/${encodeURIComponent(athlete.id)}/trends?mark=${encodeURIComponent(mark.id)}`,
      ),
      kind: 'mark_reply',
      replierName: replier.name,
      note: mark.note,
      body: reply.body,
    });
    await sendNotification(manager, mark.author, 'mark_reply', mail);
    return;
  }
  const mail = renderMarkReplyMail({
    ...mailBase(athlete.user, 'coach_note', `/athlete/trends?mark=${encodeURIComponent(mark.id)}`),
    kind: 'coach_note',
    replierName: replier.name,
    note: mark.note,
    body: reply.body,
  });
  await sendNotification(manager, athlete.user, 'coach_note', mail);
}

/** Staff answered a weekly check-in: the athlete hears (coach_note), once per check-in. */
export async function notifyWeeklyCheckInReplied(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  checkIn: { id: string; dueDate: string; replyBody: string },
  replier: Pick<User, 'name'>,
): Promise<void> {
  const mail = renderWeeklyCheckInRepliedMail({
    ...mailBase(athlete.user, 'coach_note', '/athlete/weekly'),
    coachName: replier.name,
    dueDate: checkIn.dueDate,
    body: checkIn.replyBody,
  });
  await sendNotification(manager, athlete.user, 'coach_note', mail, { dueKey: `weekly-reply:${checkIn.id}` });
}
