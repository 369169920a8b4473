import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { Mark } from './mark.entity.js';
import { User } from './user.entity.js';

/** When a user last read a mark's thread: one row per mark and reader, moved forward on each read. */
@Entity({ name: 'mark_reads' })
@Index('UQ_mark_reads_mark_id_user_id', ['markId', 'userId'], { unique: true })
export class MarkRead extends BaseRecord {
  /** Covered by the unique (mark_id, user_id) index, whose leading column it is. */
  @Column({ name: 'mark_id', type: 'uuid' })
  markId: string;

  @ManyToOne(() => Mark, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'mark_id', foreignKeyConstraintName: 'FK_mark_reads_mark_id' })
  mark?: Mark;

  @Index('IDX_mark_reads_user_id')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_mark_reads_user_id' })
  user?: User;

  @Column({ name: 'read_at', type: 'timestamptz' })
  readAt: Date;
}
