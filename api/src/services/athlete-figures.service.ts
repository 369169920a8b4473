import {
  adherenceOf,
  FLAG_KINDS,
  SAFETY_FLAG_KINDS,
  type CutoffBreach,
  type DriftEntry,
  type FlagKind,
  type Phase,
  type RateView,
  type RosterFigures,
  type TrendFlag,
} from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import { rate14, rateGuidance } from '../lib/analysis.js';
import { plannedDay, type CountdownMark } from '../lib/day-plan.js';
import { shiftDate } from '../lib/dates.js';
import { localDateTime } from '../lib/local-time.js';
import { weighInGap } from '../lib/weigh-in-gap.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import {
  TrendRepository,
  type AthleteHistory,
  type FlagRow,
  type HistoryWindow,
  type WeighInRow,
} from '../repositories/trend.repository.js';
import { rawPoints, trendByDate, trendDays, trendFlags } from './trend.service.js';

/** Days of history each athlete's figures read, ending today: the 14-day rate's window. */
export const FIGURES_WINDOW_DAYS = 14;
/** Days before today that adherence and flags look back over. */
export const RECENT_DAYS = 7;

/** One athlete's computed state today: what the roster shows and the review queue judges. */
export interface AthleteSnapshot {
  athlete: AthleteWithPeople;
  /** The athlete's own today. */
  today: string;
  history: AthleteHistory;
  /** athlete_flags rows of the last 7 days (today included). */
  flagRows: FlagRow[];
  countdown: CountdownMark | null;
  rate: RateView | null;
  latestWeighIn: WeighInRow | null;
  /** The 7 days before today, oldest first, with their drift and cut-off breach. */
  recent: { date: string; drift: DriftEntry[]; breach: CutoffBreach | null }[];
  /** flagsFor over the last 7 days (today included). */
  flags: TrendFlag[];
  figures: RosterFigures;
}

const PHASE_BY_GOAL: Record<NonNullable<AthleteWithPeople['goal']>, Phase> = {
  lose: 'dieting',
  maintain: 'maintaining',
  gain: 'regaining',
};

/**
 * Share of logged metric-days on plan (the shared adherence rule: a day in progress counts nowhere);
 * null when nothing was logged against a target.
 */
export function adherenceShare(days: readonly { drift: readonly DriftEntry[] }[]): number | null {
  return adherenceOf(days.flatMap((d) => d.drift.map((e) => e.state))).adherence;
}

const SAFETY_KINDS: ReadonlySet<FlagKind> = new Set(SAFETY_FLAG_KINDS);

/** Whether a flag is a safety flag (SAFETY_FLAG_KINDS); the others are drift or missed check-ins. */
export function isSafetyFlag(kind: FlagKind): boolean {
  return SAFETY_KINDS.has(kind);
}

/**
 * Whether an athlete has a safety flag: an active athlete (the review queue's athletes) with a safety
 * flag dated in the last 7 days, or an athlete_flags row (raised by an urgent symptom report). The
 * roster's count and the review queue's safety items both come from this one rule.
 */
export function hasSafetyFlag(input: {
  athlete: Pick<AthleteWithPeople, 'status'>;
  flags: readonly Pick<TrendFlag, 'kind'>[];
  flagRows: readonly Pick<FlagRow, 'kind'>[];
}): boolean {
  if (input.athlete.status !== 'active') return false;
  return input.flags.some((f) => isSafetyFlag(f.kind)) || input.flagRows.some((f) => isSafetyFlag(f.kind));
}

/** The figures of one athlete from their loaded history (pure). */
export function snapshotOf(input: {
  athlete: AthleteWithPeople;
  today: string;
  history: AthleteHistory;
  flagRows: FlagRow[];
  lastCheckInDate: string | null;
}): AthleteSnapshot {
  const { athlete, today, history: h } = input;
  const planToday = plannedDay(h.versions, today);
  const countdown = planToday?.countdown ?? null;
  // Countdown first; otherwise the goal says the phase. Without a goal yet (intake pending) the
  // athlete is taken as maintaining. No plan version at all: no phase to speak of.
  const phase: Phase = countdown
    ? 'countdown'
    : h.versions.length === 0
      ? 'no_plan'
      : athlete.goal
        ? PHASE_BY_GOAL[athlete.goal]
        : 'maintaining';
  const guidance = rateGuidance({ goal: athlete.goal, countdown: countdown !== null });
  const band = guidance.band;
  const rate = rate14(rawPoints(h), today, guidance);
  const latestWeighIn = h.weighIns.at(-1) ?? h.before?.weighIn ?? null;
  const trend = trendByDate(h);
  const trendKg = latestWeighIn ? (trend.get(latestWeighIn.date) ?? null) : null;
  const recentFrom = shiftDate(today, -RECENT_DAYS);
  const recent = trendDays(h, recentFrom, shiftDate(today, -1), today).map((d) => ({
    date: d.date,
    drift: d.drift,
    breach: d.breach,
  }));
  const flagsFrom = shiftDate(today, -(RECENT_DAYS - 1));
  const flags = trendFlags(h, rate, flagsFrom, today, today);
  const flagRows = input.flagRows.filter((f) => f.date >= flagsFrom && f.date <= today);
  const kinds = new Set<FlagKind>(flags.map((f) => f.kind));
  // Rows in athlete_flags are raised by urgent symptom reports.
  if (flagRows.some((f) => f.kind === 'symptom')) kinds.add('symptom');

  return {
    athlete,
    today,
    history: h,
    flagRows,
    countdown,
    rate,
    latestWeighIn,
    recent,
    flags,
    figures: {
      phase,
      countdownLabel: countdown?.dayLabel ?? null,
      latestWeightKg: latestWeighIn?.kg ?? null,
      latestWeighInDate: latestWeighIn?.date ?? null,
      trendKg,
      ratePercentPerWeek: rate?.percentPerWeek ?? null,
      rateBand: band ? { minPct: band.minPct, maxPct: band.maxPct } : null,
      rateBandNote: guidance.note,
      rateVerdict: rate?.verdict ?? null,
      adherence7: adherenceShare(recent),
      lastCheckInDate: input.lastCheckInDate,
      flags: FLAG_KINDS.filter((k) => kinds.has(k)),
      safetyFlag: hasSafetyFlag({ athlete, flags, flagRows }),
      weighInGap: weighInGap(athlete, rawPoints(h), trendKg, today),
    },
  };
}

/**
 * The snapshot of every athlete given, by athlete id, in a constant number of statements (eight:
 * the six of TrendRepository.load, safety flags, last check-ins) whatever the number of athletes
 * or the length of their history. Each athlete's today is their own time zone's.
 */
export async function loadSnapshots(
  manager: EntityManager,
  athletes: readonly AthleteWithPeople[],
  now: Date,
): Promise<Map<string, AthleteSnapshot>> {
  const out = new Map<string, AthleteSnapshot>();
  if (athletes.length === 0) return out;
  const todays = new Map(athletes.map((a) => [a.id, localDateTime(now, a.user.timeZone).date]));
  const windows: HistoryWindow[] = athletes.map((a) => {
    const today = todays.get(a.id)!;
    return { athleteId: a.id, from: shiftDate(today, -(FIGURES_WINDOW_DAYS - 1)), to: today };
  });
  const repo = new TrendRepository(manager);
  const [histories, flagRows, lastCheckIns] = await Promise.all([
    repo.load(windows),
    repo.flags(windows),
    repo.lastCheckIns(windows),
  ]);
  for (const athlete of athletes) {
    const history = histories.get(athlete.id);
    if (!history) continue;
    out.set(
      athlete.id,
      snapshotOf({
        athlete,
        today: todays.get(athlete.id)!,
        history,
        flagRows: flagRows.get(athlete.id) ?? [],
        lastCheckInDate: lastCheckIns.get(athlete.id) ?? null,
      }),
    );
  }
  return out;
}
