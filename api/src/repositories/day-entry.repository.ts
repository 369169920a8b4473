import {
  In,
  type EntityManager,
  type FindOptionsOrder,
  type FindOptionsWhere,
  type QueryDeepPartialEntity,
} from 'typeorm';
import type { ClientDayEntry } from '../entities/day-record.entity.js';
import { hydrateRows } from './hydrate.js';

/** The queries every client-id day entry table (fluids, meals, supplements, symptoms) shares. */
export class DayEntryRepository<E extends ClientDayEntry> {
  constructor(
    private readonly manager: EntityManager,
    private readonly entity: new () => E,
  ) {}

  private where(w: Partial<Pick<ClientDayEntry, 'id' | 'athleteId' | 'clientId' | 'localDate'>>) {
    return w as FindOptionsWhere<E>;
  }

  findByClientId(athleteId: string, clientId: string): Promise<E | null> {
    return this.manager.findOneBy(this.entity, this.where({ athleteId, clientId }));
  }

  /** This athlete's entries with any of these client ids (a checklist's items): one statement. */
  findByClientIds(athleteId: string, clientIds: string[]): Promise<E[]> {
    if (clientIds.length === 0) return Promise.resolve([]);
    return this.manager.findBy(this.entity, { athleteId, clientId: In(clientIds) } as FindOptionsWhere<E>);
  }

  /** The entry only if it belongs to this athlete. */
  findForAthlete(id: string, athleteId: string): Promise<E | null> {
    return this.manager.findOneBy(this.entity, this.where({ id, athleteId }));
  }

  listForDay(athleteId: string, date: string): Promise<E[]> {
    return this.manager.find(this.entity, {
      where: this.where({ athleteId, localDate: date }),
      order: { localTime: 'ASC', createdAt: 'ASC' } as FindOptionsOrder<E>,
    });
  }

  /**
   * Inserts the entry in one statement unless the athlete already used its client id (ON
   * CONFLICT DO NOTHING, so a concurrent double submit waits for the first and then inserts
   * nothing) or the day already holds `perDay` entries of this kind. Returns the new row, or null
   * when nothing was inserted (the caller looks up which of the two it was).
   */
  async insertWithinDayLimit(values: QueryDeepPartialEntity<E>, perDay: number): Promise<E | null> {
    const metadata = this.manager.connection.getMetadata(this.entity);
    const driver = this.manager.connection.driver;
    const names: string[] = [];
    const params: unknown[] = [];
    for (const column of metadata.columns) {
      const value: unknown = column.getEntityValue(values);
      if (value === undefined) continue;
      names.push(driver.escape(column.databaseName));
      params.push(driver.preparePersistentValue(value, column));
    }
    const v = values as { athleteId?: string; localDate?: string };
    if (!v.athleteId || !v.localDate) throw new Error('an entry needs its athlete and date');
    const table = driver.escape(metadata.tableName);
    const at = params.length;
    params.push(v.athleteId, v.localDate, perDay);
    // INSERT … SELECT: the parameters take the types of the columns they fill.
    const rows = await this.manager.query<Record<string, unknown>[]>(
      `INSERT INTO ${table} (${names.join(', ')})
       SELECT ${names.map((_, i) => `$${i + 1}`).join(', ')}
        WHERE (SELECT count(*) FROM ${table} WHERE athlete_id = $${at + 1} AND local_date = $${at + 2}) < $${at + 3}
       ON CONFLICT DO NOTHING
       RETURNING *`,
      params,
    );
    return hydrateRows(this.manager, this.entity, rows)[0] ?? null;
  }

  /** Updates the entry if it belongs to this athlete; returns the stored row, or null. */
  async updateForAthlete(
    id: string,
    athleteId: string,
    changes: QueryDeepPartialEntity<E>,
  ): Promise<E | null> {
    const result = await this.manager
      .createQueryBuilder()
      .update(this.entity)
      .set(changes)
      .where('id = :id AND athlete_id = :athleteId', { id, athleteId })
      .returning('*')
      .execute();
    return hydrateRows(this.manager, this.entity, result.raw as Record<string, unknown>[])[0] ?? null;
  }

  /** Deletes the entry if it belongs to this athlete; false when there was none. */
  async removeForAthlete(id: string, athleteId: string): Promise<boolean> {
    const result = await this.manager
      .createQueryBuilder()
      .delete()
      .from(this.entity)
      .where('id = :id AND athlete_id = :athleteId', { id, athleteId })
      .execute();
    return (result.affected ?? 0) > 0;
  }
}
