import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * When a staff member last marked an athlete reviewed in their review queue: one row per athlete
 * and reviewer, moved forward on each review. Items older than it leave that reviewer's queue.
 */
@Entity({ name: 'athlete_reviews' })
@Index('UQ_athlete_reviews_athlete_id_reviewer_id', ['athleteId', 'reviewerId'], { unique: true })
export class AthleteReview extends BaseRecord {
  /** Covered by the unique (athlete_id, reviewer_id) index, whose leading column it is. */
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_athlete_reviews_athlete_id' })
  athlete?: Athlete;

  @Index('IDX_athlete_reviews_reviewer_id')
  @Column({ name: 'reviewer_id', type: 'uuid' })
  reviewerId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'reviewer_id', foreignKeyConstraintName: 'FK_athlete_reviews_reviewer_id' })
  reviewer?: User;

  @Column({ name: 'reviewed_at', type: 'timestamptz' })
  reviewedAt: Date;
}
