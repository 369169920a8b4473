import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { Symptom } from '@driftmark/shared';
import { Athlete } from './athlete.entity.js';
import { ClientDayEntry } from './day-record.entity.js';

/** Symptoms the athlete reported; `urgent` when any of them stops the plan. */
@Entity({ name: 'symptom_reports' })
@Index('UQ_symptom_reports_athlete_id_client_id', ['athleteId', 'clientId'], { unique: true })
@Index('IDX_symptom_reports_athlete_id_local_date', ['athleteId', 'localDate'])
export class SymptomReport extends ClientDayEntry {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_symptom_reports_athlete_id' })
  athlete?: Athlete;

  @Column({ type: 'jsonb' })
  symptoms: Symptom[];

  @Column({ type: 'varchar', length: 2000, nullable: true })
  note: string | null;

  @Column({ type: 'boolean' })
  urgent: boolean;
}
