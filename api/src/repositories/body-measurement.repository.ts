import type { EntityManager } from 'typeorm';
import { BodyMeasurement } from '../entities/body-measurement.entity.js';
import type { User } from '../entities/user.entity.js';

export type BodyMeasurementWithAuthor = BodyMeasurement & { enteredBy: User };

export type NewBodyMeasurement = Pick<
  BodyMeasurement,
  | 'athleteId'
  | 'localDate'
  | 'method'
  | 'densityEquation'
  | 'skinfoldsMm'
  | 'neckCm'
  | 'waistCm'
  | 'hipCm'
  | 'heightCm'
  | 'measuredBy'
  | 'enteredById'
> & {
  /** Default: now (the database's). The seed passes the morning of the measurement's day. */
  createdAt?: Date;
};

/** An athlete's body-composition measurements. */
export class BodyMeasurementRepository {
  constructor(private readonly manager: EntityManager) {}

  /** Every measurement of the athlete, oldest first (by date, then entry). */
  listForAthlete(athleteId: string): Promise<BodyMeasurementWithAuthor[]> {
    return this.manager.find(BodyMeasurement, {
      where: { athleteId },
      relations: { enteredBy: true },
      order: { localDate: 'ASC', createdAt: 'ASC' },
    }) as Promise<BodyMeasurementWithAuthor[]>;
  }

  findForAthlete(athleteId: string, id: string): Promise<BodyMeasurementWithAuthor | null> {
    return this.manager.findOne(BodyMeasurement, {
      where: { athleteId, id },
      relations: { enteredBy: true },
    }) as Promise<BodyMeasurementWithAuthor | null>;
  }

  async insert(row: NewBodyMeasurement): Promise<string> {
    const values = row.createdAt ? { ...row, updatedAt: row.createdAt } : row;
    const saved = await this.manager.save(BodyMeasurement, this.manager.create(BodyMeasurement, values));
    return saved.id;
  }

  async delete(athleteId: string, id: string): Promise<void> {
    await this.manager.delete(BodyMeasurement, { athleteId, id });
  }
}
