import {
  Between,
  LessThanOrEqual,
  MoreThanOrEqual,
  type EntityManager,
  type FindOptionsWhere,
} from 'typeorm';
import { ConditionPhoto } from '../entities/condition-photo.entity.js';

export type NewConditionPhoto = Pick<
  ConditionPhoto,
  | 'athleteId'
  | 'localDate'
  | 'pose'
  | 'width'
  | 'height'
  | 'thumbKey'
  | 'displayKey'
  | 'contentType'
  | 'bytes'
  | 'contentHash'
>;

export interface PhotoFilter {
  pose?: string;
  from?: string;
  to?: string;
}

/** Newest day first; within a day, in upload order. */
const ORDER = { localDate: 'DESC', createdAt: 'ASC', id: 'ASC' } as const;

export class PhotoRepository {
  constructor(private readonly manager: EntityManager) {}

  findById(id: string): Promise<ConditionPhoto | null> {
    return this.manager.findOneBy(ConditionPhoto, { id });
  }

  /** An athlete's photos, optionally of one pose and within dates (inclusive), at most `limit`. */
  list(athleteId: string, filter: PhotoFilter = {}, limit = 1000): Promise<ConditionPhoto[]> {
    const where: FindOptionsWhere<ConditionPhoto> = { athleteId };
    if (filter.pose !== undefined) where.pose = filter.pose;
    if (filter.from !== undefined && filter.to !== undefined)
      where.localDate = Between(filter.from, filter.to);
    else if (filter.from !== undefined) where.localDate = MoreThanOrEqual(filter.from);
    else if (filter.to !== undefined) where.localDate = LessThanOrEqual(filter.to);
    return this.manager.find(ConditionPhoto, { where, order: ORDER, take: limit });
  }

  /** The photos of one day (for the day view), in upload order. */
  listForDay(athleteId: string, date: string): Promise<ConditionPhoto[]> {
    return this.manager.find(ConditionPhoto, {
      where: { athleteId, localDate: date },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
  }

  /** date → number of photos, for day summaries over a range. */
  async countByDay(athleteId: string, from: string, to: string): Promise<Map<string, number>> {
    const rows = await this.manager
      .createQueryBuilder(ConditionPhoto, 'p')
      .select(`to_char(p.local_date, 'YYYY-MM-DD')`, 'date')
      .addSelect('COUNT(*)::int', 'count')
      .where('p.athlete_id = :athleteId', { athleteId })
      .andWhere('p.local_date BETWEEN :from AND :to', { from, to })
      .groupBy('p.local_date')
      .getRawMany<{ date: string; count: number }>();
    return new Map(rows.map((r) => [r.date, r.count]));
  }

  /** Photos already stored for this day and pose with one of these content hashes. */
  findExisting(
    athleteId: string,
    localDate: string,
    pose: string,
    hashes: string[],
  ): Promise<ConditionPhoto[]> {
    if (hashes.length === 0) return Promise.resolve([]);
    return this.manager
      .createQueryBuilder(ConditionPhoto, 'p')
      .where('p.athlete_id = :athleteId', { athleteId })
      .andWhere('p.local_date = :localDate', { localDate })
      .andWhere('p.pose = :pose', { pose })
      .andWhere('p.content_hash IN (:...hashes)', { hashes })
      .getMany();
  }

  async insertMany(rows: NewConditionPhoto[]): Promise<ConditionPhoto[]> {
    if (rows.length === 0) return [];
    return this.manager.save(rows.map((r) => this.manager.create(ConditionPhoto, r)));
  }

  async delete(id: string): Promise<void> {
    await this.manager.delete(ConditionPhoto, { id });
  }

  /** Which of these storage keys a photo row names (as its thumb or its display size). */
  async claimedKeys(keys: readonly string[]): Promise<Set<string>> {
    if (keys.length === 0) return new Set();
    const rows: { key: string }[] = await this.manager.query(
      `SELECT thumb_key AS key FROM condition_photos WHERE thumb_key = ANY($1)
       UNION SELECT display_key FROM condition_photos WHERE display_key = ANY($1)`,
      [keys],
    );
    return new Set(rows.map((r) => r.key));
  }

  /**
   * The stored keys of up to `limit` photos after `afterId` in id order (the photo migration's
   * pages: resumable, and never reading the whole table at once).
   */
  async keysPage(
    afterId: string | null,
    limit: number,
  ): Promise<{ id: string; thumbKey: string; displayKey: string }[]> {
    return this.manager.query(
      `SELECT id, thumb_key AS "thumbKey", display_key AS "displayKey" FROM condition_photos
       WHERE ($1::uuid IS NULL OR id > $1::uuid) ORDER BY id LIMIT $2`,
      [afterId, limit],
    );
  }
}
