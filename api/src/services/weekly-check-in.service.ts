import {
  checkInQuestion,
  dateWindowProblem,
  DRIFT_METRICS,
  RATING_KEYS,
  type CheckInQuestion,
  type DriftMetric,
  type SubmitWeeklyCheckInRequest,
  type Weekday,
  type WeeklyCheckInView,
  type WeeklyFigures,
  type ReplyWeeklyCheckInRequest,
} from '@driftmark/shared';
import { z } from 'zod';
import type { DataSource, EntityManager } from 'typeorm';
import type { Team } from '../entities/team.entity.js';
import type { WeeklyAnswer } from '../entities/weekly-check-in.entity.js';
import { conflict, notFound, validationFailed } from '../errors.js';
import { MEAN7_MIN_POINTS, rate14, rateGuidance, weeklyAdherence } from '../lib/analysis.js';
import { plannedDay } from '../lib/day-plan.js';
import { shiftDate } from '../lib/dates.js';
import { localDateTime } from '../lib/local-time.js';
import {
  checkInExpected,
  currentDueDate,
  firstExpectedDueDate,
  weekOf,
  WEEK_DAYS,
} from '../lib/weekly-dates.js';
import type { Actor } from '../policies/actor.js';
import { presentWeeklyCheckIn } from '../presenters/weekly-check-in.presenter.js';
import { AthleteRepository, type AthleteWithPeople } from '../repositories/athlete.repository.js';
import { PlanRepository } from '../repositories/plan.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { UserRepository } from '../repositories/user.repository.js';
import { TrendRepository, type AthleteHistory } from '../repositories/trend.repository.js';
import {
  WeeklyCheckInRepository,
  type WeeklyCheckInWithReplier,
  type WeeklyEveningRow,
} from '../repositories/weekly-check-in.repository.js';
import { notifyWeeklyCheckInReceived, notifyWeeklyCheckInReplied } from './notify.service.js';
import { rawPoints, trendDays } from './trend.service.js';

/** How many stored check-ins the list answers at most (about a year). */
export const WEEKLY_LIST_LIMIT = 53;

const round = (value: number, digits: number) => Math.round(value * 10 ** digits) / 10 ** digits;
const meanOf = (values: readonly number[]): number | null =>
  values.length === 0 ? null : values.reduce((s, v) => s + v, 0) / values.length;
/** A week's mean weigh-in: null with fewer than 4 (the 7-day mean's rule, analysis.ts MEAN7_MIN_POINTS). */
const weekMean = (kgs: readonly number[]): number | null =>
  kgs.length < MEAN7_MIN_POINTS ? null : meanOf(kgs);

/** Adherence per metric over the days given, summed across the analysis module's (Monday) weeks. */
export function adherenceOver(days: Parameters<typeof weeklyAdherence>[0]): WeeklyFigures['adherence'] {
  const sums = new Map<DriftMetric, { targetDays: number; loggedDays: number; onPlanDays: number }>();
  for (const row of weeklyAdherence(days)) {
    const sum = sums.get(row.metric) ?? { targetDays: 0, loggedDays: 0, onPlanDays: 0 };
    sum.targetDays += row.targetDays;
    sum.loggedDays += row.loggedDays;
    sum.onPlanDays += row.onPlanDays;
    sums.set(row.metric, sum);
  }
  return DRIFT_METRICS.flatMap((metric) => {
    const sum = sums.get(metric);
    if (!sum || sum.targetDays === 0) return [];
    return [
      {
        metric,
        adherence: sum.loggedDays === 0 ? null : round(sum.onPlanDays / sum.loggedDays, 3),
        loggedShare: round(sum.loggedDays / sum.targetDays, 3),
      },
    ];
  });
}

/**
 * The figures of the week before `dueDate` from a history covering the 14 days before it: the mean
 * weigh-in of the week and of the week before (each only from 4 weigh-ins or more) and their change,
 * the 14-day rate ending on the week's last day (analysis module, as the trend), adherence per metric,
 * the means of the evening ratings, steps and sleep, and the week's condition photos.
 */
export function weeklyFiguresOf(input: {
  dueDate: string;
  today: string;
  goal: AthleteWithPeople['goal'];
  history: AthleteHistory;
  evenings: readonly WeeklyEveningRow[];
  photoIds: readonly string[];
}): WeeklyFigures {
  const { dueDate, today, history: h } = input;
  const { weekStart, weekEnd } = weekOf(dueDate);
  const previousStart = shiftDate(weekStart, -WEEK_DAYS);
  const inWeek = h.weighIns.filter((w) => w.date >= weekStart && w.date <= weekEnd).map((w) => w.kg);
  const inPrevious = h.weighIns.filter((w) => w.date >= previousStart && w.date < weekStart).map((w) => w.kg);
  const mean = weekMean(inWeek);
  const previous = weekMean(inPrevious);
  const countdown = plannedDay(h.versions, weekEnd)?.countdown != null;
  const rate = rate14(rawPoints(h), weekEnd, rateGuidance({ goal: input.goal, countdown }));
  const evenings = input.evenings.filter((e) => e.date >= weekStart && e.date <= weekEnd);
  const meanOfEvenings = (pick: (e: WeeklyEveningRow) => number | null | undefined) =>
    meanOf(evenings.map(pick).filter((v): v is number => typeof v === 'number'));
  const ratings = Object.fromEntries(
    RATING_KEYS.map((key) => {
      const m = meanOfEvenings((e) => e.ratings?.[key]);
      return [key, m === null ? null : round(m, 1)];
    }),
  );
  const steps = meanOfEvenings((e) => e.steps);
  const sleep = meanOfEvenings((e) => e.sleepHours);
  return {
    weekStart,
    weekEnd,
    meanWeightKg: mean === null ? null : round(mean, 2),
    previousMeanWeightKg: previous === null ? null : round(previous, 2),
    changeKg: mean === null || previous === null ? null : round(mean - previous, 2),
    weighIns: inWeek.length,
    rate,
    adherence: adherenceOver(trendDays(h, weekStart, weekEnd, today)),
    ratings,
    stepsMean: steps === null ? null : Math.round(steps),
    sleepHoursMean: sleep === null ? null : round(sleep, 1),
    photoIds: [...input.photoIds],
  };
}

/** The team's questions, dropping any stored entry that no longer parses. */
export function teamQuestions(team: Pick<Team, 'settings'> | null): CheckInQuestion[] {
  const parsed = z.array(checkInQuestion).safeParse(team?.settings?.checkInQuestions ?? []);
  return parsed.success ? parsed.data : [];
}

/** Each answer must belong to one of `questions` (once) and fit its kind; null leaves it unanswered. */
export function answerProblems(
  questions: readonly CheckInQuestion[],
  answers: SubmitWeeklyCheckInRequest['answers'],
): Record<string, string> {
  const byId = new Map(questions.map((q) => [q.id, q]));
  const seen = new Set<string>();
  const problems: Record<string, string> = {};
  answers.forEach((a, i) => {
    const q = byId.get(a.questionId);
    if (!q) {
      problems[`answers.${i}.questionId`] = 'Not one of this check-in’s questions';
      return;
    }
    if (seen.has(a.questionId)) {
      problems[`answers.${i}.questionId`] = 'Answered twice';
      return;
    }
    seen.add(a.questionId);
    const v = a.value;
    if (v === null) return;
    if (q.kind === 'text' && typeof v !== 'string') problems[`answers.${i}.value`] = 'Type an answer';
    if (q.kind === 'scale' && typeof v !== 'number') problems[`answers.${i}.value`] = 'Choose 1 to 5';
    if (q.kind === 'yes_no' && typeof v !== 'boolean') problems[`answers.${i}.value`] = 'Choose yes or no';
  });
  return problems;
}

type WeeklyDeps = { dataSource: DataSource; clock: () => Date };

/**
 * Weekly check-ins. The due date is the latest check-in weekday on or before the athlete's today
 * (their time zone); the check-in for it stays open for the athlete until the next one is due or
 * a staff member replies. Figures are computed from the logs when shown while due and stored with
 * each submission.
 */
export class WeeklyCheckInService {
  constructor(private readonly deps: WeeklyDeps) {}

  private get manager(): EntityManager {
    return this.deps.dataSource.manager;
  }

  /** The athlete's today and current due date. */
  dates(athlete: AthleteWithPeople): { today: string; dueDate: string } {
    const now = this.deps.clock();
    return {
      today: localDateTime(now, athlete.user.timeZone).date,
      dueDate: currentDueDate(now, athlete.user.timeZone, athlete.checkInWeekday),
    };
  }

  /**
   * A due date is an entry date: held to the shared entry window (`dateWindow` 'past': back
   * LIMITS.dateWindow.historyYears, never after the athlete's today), refused on `dueDate`.
   */
  private assertDueDateInWindow(dueDate: string, today: string): void {
    const problem = dateWindowProblem(dueDate, today, 'past');
    if (problem) throw validationFailed({ dueDate: problem });
  }

  /** Reads in parallel: pass a pool manager, not a transaction's. */
  async figures(manager: EntityManager, athlete: AthleteWithPeople, dueDate: string): Promise<WeeklyFigures> {
    const { today } = this.dates(athlete);
    const { weekStart, weekEnd } = weekOf(dueDate);
    const from = shiftDate(weekStart, -WEEK_DAYS);
    const repo = new WeeklyCheckInRepository(manager);
    const [loaded, evenings, photos] = await Promise.all([
      new TrendRepository(manager).load([{ athleteId: athlete.id, from, to: weekEnd }]),
      repo.evenings(athlete.id, weekStart, weekEnd),
      repo.photos(athlete.id, weekStart, weekEnd),
    ]);
    const history = loaded.get(athlete.id);
    if (!history) throw new Error('weekly history missing for a loaded window');
    return weeklyFiguresOf({
      dueDate,
      today,
      goal: athlete.goal,
      history,
      evenings,
      photoIds: photos.map((p) => p.id),
    });
  }

  async questions(teamId: string): Promise<CheckInQuestion[]> {
    return this.questionsIn(this.manager, teamId);
  }

  /** Replaces the team's list in one statement, leaving the other settings as they are. */
  async replaceQuestions(teamId: string, questions: readonly CheckInQuestion[]): Promise<CheckInQuestion[]> {
    const ids = new Set<string>();
    const problems: Record<string, string> = {};
    questions.forEach((q, i) => {
      if (ids.has(q.id)) problems[`questions.${i}.id`] = 'Each question needs its own id';
      ids.add(q.id);
    });
    if (Object.keys(problems).length > 0) throw validationFailed(problems);
    await new TeamRepository(this.manager).replaceCheckInQuestions(teamId, questions);
    return this.questions(teamId);
  }

  /**
   * The check-in due now: the stored one, or one computed from the logs with the team's questions.
   * Nothing is due before joining: while the due date is on or before the day the athlete completed
   * the intake, it is not_due, naming the first due date.
   */
  async current(athlete: AthleteWithPeople): Promise<WeeklyCheckInView> {
    return this.forDueDate(athlete, this.dates(athlete).dueDate);
  }

  /**
   * The check-in due on `dueDate` (today's or an earlier one): stored, or computed from the logs —
   * due while it is the current one, missed after, not_due when none was expected then (joined on or
   * after it). A later date, or one before the entry window, answers 400 on `dueDate`.
   */
  async forDueDate(athlete: AthleteWithPeople, dueDate: string): Promise<WeeklyCheckInView> {
    const { dueDate: current, today } = this.dates(athlete);
    this.assertDueDateInWindow(dueDate, today);
    if (dueDate > current) {
      throw validationFailed({
        dueDate: `No check-in is due on ${dueDate} yet (the current one is due on ${current})`,
      });
    }
    const stored = await new WeeklyCheckInRepository(this.manager).findByDueDate(athlete.id, dueDate);
    if (stored) return presentWeeklyCheckIn(stored);
    const [figures, questions] = await Promise.all([
      this.figures(this.manager, athlete, dueDate),
      this.questions(athlete.teamId),
    ]);
    const expected = checkInExpected(dueDate, athlete.intakeCompletedAt, athlete.user.timeZone);
    return {
      id: null,
      athleteId: athlete.id,
      dueDate,
      status: !expected ? 'not_due' : dueDate === current ? 'due' : 'missed',
      firstDueDate: expected ? null : this.firstDueDate(athlete),
      figures,
      questions,
      answers: [],
      questionsForCoach: null,
      submittedAt: null,
      reply: null,
    };
  }

  /** Stored check-ins, newest first. */
  async list(athlete: AthleteWithPeople): Promise<WeeklyCheckInView[]> {
    const rows = await new WeeklyCheckInRepository(this.manager).listForAthlete(
      athlete.id,
      WEEKLY_LIST_LIMIT,
    );
    return rows.map((r) => presentWeeklyCheckIn(r));
  }

  get(checkIn: WeeklyCheckInWithReplier): WeeklyCheckInView {
    return presentWeeklyCheckIn(checkIn);
  }

  /**
   * The athlete submits the check-in due now: created on the first submission (staff hear of it),
   * updated on later ones with fresh figures until a staff member replies (then 409).
   */
  async submit(athlete: AthleteWithPeople, input: SubmitWeeklyCheckInRequest): Promise<WeeklyCheckInView> {
    const { dueDate, today } = this.dates(athlete);
    this.assertDueDateInWindow(input.dueDate, today);
    if (input.dueDate !== dueDate) {
      throw validationFailed({ dueDate: `Only the check-in due on ${dueDate} is open` });
    }
    if (!checkInExpected(dueDate, athlete.intakeCompletedAt, athlete.user.timeZone)) {
      throw validationFailed({
        dueDate: `Nothing is due before you joined: your first check-in is due on ${this.firstDueDate(athlete)}`,
      });
    }
    const now = this.deps.clock();
    // Read before the transaction: the history loads in parallel, which needs the pool.
    const figures = await this.figures(this.manager, athlete, dueDate);
    await this.deps.dataSource.transaction(async (manager) => {
      const repo = new WeeklyCheckInRepository(manager);
      // Lock the athlete row: two submissions at once must not both insert.
      await new AthleteRepository(manager).lockForUpdate(athlete.id);
      const existing = await repo.findByDueDate(athlete.id, dueDate);
      if (existing?.repliedAt) {
        throw conflict('Your coach has already answered this check-in; it can no longer be changed.');
      }
      const questions = existing ? existing.questions : await this.questionsIn(manager, athlete.teamId);
      const problems = answerProblems(questions, input.answers);
      if (Object.keys(problems).length > 0) throw validationFailed(problems);
      const answers: WeeklyAnswer[] = input.answers.map((a) => ({
        questionId: a.questionId,
        value: a.value,
      }));
      const saved = await repo.save({
        ...(existing ? { id: existing.id, createdAt: existing.createdAt } : { createdAt: now }),
        athleteId: athlete.id,
        dueDate,
        questions,
        answers,
        questionsForCoach: input.questionsForCoach || null,
        figures,
        submittedAt: existing?.submittedAt ?? now,
        updatedAt: now,
      });
      await notifyWeeklyCheckInReceived(manager, athlete, {
        id: saved.id,
        dueDate,
        questionsForCoach: saved.questionsForCoach,
      });
    });
    return this.current(athlete);
  }

  /** A staff member answers the check-in (once), optionally linking a plan version of the athlete. */
  async reply(
    actor: Actor,
    athlete: AthleteWithPeople,
    checkIn: WeeklyCheckInWithReplier,
    input: ReplyWeeklyCheckInRequest,
  ): Promise<WeeklyCheckInView> {
    const now = this.deps.clock();
    await this.deps.dataSource.transaction(async (manager) => {
      const repo = new WeeklyCheckInRepository(manager);
      const locked = await repo.findByIdForUpdate(checkIn.id);
      if (!locked) throw notFound();
      if (locked.repliedAt) throw conflict('This check-in has already been answered.');
      const planVersionId = input.planVersionId ?? null;
      if (planVersionId) {
        const exists = await new PlanRepository(manager).versionExists(athlete.id, planVersionId);
        if (!exists) throw validationFailed({ planVersionId: 'Not a plan version of this athlete' });
      }
      await repo.save({
        ...locked,
        replyBody: input.body,
        repliedById: actor.userId,
        repliedAt: now,
        planVersionId,
        updatedAt: now,
      });
      const replier = await new UserRepository(manager).findById(actor.userId);
      if (!replier) throw notFound();
      await notifyWeeklyCheckInReplied(
        manager,
        athlete,
        { id: checkIn.id, dueDate: checkIn.dueDate, replyBody: input.body },
        replier,
      );
    });
    const updated = await new WeeklyCheckInRepository(this.manager).findById(checkIn.id);
    if (!updated) throw notFound();
    return this.get(updated);
  }

  /** Moves the athlete's check-in weekday; answers the check-in due now under the new day. */
  async setWeekday(athlete: AthleteWithPeople, weekday: Weekday): Promise<WeeklyCheckInView> {
    await new AthleteRepository(this.manager).update(athlete.id, { checkInWeekday: weekday });
    return this.current({ ...athlete, checkInWeekday: weekday });
  }

  /** The first check-in expected of the athlete (checkInExpected), from their intake. */
  private firstDueDate(athlete: AthleteWithPeople): string {
    const joined = athlete.intakeCompletedAt ?? this.deps.clock();
    return firstExpectedDueDate(joined, athlete.user.timeZone, athlete.checkInWeekday);
  }

  private async questionsIn(manager: EntityManager, teamId: string): Promise<CheckInQuestion[]> {
    return teamQuestions(await new TeamRepository(manager).findSettings(teamId));
  }
}
