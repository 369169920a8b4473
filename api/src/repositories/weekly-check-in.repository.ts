import type { RatingKey } from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import type { User } from '../entities/user.entity.js';
import { WeeklyCheckIn } from '../entities/weekly-check-in.entity.js';

export type WeeklyCheckInWithReplier = WeeklyCheckIn & { repliedBy: User | null };

/** One evening's figures the weekly check-in averages. */
export interface WeeklyEveningRow {
  date: string;
  steps: number | null;
  sleepHours: number | null;
  ratings: Partial<Record<RatingKey, number | null>>;
}

/** For the review queue: per athlete, the check-ins not yet answered and whether the current one exists. */
export interface QueueCheckInRow {
  athleteId: string;
  dueDate: string;
  submittedAt: Date;
  repliedAt: Date | null;
}

/** Weekly check-ins and the week's evening logs and photos they sum up. */
export class WeeklyCheckInRepository {
  constructor(private readonly manager: EntityManager) {}

  findById(id: string): Promise<WeeklyCheckInWithReplier | null> {
    return this.manager.findOne(WeeklyCheckIn, {
      where: { id },
      relations: { repliedBy: true },
    }) as Promise<WeeklyCheckInWithReplier | null>;
  }

  /** The row locked for update inside the caller's transaction (two replies at once: one wins). */
  findByIdForUpdate(id: string): Promise<WeeklyCheckIn | null> {
    return this.manager.findOne(WeeklyCheckIn, { where: { id }, lock: { mode: 'pessimistic_write' } });
  }

  findByDueDate(athleteId: string, dueDate: string): Promise<WeeklyCheckInWithReplier | null> {
    return this.manager.findOne(WeeklyCheckIn, {
      where: { athleteId, dueDate },
      relations: { repliedBy: true },
    }) as Promise<WeeklyCheckInWithReplier | null>;
  }

  /** Newest due date first. */
  listForAthlete(athleteId: string, limit: number): Promise<WeeklyCheckInWithReplier[]> {
    return this.manager.find(WeeklyCheckIn, {
      where: { athleteId },
      relations: { repliedBy: true },
      order: { dueDate: 'DESC' },
      take: limit,
    }) as Promise<WeeklyCheckInWithReplier[]>;
  }

  async save(row: Partial<WeeklyCheckIn>): Promise<WeeklyCheckIn> {
    return this.manager.save(WeeklyCheckIn, this.manager.create(WeeklyCheckIn, row));
  }

  /**
   * Evening logs of athleteId in from..to, oldest first. One statement.
   */
  async evenings(athleteId: string, from: string, to: string): Promise<WeeklyEveningRow[]> {
    const rows = await this.manager.query<
      {
        date: string;
        steps: number | null;
        sleep_hours: number | null;
        ratings: WeeklyEveningRow['ratings'];
      }[]
    >(
      `SELECT local_date::text AS date, steps, sleep_hours, ratings
         FROM evening_logs
        WHERE athlete_id = $1 AND local_date BETWEEN $2 AND $3
        ORDER BY local_date`,
      [athleteId, from, to],
    );
    return rows.map((r) => ({ date: r.date, steps: r.steps, sleepHours: r.sleep_hours, ratings: r.ratings }));
  }

  /** Condition photos of athleteId in from..to (id and date), oldest first. */
  async photos(athleteId: string, from: string, to: string): Promise<{ id: string; date: string }[]> {
    return this.manager.query<{ id: string; date: string }[]>(
      `SELECT id, local_date::text AS date
         FROM condition_photos
        WHERE athlete_id = $1 AND local_date BETWEEN $2 AND $3
        ORDER BY local_date, created_at`,
      [athleteId, from, to],
    );
  }

  /**
   * For each athlete: its check-ins that are unanswered or due on the given date. One statement
   * whatever the number of athletes.
   */
  async forQueue(dueDates: ReadonlyMap<string, string>): Promise<QueueCheckInRow[]> {
    if (dueDates.size === 0) return [];
    const rows = await this.manager.query<
      { athlete_id: string; due_date: string; submitted_at: Date; replied_at: Date | null }[]
    >(
      `SELECT w.athlete_id, w.due_date::text AS due_date, w.submitted_at, w.replied_at
         FROM weekly_check_ins w
         JOIN unnest($1::uuid[], $2::date[]) AS p(athlete_id, due_date) ON p.athlete_id = w.athlete_id
        WHERE w.replied_at IS NULL OR w.due_date = p.due_date`,
      [[...dueDates.keys()], [...dueDates.values()]],
    );
    return rows.map((r) => ({
      athleteId: r.athlete_id,
      dueDate: r.due_date,
      submittedAt: r.submitted_at,
      repliedAt: r.replied_at,
    }));
  }
}
