import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { Mark } from './mark.entity.js';
import { User } from './user.entity.js';

/** A reply in a mark's thread, by the athlete or a staff member who can read the athlete. */
@Entity({ name: 'mark_replies' })
// A thread in order: mark_id leads, created_at orders.
@Index('IDX_mark_replies_mark_id_created_at', ['markId', 'createdAt'])
export class MarkReply extends BaseRecord {
  @Column({ name: 'mark_id', type: 'uuid' })
  markId: string;

  @ManyToOne(() => Mark, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'mark_id', foreignKeyConstraintName: 'FK_mark_replies_mark_id' })
  mark?: Mark;

  /** RESTRICT, like a mark's author (users are deactivated, never deleted). */
  @Index('IDX_mark_replies_author_id')
  @Column({ name: 'author_id', type: 'uuid' })
  authorId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'author_id', foreignKeyConstraintName: 'FK_mark_replies_author_id' })
  author?: User;

  @Column({ type: 'text' })
  body: string;
}
