import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/** A single-use reset link. Only the sha256 of the token is stored. */
@Entity({ name: 'password_reset_tokens' })
export class PasswordResetToken extends BaseRecord {
  @Index('IDX_password_reset_tokens_user_id')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_password_reset_tokens_user_id' })
  user?: User;

  /** sha256 of the e-mailed token, hex. */
  @Index('UQ_password_reset_tokens_token_hash', { unique: true })
  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'timestamptz', nullable: true })
  usedAt: Date | null;
}
