import {
  DRIFT_METRICS,
  DRIFT_METRIC_LABELS,
  EVENT_TYPE_LABELS,
  inReaderUnits,
  SYMPTOM_LABELS,
  type Reader,
  type ReviewQueueItem,
  type ReviewReasonKind,
} from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { daysBetween, daysToEvent, shiftDate } from '../lib/dates.js';
import { localInstant } from '../lib/local-time.js';
import type { Actor } from '../policies/actor.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { AthleteReviewRepository } from '../repositories/athlete-review.repository.js';
import { MarkRepository } from '../repositories/mark.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { teamQuestions } from './weekly-check-in.service.js';
import { WeeklyCheckInRepository } from '../repositories/weekly-check-in.repository.js';
import { checkInExpected, currentDueDate } from '../lib/weekly-dates.js';
import { isSafetyFlag, loadSnapshots, type AthleteSnapshot } from './athlete-figures.service.js';
import { visibleAthletes } from './roster.service.js';

/** Days before today whose drift counts as recent ("off plan 2 of the last 3 days"). */
export const DRIFT_LOOKBACK_DAYS = 3;
/** Off-plan days of one metric within the lookback that put an athlete in the queue. */
export const OFF_PLAN_DAYS_TO_QUEUE = 2;
/** 7-day adherence below this puts an athlete in the queue (common practice, no source). */
export const LOW_ADHERENCE = 0.6;
/** Whole days without a weigh-in (today not counted: it may still come) that count as missed. */
export const MISSED_WEIGH_IN_DAYS = 2;

/** One reason with the instant it arose, which decides whether a review has already covered it. */
export interface Reason {
  kind: ReviewReasonKind;
  priority: 1 | 2 | 3 | 4;
  text: string;
  date: string | null;
  at: Date;
  /** A standing state (the countdown) rather than news: a review never clears it. */
  standing?: boolean;
}

const PRIORITY: Record<ReviewReasonKind, Reason['priority']> = {
  safety: 1,
  missed: 2,
  drift: 3,
  countdown: 3,
  over_limit: 3,
  reply: 4,
};

/** The weekly check-in as the queue sees it for one athlete. */
export interface WeeklyQueueState {
  /** The current due date (athlete's time zone). */
  dueDate: string;
  /** Whether the check-in for `dueDate` has been submitted. */
  submitted: boolean;
  /** Whether the team runs weekly check-ins (it has a question list): only then is one missing. */
  expected: boolean;
  /** Submitted check-ins nobody has replied to yet. */
  unanswered: readonly { dueDate: string; submittedAt: Date }[];
  now: Date;
}

/** "35 min", "5 h", "3 days": how long ago `at` was. */
export function timeSince(at: Date, now: Date): string {
  const minutes = Math.max(0, Math.floor((now.getTime() - at.getTime()) / 60_000));
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return `${hours} h`;
  return `${Math.floor(hours / 24)} days`;
}

const pct = (value: number): string => `${Math.abs(value).toFixed(1)} %`;
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * Why the athlete needs attention, with when each reason arose:
 * - safety: the flags of the last 7 days (acute drop — ACSM 2007, Sawka et al.; a 14-day loss beyond
 *   about 1.4 %/week — Garthe 2011; any symptom report; athlete_flags rows), at the time the row behind
 *   it was written;
 * - missed check-ins: no weigh-in for 2 or more whole days, or nothing logged yesterday, arising
 *   at the start of the athlete's today (so a review clears it for the day, and it comes back the next);
 * - drift: a metric off plan on 2 of the last 3 days, 7-day adherence below 0.6, cut-off breaches
 *   in the last 3 days (arising when the day closed), a 14-day loss beyond 1 %/week (Helms 2014);
 * - projected over the weigh-in limit (the projection against the class limit), arising at the
 *   start of the athlete's today;
 * - the countdown day (standing);
 * - unread replies to marks;
 * - weekly check-ins received and not answered yet (standing until a reply, with the time since
 *   received), and — once the team has a question list — the current one missing after its due
 *   date has passed (arising the day after; only when one was expected: checkInExpected).
 * No reason arises before the athlete completed the intake: earlier instants are clamped to it.
 */
export function reasonsFor(
  s: AthleteSnapshot,
  unread: { count: number; latestAt: Date } | undefined,
  weekly?: WeeklyQueueState,
): Reason[] {
  const tz = s.athlete.user.timeZone;
  const startOf = (date: string) => localInstant(date, '00:00', tz);
  const todayStart = startOf(s.today);
  const reasons: Reason[] = [];
  // Nothing arises before the athlete joined (completed the intake): a reason from the start of a
  // day they joined part-way through arose when they joined.
  const joined = s.athlete.intakeCompletedAt;
  const add = (r: Omit<Reason, 'priority'>) =>
    reasons.push({ ...r, at: joined && r.at < joined ? joined : r.at, priority: PRIORITY[r.kind] });
  const h = s.history;
  const weighIns = [...(h.before ? [h.before.weighIn] : []), ...h.weighIns];
  const latestWritten = weighIns.reduce<Date | null>(
    (max, w) => (max === null || w.updatedAt > max ? w.updatedAt : max),
    null,
  );

  // Safety -----------------------------------------------------------------------------------
  // One rule decides what is a safety item: isSafetyFlag (the roster counts with the same rule).
  for (const flag of s.flags) {
    // Symptom flags are listed from their reports below (with when each was sent).
    if (flag.kind === 'acute_drop' && flag.drop) {
      const gap = daysBetween(flag.drop.fromDate, flag.date);
      add({
        kind: isSafetyFlag(flag.kind) ? 'safety' : 'drift',
        text: `Weight down ${pct(flag.drop.percent)} ${gap === 1 ? 'from the day before' : `in ${gap} days`} (ACSM 2007 guard)`,
        date: flag.date,
        at: weighIns.find((w) => w.date === flag.date)?.updatedAt ?? todayStart,
      });
    } else if ((flag.kind === 'rate_far_beyond' || flag.kind === 'rate_beyond') && s.rate) {
      const far = flag.kind === 'rate_far_beyond';
      add({
        kind: isSafetyFlag(flag.kind) ? 'safety' : 'drift',
        text: far
          ? `Losing ${pct(s.rate.percentPerWeek)} of body weight a week, beyond 1.4 % (Garthe 2011)`
          : `Losing ${pct(s.rate.percentPerWeek)} of body weight a week, beyond 1 % (Helms 2014)`,
        date: flag.date,
        at: latestWritten ?? todayStart,
      });
    }
  }
  const flagsFrom = shiftDate(s.today, -6);
  const reports = h.symptoms.filter((r) => r.date >= flagsFrom && r.date <= s.today);
  for (const r of reports) {
    const names = r.symptoms.map((x) => SYMPTOM_LABELS[x]?.toLowerCase() ?? x).join(', ');
    add({
      kind: isSafetyFlag('symptom') ? 'safety' : 'drift',
      text: `Reported ${names}${r.urgent ? ' (urgent: told to stop and seek care)' : ''}`,
      date: r.date,
      at: r.createdAt,
    });
  }
  const reportIds = new Set(reports.map((r) => r.id));
  for (const f of s.flagRows) {
    // A flag raised by a report listed above says the same thing once more.
    if (f.symptomReportId && reportIds.has(f.symptomReportId)) continue;
    add({ kind: isSafetyFlag(f.kind) ? 'safety' : 'drift', text: f.message, date: f.date, at: f.createdAt });
  }

  // Missed check-ins -------------------------------------------------------------------------
  const last = s.latestWeighIn?.date ?? null;
  if (last === null) {
    add({ kind: 'missed', text: 'No weigh-in logged yet', date: null, at: todayStart });
  } else {
    const missed = daysBetween(last, s.today) - 1;
    if (missed >= MISSED_WEIGH_IN_DAYS) {
      add({ kind: 'missed', text: `No weigh-in for ${missed} days`, date: last, at: todayStart });
    }
  }
  const yesterday = shiftDate(s.today, -1);
  const lastCheckIn = s.figures.lastCheckInDate;
  if (lastCheckIn === null) {
    add({ kind: 'missed', text: 'Nothing logged yet', date: null, at: todayStart });
  } else if (lastCheckIn < yesterday) {
    add({ kind: 'missed', text: 'Nothing logged yesterday', date: yesterday, at: todayStart });
  }

  // Drift ------------------------------------------------------------------------------------
  const lookback = s.recent.slice(-DRIFT_LOOKBACK_DAYS);
  for (const metric of DRIFT_METRICS) {
    const offDays = lookback.filter((d) =>
      d.drift.some((e) => e.metric === metric && e.state === 'off_plan'),
    );
    if (offDays.length < OFF_PLAN_DAYS_TO_QUEUE) continue;
    const latest = offDays.at(-1)!.date;
    add({
      kind: 'drift',
      text: `${DRIFT_METRIC_LABELS[metric]} off plan ${offDays.length} of the last ${lookback.length} days`,
      date: latest,
      at: startOf(shiftDate(latest, 1)),
    });
  }
  const adherence = s.figures.adherence7;
  if (adherence !== null && adherence < LOW_ADHERENCE) {
    const lastOff = [...s.recent]
      .reverse()
      .find((d) => d.drift.some((e) => e.state === 'off_plan' || e.state === 'drifting'));
    add({
      kind: 'drift',
      text: `On plan ${Math.round(adherence * 100)} % of logged targets over the last 7 days`,
      date: null,
      at: startOf(shiftDate(lastOff?.date ?? yesterday, 1)),
    });
  }
  for (const d of lookback) {
    if (!d.breach) continue;
    add({
      kind: 'drift',
      text: `${Math.round(d.breach.excessMl)} mL of fluids after the ${d.breach.cutoff} cut-off beyond the allowance`,
      date: d.date,
      at: startOf(shiftDate(d.date, 1)),
    });
  }

  // Making weight: projected over the weigh-in limit (shared rules/weight-cut.ts limitGap), arising
  // at the start of the athlete's today like the missed check-ins: a review clears it for the day.
  const gap = s.figures.weighInGap;
  if (gap?.over) {
    add({
      kind: 'over_limit',
      text:
        `Projected ${gap.overKg.toFixed(1)} kg (${gap.overPct.toFixed(1)} %) over the weigh-in limit, ` +
        `${plural(gap.daysLeft, 'day', 'days')} left`,
      date: s.athlete.eventDate,
      at: todayStart,
    });
  }

  // Countdown and replies --------------------------------------------------------------------
  if (s.countdown) {
    add({
      kind: 'countdown',
      text: `${s.countdown.dayLabel} of the ${EVENT_TYPE_LABELS[s.countdown.eventType].toLowerCase()} countdown`,
      date: s.today,
      at: todayStart,
      standing: true,
    });
  }
  if (unread && unread.count > 0) {
    add({
      kind: 'reply',
      text: plural(unread.count, 'unread reply', 'unread replies'),
      date: null,
      at: unread.latestAt,
    });
  }

  // Weekly check-ins -------------------------------------------------------------------------
  if (weekly) {
    for (const w of [...weekly.unanswered].sort((a, b) => a.dueDate.localeCompare(b.dueDate))) {
      add({
        kind: 'reply',
        text: `Weekly check-in received ${timeSince(w.submittedAt, weekly.now)} ago, not answered yet`,
        date: w.dueDate,
        at: w.submittedAt,
        standing: true,
      });
    }
    if (
      weekly.expected &&
      !weekly.submitted &&
      weekly.dueDate < s.today &&
      checkInExpected(weekly.dueDate, s.athlete.intakeCompletedAt, tz)
    ) {
      const late = daysBetween(weekly.dueDate, s.today);
      add({
        kind: 'missed',
        text: `Weekly check-in not submitted (due ${plural(late, 'day', 'days')} ago)`,
        date: weekly.dueDate,
        at: startOf(shiftDate(weekly.dueDate, 1)),
      });
    }
  }
  return reasons;
}

/**
 * The queue item for one athlete, or null when nothing is left: reasons that arose at or before
 * the viewer's last review drop out (the countdown stays while it lasts).
 */
export function queueItemFor(
  s: AthleteSnapshot,
  reasons: readonly Reason[],
  lastReviewedAt: Date | null,
  now: Date,
): ReviewQueueItem | null {
  const open = reasons.filter((r) => r.standing || lastReviewedAt === null || r.at > lastReviewedAt);
  if (open.length === 0) return null;
  const ordered = [...open].sort((a, b) => a.priority - b.priority);
  const since = open.reduce((min, r) => (r.at < min ? r.at : min), open[0]!.at);
  const a = s.athlete;
  return {
    athleteId: a.id,
    name: a.user.name,
    eventType: a.eventType,
    goal: a.goal,
    daysToEvent: daysToEvent(a.eventDate, a.user.timeZone, now),
    countdownLabel: s.figures.countdownLabel,
    priority: ordered[0]!.priority,
    reasons: ordered.map((r) => ({ kind: r.kind, text: r.text, date: r.date })),
    since: since.toISOString(),
    lastReviewedAt: lastReviewedAt ? lastReviewedAt.toISOString() : null,
  };
}

/** Priority first, then the oldest unreviewed item, then name. */
function compareItems(x: ReviewQueueItem, y: ReviewQueueItem): number {
  return (
    x.priority - y.priority ||
    (x.since < y.since ? -1 : x.since > y.since ? 1 : 0) ||
    x.name.localeCompare(y.name, 'en', { sensitivity: 'base' }) ||
    x.athleteId.localeCompare(y.athleteId)
  );
}

type ReviewQueueDeps = { dataSource: DataSource; clock: () => Date };

export class ReviewQueueService {
  constructor(private readonly deps: ReviewQueueDeps) {}

  /**
   * The active athletes the actor may see (as on the roster) that need attention, most urgent
   * first. A constant number of statements: two for the athletes, eight for their figures, one for
   * unread replies, one for the actor's last reviews, one for the weekly check-ins and one for the
   * team's question list.
   */
  async list(actor: Actor, units: Reader['units']): Promise<ReviewQueueItem[]> {
    const manager = this.deps.dataSource.manager;
    const now = this.deps.clock();
    // Athletes still doing their intake, or whose coaching ended, have nothing to review.
    const athletes = (await visibleAthletes(manager, actor)).filter((a) => a.status === 'active');
    const ids = athletes.map((a) => a.id);
    const dueDates = new Map(
      athletes.map((a) => [a.id, currentDueDate(now, a.user.timeZone, a.checkInWeekday)]),
    );
    const [snapshots, unread, reviewed, checkIns, team] = await Promise.all([
      loadSnapshots(manager, athletes, now),
      new MarkRepository(manager).unreadRepliesByAthlete(actor.userId, ids),
      new AthleteReviewRepository(manager).lastReviewedByAthlete(actor.userId, ids),
      new WeeklyCheckInRepository(manager).forQueue(dueDates),
      ids.length > 0 ? new TeamRepository(manager).findSettings(actor.teamId) : null,
    ]);
    const expected = teamQuestions(team).length > 0;
    const checkInsOf = new Map<string, typeof checkIns>();
    for (const c of checkIns) checkInsOf.set(c.athleteId, [...(checkInsOf.get(c.athleteId) ?? []), c]);
    return athletes
      .flatMap((a) => {
        const s = snapshots.get(a.id);
        if (!s) return [];
        const dueDate = dueDates.get(a.id)!;
        const own = checkInsOf.get(a.id) ?? [];
        const weekly: WeeklyQueueState = {
          dueDate,
          expected,
          submitted: own.some((c) => c.dueDate === dueDate),
          unanswered: own.filter((c) => c.repliedAt === null),
          now,
        };
        const reasons = reasonsFor(s, unread.get(a.id), weekly);
        const item = queueItemFor(s, reasons, reviewed.get(a.id) ?? null, now);
        // Reasons are written in kg and mL (flags stored so); the coach reads their own units.
        return item
          ? [{ ...item, reasons: item.reasons.map((r) => ({ ...r, text: inReaderUnits(r.text, units) })) }]
          : [];
      })
      .sort(compareItems);
  }

  /** Records that the actor reviewed the athlete now: their current items leave the actor's queue. */
  async markReviewed(
    actor: Actor,
    athlete: AthleteWithPeople,
  ): Promise<{ athleteId: string; reviewedAt: string }> {
    const at = await new AthleteReviewRepository(this.deps.dataSource.manager).upsertReview(
      athlete.id,
      actor.userId,
      this.deps.clock(),
    );
    return { athleteId: athlete.id, reviewedAt: new Date(at).toISOString() };
  }
}
