import type { EntityManager } from 'typeorm';
import { AthleteFlag } from '../entities/athlete-flag.entity.js';

export type NewFlag = Pick<
  AthleteFlag,
  'athleteId' | 'localDate' | 'kind' | 'message' | 'detail' | 'symptomReportId'
>;

export class AthleteFlagRepository {
  constructor(private readonly manager: EntityManager) {}

  create(input: NewFlag): Promise<AthleteFlag> {
    return this.manager.save(this.manager.create(AthleteFlag, input));
  }

  existsForSymptomReport(symptomReportId: string): Promise<boolean> {
    return this.manager.existsBy(AthleteFlag, { symptomReportId });
  }

  listForDay(athleteId: string, date: string): Promise<AthleteFlag[]> {
    return this.manager.find(AthleteFlag, {
      where: { athleteId, localDate: date },
      order: { createdAt: 'ASC' },
    });
  }
}
