import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * One notification sent for a due time (`due_key`, e.g. a local date or ISO week): the unique
 * (user, kind, due_key) makes a scheduled send happen once, across restarts and workers.
 */
@Entity({ name: 'notification_sends' })
@Index('UQ_notification_sends_user_id_kind_due_key', ['userId', 'kind', 'dueKey'], { unique: true })
export class NotificationSend extends BaseRecord {
  /** Covered by the unique (user_id, kind, due_key) index, whose leading column it is. */
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_notification_sends_user_id' })
  user?: User;

  @Column({ type: 'varchar', length: 32 })
  kind: string;

  @Column({ name: 'due_key', type: 'varchar', length: 64 })
  dueKey: string;
}
