import {
  cautionsForDay,
  timingBreaches,
  versionInForce,
  type DaySummary,
  type Reader,
  type DayView,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { FluidEntry } from '../entities/fluid-entry.entity.js';
import { MealEntry } from '../entities/meal-entry.entity.js';
import { mealKind } from './day-entry-kinds.js';
import type { PlanVersion } from '../entities/plan-version.entity.js';
import { SupplementEntry } from '../entities/supplement-entry.entity.js';
import { SymptomReport } from '../entities/symptom-report.entity.js';
import { validationFailed } from '../errors.js';
import { dayActuals, mealTotals } from '../lib/day-actuals.js';
import { dayDrift } from '../lib/day-drift.js';
import { dayMealPlan } from '../lib/day-meal-plan.js';
import { versionDay, type EventPlace } from '../lib/day-plan.js';
import { daysBetween } from '../lib/dates.js';
import { localDateTime } from '../lib/local-time.js';
import { emptyDaySummary, presentDay } from '../presenters/day.presenter.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { AthleteFlagRepository } from '../repositories/athlete-flag.repository.js';
import { DayEntryRepository } from '../repositories/day-entry.repository.js';
import { DayHistoryRepository } from '../repositories/day-history.repository.js';
import { EveningLogRepository } from '../repositories/evening-log.repository.js';
import { PlanRepository, type AcknowledgementWithAuthor } from '../repositories/plan.repository.js';
import { WeighInRepository } from '../repositories/weigh-in.repository.js';
import { dayPhotoSource } from './day-photos.service.js';

/** The longest range the history list answers at once, in days. */
export const HISTORY_MAX_DAYS = 400;

type DayPlan = Pick<DayView, 'targets' | 'countdown' | 'cautions'>;

/** The event place of an athlete's profile. */
export function eventPlaceOf(athlete: AthleteWithPeople): EventPlace {
  return {
    eventTime: athlete.eventTime,
    eventTimeZone: athlete.eventTimeZone,
    athleteTimeZone: athlete.user.timeZone,
  };
}

/**
 * What the plan says about `date`: the targets of the version in force that day, resolved with
 * that version's own baseline snapshot (so a later version or a new weigh-in never changes a past
 * day), the countdown day it is, and the cautions the athlete sees.
 */
export function planForDay(
  version: PlanVersion | null,
  acknowledgements: readonly AcknowledgementWithAuthor[],
  date: string,
  place: EventPlace,
  reader: Reader,
): DayPlan {
  if (!version) return { targets: null, countdown: null, cautions: [] };
  const { content } = version;
  const day = versionDay(version, date, place);
  const { entry } = day;
  return {
    targets: {
      versionId: version.id,
      versionNumber: version.number,
      effectiveFrom: version.effectiveFrom,
      source:
        entry.kind === 'date'
          ? { kind: 'date', label: entry.override.label }
          : { kind: 'pattern', dayTypeKey: entry.dayType.key, dayTypeName: entry.dayType.name },
      targets: day.targets,
      tolerances: day.tolerances,
    },
    countdown: day.countdown
      ? {
          eventDate: day.countdown.eventDate,
          eventType: day.countdown.eventType,
          offset: day.countdown.offset,
          dayLabel: day.countdown.dayLabel,
          label: day.countdown.label,
        }
      : null,
    cautions: cautionsForDay({
      content,
      date,
      reader,
      acknowledgements: acknowledgements.map((a) => ({
        code: a.code,
        severity: a.severity,
        scope: a.scope,
        message: a.message,
        source: a.source,
        at: a.acknowledgedAt.toISOString(),
      })),
    }),
  };
}

/** The version in force on `date` with its acknowledgements (two queries). */
async function loadDayPlan(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  date: string,
  reader: Reader,
): Promise<DayPlan> {
  const plans = new PlanRepository(manager);
  const version = versionInForce(await plans.listVersions(athlete.id), date);
  const acks = version ? ((await plans.acknowledgementsByVersion([version.id])).get(version.id) ?? []) : [];
  return planForDay(version, acks, date, eventPlaceOf(athlete), reader);
}

/** Everything the athlete logged on `date` (their local date), as the day view, worded for `reader`. */
export async function loadDayView(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  date: string,
  now: Date,
  reader: Reader,
): Promise<DayView> {
  const timeZone = athlete.user.timeZone;
  const today = localDateTime(now, timeZone).date;
  const [weighIn, fluids, meals, supplements, evening, symptoms, flags, photos, plan] = await Promise.all([
    new WeighInRepository(manager).findForDay(athlete.id, date),
    new DayEntryRepository(manager, FluidEntry).listForDay(athlete.id, date),
    new DayEntryRepository(manager, MealEntry).listForDay(athlete.id, date),
    new DayEntryRepository(manager, SupplementEntry).listForDay(athlete.id, date),
    new EveningLogRepository(manager).findForDay(athlete.id, date),
    new DayEntryRepository(manager, SymptomReport).listForDay(athlete.id, date),
    new AthleteFlagRepository(manager).listForDay(athlete.id, date),
    dayPhotoSource(manager).forDay(athlete.id, date),
    loadDayPlan(manager, athlete, date, reader),
  ]);
  // A meal of foods lists its items: one more statement for all of the day's.
  await mealKind.load?.(meals, manager);
  const judged = dayDrift({
    plan: plan.targets,
    actuals: dayActuals(mealTotals(meals), fluids, evening),
    fluids: fluids.map((f) => ({ time: f.localTime, volumeMl: f.volumeMl })),
    date,
    today,
  });
  const inForce = plan.targets?.targets;
  const timing =
    inForce && date <= today
      ? timingBreaches(
          inForce,
          fluids.map((f) => ({ time: f.localTime, volumeMl: f.volumeMl })),
          meals.map((m) => ({ time: m.localTime, energyKcal: m.energyKcal })),
        )
      : [];
  const mealPlan = dayMealPlan({
    planned: inForce?.meals ?? [],
    logged: meals.map((m) => ({ id: m.id, plannedMealId: m.plannedMealId })),
    date,
    today,
  });
  return presentDay({
    mealPlan,
    athleteId: athlete.id,
    date,
    timeZone,
    isToday: today === date,
    weighIn,
    fluids,
    meals,
    supplements,
    evening,
    symptoms,
    flags,
    photos,
    reader,
    plan,
    judged: { ...judged, timingBreaches: timing },
  });
}

type DayDeps = { dataSource: DataSource; clock: () => Date };

export class DayService {
  constructor(private readonly deps: DayDeps) {}

  getDay(athlete: AthleteWithPeople, date: string, reader: Reader): Promise<DayView> {
    return loadDayView(this.deps.dataSource.manager, athlete, date, this.deps.clock(), reader);
  }

  /** One summary per day with anything logged between `from` and `to` (inclusive), newest first. */
  async listDays(athlete: AthleteWithPeople, from: string, to: string): Promise<DaySummary[]> {
    const span = daysBetween(from, to) + 1;
    if (span < 1) throw validationFailed({ to: 'Must be on or after the start date' });
    if (span > HISTORY_MAX_DAYS)
      throw validationFailed({ from: `At most ${HISTORY_MAX_DAYS} days at a time` });

    const manager = this.deps.dataSource.manager;
    const [agg, photoCounts] = await Promise.all([
      new DayHistoryRepository(manager).aggregate(athlete.id, from, to),
      dayPhotoSource(manager).countsByDay(athlete.id, from, to),
    ]);
    const days = new Map<string, DaySummary>();
    const day = (date: string) => {
      let summary = days.get(date);
      if (!summary) days.set(date, (summary = emptyDaySummary(date)));
      return summary;
    };
    for (const [date, kg] of agg.weights) day(date).weightKg = kg;
    for (const [date, ml] of agg.fluids) day(date).fluidTotalMl = ml;
    for (const [date, m] of agg.meals) {
      Object.assign(day(date), { energyKcal: m.energyKcal, proteinG: m.proteinG, mealCount: m.count });
    }
    for (const date of agg.evenings) day(date).hasEvening = true;
    for (const [date, s] of agg.symptoms)
      Object.assign(day(date), { symptomCount: s.count, urgent: s.urgent });
    for (const date of agg.supplements) day(date);
    for (const [date, n] of photoCounts) if (n > 0) day(date).photoCount = n;
    return [...days.values()].sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : 0));
  }
}
