import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/** An athlete shared with another staff member (usually an assistant coach). */
@Entity({ name: 'athlete_shares' })
@Index('UQ_athlete_shares_athlete_id_user_id', ['athleteId', 'userId'], { unique: true })
export class AthleteShare extends BaseRecord {
  /** Covered by the unique (athlete_id, user_id) index, whose leading column it is. */
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_athlete_shares_athlete_id' })
  athlete?: Athlete;

  @Index('IDX_athlete_shares_user_id')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_athlete_shares_user_id' })
  user?: User;

  @Index('IDX_athlete_shares_shared_by_id')
  @Column({ name: 'shared_by_id', type: 'uuid', nullable: true })
  sharedById: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'shared_by_id', foreignKeyConstraintName: 'FK_athlete_shares_shared_by_id' })
  sharedBy?: User | null;
}
