import type { PlanBaseline, PlanContent } from '@driftmark/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * One version of an athlete's plan, in force from `effective_from` (the athlete's date) until the
 * next version's. Append-only: a change is a new version, so a past day keeps the plan it had.
 * `content` holds the targets as written (expressions); `baseline` the athlete figures they resolve
 * against, snapshotted at save.
 */
@Entity({ name: 'plan_versions' })
// Also the index for loading an athlete's versions (athlete_id leads).
@Index('UQ_plan_versions_athlete_id_number', ['athleteId', 'number'], { unique: true })
export class PlanVersion extends BaseRecord {
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_plan_versions_athlete_id' })
  athlete?: Athlete;

  /** 1, 2, 3 … per athlete, in the order the versions were saved. */
  @Column({ type: 'integer' })
  number: number;

  /** YYYY-MM-DD in the athlete's time zone. */
  @Column({ name: 'effective_from', type: 'date' })
  effectiveFrom: string;

  @Column({ type: 'varchar', length: 300 })
  reason: string;

  @Column({ type: 'jsonb' })
  content: PlanContent;

  @Column({ type: 'jsonb' })
  baseline: PlanBaseline;

  /** RESTRICT: who wrote a plan is part of its record. */
  @Index('IDX_plan_versions_created_by_id')
  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'FK_plan_versions_created_by_id' })
  createdBy?: User;
}
