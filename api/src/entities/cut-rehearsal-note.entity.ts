import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { CutPlan } from './cut-plan.entity.js';
import { User } from './user.entity.js';

/**
 * What was done on one day of a practice cut, in the words of the coach or the athlete: one note a
 * day of the rehearsal, the latest writer's. The athlete id is kept beside the plan's so the demo
 * refresh and data rights reach it as every other athlete row.
 */
@Entity({ name: 'cut_rehearsal_notes' })
@Index('UQ_cut_rehearsal_notes_cut_plan_id_local_date', ['cutPlanId', 'localDate'], { unique: true })
export class CutRehearsalNote extends BaseRecord {
  @Column({ name: 'cut_plan_id', type: 'uuid' })
  cutPlanId: string;

  @ManyToOne(() => CutPlan, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'cut_plan_id', foreignKeyConstraintName: 'FK_cut_rehearsal_notes_cut_plan_id' })
  cutPlan?: CutPlan;

  @Index('IDX_cut_rehearsal_notes_athlete_id')
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_cut_rehearsal_notes_athlete_id' })
  athlete?: Athlete;

  /** The rehearsal day, the athlete's date. */
  @Column({ name: 'local_date', type: 'date' })
  localDate: string;

  @Column({ type: 'text' })
  note: string;

  /** SET NULL: the note outlives its writer's account (read as "a former member"). */
  @Index('IDX_cut_rehearsal_notes_author_id')
  @Column({ name: 'author_id', type: 'uuid', nullable: true })
  authorId: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'author_id', foreignKeyConstraintName: 'FK_cut_rehearsal_notes_author_id' })
  author?: User | null;
}
