import {
  LIMITS,
  RATING_KEYS,
  weightToKg,
  type DayView,
  type EveningRequest,
  type WeighInRequest,
} from '@driftmark/shared';
import type { DataSource, QueryDeepPartialEntity } from 'typeorm';
import type { ClientDayEntry } from '../entities/day-record.entity.js';
import type { Ratings } from '../entities/evening-log.entity.js';
import { notFound, validationFailed } from '../errors.js';
import { futureEntryProblem, localInstant } from '../lib/local-time.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { DayEntryRepository } from '../repositories/day-entry.repository.js';
import { EveningLogRepository } from '../repositories/evening-log.repository.js';
import { WeighInRepository } from '../repositories/weigh-in.repository.js';
import type { EntryContext, EntryKind } from './day-entry-kinds.js';
import { readerOf } from '../lib/reader.js';
import { loadDayView } from './day.service.js';
import { CutService } from './cut.service.js';

export interface EntryResult {
  day: DayView;
  /** False when the client id had been used: the first entry is returned, nothing is added. */
  created: boolean;
  meta?: Record<string, string>;
}

type CheckInDeps = { dataSource: DataSource; clock: () => Date };

const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

/** Writes to an athlete's days. The caller has authorized `log` on the athlete. */
export class CheckInService {
  constructor(private readonly deps: CheckInDeps) {}

  private assertNotFuture(athlete: AthleteWithPeople, date: string, time: string | null, now: Date) {
    const problem = futureEntryProblem({ date, time }, athlete.user.timeZone, now);
    if (problem) throw validationFailed(problem);
  }

  private day(athlete: AthleteWithPeople, date: string, now: Date): Promise<DayView> {
    // Only the athlete logs their own days, so the athlete reads the answer.
    return loadDayView(this.deps.dataSource.manager, athlete, date, now, readerOf(athlete.user, athlete));
  }

  /** Replaces the day's weigh-in (kg stored, the typed value and unit kept). */
  async putWeighIn(athlete: AthleteWithPeople, date: string, input: WeighInRequest): Promise<DayView> {
    const now = this.deps.clock();
    this.assertNotFuture(athlete, date, input.time, now);
    await new WeighInRepository(this.deps.dataSource.manager).upsert({
      athleteId: athlete.id,
      localDate: date,
      localTime: input.time,
      loggedAt: localInstant(date, input.time, athlete.user.timeZone),
      weightKg: weightToKg(input.weight, input.unit),
      enteredValue: input.weight,
      enteredUnit: input.unit,
      protocolConfirmed: input.protocolConfirmed,
      tags: [...new Set(input.tags)],
      cyclePhase: input.cyclePhase ?? null,
    });
    // A weigh-in moves the projection: the coach hears once when it first crosses above the limit.
    await new CutService(this.deps).notifyIfOver(athlete);
    return this.day(athlete, date, now);
  }

  async deleteWeighIn(athlete: AthleteWithPeople, date: string): Promise<DayView> {
    await new WeighInRepository(this.deps.dataSource.manager).removeForDay(athlete.id, date);
    return this.day(athlete, date, this.deps.clock());
  }

  /**
   * Saves the evening card. Fields left out keep what was saved (the card fills up through the
   * evening); null clears one. Ratings merge the same way, key by key.
   */
  async putEvening(athlete: AthleteWithPeople, date: string, input: EveningRequest): Promise<DayView> {
    const now = this.deps.clock();
    this.assertNotFuture(athlete, date, null, now);
    const repo = new EveningLogRepository(this.deps.dataSource.manager);
    const saved = await repo.findForDay(athlete.id, date);
    const pick = <T>(value: T | undefined, stored: T | null | undefined): T | null =>
      value !== undefined ? value : (stored ?? null);
    const ratings: Ratings = { ...saved?.ratings };
    for (const key of RATING_KEYS) {
      const value = input.ratings[key];
      if (value !== undefined) ratings[key] = value;
    }
    await repo.upsert({
      athleteId: athlete.id,
      localDate: date,
      steps: pick(input.steps, saved?.steps),
      sleepHours: pick(input.sleepHours, saved?.sleepHours),
      cardioMinutes: pick(input.cardioMinutes, saved?.cardioMinutes),
      trainingDone: pick(input.trainingDone, saved?.trainingDone),
      trainingNote: pick(input.trainingNote === '' ? null : input.trainingNote, saved?.trainingNote),
      ratings,
      note: pick(input.note === '' ? null : input.note, saved?.note),
    });
    return this.day(athlete, date, now);
  }

  async deleteEvening(athlete: AthleteWithPeople, date: string): Promise<DayView> {
    await new EveningLogRepository(this.deps.dataSource.manager).removeForDay(athlete.id, date);
    return this.day(athlete, date, this.deps.clock());
  }

  /**
   * Creates an entry on `date`, idempotently: a client id the athlete already used returns the
   * first entry (`created: false`) whatever the body says, also when both requests race (the
   * insert is ON CONFLICT DO NOTHING and the loser reads the winner's row). One transaction, so
   * an urgent symptom report and its flag commit together.
   */
  async createEntry<E extends ClientDayEntry, I extends { clientId: string; time: string }>(
    kind: EntryKind<E, I>,
    athlete: AthleteWithPeople,
    date: string,
    input: I,
  ): Promise<EntryResult> {
    const now = this.deps.clock();
    const { entry, created } = await this.deps.dataSource.transaction(async (manager) => {
      const repo = new DayEntryRepository(manager, kind.entity);
      const first = await repo.findByClientId(athlete.id, input.clientId);
      if (first) return { entry: first, created: false };

      this.assertNotFuture(athlete, date, input.time, now);
      if ((await repo.countForDay(athlete.id, date)) >= LIMITS.entriesPerDay) {
        throw validationFailed({ date: `At most ${LIMITS.entriesPerDay} ${kind.plural} a day` });
      }
      const ctx: EntryContext = { manager, athlete, previous: null };
      const inserted = await repo.insertUnlessDuplicate({
        ...(await kind.columns(input, ctx)),
        athleteId: athlete.id,
        localDate: date,
        localTime: input.time,
        loggedAt: localInstant(date, input.time, athlete.user.timeZone),
        clientId: input.clientId,
      } as QueryDeepPartialEntity<E>);
      if (!inserted) {
        const winner = await repo.findByClientId(athlete.id, input.clientId);
        if (!winner) throw new Error('client id conflict without a row');
        return { entry: winner, created: false };
      }
      await kind.afterSave?.(inserted, ctx);
      return { entry: inserted, created: true };
    });
    const meta = kind.meta?.(entry);
    return { day: await this.day(athlete, entry.localDate, now), created, ...(meta ? { meta } : {}) };
  }

  /**
   * Edits an entry of this athlete (404 for anyone else's id). The body holds the fields to
   * change; they are laid over the stored entry and the whole is checked with the create schema.
   * A meal switching between macros and a food takes only time and name from before.
   */
  async updateEntry<E extends ClientDayEntry, I extends { clientId: string; time: string }>(
    kind: EntryKind<E, I>,
    athlete: AthleteWithPeople,
    entryId: string,
    body: unknown,
  ): Promise<Omit<EntryResult, 'created'>> {
    if (!isPlainObject(body)) throw validationFailed({}, 'Send the fields to change as a JSON object.');
    const now = this.deps.clock();
    const entry = await this.deps.dataSource.transaction(async (manager) => {
      const repo = new DayEntryRepository(manager, kind.entity);
      const stored = await repo.findForAthlete(entryId, athlete.id);
      if (!stored) throw notFound();
      let base = kind.asInput(stored);
      if (kind.path === 'meals' && 'source' in body && body.source !== base.source) {
        base = { time: base.time, name: base.name };
      }
      const input = kind.schema.parse({ ...base, ...body, clientId: stored.clientId });
      this.assertNotFuture(athlete, stored.localDate, input.time, now);
      const ctx: EntryContext = { manager, athlete, previous: stored };
      await repo.update(stored.id, {
        ...(await kind.columns(input, ctx)),
        localTime: input.time,
        loggedAt: localInstant(stored.localDate, input.time, athlete.user.timeZone),
      } as QueryDeepPartialEntity<E>);
      const updated = await repo.findForAthlete(stored.id, athlete.id);
      if (!updated) throw notFound();
      await kind.afterSave?.(updated, ctx);
      return updated;
    });
    const meta = kind.meta?.(entry);
    return { day: await this.day(athlete, entry.localDate, now), ...(meta ? { meta } : {}) };
  }

  /** Deletes an entry of this athlete (404 for anyone else's id); answers with its day. */
  async deleteEntry<E extends ClientDayEntry, I extends { clientId: string; time: string }>(
    kind: EntryKind<E, I>,
    athlete: AthleteWithPeople,
    entryId: string,
  ): Promise<DayView> {
    const repo = new DayEntryRepository(this.deps.dataSource.manager, kind.entity);
    const stored = await repo.findForAthlete(entryId, athlete.id);
    if (!stored) throw notFound();
    await repo.remove(stored.id);
    return this.day(athlete, stored.localDate, this.deps.clock());
  }
}
