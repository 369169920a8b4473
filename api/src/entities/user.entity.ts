import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { NotificationKind, Role, VolumeUnit, WeightUnit } from '@driftmark/shared';
import { BaseRecord } from './base.entity.js';
import { Team } from './team.entity.js';

export interface UserNotificationPrefs {
  enabled?: Partial<Record<NotificationKind, boolean>>;
  reminderHour?: number | null;
}

@Entity({ name: 'users' })
@Check('CHK_users_role', `"role" IN ('owner', 'coach', 'assistant', 'athlete')`)
@Check('CHK_users_weight_unit', `"weight_unit" IN ('kg', 'lb')`)
@Check('CHK_users_volume_unit', `"volume_unit" IN ('ml', 'floz')`)
export class User extends BaseRecord {
  @Index('IDX_users_team_id')
  @Column({ name: 'team_id', type: 'uuid' })
  teamId: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'team_id', foreignKeyConstraintName: 'FK_users_team_id' })
  team?: Team;

  /** Stored trimmed and lower-cased (the shared `email` schema does both). */
  @Index('UQ_users_email', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 100 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  @Column({ name: 'password_hash', type: 'varchar', length: 100 })
  passwordHash: string;

  @Column({ name: 'time_zone', type: 'varchar', length: 64, default: 'UTC' })
  timeZone: string;

  @Column({ name: 'weight_unit', type: 'varchar', length: 4, default: 'kg' })
  weightUnit: WeightUnit;

  @Column({ name: 'volume_unit', type: 'varchar', length: 4, default: 'ml' })
  volumeUnit: VolumeUnit;

  @Column({ name: 'password_changed_at', type: 'timestamptz', default: () => 'now()' })
  passwordChangedAt: Date;

  /** E-mail preferences: kinds missing from `enabled` count as wanted (see notifications schema). */
  @Column({ name: 'notification_prefs', type: 'jsonb', default: () => "'{}'" })
  notificationPrefs: UserNotificationPrefs;
}
