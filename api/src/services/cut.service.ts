import {
  ACUTE_SHARE_DEFAULT_PCT,
  ACUTE_SHARE_SEVERE_MEANING,
  ACUTE_SHARE_SEVERE_PCT,
  acuteShare,
  beforeEventOnAthleteClock,
  chronicRate,
  competitionDate,
  CUT_CAUTION,
  CUT_SOURCES,
  cutPathKg,
  cutWarnings,
  preAcuteDate,
  recoveryItemAmounts,
  recoveryTargets,
  recoveryWindowHours,
  REHEARSAL_REGAIN_MORNINGS,
  rehearsalFigures,
  STOP_SIGNS_TEXT,
  addDays,
  type CreateCutPlanRequest,
  type RehearsalNoteRequest,
  type RehearsalView,
  type CutFiguresView,
  type CutPlanShape,
  type CutSettingsView,
  type RecoveryItemKind,
  type CutView,
  type LimitGapView,
  type RecoveryView,
  type WeighInEventRequest,
  type WeighInEventView,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { conflict, guardrailsUnacknowledged, notFound, validationFailed } from '../errors.js';
import { FluidEntry } from '../entities/fluid-entry.entity.js';
import { MealEntry } from '../entities/meal-entry.entity.js';
import { localDateTime } from '../lib/local-time.js';
import { recoveryClientId } from '../lib/recovery-client-id.js';
import type { Actor } from '../policies/actor.js';
import type { CutPlan } from '../entities/cut-plan.entity.js';
import { presentCutPlan, presentRehearsal } from '../presenters/cut.presenter.js';
import { AthleteRepository, type AthleteWithPeople } from '../repositories/athlete.repository.js';
import { CutPlanRepository, type CutPlanWithAuthor } from '../repositories/cut-plan.repository.js';
import { DayEntryRepository } from '../repositories/day-entry.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { TrendRepository } from '../repositories/trend.repository.js';
import { loadSnapshots } from './athlete-figures.service.js';
import { notifyOverLimit } from './notify.service.js';

type CutDeps = { dataSource: DataSource; clock: () => Date };

const NOT_A_WEIGH_IN = 'The athlete’s event is not a weigh-in with a date: set the event first.';

/** The weigh-in's record, with its recovery window once both clock times and the zone are known. */
export function weighInEventOf(athlete: AthleteWithPeople): WeighInEventView | null {
  if (athlete.eventType !== 'weigh_in' || !athlete.eventDate || athlete.weighInLimitKg === null) return null;
  const timing = athlete.weighInTiming;
  const window =
    timing && athlete.eventTime && athlete.competitionTime && athlete.eventTimeZone
      ? recoveryWindowHours({
          weighInDate: athlete.eventDate,
          weighInTime: athlete.eventTime,
          timing,
          competitionTime: athlete.competitionTime,
          timeZone: athlete.eventTimeZone,
        })
      : null;
  return {
    date: athlete.eventDate,
    limitKg: athlete.weighInLimitKg,
    timing,
    weighInTime: athlete.eventTime,
    competitionDate: timing ? competitionDate({ weighInDate: athlete.eventDate, timing }) : null,
    competitionTime: athlete.competitionTime,
    timeZone: athlete.eventTimeZone,
    recoveryWindowHours: window,
    usualWeightKg: athlete.usualWeightKg,
    classBelowKg: athlete.classBelowKg,
    classAboveKg: athlete.classAboveKg,
  };
}

function shapeOf(
  plan: CutPlanWithAuthor | (CreateCutPlanRequest & { weighInDate: string; limitKg: number }),
): CutPlanShape {
  return {
    startDate: plan.startDate,
    startKg: plan.startKg,
    preAcuteKg: plan.preAcuteKg,
    acuteDays: plan.acuteDays,
    weighInDate: plan.weighInDate,
    limitKg: plan.limitKg,
    path: plan.path,
  };
}

/** The plan's figures on `today` (shared rules/weight-cut.ts), with its warnings. */
export function cutFigures(shape: CutPlanShape, thresholdPct: number, today: string): CutFiguresView {
  const path = cutPathKg(shape, today);
  const chronic = chronicRate(shape);
  const acute = acuteShare(shape.preAcuteKg, shape.limitKg, thresholdPct);
  return {
    today,
    todayKg: path.kg,
    stage: path.stage,
    chronic,
    acute,
    thresholdPct,
    warnings: cutWarnings(chronic, acute, thresholdPct).map((w) => ({ ...w, needsAcknowledgement: true })),
    stopSigns: acute.severity === 'severe' ? STOP_SIGNS_TEXT : null,
  };
}

/** The team's acute-share threshold with the default, the severe line and their sources. */
export async function cutSettingsOf(teams: TeamRepository, teamId: string): Promise<CutSettingsView> {
  return {
    acuteSharePct: await teams.acuteSharePct(teamId),
    defaultPct: ACUTE_SHARE_DEFAULT_PCT,
    source: CUT_SOURCES.acuteShare,
    severePct: ACUTE_SHARE_SEVERE_PCT,
    severeMeaning: ACUTE_SHARE_SEVERE_MEANING,
    severeSource: CUT_SOURCES.acuteShareSevere,
  };
}

/** An entry a recovery item logged, found by the item's client id. */
export type LoggedEntry = { entryId: string; date: string; time: string };

/** How a recovery item is linked to what it logs: its client id, and the entry with that id. */
export interface RecoveryLinks {
  clientId(slotIndex: number, kind: RecoveryItemKind): string;
  logged(clientId: string): LoggedEntry | null;
}

const NO_LINKS: RecoveryLinks = { clientId: () => '', logged: () => null };

/**
 * On the weigh-in day and until the competition: recovery targets from the kg lost at the scale,
 * counted from the plan's pre-acute weight (else the usual weight) down to the limit, each slot
 * placed on the athlete's clock from the weigh-in's time on the venue clock, each with its fluid
 * and carbohydrate items (done while an entry with the item's client id exists).
 */
export function recoveryOf(
  event: WeighInEventView | null,
  plan: Pick<CutPlanShape, 'preAcuteKg'> | null,
  today: string,
  athleteTimeZone: string,
  links: RecoveryLinks = NO_LINKS,
): RecoveryView | null {
  if (!event || event.recoveryWindowHours === null || !event.weighInTime || !event.timeZone) return null;
  if (today < event.date || (event.competitionDate !== null && today > event.competitionDate)) return null;
  const from = plan
    ? { kg: plan.preAcuteKg, basis: 'plan' as const }
    : event.usualWeightKg !== null
      ? { kg: event.usualWeightKg, basis: 'usual' as const }
      : null;
  if (!from) return null;
  const kgLost = Math.max(0, from.kg - event.limitKg);
  const targets = recoveryTargets({ kgLost, bodyKg: event.limitKg, windowHours: event.recoveryWindowHours });
  const clock = { date: event.date, time: event.weighInTime, timeZone: event.timeZone };
  return {
    kgLost,
    basis: from.basis,
    windowHours: event.recoveryWindowHours,
    fluidL: targets.fluidL,
    carbohydrateG: targets.carbohydrateG,
    slots: targets.slots.map((s, i) => {
      const at = beforeEventOnAthleteClock(clock, -s.minutesAfterWeighIn, athleteTimeZone);
      const amounts = recoveryItemAmounts(s);
      const item = (kind: RecoveryItemKind) => {
        const clientId = links.clientId(i, kind);
        return { clientId, logged: links.logged(clientId) };
      };
      return {
        ...at,
        fluidL: s.fluidL,
        carbohydrateG: s.carbohydrateG,
        fluid: { ...item('fluid'), volumeMl: amounts.volumeMl, sodiumMg: amounts.sodiumMg },
        carbohydrate: {
          ...item('carbohydrate'),
          carbohydrateG: amounts.carbohydrateG,
          mealName: `Recovery carbohydrate ${at.time}`,
        },
      };
    }),
    source: CUT_SOURCES.recovery,
  };
}

export class CutService {
  constructor(private readonly deps: CutDeps) {}

  private get manager(): EntityManager {
    return this.deps.dataSource.manager;
  }

  /** The weigh-in, the projection against its limit, and the plan in force with today's figures. */
  async getCut(athlete: AthleteWithPeople): Promise<CutView> {
    const now = this.deps.clock();
    const today = localDateTime(now, athlete.user.timeZone).date;
    const [snapshots, plan, thresholdPct, rehearsal] = await Promise.all([
      loadSnapshots(this.manager, [athlete], now),
      new CutPlanRepository(this.manager).latest(athlete.id),
      new TeamRepository(this.manager).acuteSharePct(athlete.teamId),
      new CutPlanRepository(this.manager).latestRehearsal(athlete.id),
    ]);
    const acks = plan ? await new CutPlanRepository(this.manager).acknowledgements(plan.id) : [];
    const event = weighInEventOf(athlete);
    const recovery = recoveryOf(event, plan, today, athlete.user.timeZone);
    const links = recovery && event ? await this.recoveryLinks(athlete.id, event.date, recovery) : NO_LINKS;
    return {
      athleteId: athlete.id,
      weighIn: event,
      gap: snapshots.get(athlete.id)?.figures.weighInGap ?? null,
      plan: plan ? presentCutPlan(plan, acks) : null,
      figures: plan ? cutFigures(shapeOf(plan), plan.thresholdPct, today) : null,
      thresholdPct,
      recovery: recovery ? recoveryOf(event, plan, today, athlete.user.timeZone, links) : null,
      rehearsal: rehearsal ? await this.rehearsalRecord(rehearsal, today) : null,
      caution: CUT_CAUTION,
    };
  }

  /**
   * The recovery items' client ids (fixed per athlete, weigh-in date and item) and the fluid and
   * meal entries logged with them: one query per table, whatever the number of slots.
   */
  private async recoveryLinks(
    athleteId: string,
    weighInDate: string,
    recovery: RecoveryView,
  ): Promise<RecoveryLinks> {
    const clientId = (i: number, kind: RecoveryItemKind) => recoveryClientId(athleteId, weighInDate, i, kind);
    const ids = (kind: RecoveryItemKind) => recovery.slots.map((_, i) => clientId(i, kind));
    const [fluids, meals] = await Promise.all([
      new DayEntryRepository(this.manager, FluidEntry).findByClientIds(athleteId, ids('fluid')),
      new DayEntryRepository(this.manager, MealEntry).findByClientIds(athleteId, ids('carbohydrate')),
    ]);
    const byClientId = new Map<string, LoggedEntry>(
      [...fluids, ...meals].map((e) => [e.clientId, { entryId: e.id, date: e.localDate, time: e.localTime }]),
    );
    return { clientId, logged: (id) => byClientId.get(id) ?? null };
  }

  /**
   * A practice run's record: each day's scale weight and loss from the start of its acute part to
   * the practice weigh-in and the regain mornings after (shared rehearsalFigures over the weigh-ins
   * the trend reads), the day notes and the symptom reports of those days.
   */
  async rehearsalRecord(plan: CutPlan, today: string): Promise<RehearsalView> {
    const window = {
      athleteId: plan.athleteId,
      from: preAcuteDate(plan),
      to: addDays(plan.weighInDate, REHEARSAL_REGAIN_MORNINGS),
    };
    const [history, notes] = await Promise.all([
      new TrendRepository(this.manager).load([window]),
      new CutPlanRepository(this.manager).notes(plan.id),
    ]);
    const days = history.get(plan.athleteId);
    const figures = rehearsalFigures({
      preAcuteDate: window.from,
      weighInDate: plan.weighInDate,
      weighIns: days?.weighIns ?? [],
    });
    return presentRehearsal(plan, figures, notes, days?.symptoms ?? [], today);
  }

  /**
   * Writes (or, empty, removes) what was done on one day of a rehearsal: a day from the start of
   * its acute part to the last regain morning, not after the athlete's today.
   */
  async setRehearsalNote(
    actor: Actor,
    athlete: AthleteWithPeople,
    cutPlanId: string,
    input: RehearsalNoteRequest,
  ): Promise<RehearsalView> {
    const repo = new CutPlanRepository(this.manager);
    const plan = await repo.findRehearsal(athlete.id, cutPlanId);
    if (!plan) throw notFound();
    const from = preAcuteDate(plan);
    const to = addDays(plan.weighInDate, REHEARSAL_REGAIN_MORNINGS);
    const today = localDateTime(this.deps.clock(), athlete.user.timeZone).date;
    if (input.date < from || input.date > to)
      throw validationFailed({ date: `Choose a day of the rehearsal, ${from} to ${to}` });
    if (input.date > today) throw validationFailed({ date: 'Write a day’s note on the day or after it' });
    if (input.note) await repo.setNote(plan, input.date, input.note, actor.userId);
    else await repo.removeNote(plan.id, input.date);
    return this.rehearsalRecord(plan, today);
  }

  /** Sets the weigh-in's record on the athlete (the event must already be a dated weigh-in). */
  async setWeighInEvent(athlete: AthleteWithPeople, input: WeighInEventRequest): Promise<CutView> {
    if (athlete.eventType !== 'weigh_in' || !athlete.eventDate) throw conflict(NOT_A_WEIGH_IN);
    const athletes = new AthleteRepository(this.manager);
    await athletes.update(athlete.id, {
      weighInLimitKg: input.weighInLimitKg,
      eventTime: input.weighInTime,
      weighInTiming: input.weighInTiming,
      competitionTime: input.competitionTime,
      usualWeightKg: input.usualWeightKg,
      classBelowKg: input.classBelowKg,
      classAboveKg: input.classAboveKg,
    });
    const updated = await athletes.findWithPeople(athlete.id);
    if (!updated) throw notFound();
    return this.getCut(updated);
  }

  /**
   * Saves a cut plan for the athlete's weigh-in: refused (409 `guardrails_unacknowledged`, fields by
   * key, warnings whole) while any of its warnings is not acknowledged; stored with one acknowledgement per warning.
   */
  async createPlan(actor: Actor, athlete: AthleteWithPeople, input: CreateCutPlanRequest): Promise<CutView> {
    const event = weighInEventOf(athlete);
    if (!event) throw conflict(NOT_A_WEIGH_IN);
    const practice = input.practiceWeighInDate;
    if (practice !== null && practice >= event.date)
      throw validationFailed({ practiceWeighInDate: `Must be before the weigh-in on ${event.date}` });
    const shapeInput = { ...input, weighInDate: practice ?? event.date, limitKg: event.limitKg };
    if (input.startDate >= preAcuteDate(shapeInput))
      throw validationFailed({
        startDate: `Start before the last ${input.acuteDays} days before the weigh-in`,
      });
    if (input.preAcuteKg > input.startKg)
      throw validationFailed({ preAcuteKg: 'Must not be above the start weight' });
    const thresholdPct = await new TeamRepository(this.manager).acuteSharePct(athlete.teamId);
    const today = localDateTime(this.deps.clock(), athlete.user.timeZone).date;
    const warnings = cutFigures(shapeOf(shapeInput), thresholdPct, today).warnings;
    const missing = warnings.filter((w) => !input.acknowledgedKeys.includes(w.key));
    if (missing.length > 0) throw guardrailsUnacknowledged(missing, 'warning');
    const at = this.deps.clock();
    await this.deps.dataSource.transaction((manager) =>
      new CutPlanRepository(manager).create(
        {
          athleteId: athlete.id,
          weighInDate: shapeInput.weighInDate,
          limitKg: event.limitKg,
          startDate: input.startDate,
          startKg: input.startKg,
          preAcuteKg: input.preAcuteKg,
          acuteDays: input.acuteDays,
          path: input.path,
          thresholdPct,
          notes: input.notes,
          rehearsal: practice !== null,
          createdById: actor.userId,
        },
        warnings.map((w) => ({
          key: w.key,
          severity: w.severity,
          message: w.message,
          source: w.source,
          acknowledgedById: actor.userId,
          acknowledgedAt: at,
        })),
      ),
    );
    return this.getCut(athlete);
  }

  /**
   * After a weigh-in is logged: when the projection is over the limit, the coach and shared staff
   * hear once per weigh-in date (the notification_sends claim makes it once).
   */
  async notifyIfOver(athlete: AthleteWithPeople): Promise<LimitGapView | null> {
    if (athlete.eventType !== 'weigh_in') return null;
    const now = this.deps.clock();
    const gap =
      (await loadSnapshots(this.manager, [athlete], now)).get(athlete.id)?.figures.weighInGap ?? null;
    if (gap?.over) await this.deps.dataSource.transaction((m) => notifyOverLimit(m, athlete, gap));
    return gap;
  }
}
