import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { RatingKey } from '@driftmark/shared';
import { Athlete } from './athlete.entity.js';
import { DayRecord } from './day-record.entity.js';

export type Ratings = Partial<Record<RatingKey, number | null>>;

/** The evening card: one per athlete and day. */
@Entity({ name: 'evening_logs' })
@Index('UQ_evening_logs_athlete_id_local_date', ['athleteId', 'localDate'], { unique: true })
export class EveningLog extends DayRecord {
  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_evening_logs_athlete_id' })
  athlete?: Athlete;

  @Column({ type: 'integer', nullable: true })
  steps: number | null;

  @Column({ name: 'sleep_hours', type: 'double precision', nullable: true })
  sleepHours: number | null;

  @Column({ name: 'cardio_minutes', type: 'double precision', nullable: true })
  cardioMinutes: number | null;

  @Column({ name: 'training_done', type: 'boolean', nullable: true })
  trainingDone: boolean | null;

  @Column({ name: 'training_note', type: 'varchar', length: 120, nullable: true })
  trainingNote: string | null;

  /** Ratings 1–5 by key (energy, hunger, mood, sleepQuality, digestion, stress). */
  @Column({ type: 'jsonb', default: () => "'{}'" })
  ratings: Ratings;

  @Column({ type: 'varchar', length: 2000, nullable: true })
  note: string | null;
}
