import type { EntityManager } from 'typeorm';
import { WeighIn } from '../entities/weigh-in.entity.js';

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

  /** Inserts the day's weigh-in or replaces it (one statement, so two at once cannot both insert). */
  async upsert(values: WeighInValues): Promise<void> {
    await this.manager
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
      .execute();
  }

  async removeForDay(athleteId: string, date: string): Promise<void> {
    await this.manager.delete(WeighIn, { athleteId, localDate: date });
  }
}
