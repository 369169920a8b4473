import type { EntityManager } from 'typeorm';
import { WeighIn } from '../entities/weigh-in.entity.js';
import { hydrateRows } from './hydrate.js';

export type WeighInValues = Pick<
  WeighIn,
  | 'athleteId'
  | 'localDate'
  | 'localTime'
  | 'loggedAt'
  | 'weightKg'
  | 'enteredValue'
  | 'enteredUnit'
  | 'protocolConfirmed'
  | 'tags'
  | 'cyclePhase'
>;

export class WeighInRepository {
  constructor(private readonly manager: EntityManager) {}

  findForDay(athleteId: string, date: string): Promise<WeighIn | null> {
    return this.manager.findOneBy(WeighIn, { athleteId, localDate: date });
  }

  /** The weigh-ins between two local dates (inclusive), oldest first, as date and kg. */
  async listBetween(athleteId: string, from: string, to: string): Promise<{ date: string; kg: number }[]> {
    // local_date::text keeps dates as YYYY-MM-DD strings.
    return this.manager.query<{ date: string; kg: number }[]>(
      `SELECT local_date::text AS date, weight_kg AS kg FROM weigh_ins
        WHERE athlete_id = $1 AND local_date BETWEEN $2 AND $3 ORDER BY local_date`,
      [athleteId, from, to],
    );
  }

  /** Whether the athlete has ever weighed in. */
  existsFor(athleteId: string): Promise<boolean> {
    return this.manager.existsBy(WeighIn, { athleteId });
  }

  /**
   * Inserts the day's weigh-in or replaces it (one statement, so two at once cannot both insert);
   * returns the stored row.
   */
  async upsert(values: WeighInValues): Promise<WeighIn> {
    const result = await this.manager
      .createQueryBuilder()
      .insert()
      .into(WeighIn)
      .values(values)
      .orUpdate(
        [
          'local_time',
          'logged_at',
          'weight_kg',
          'entered_value',
          'entered_unit',
          'protocol_confirmed',
          'tags',
          'cycle_phase',
          'updated_at',
        ],
        ['athlete_id', 'local_date'],
      )
      .returning('*')
      .execute();
    const [row] = hydrateRows(this.manager, WeighIn, result.raw as Record<string, unknown>[]);
    if (!row) throw new Error('weigh-in upsert returned no row');
    return row;
  }

  async removeForDay(athleteId: string, date: string): Promise<void> {
    await this.manager.delete(WeighIn, { athleteId, localDate: date });
  }
}
