import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { Symptom } from '@driftmark/shared';
import { Athlete } from './athlete.entity.js';
import { DayRecord } from './day-record.entity.js';
import { SymptomReport } from './symptom-report.entity.js';

export type FlagKind = 'symptom';

/** What a flag of each kind records beside its message. */
export interface FlagDetail {
  symptoms?: Symptom[];
  time?: string;
}

/**
 * A safety flag for the coach (today: an urgent symptom report). It outlives the report that
 * raised it: deleting the report leaves the flag, with `symptom_report_id` cleared.
 */
@Entity({ name: 'athlete_flags' })
@Index('IDX_athlete_flags_athlete_id_local_date', ['athleteId', 'localDate'])
@Check('CHK_athlete_flags_kind', `"kind" IN ('symptom')`)
export class AthleteFlag extends DayRecord {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_athlete_flags_athlete_id' })
  athlete?: Athlete;

  @Column({ type: 'varchar', length: 16 })
  kind: FlagKind;

  @Column({ type: 'varchar', length: 300 })
  message: string;

  @Column({ type: 'jsonb', default: () => "'{}'" })
  detail: FlagDetail;

  @Index('IDX_athlete_flags_symptom_report_id')
  @Column({ name: 'symptom_report_id', type: 'uuid', nullable: true })
  symptomReportId: string | null;

  @ManyToOne(() => SymptomReport, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'symptom_report_id', foreignKeyConstraintName: 'FK_athlete_flags_symptom_report_id' })
  symptomReport?: SymptomReport | null;
}
