/**
 * Keeps an existing demo team "around today". The seed writes every date relative to its own now
 * (team settings `demoAnchorAt`); a later seed run (each `npm start`) moves every dated thing of
 * the demo team forward by the days since, in one transaction, and makes now the new anchor. So the
 * countdown athlete is on the same countdown day on every start, with history ending yesterday.
 *
 * Days are counted per athlete in the athlete's own time zone, as the seed counts them: the team
 * spans Auckland to Honolulu, so one instant is two dates there and a single team-wide count would
 * put some athletes a day off. Instants move by whole local days, keeping their wall-clock time
 * across a daylight-saving change.
 *
 * Everything of the team's athletes moves, including rows the demo users added themselves after the
 * seed (an entry logged on the anchor day becomes today's; one logged later lands in the future).
 * That is acceptable for demo data. Marks, their replies and read state, and review times move
 * with the athlete they belong to. Weekly check-ins move with their due date, the dates in their
 * figures and the athlete's check-in weekday (so a due date stays on it). Not moved: birth dates, countdown templates (offsets only),
 * accounts, sessions, invitations, mail and notification sends (not part of anyone's history).
 */
import {
  isValidTimeZone,
  planContent,
  utcMidnight,
  type GuardrailScope,
  type PlanContent,
} from '@driftmark/shared';
import { In, type EntityManager } from 'typeorm';
import { GuardrailAcknowledgement } from '../entities/guardrail-acknowledgement.entity.js';
import { PlanVersion } from '../entities/plan-version.entity.js';
import { Team } from '../entities/team.entity.js';
import { User } from '../entities/user.entity.js';
import { addDays, daysBetween, localDate } from './calendar.js';
import { DEMO_OWNER_EMAIL } from './demo-team.js';

/** The athlete-owned rows with a local date; `timed` ones also have `logged_at`. */
const DAY_TABLES: readonly { table: string; timed: boolean; uniqueDate: boolean }[] = [
  { table: 'weigh_ins', timed: true, uniqueDate: true },
  { table: 'fluid_entries', timed: true, uniqueDate: false },
  { table: 'meal_entries', timed: true, uniqueDate: false },
  { table: 'supplement_entries', timed: true, uniqueDate: false },
  { table: 'symptom_reports', timed: true, uniqueDate: false },
  { table: 'evening_logs', timed: false, uniqueDate: true },
  { table: 'athlete_flags', timed: false, uniqueDate: false },
  { table: 'condition_photos', timed: false, uniqueDate: true },
  { table: 'body_measurements', timed: false, uniqueDate: false },
  // One note a rehearsal day: unique (cut plan, date), so moved through FAR_DAYS like the other unique dates.
  { table: 'cut_rehearsal_notes', timed: false, uniqueDate: true },
];

/** Every `date` column this moves (`table.column`); the integration test checks none is missing. */
export const SHIFTED_DATE_COLUMNS: readonly string[] = [
  ...DAY_TABLES.map((t) => `${t.table}.local_date`),
  'athletes.event_date',
  'plan_versions.effective_from',
  'marks.from_date',
  'marks.to_date',
  'weekly_check_ins.due_date',
  'cut_plans.start_date',
  'cut_plans.weigh_in_date',
];

/** The weekdays in order, for moving a check-in weekday along with the dates. */
const WEEKDAY_ARRAY = `ARRAY['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun']`;

/** Past any real date: unique (athlete, date) rows move there first, so no row meets one not yet moved. */
const FAR_DAYS = 1_000_000;

/** The moved athletes as rows `s` (athlete_id, user_id, tz, n) for the UPDATE … FROM statements. */
const SHIFTS = `unnest($1::uuid[], $2::uuid[], $3::text[], $4::int[]) AS s(athlete_id, user_id, tz, n)`;

/** An instant moved `s.n` days of the athlete's calendar (same wall-clock time there). */
const at = (column: string) => `(t."${column}" AT TIME ZONE s.tz + s.n * interval '1 day') AT TIME ZONE s.tz`;

interface Shift {
  athleteId: string;
  userId: string;
  timeZone: string;
  eventDate: string | null;
  days: number;
}

/**
 * Moves the demo team's dates to `now` when its anchor is days behind (per athlete, in their time
 * zone). Returns the most days any athlete moved; 0 (and nothing written) when none did. Runs in
 * the caller's transaction, which holds the seed lock.
 */
/** The last date a stored row may reach: the app writes and reads four-digit years only. */
const LAST_DATE = '9999-12-31';

/** Where the refresh reports rows it leaves alone (a bad stored value must not stop the start). */
export type RefreshWarn = (message: string, details: Record<string, unknown>) => void;

export async function refreshDemoDates(
  manager: EntityManager,
  now: Date,
  warn: RefreshWarn = () => undefined,
): Promise<number> {
  const owner = await manager.findOne(User, { where: { email: DEMO_OWNER_EMAIL }, select: { teamId: true } });
  const team = owner && (await manager.findOneBy(Team, { id: owner.teamId }));
  if (!team) return 0;
  // A team seeded before the anchor existed: its row was written seconds after the seed's now.
  const stored = team.settings.demoAnchorAt ? new Date(team.settings.demoAnchorAt) : null;
  const anchor = stored && !Number.isNaN(stored.getTime()) ? stored : team.createdAt;
  if (now.getTime() <= anchor.getTime()) return 0;

  const athletes = await manager.query<
    { id: string; user_id: string; time_zone: string; event_date: string | null }[]
  >(
    `SELECT a.id, a.user_id, u.time_zone, to_char(a.event_date, 'YYYY-MM-DD') AS event_date
       FROM athletes a JOIN users u ON u.id = a.user_id
      WHERE a.team_id = $1`,
    [team.id],
  );
  const latest = await latestDates(
    manager,
    athletes.map((a) => a.id),
  );
  const shifts: Shift[] = athletes
    .map((a) => {
      // A zone PostgreSQL or Intl does not know (saved before zones were checked) would make the
      // statements below fail: such an athlete's instants move by UTC days instead.
      const timeZone = isValidTimeZone(a.time_zone) ? a.time_zone : 'UTC';
      if (timeZone !== a.time_zone)
        warn('demo refresh: unknown time zone, moved by UTC days', { athleteId: a.id });
      return {
        athleteId: a.id,
        userId: a.user_id,
        timeZone,
        eventDate: a.event_date,
        // The event date moves with the athlete's own days (the demo events are in their time zones).
        days: daysBetween(localDate(anchor, timeZone), localDate(now, timeZone)),
      };
    })
    .filter((s) => s.days > 0)
    .filter((s) => {
      // A stored date so far ahead that moving it would leave four-digit years: this athlete stays put.
      const last = latest.get(s.athleteId);
      const fits = !last || daysBetween(last, LAST_DATE) >= s.days;
      if (!fits)
        warn('demo refresh: a stored date is too far ahead to move; athlete skipped', {
          athleteId: s.athleteId,
          last,
        });
      return fits;
    });
  if (shifts.length === 0) return 0;

  await rewritePlans(manager, shifts, warn);
  const params = [
    shifts.map((s) => s.athleteId),
    shifts.map((s) => s.userId),
    shifts.map((s) => s.timeZone),
    shifts.map((s) => s.days),
  ];
  const update = (table: string, set: string[], match = 't.athlete_id = s.athlete_id') =>
    manager.query(`UPDATE "${table}" t SET ${set.join(', ')} FROM ${SHIFTS} WHERE ${match}`, params);

  for (const { table, timed, uniqueDate } of DAY_TABLES) {
    const instants = [...(timed ? ['logged_at'] : []), 'created_at', 'updated_at'];
    const far = uniqueDate ? FAR_DAYS : 0;
    await update(table, [
      `local_date = t.local_date + s.n + ${far}`,
      ...instants.map((c) => `"${c}" = ${at(c)}`),
    ]);
    if (uniqueDate) await update(table, [`local_date = t.local_date - ${FAR_DAYS}`]);
  }
  await update(
    'athletes',
    ['event_date = t.event_date + s.n', `intake_completed_at = ${at('intake_completed_at')}`],
    't.id = s.athlete_id',
  );
  await update('consents', [`accepted_at = ${at('accepted_at')}`], 't.user_id = s.user_id');
  await update('plan_versions', [
    'effective_from = t.effective_from + s.n',
    `created_at = ${at('created_at')}`,
    `updated_at = ${at('updated_at')}`,
  ]);
  await update('guardrail_acknowledgements', [
    `acknowledged_at = ${at('acknowledged_at')}`,
    `created_at = ${at('created_at')}`,
    `updated_at = ${at('updated_at')}`,
  ]);
  // Cut plans and their acknowledgements (reached through their plan).
  await update('cut_plans', [
    'start_date = t.start_date + s.n',
    'weigh_in_date = t.weigh_in_date + s.n',
    `created_at = ${at('created_at')}`,
    `updated_at = ${at('updated_at')}`,
  ]);
  await update(
    'cut_plan_acknowledgements',
    [
      `acknowledged_at = ${at('acknowledged_at')}`,
      `created_at = ${at('created_at')}`,
      `updated_at = ${at('updated_at')}`,
    ],
    'EXISTS (SELECT 1 FROM cut_plans c WHERE c.id = t.cut_plan_id AND c.athlete_id = s.athlete_id)',
  );
  // Marks and their threads: replies and reads reach the athlete through their mark.
  await update('marks', [
    'from_date = t.from_date + s.n',
    'to_date = t.to_date + s.n',
    `created_at = ${at('created_at')}`,
    `updated_at = ${at('updated_at')}`,
  ]);
  const ofMark = 'EXISTS (SELECT 1 FROM marks m WHERE m.id = t.mark_id AND m.athlete_id = s.athlete_id)';
  await update(
    'mark_replies',
    [`created_at = ${at('created_at')}`, `updated_at = ${at('updated_at')}`],
    ofMark,
  );
  await update(
    'mark_reads',
    [`read_at = ${at('read_at')}`, `created_at = ${at('created_at')}`, `updated_at = ${at('updated_at')}`],
    ofMark,
  );
  await update('athlete_reviews', [
    `reviewed_at = ${at('reviewed_at')}`,
    `created_at = ${at('created_at')}`,
    `updated_at = ${at('updated_at')}`,
  ]);
  // Weekly check-ins: unique (athlete, due date), so through FAR_DAYS like the day tables.
  const week = (key: string) => `'${key}', to_char((t.figures->>'${key}')::date + s.n, 'YYYY-MM-DD')`;
  await update('weekly_check_ins', [
    `due_date = t.due_date + s.n + ${FAR_DAYS}`,
    `figures = t.figures || jsonb_build_object(${week('weekStart')}, ${week('weekEnd')})`,
    ...['submitted_at', 'replied_at', 'created_at', 'updated_at'].map((c) => `"${c}" = ${at(c)}`),
  ]);
  await update('weekly_check_ins', [`due_date = t.due_date - ${FAR_DAYS}`]);
  await update(
    'athletes',
    [
      `check_in_weekday = (${WEEKDAY_ARRAY})[(array_position(${WEEKDAY_ARRAY}, t.check_in_weekday) - 1 + s.n) % 7 + 1]`,
    ],
    't.id = s.athlete_id',
  );
  await manager.query(
    `UPDATE teams SET settings = settings || jsonb_build_object('demoAnchorAt', $2::text) WHERE id = $1`,
    [team.id, now.toISOString()],
  );
  return Math.max(...shifts.map((s) => s.days));
}

/** Each athlete's latest date over every column the refresh moves (YYYY-MM-DD), if any. */
async function latestDates(manager: EntityManager, athleteIds: string[]): Promise<Map<string, string>> {
  if (athleteIds.length === 0) return new Map();
  const parts = SHIFTED_DATE_COLUMNS.map((c) => {
    const [table, column] = c.split('.') as [string, string];
    return `SELECT ${table === 'athletes' ? 'id' : 'athlete_id'} AS athlete_id, "${column}" AS d FROM "${table}"`;
  });
  const rows = await manager.query<{ athlete_id: string; d: string | null }[]>(
    `SELECT athlete_id, to_char(max(d), 'YYYY-MM-DD') AS d FROM (${parts.join(' UNION ALL ')}) x
      WHERE athlete_id = ANY($1::uuid[]) GROUP BY athlete_id`,
    [athleteIds],
  );
  return new Map(rows.filter((r) => r.d != null).map((r) => [r.athlete_id, r.d!]));
}

/**
 * The dates inside plan versions (dated days, the countdown's event date, the reason's ISO dates)
 * and in their acknowledgements (date scope, key, the dates in the message).
 */
async function rewritePlans(
  manager: EntityManager,
  shifts: readonly Shift[],
  warn: RefreshWarn,
): Promise<void> {
  const byAthlete = new Map(shifts.map((s) => [s.athleteId, s]));
  const versions = await manager.find(PlanVersion, { where: { athleteId: In([...byAthlete.keys()]) } });
  const acks = await manager.find(GuardrailAcknowledgement, {
    where: { planVersionId: In(versions.map((v) => v.id)) },
  });
  const known = new Map<string, { n: number; dates: string[] }>();
  for (const v of versions) {
    const { days: n, eventDate } = byAthlete.get(v.athleteId)!;
    // Content the schema no longer reads (or that would not read once moved) stays as it is.
    const parsed = planContent.safeParse(v.content);
    const moved = parsed.success ? planContent.safeParse(shiftContent(parsed.data, n)) : parsed;
    if (!parsed.success || !moved.success) {
      warn('demo refresh: plan version content left unmoved', { planVersionId: v.id });
      known.set(v.id, { n, dates: [] });
      continue;
    }
    const content = parsed.data;
    const dates = [...content.dates.map((d) => d.date), content.countdown?.eventDate, eventDate];
    known.set(v.id, { n, dates: dates.filter((d): d is string => d != null) });
    await manager.update(PlanVersion, v.id, {
      content: moved.data,
      reason: shiftText(v.reason, n, []),
      updatedAt: v.updatedAt,
    });
  }
  // Keys are unique per version and carry a date: the latest dates move first so none meets one not yet moved.
  const latestFirst = [...acks].sort((a, b) => scopeDate(b).localeCompare(scopeDate(a)));
  for (const a of latestFirst) {
    const { n, dates } = known.get(a.planVersionId)!;
    const date = a.scope.kind === 'date' ? a.scope.date : null;
    const scope: GuardrailScope = date ? { kind: 'date', date: addDays(date, n) } : a.scope;
    await manager.update(GuardrailAcknowledgement, a.id, {
      scope,
      key: date ? `${a.code}:date:${addDays(date, n)}` : a.key,
      message: shiftText(a.message, n, date ? [...dates, date] : dates),
      // Given, or TypeORM sets it to now; the SQL after moves it with the rest.
      updatedAt: a.updatedAt,
    });
  }
}

function scopeDate(a: GuardrailAcknowledgement): string {
  return a.scope.kind === 'date' ? a.scope.date : '';
}

function shiftContent(content: PlanContent, n: number): PlanContent {
  return {
    ...content,
    dates: content.dates.map((d) => ({ ...d, date: addDays(d.date, n) })),
    countdown: content.countdown && {
      ...content.countdown,
      eventDate: addDays(content.countdown.eventDate, n),
    },
  };
}

const WEEKDAY_NAMES = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const MONTH_NAMES = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const DATE_IN_TEXT = new RegExp(
  `\\b\\d{4}-\\d{2}-\\d{2}\\b|\\b(?:${WEEKDAY_NAMES.join('|')}) \\d{1,2} (?:${MONTH_NAMES.join('|')})\\b`,
  'g',
);

/** "Fri 4 Dec", the way the guardrail messages write a date (fmtDate in shared/src/plans/format.ts). */
function shortDate(date: string): string {
  const d = utcMidnight(date);
  return `${WEEKDAY_NAMES[d.getUTCDay()]} ${d.getUTCDate()} ${MONTH_NAMES[d.getUTCMonth()]}`;
}

/**
 * `text` with its ISO dates moved `n` days, and its "Fri 4 Dec" dates too when they name one of
 * `known` (that form has no year). One pass, so a moved date is never moved again.
 */
function shiftText(text: string, n: number, known: readonly string[]): string {
  const short = new Map(known.map((d) => [shortDate(d), shortDate(addDays(d, n))]));
  return text.replace(DATE_IN_TEXT, (m) => (/^\d/.test(m) ? addDays(m, n) : (short.get(m) ?? m)));
}
