import { LIMITS, RATING_KEYS, weightToKg, type EveningRequest, type WeighInRequest } from '@driftmark/shared';
import type { DataSource, EntityManager, QueryDeepPartialEntity } from 'typeorm';
import type { ClientDayEntry } from '../entities/day-record.entity.js';
import type { EveningLog, Ratings } from '../entities/evening-log.entity.js';
import type { WeighIn } from '../entities/weigh-in.entity.js';
import { notFound, validationFailed } from '../errors.js';
import { futureEntryProblem, localInstant } from '../lib/local-time.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { DayEntryRepository } from '../repositories/day-entry.repository.js';
import { EveningLogRepository } from '../repositories/evening-log.repository.js';
import { WeighInRepository } from '../repositories/weigh-in.repository.js';
import type { EntryContext, EntryKind } from './day-entry-kinds.js';
import { CutService } from './cut.service.js';

export interface EntryResult<E> {
  entry: E;
  /** False when the client id had been used: the first entry is returned, nothing is added. */
  created: boolean;
  meta?: Record<string, string>;
}

type CheckInDeps = { dataSource: DataSource; clock: () => Date };

const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

/**
 * Writes to an athlete's days. The caller has authorized `log` on the athlete. Each write answers
 * with the row it wrote, never the day view: the day's totals and verdicts are the day view's
 * (`GET …/days/:date`), which the client fetches again after a write.
 */
export class CheckInService {
  constructor(private readonly deps: CheckInDeps) {}

  private assertNotFuture(athlete: AthleteWithPeople, date: string, time: string | null, now: Date) {
    const problem = futureEntryProblem({ date, time }, athlete.user.timeZone, now);
    if (problem) throw validationFailed(problem);
  }

  /** Replaces the day's weigh-in (kg stored, the typed value and unit kept): one statement. */
  async putWeighIn(athlete: AthleteWithPeople, date: string, input: WeighInRequest): Promise<WeighIn> {
    this.assertNotFuture(athlete, date, input.time, this.deps.clock());
    const saved = await new WeighInRepository(this.deps.dataSource.manager).upsert({
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
    // A weigh-in moves the projection: the coach hears once when it first crosses above the limit
    // (athletes with a weigh-in only; the others' write stays one statement).
    await new CutService(this.deps).notifyIfOver(athlete);
    return saved;
  }

  async deleteWeighIn(athlete: AthleteWithPeople, date: string): Promise<void> {
    await new WeighInRepository(this.deps.dataSource.manager).removeForDay(athlete.id, date);
  }

  /**
   * Saves the evening card. Fields left out keep what was saved (the card fills up through the
   * evening); null clears one. Ratings merge the same way, key by key.
   */
  async putEvening(athlete: AthleteWithPeople, date: string, input: EveningRequest): Promise<EveningLog> {
    this.assertNotFuture(athlete, date, null, this.deps.clock());
    const repo = new EveningLogRepository(this.deps.dataSource.manager);
    const saved = await repo.findForDay(athlete.id, date);
    const pick = <T>(value: T | undefined, stored: T | null | undefined): T | null =>
      value !== undefined ? value : (stored ?? null);
    const ratings: Ratings = { ...saved?.ratings };
    for (const key of RATING_KEYS) {
      const value = input.ratings[key];
      if (value !== undefined) ratings[key] = value;
    }
    return repo.upsert({
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
  }

  async deleteEvening(athlete: AthleteWithPeople, date: string): Promise<void> {
    await new EveningLogRepository(this.deps.dataSource.manager).removeForDay(athlete.id, date);
  }

  /**
   * Runs `work` in a transaction when the kind writes more than its row (an urgent symptom
   * report and its flag commit together), else straight on the pool: one insert needs none.
   */
  private write<E extends ClientDayEntry, I extends { clientId: string; time: string }, T>(
    kind: EntryKind<E, I>,
    work: (manager: EntityManager) => Promise<T>,
    input?: I,
  ): Promise<T> {
    const { dataSource } = this.deps;
    const needed = kind.afterSave && (input === undefined || (kind.transactional?.(input) ?? true));
    return needed ? dataSource.transaction(work) : work(dataSource.manager);
  }

  /**
   * Creates an entry on `date`, idempotently: a client id the athlete already used returns the
   * first entry (`created: false`) whatever the body says, also when both requests race (the
   * insert is ON CONFLICT DO NOTHING and the loser reads the winner's row). The day's limit is
   * checked by the insert itself, so a fluid is one statement.
   */
  async createEntry<E extends ClientDayEntry, I extends { clientId: string; time: string }>(
    kind: EntryKind<E, I>,
    athlete: AthleteWithPeople,
    date: string,
    input: I,
  ): Promise<EntryResult<E>> {
    const now = this.deps.clock();
    const { entry, created } = await this.write(
      kind,
      async (manager) => {
        const repo = new DayEntryRepository(manager, kind.entity);
        const replay = async () => {
          const first = await repo.findByClientId(athlete.id, input.clientId);
          if (first) await kind.load?.([first], manager);
          return first ? { entry: first, created: false } : null;
        };
        const problem = futureEntryProblem({ date, time: input.time }, athlete.user.timeZone, now);
        if (problem) {
          const first = await replay();
          if (first) return first;
          throw validationFailed(problem);
        }
        const ctx: EntryContext = { manager, athlete, previous: null };
        const inserted = await repo.insertWithinDayLimit(
          {
            ...(await kind.columns(input, ctx)),
            athleteId: athlete.id,
            localDate: date,
            localTime: input.time,
            loggedAt: localInstant(date, input.time, athlete.user.timeZone),
            clientId: input.clientId,
          } as QueryDeepPartialEntity<E>,
          LIMITS.entriesPerDay,
        );
        if (!inserted) {
          // Either the client id was taken (return its entry) or the day is full.
          const first = await replay();
          if (first) return first;
          throw validationFailed({ date: `At most ${LIMITS.entriesPerDay} ${kind.plural} a day` });
        }
        await kind.afterSave?.(inserted, ctx);
        return { entry: inserted, created: true };
      },
      input,
    );
    const meta = kind.meta?.(entry);
    return { entry, created, ...(meta ? { meta } : {}) };
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
  ): Promise<Omit<EntryResult<E>, 'created'>> {
    if (!isPlainObject(body)) throw validationFailed({}, 'Send the fields to change as a JSON object.');
    const now = this.deps.clock();
    const entry = await this.write(kind, async (manager) => {
      const repo = new DayEntryRepository(manager, kind.entity);
      const stored = await repo.findForAthlete(entryId, athlete.id);
      if (!stored) throw notFound();
      await kind.load?.([stored], manager);
      let base = kind.asInput(stored);
      if (kind.path === 'meals' && 'source' in body && body.source !== base.source) {
        base = { time: base.time, name: base.name };
      }
      const input = kind.schema.parse({ ...base, ...body, clientId: stored.clientId });
      this.assertNotFuture(athlete, stored.localDate, input.time, now);
      const ctx: EntryContext = { manager, athlete, previous: stored };
      const updated = await repo.updateForAthlete(stored.id, athlete.id, {
        ...(await kind.columns(input, ctx)),
        localTime: input.time,
        loggedAt: localInstant(stored.localDate, input.time, athlete.user.timeZone),
      } as QueryDeepPartialEntity<E>);
      if (!updated) throw notFound();
      await kind.afterSave?.(updated, ctx);
      return updated;
    });
    const meta = kind.meta?.(entry);
    return { entry, ...(meta ? { meta } : {}) };
  }

  /** Deletes an entry of this athlete (404 for anyone else's id): one statement. */
  async deleteEntry<E extends ClientDayEntry, I extends { clientId: string; time: string }>(
    kind: EntryKind<E, I>,
    athlete: AthleteWithPeople,
    entryId: string,
  ): Promise<void> {
    const repo = new DayEntryRepository(this.deps.dataSource.manager, kind.entity);
    if (!(await repo.removeForAthlete(entryId, athlete.id))) throw notFound();
  }
}
