import type { EntityManager, FindOptionsOrder, FindOptionsWhere, QueryDeepPartialEntity } from 'typeorm';
import type { ClientDayEntry } from '../entities/day-record.entity.js';

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

  countForDay(athleteId: string, date: string): Promise<number> {
    return this.manager.countBy(this.entity, this.where({ athleteId, localDate: date }));
  }

  /**
   * Inserts the entry unless the athlete already used its client id (ON CONFLICT DO NOTHING, so
   * a concurrent double submit waits for the first and then inserts nothing). Returns the new
   * row, or null when the client id was taken.
   */
  async insertUnlessDuplicate(values: QueryDeepPartialEntity<E>): Promise<E | null> {
    const result = await this.manager
      .createQueryBuilder()
      .insert()
      .into(this.entity)
      .values(values)
      .orIgnore()
      .returning(['id'])
      .execute();
    const row = (result.raw as { id: string }[])[0];
    if (!row) return null;
    return this.manager.findOneByOrFail(this.entity, this.where({ id: row.id }));
  }

  async update(id: string, changes: QueryDeepPartialEntity<E>): Promise<void> {
    await this.manager.update(this.entity, this.where({ id }), changes);
  }

  async remove(id: string): Promise<void> {
    await this.manager.delete(this.entity, this.where({ id }));
  }
}
