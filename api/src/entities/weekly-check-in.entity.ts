import type { CheckInQuestion, WeeklyFigures } from '@driftmark/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { PlanVersion } from './plan-version.entity.js';
import { User } from './user.entity.js';

export type WeeklyAnswerValue = string | number | boolean | null;
export interface WeeklyAnswer {
  questionId: string;
  value: WeeklyAnswerValue;
}

/**
 * An athlete's weekly check-in for the week before `due_date` (dueDate − 7 … dueDate − 1), stored
 * when the athlete submits it: the questions as asked, the answers and the figures of that week.
 * The coach's reply is on the row (one reply per check-in); after it the check-in is closed.
 */
@Entity({ name: 'weekly_check_ins' })
@Index('UQ_weekly_check_ins_athlete_id_due_date', ['athleteId', 'dueDate'], { unique: true })
export class WeeklyCheckIn extends BaseRecord {
  /** Covered by the unique (athlete_id, due_date) index, whose leading column it is. */
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_weekly_check_ins_athlete_id' })
  athlete?: Athlete;

  /** YYYY-MM-DD in the athlete's time zone: a check-in weekday. */
  @Column({ name: 'due_date', type: 'date' })
  dueDate: string;

  /** The team's questions as they were when the athlete submitted. */
  @Column({ type: 'jsonb', default: () => "'[]'" })
  questions: CheckInQuestion[];

  @Column({ type: 'jsonb', default: () => "'[]'" })
  answers: WeeklyAnswer[];

  @Column({ name: 'questions_for_coach', type: 'text', nullable: true })
  questionsForCoach: string | null;

  /** Computed on each submission from the week's logs. */
  @Column({ type: 'jsonb' })
  figures: WeeklyFigures;

  @Column({ name: 'submitted_at', type: 'timestamptz' })
  submittedAt: Date;

  @Column({ name: 'reply_body', type: 'text', nullable: true })
  replyBody: string | null;

  /** RESTRICT like other authored rows (users are deactivated, never deleted). */
  @Index('IDX_weekly_check_ins_replied_by_id')
  @Column({ name: 'replied_by_id', type: 'uuid', nullable: true })
  repliedById: string | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'replied_by_id', foreignKeyConstraintName: 'FK_weekly_check_ins_replied_by_id' })
  repliedBy?: User | null;

  @Column({ name: 'replied_at', type: 'timestamptz', nullable: true })
  repliedAt: Date | null;

  /** A plan version saved with the reply; cleared if that version goes. */
  @Index('IDX_weekly_check_ins_plan_version_id')
  @Column({ name: 'plan_version_id', type: 'uuid', nullable: true })
  planVersionId: string | null;

  @ManyToOne(() => PlanVersion, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'plan_version_id', foreignKeyConstraintName: 'FK_weekly_check_ins_plan_version_id' })
  planVersion?: PlanVersion | null;
}
