import type { CutPath } from '@driftmark/shared';
import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * A weight-cut plan for the athlete's weigh-in, built by the coach with the athlete: the chronic
 * part (start weight down to the pre-acute weight) and the acute last days. The latest one is in
 * force; earlier ones stay as the history. A rehearsal (practice run) aims at a practice weigh-in
 * and is kept apart: its record is shown beside the next plan.
 */
@Entity({ name: 'cut_plans' })
@Check('CHK_cut_plans_path', `"path" IN ('linear', 'rate')`)
@Check('CHK_cut_plans_acute_days', `"acute_days" >= 0`)
export class CutPlan extends BaseRecord {
  @Index('IDX_cut_plans_athlete_id')
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_cut_plans_athlete_id' })
  athlete?: Athlete;

  /** The weigh-in date the plan aims at (the athlete's event date when it was made). */
  @Column({ name: 'weigh_in_date', type: 'date' })
  weighInDate: string;

  @Column({ name: 'limit_kg', type: 'double precision' })
  limitKg: number;

  @Column({ name: 'start_date', type: 'date' })
  startDate: string;

  @Column({ name: 'start_kg', type: 'double precision' })
  startKg: number;

  @Column({ name: 'pre_acute_kg', type: 'double precision' })
  preAcuteKg: number;

  @Column({ name: 'acute_days', type: 'integer' })
  acuteDays: number;

  @Column({ type: 'varchar', length: 8 })
  path: CutPath;

  /** The team's acute-share threshold when the plan was made, %. */
  @Column({ name: 'threshold_pct', type: 'double precision' })
  thresholdPct: number;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  /** A practice run: `weighInDate` is its practice weigh-in, and it is never the plan in force. */
  @Column({ type: 'boolean', default: false })
  rehearsal: boolean;

  /** RESTRICT: a plan without its author would be no record at all. */
  @Index('IDX_cut_plans_created_by_id')
  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'FK_cut_plans_created_by_id' })
  createdBy?: User;
}
