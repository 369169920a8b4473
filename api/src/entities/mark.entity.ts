import type { MarkMetric } from '@driftmark/shared';
import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * A staff member's note pinned to one of an athlete's charts over a date or a date range (the
 * athlete's dates). Replies and read state hang off it.
 */
@Entity({ name: 'marks' })
// Listing an athlete's marks in a range: athlete_id leads, from_date narrows.
@Index('IDX_marks_athlete_id_from_date', ['athleteId', 'fromDate'])
@Check('CHK_marks_metric', `"metric" IN ('weight', 'fluids', 'energy', 'macros', 'general')`)
@Check('CHK_marks_range', `"to_date" >= "from_date"`)
export class Mark extends BaseRecord {
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_marks_athlete_id' })
  athlete?: Athlete;

  /** RESTRICT, like a plan version's author (users are deactivated, never deleted). */
  @Index('IDX_marks_author_id')
  @Column({ name: 'author_id', type: 'uuid' })
  authorId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'author_id', foreignKeyConstraintName: 'FK_marks_author_id' })
  author?: User;

  @Column({ type: 'varchar', length: 16 })
  metric: MarkMetric;

  /** YYYY-MM-DD in the athlete's time zone. */
  @Column({ name: 'from_date', type: 'date' })
  fromDate: string;

  /** YYYY-MM-DD in the athlete's time zone; equal to from_date for a single day. */
  @Column({ name: 'to_date', type: 'date' })
  toDate: string;

  @Column({ type: 'text' })
  note: string;
}
