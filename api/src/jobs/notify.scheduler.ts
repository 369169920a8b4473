/**
 * The notification scheduler on pg-boss: a cron tick (every few minutes, once per tick across
 * processes) plus one tick at start. Each tick looks at "now" in every person's own time zone:
 *
 * - morning reminder: an active athlete whose local hour is at or past their reminder hour and
 *   who has no weigh-in for their local today; once per (user, morning_reminder, local date);
 * - weekly check-in due: on the athlete's check-in weekday at or past the reminder hour, while
 *   nothing is submitted for that due date and one is expected (joined before it: checkInExpected);
 *   once per (user, weekly_check_in_due, due date);
 * - weekly summary: staff with athletes, from Monday SUMMARY_HOUR local time on; once per
 *   (user, weekly_summary, ISO week).
 *
 * No loss, no doubles across restarts: a send is due from its time on (not only at it), so the
 * first tick after a restart catches up whatever fell due while nothing ran, and the
 * notification_sends row claimed in the same transaction as the outbox row makes every later
 * tick (or a second process) skip it. Local hours come from the shared wall clock (Intl's tz database), so the changes to and
 * from daylight-saving time move the reminder with the athlete's clock.
 */
import { STAFF_ROLES, wallClock, type Weekday } from '@driftmark/shared';
import { getISOWeek, getISOWeekYear } from 'date-fns';
import type PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import type { Config } from '../config.js';
import type { UserNotificationPrefs } from '../entities/user.entity.js';
import type { Logger } from '../logger.js';
import { shiftDate } from '../lib/dates.js';
import { localDateTime } from '../lib/local-time.js';
import { checkInExpected, dueDateOn } from '../lib/weekly-dates.js';
import {
  renderMorningReminderMail,
  renderWeeklyCheckInDueMail,
  renderWeeklySummaryMail,
  type SummaryLine,
} from '../mail/notify-templates.js';
import {
  alreadySent,
  configureNotifications,
  DEFAULT_REMINDER_HOUR,
  mailBase,
  sendNotification,
  wants,
} from '../services/notify.service.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { isSafetyFlag, loadSnapshots, type AthleteSnapshot } from '../services/athlete-figures.service.js';
import { createQueue, oneSetupAtATime } from './queue.js';

export const NOTIFY_TICK_QUEUE = 'notify-tick';
/** Local hour on Monday from which staff get the weekly summary. */
export const SUMMARY_HOUR = 8;

export interface NotifySchedulerTuning {
  /** Cron of the tick; null: only the tick at start (tests tick by hand). */
  cron: string | null;
  pollingIntervalSeconds: number;
  stopTimeoutMs: number;
}

export const DEFAULT_NOTIFY_TUNING: NotifySchedulerTuning = {
  cron: '*/5 * * * *',
  pollingIntervalSeconds: 5,
  stopTimeoutMs: 8_000,
};

export interface TickResult {
  morningReminders: number;
  weeklyCheckInsDue: number;
  weeklySummaries: number;
}

interface PersonRow {
  user_id: string;
  email: string;
  name: string;
  role: 'owner' | 'coach' | 'assistant' | 'athlete';
  time_zone: string;
  notification_prefs: UserNotificationPrefs | null;
}

interface AthleteRow extends PersonRow {
  athlete_id: string;
  check_in_weekday: Weekday;
  intake_completed_at: Date | null;
}

const asUser = (r: PersonRow) => ({
  id: r.user_id,
  email: r.email,
  name: r.name,
  role: r.role,
  notificationPrefs: r.notification_prefs ?? {},
});

function localHour(now: Date, timeZone: string): number {
  return Number(localDateTime(now, timeZone).time.slice(0, 2));
}

/** "2027-W10" for the ISO week of the local date in `timeZone`. */
export function isoWeekKey(now: Date, timeZone: string): string {
  const w = wallClock(now, timeZone);
  // A Date on the runtime's own calendar holding the local date: date-fns reads it as that day.
  const local = new Date(w.year, w.month - 1, w.day);
  return `${getISOWeekYear(local)}-W${String(getISOWeek(local)).padStart(2, '0')}`;
}

async function exists(manager: EntityManager, sql: string, params: unknown[]): Promise<boolean> {
  const rows: unknown[] = await manager.query(sql, params);
  return rows.length > 0;
}

async function athleteReminders(
  dataSource: DataSource,
  now: Date,
): Promise<Omit<TickResult, 'weeklySummaries'>> {
  const athletes: AthleteRow[] = await dataSource.query(
    `SELECT a.id AS athlete_id, a.check_in_weekday, a.intake_completed_at, u.id AS user_id, u.email, u.name, u.role, u.time_zone,
            u.notification_prefs
       FROM athletes a JOIN users u ON u.id = a.user_id
      WHERE a.status = 'active' AND u.role = 'athlete'
      ORDER BY a.id`,
  );
  let morningReminders = 0;
  let weeklyCheckInsDue = 0;
  for (const row of athletes) {
    const user = asUser(row);
    const today = localDateTime(now, row.time_zone).date;
    const hour = localHour(now, row.time_zone);
    const reminderHour = user.notificationPrefs.reminderHour ?? DEFAULT_REMINDER_HOUR;
    if (hour < reminderHour) continue;

    if (wants(user, 'morning_reminder')) {
      const sent = await dataSource.transaction(async (manager) => {
        const logged = await exists(
          manager,
          'SELECT 1 FROM weigh_ins WHERE athlete_id = $1 AND local_date = $2',
          [row.athlete_id, today],
        );
        if (logged) return false;
        const mail = renderMorningReminderMail({
          ...mailBase(user, 'morning_reminder', '/athlete'),
          date: today,
        });
        return sendNotification(manager, user, 'morning_reminder', mail, {
          dueKey: today,
          listUnsubscribe: true,
        });
      });
      if (sent) morningReminders += 1;
    }

    const dueDate = dueDateOn(today, row.check_in_weekday);
    // Nothing is due before joining (the same rule as the check-in itself and the review queue).
    if (
      dueDate === today &&
      checkInExpected(dueDate, row.intake_completed_at, row.time_zone) &&
      wants(user, 'weekly_check_in_due')
    ) {
      const sent = await dataSource.transaction(async (manager) => {
        const submitted = await exists(
          manager,
          'SELECT 1 FROM weekly_check_ins WHERE athlete_id = $1 AND due_date = $2',
          [row.athlete_id, dueDate],
        );
        if (submitted) return false;
        const mail = renderWeeklyCheckInDueMail({
          ...mailBase(user, 'weekly_check_in_due', '/athlete/weekly'),
          dueDate,
        });
        return sendNotification(manager, user, 'weekly_check_in_due', mail, {
          dueKey: dueDate,
          listUnsubscribe: true,
        });
      });
      if (sent) weeklyCheckInsDue += 1;
    }
  }
  return { morningReminders, weeklyCheckInsDue };
}

/** Safety flags of the athlete's last 7 days: at least one whenever hasSafetyFlag says so. */
function safetyFlagCount(s: AthleteSnapshot | undefined): number {
  if (!s?.figures.safetyFlag) return 0;
  return Math.max(1, s.flags.filter((f) => isSafetyFlag(f.kind)).length);
}

async function staffSummaries(dataSource: DataSource, now: Date): Promise<number> {
  const staff: (PersonRow & { team_id: string })[] = await dataSource.query(
    `SELECT u.id AS user_id, u.team_id, u.email, u.name, u.role, u.time_zone, u.notification_prefs
       FROM users u
      WHERE u.role = ANY($1)
        AND EXISTS (SELECT 1 FROM athletes a
                     WHERE a.status = 'active'
                       AND (a.coach_id = u.id
                            OR EXISTS (SELECT 1 FROM athlete_shares s WHERE s.athlete_id = a.id AND s.user_id = u.id)))
      ORDER BY u.id`,
    [[...STAFF_ROLES]],
  );
  let sentCount = 0;
  for (const row of staff) {
    const user = asUser(row);
    if (!wants(user, 'weekly_summary')) continue;
    const local = wallClock(now, row.time_zone);
    // Monday from SUMMARY_HOUR on, or any later day of the ISO week (catching up after downtime).
    const weekday = new Date(Date.UTC(local.year, local.month - 1, local.day)).getUTCDay();
    const isoDay = weekday === 0 ? 7 : weekday;
    if (isoDay === 1 && local.hour < SUMMARY_HOUR) continue;
    const week = isoWeekKey(now, row.time_zone);
    const today = localDateTime(now, row.time_zone).date;
    const from = shiftDate(today, -7);
    const to = shiftDate(today, -1);
    // Every tick of the week after the first finds it sent: look before loading anyone's figures.
    if (await alreadySent(dataSource.manager, row.user_id, 'weekly_summary', week)) continue;
    // Safety flags by the one rule the roster and the review queue use (hasSafetyFlag), over each
    // athlete's own last 7 days.
    const athletes = (
      await new AthleteRepository(dataSource.manager).listForRoster(row.team_id, {
        kind: 'coachOrShared',
        userId: row.user_id,
      })
    ).filter((a) => a.status === 'active');
    const snapshots = await loadSnapshots(dataSource.manager, athletes, now);
    const sent = await dataSource.transaction(async (manager) => {
      const lines: (SummaryLine & { sort: string })[] = (
        await manager.query(
          `SELECT a.id AS athlete_id, au.name AS athlete_name,
                  (SELECT count(*) FROM weigh_ins w
                    WHERE w.athlete_id = a.id AND w.local_date BETWEEN $2 AND $3)::int AS weigh_ins,
                  EXISTS (SELECT 1 FROM weekly_check_ins c
                           WHERE c.athlete_id = a.id AND c.due_date BETWEEN $2 AND $4) AS submitted
             FROM athletes a JOIN users au ON au.id = a.user_id
            WHERE a.id = ANY($1::uuid[])
            ORDER BY au.name`,
          [athletes.map((a) => a.id), from, to, today],
        )
      ).map((r: { athlete_id: string; athlete_name: string; weigh_ins: number; submitted: boolean }) => ({
        athleteName: r.athlete_name,
        weighIns: r.weigh_ins,
        flags: safetyFlagCount(snapshots.get(r.athlete_id)),
        checkIn: r.submitted ? 'submitted' : 'missing',
        sort: r.athlete_name,
      }));
      if (lines.length === 0) return false;
      const mail = renderWeeklySummaryMail({ ...mailBase(user, 'weekly_summary', '/coach'), week, lines });
      return sendNotification(manager, user, 'weekly_summary', mail, { dueKey: week, listUnsubscribe: true });
    });
    if (sent) sentCount += 1;
  }
  return sentCount;
}

/** One pass over everyone: queues whatever is due at `now` and not sent yet. */
export async function runNotifyTick(dataSource: DataSource, now: Date): Promise<TickResult> {
  const athletes = await athleteReminders(dataSource, now);
  const weeklySummaries = await staffSummaries(dataSource, now);
  return { ...athletes, weeklySummaries };
}

export interface NotifySchedulerOptions {
  config: Config;
  dataSource: DataSource;
  logger: Logger;
  /** Where "now" comes from (tests pin it). */
  clock?: () => Date;
  tuning?: Partial<NotifySchedulerTuning>;
}

export interface NotifyScheduler {
  /** Runs one tick now (also what the cron job runs). */
  tick(): Promise<TickResult>;
  stop(): Promise<void>;
}

export async function startNotifyScheduler(opts: NotifySchedulerOptions): Promise<NotifyScheduler> {
  const { config, dataSource } = opts;
  const tuning = { ...DEFAULT_NOTIFY_TUNING, ...opts.tuning };
  const clock = opts.clock ?? (() => new Date());
  const log = opts.logger.child({ component: 'notify-scheduler' });
  configureNotifications(config);

  const boss: PgBoss = createQueue(config);
  boss.on('error', (err) => log.error({ err }, 'job queue error'));

  let stopping = false;
  const tick = async (): Promise<TickResult> => {
    const result = await runNotifyTick(dataSource, clock());
    const total = result.morningReminders + result.weeklyCheckInsDue + result.weeklySummaries;
    if (total > 0) log.info(result, 'notifications queued');
    return result;
  };

  try {
    await boss.start();
    await oneSetupAtATime(dataSource, () =>
      boss.createQueue(NOTIFY_TICK_QUEUE, { name: NOTIFY_TICK_QUEUE, policy: 'short', retryLimit: 0 }),
    );
    await boss.work(
      NOTIFY_TICK_QUEUE,
      { pollingIntervalSeconds: tuning.pollingIntervalSeconds },
      async () => {
        if (stopping) return;
        await tick();
      },
    );
    if (tuning.cron) await boss.schedule(NOTIFY_TICK_QUEUE, tuning.cron);
    else await boss.unschedule(NOTIFY_TICK_QUEUE);
  } catch (err) {
    await boss.stop({ graceful: false, wait: true }).catch(() => undefined);
    throw err;
  }
  log.info({ queue: NOTIFY_TICK_QUEUE, cron: tuning.cron }, 'notification scheduler started');
  // Catch up on whatever fell due while no scheduler ran. A failure here must not stop the server
  // from starting: the next cron tick tries again.
  await tick().catch((err: unknown) => log.error({ err }, 'notification tick at start failed'));

  let stopped: Promise<void> | null = null;
  return {
    tick,
    stop() {
      stopped ??= (async () => {
        stopping = true;
        await boss.stop({ graceful: true, wait: true, timeout: tuning.stopTimeoutMs });
        log.info('notification scheduler stopped');
      })();
      return stopped;
    },
  };
}
