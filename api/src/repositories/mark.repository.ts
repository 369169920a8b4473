import { In, type EntityManager } from 'typeorm';
import { Mark } from '../entities/mark.entity.js';
import { MarkRead } from '../entities/mark-read.entity.js';
import { MarkReply } from '../entities/mark-reply.entity.js';
import type { User } from '../entities/user.entity.js';

export type MarkWithAuthor = Mark & { author: User };
export type MarkReplyWithAuthor = MarkReply & { author: User };

/** A mark with everything its view needs: author, replies (oldest first, with authors), every reader's read row. */
export interface MarkThread {
  mark: MarkWithAuthor;
  replies: MarkReplyWithAuthor[];
  reads: MarkRead[];
}

export interface NewMark {
  athleteId: string;
  authorId: string;
  metric: Mark['metric'];
  fromDate: string;
  toDate: string;
  note: string;
  /** Default: now (the database's). The seed passes past instants. */
  createdAt?: Date;
}

export interface NewMarkReply {
  markId: string;
  authorId: string;
  body: string;
  /** Default: now (the database's). The seed passes past instants. */
  createdAt?: Date;
}

/** Marks on athletes' charts, their replies and read state. */
export class MarkRepository {
  constructor(private readonly manager: EntityManager) {}

  /**
   * The athlete's marks overlapping `from..to` (either end open), newest first, as threads.
   * Three queries whatever the count: marks, replies, reads.
   */
  async listThreads(athleteId: string, range: { from?: string; to?: string } = {}): Promise<MarkThread[]> {
    const query = this.manager
      .createQueryBuilder(Mark, 'm')
      .innerJoinAndSelect('m.author', 'author')
      .where('m.athleteId = :athleteId', { athleteId })
      .orderBy('m.createdAt', 'DESC')
      .addOrderBy('m.id', 'DESC');
    if (range.to) query.andWhere('m.fromDate <= :to', { to: range.to });
    if (range.from) query.andWhere('m.toDate >= :from', { from: range.from });
    const marks = (await query.getMany()) as MarkWithAuthor[];
    return this.threadsFor(marks);
  }

  /** One mark as a thread (null when there is none). */
  async findThread(markId: string): Promise<MarkThread | null> {
    const mark = await this.findById(markId);
    if (!mark) return null;
    const [thread] = await this.threadsFor([mark]);
    return thread ?? null;
  }

  /** The mark with its author, without replies (what the routes authorize against). */
  findById(markId: string): Promise<MarkWithAuthor | null> {
    return this.manager.findOne(Mark, {
      where: { id: markId },
      relations: { author: true },
    }) as Promise<MarkWithAuthor | null>;
  }

  async create(input: NewMark): Promise<Mark> {
    const { createdAt, ...fields } = input;
    return this.manager.save(
      this.manager.create(Mark, { ...fields, ...(createdAt ? { createdAt, updatedAt: createdAt } : {}) }),
    );
  }

  /** `at` becomes updated_at (given, or TypeORM would write the database's now). */
  async updateNote(markId: string, note: string, at: Date): Promise<void> {
    await this.manager.update(Mark, { id: markId }, { note, updatedAt: at });
  }

  /** Deletes the mark; its replies and reads cascade. */
  async delete(markId: string): Promise<void> {
    await this.manager.delete(Mark, { id: markId });
  }

  async addReply(input: NewMarkReply): Promise<MarkReply> {
    const { createdAt, ...fields } = input;
    return this.manager.save(
      this.manager.create(MarkReply, {
        ...fields,
        ...(createdAt ? { createdAt, updatedAt: createdAt } : {}),
      }),
    );
  }

  /**
   * Records that `userId` read the mark's thread at `at`: one row per mark and reader, moved
   * forward, never back (two requests racing keep the later instant).
   */
  async upsertRead(markId: string, userId: string, at: Date): Promise<void> {
    // The row's own timestamps come from the caller's clock too (the app's pinned clock in tests,
    // the seed's now in the demo), not from the database's.
    await this.manager.query(
      `INSERT INTO "mark_reads" ("mark_id", "user_id", "read_at", "created_at", "updated_at")
       VALUES ($1, $2, $3, $3, $3)
       ON CONFLICT ("mark_id", "user_id") DO UPDATE
         SET "read_at" = GREATEST("mark_reads"."read_at", EXCLUDED."read_at"),
             "updated_at" = EXCLUDED."updated_at"`,
      [markId, userId, at],
    );
  }

  /**
   * athlete id → the replies by someone other than the viewer that are newer than the viewer's
   * read of their mark (every such reply when the viewer never read it): how many, and the newest
   * one's time. Athletes with none are absent. One query.
   */
  async unreadRepliesByAthlete(
    viewerUserId: string,
    athleteIds: string[],
  ): Promise<Map<string, { count: number; latestAt: Date }>> {
    const map = new Map<string, { count: number; latestAt: Date }>();
    if (athleteIds.length === 0) return map;
    const rows = await this.manager.query<{ athlete_id: string; count: number; latest_at: Date }[]>(
      `SELECT m."athlete_id", COUNT(*)::int AS "count", MAX(r."created_at") AS "latest_at"
       FROM "mark_replies" r
       JOIN "marks" m ON m."id" = r."mark_id"
       LEFT JOIN "mark_reads" mr ON mr."mark_id" = r."mark_id" AND mr."user_id" = $1
       WHERE m."athlete_id" = ANY($2::uuid[])
         AND r."author_id" <> $1
         AND (mr."read_at" IS NULL OR r."created_at" > mr."read_at")
       GROUP BY m."athlete_id"`,
      [viewerUserId, athleteIds],
    );
    for (const row of rows) map.set(row.athlete_id, { count: row.count, latestAt: row.latest_at });
    return map;
  }

  private async threadsFor(marks: MarkWithAuthor[]): Promise<MarkThread[]> {
    if (marks.length === 0) return [];
    const ids = marks.map((m) => m.id);
    const [replies, reads] = await Promise.all([
      this.manager.find(MarkReply, {
        where: { markId: In(ids) },
        relations: { author: true },
        order: { createdAt: 'ASC', id: 'ASC' },
      }) as Promise<MarkReplyWithAuthor[]>,
      this.manager.find(MarkRead, { where: { markId: In(ids) } }),
    ]);
    const repliesByMark = new Map<string, MarkReplyWithAuthor[]>();
    for (const reply of replies) {
      const list = repliesByMark.get(reply.markId) ?? [];
      list.push(reply);
      repliesByMark.set(reply.markId, list);
    }
    const readsByMark = new Map<string, MarkRead[]>();
    for (const read of reads) {
      const list = readsByMark.get(read.markId) ?? [];
      list.push(read);
      readsByMark.set(read.markId, list);
    }
    return marks.map((mark) => ({
      mark,
      replies: repliesByMark.get(mark.id) ?? [],
      reads: readsByMark.get(mark.id) ?? [],
    }));
  }
}
