import type { EntityManager } from 'typeorm';
import { EveningLog } from '../entities/evening-log.entity.js';
import { hydrateRows } from './hydrate.js';

export type EveningValues = Pick<
  EveningLog,
  | 'athleteId'
  | 'localDate'
  | 'steps'
  | 'sleepHours'
  | 'cardioMinutes'
  | 'trainingDone'
  | 'trainingNote'
  | 'ratings'
  | 'note'
>;

export class EveningLogRepository {
  constructor(private readonly manager: EntityManager) {}

  findForDay(athleteId: string, date: string): Promise<EveningLog | null> {
    return this.manager.findOneBy(EveningLog, { athleteId, localDate: date });
  }

  /** Inserts the day's evening log or replaces it; returns the stored row. */
  async upsert(values: EveningValues): Promise<EveningLog> {
    const result = await this.manager
      .createQueryBuilder()
      .insert()
      .into(EveningLog)
      .values(values)
      .orUpdate(
        [
          'steps',
          'sleep_hours',
          'cardio_minutes',
          'training_done',
          'training_note',
          'ratings',
          'note',
          'updated_at',
        ],
        ['athlete_id', 'local_date'],
      )
      .returning('*')
      .execute();
    const [row] = hydrateRows(this.manager, EveningLog, result.raw as Record<string, unknown>[]);
    if (!row) throw new Error('evening upsert returned no row');
    return row;
  }

  async removeForDay(athleteId: string, date: string): Promise<void> {
    await this.manager.delete(EveningLog, { athleteId, localDate: date });
  }
}
