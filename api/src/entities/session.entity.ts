import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/**
 * A signed-in browser. The short-lived JWT in the cookie names this row (`sid`); revoking the
 * row signs the browser out even while its JWT is still unexpired.
 */
@Entity({ name: 'sessions' })
export class Session extends BaseRecord {
  @Index('IDX_sessions_user_id')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_sessions_user_id' })
  user?: User;

  /**
   * Absolute end of the session (sign-in time + the role's absolute lifetime, lib/session-lifetime.ts);
   * the sliding idle end never passes it.
   */
  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt: Date | null;

  /** Moved when the cookie's JWT is replaced (at most once per SESSION_REFRESH_MINUTES); the idle end counts from it. */
  @Column({ name: 'last_seen_at', type: 'timestamptz', default: () => 'now()' })
  lastSeenAt: Date;

  @Column({ name: 'user_agent', type: 'varchar', length: 500, nullable: true })
  userAgent: string | null;

  @Column({ type: 'varchar', length: 64, nullable: true })
  ip: string | null;
}
