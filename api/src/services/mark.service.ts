import {
  MARK_LIMITS,
  type CreateMarkRequest,
  type CreateReplyRequest,
  type ListMarksQuery,
  type MarkView,
  type UpdateMarkRequest,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { User } from '../entities/user.entity.js';
import { notFound, validationFailed } from '../errors.js';
import { daysBetween } from '../lib/dates.js';
import type { Actor } from '../policies/actor.js';
import { presentMark } from '../presenters/mark.presenter.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { MarkRepository, type MarkWithAuthor } from '../repositories/mark.repository.js';
import { notifyMarkCreated, notifyMarkReply } from './notify.service.js';

type MarkDeps = { dataSource: DataSource; clock: () => Date };

/**
 * Marks on an athlete's charts and their threads. Every write takes its instant from the clock
 * (not the database's now), so read state compares like with like; writing a mark or a reply also
 * marks the thread read for its author.
 */
export class MarkService {
  constructor(private readonly deps: MarkDeps) {}

  private get manager(): EntityManager {
    return this.deps.dataSource.manager;
  }

  /** The athlete's marks overlapping `from..to` (either end open), newest first, as `actor` sees them. */
  async list(actor: Actor, athlete: AthleteWithPeople, query: ListMarksQuery): Promise<MarkView[]> {
    if (query.from && query.to && query.to < query.from) {
      throw validationFailed({ to: 'Must be on or after the start date' });
    }
    const threads = await new MarkRepository(this.manager).listThreads(athlete.id, query);
    return threads.map((t) => presentMark(t, { userId: actor.userId, athleteUserId: athlete.userId }));
  }

  /** Pins a mark (at most MARK_LIMITS.rangeDays days, counted inclusively). */
  async create(actor: Actor, athlete: AthleteWithPeople, input: CreateMarkRequest): Promise<MarkView> {
    if (daysBetween(input.fromDate, input.toDate) + 1 > MARK_LIMITS.rangeDays) {
      throw validationFailed({ toDate: `A mark spans at most ${MARK_LIMITS.rangeDays} days` });
    }
    const now = this.deps.clock();
    const id = await this.deps.dataSource.transaction(async (manager) => {
      const marks = new MarkRepository(manager);
      const mark = await marks.create({
        athleteId: athlete.id,
        authorId: actor.userId,
        metric: input.metric,
        fromDate: input.fromDate,
        toDate: input.toDate,
        note: input.note,
        createdAt: now,
      });
      await marks.upsertRead(mark.id, actor.userId, now);
      const author = await manager.findOneByOrFail(User, { id: actor.userId });
      await notifyMarkCreated(manager, athlete, { ...mark, note: input.note }, author);
      return mark.id;
    });
    return this.view(actor, athlete, id);
  }

  async update(
    actor: Actor,
    athlete: AthleteWithPeople,
    mark: MarkWithAuthor,
    input: UpdateMarkRequest,
  ): Promise<MarkView> {
    const now = this.deps.clock();
    await this.deps.dataSource.transaction(async (manager) => {
      const marks = new MarkRepository(manager);
      await marks.updateNote(mark.id, input.note, now);
      await marks.upsertRead(mark.id, actor.userId, now);
    });
    return this.view(actor, athlete, mark.id);
  }

  /** Deletes the mark with its replies and read state. */
  async delete(mark: MarkWithAuthor): Promise<void> {
    await new MarkRepository(this.manager).delete(mark.id);
  }

  async reply(
    actor: Actor,
    athlete: AthleteWithPeople,
    mark: MarkWithAuthor,
    input: CreateReplyRequest,
  ): Promise<MarkView> {
    const now = this.deps.clock();
    await this.deps.dataSource.transaction(async (manager) => {
      const marks = new MarkRepository(manager);
      await marks.addReply({ markId: mark.id, authorId: actor.userId, body: input.body, createdAt: now });
      await marks.upsertRead(mark.id, actor.userId, now);
      const replier = await manager.findOneByOrFail(User, { id: actor.userId });
      await notifyMarkReply(manager, athlete, mark, { authorId: actor.userId, body: input.body }, replier);
    });
    return this.view(actor, athlete, mark.id);
  }

  /** The whole thread counts as read by `actor` from now. */
  async markRead(actor: Actor, athlete: AthleteWithPeople, mark: MarkWithAuthor): Promise<MarkView> {
    await new MarkRepository(this.manager).upsertRead(mark.id, actor.userId, this.deps.clock());
    return this.view(actor, athlete, mark.id);
  }

  private async view(actor: Actor, athlete: AthleteWithPeople, markId: string): Promise<MarkView> {
    const thread = await new MarkRepository(this.manager).findThread(markId);
    // Deleted in between by its author: the same answer as any mark that is not there.
    if (!thread) throw notFound();
    return presentMark(thread, { userId: actor.userId, athleteUserId: athlete.userId });
  }
}
