import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { InvitableRole } from '@driftmark/shared';
import { BaseRecord } from './base.entity.js';
import { Team } from './team.entity.js';
import { User } from './user.entity.js';

/** An e-mailed invitation to join a team. Only the sha256 of the token is stored. */
@Entity({ name: 'invitations' })
@Check('CHK_invitations_role', `"role" IN ('athlete', 'coach', 'assistant')`)
export class Invitation extends BaseRecord {
  @Index('IDX_invitations_team_id')
  @Column({ name: 'team_id', type: 'uuid' })
  teamId: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'team_id', foreignKeyConstraintName: 'FK_invitations_team_id' })
  team?: Team;

  @Index('IDX_invitations_email')
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 100 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  role: InvitableRole;

  @Index('IDX_invitations_invited_by_id')
  @Column({ name: 'invited_by_id', type: 'uuid' })
  invitedById: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'invited_by_id', foreignKeyConstraintName: 'FK_invitations_invited_by_id' })
  invitedBy?: User;

  /** For an athlete invitation: the coach to assign (null means the inviter). */
  @Index('IDX_invitations_coach_id')
  @Column({ name: 'coach_id', type: 'uuid', nullable: true })
  coachId: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'coach_id', foreignKeyConstraintName: 'FK_invitations_coach_id' })
  coach?: User | null;

  @Index('UQ_invitations_token_hash', { unique: true })
  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'accepted_at', type: 'timestamptz', nullable: true })
  acceptedAt: Date | null;

  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt: Date | null;

  @Index('IDX_invitations_accepted_user_id')
  @Column({ name: 'accepted_user_id', type: 'uuid', nullable: true })
  acceptedUserId: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'accepted_user_id', foreignKeyConstraintName: 'FK_invitations_accepted_user_id' })
  acceptedUser?: User | null;
}
