import { IsNull, type EntityManager } from 'typeorm';
import { PasswordResetToken } from '../entities/password-reset-token.entity.js';

export class PasswordResetTokenRepository {
  constructor(private readonly manager: EntityManager) {}

  create(input: Pick<PasswordResetToken, 'userId' | 'tokenHash' | 'expiresAt'>): Promise<PasswordResetToken> {
    return this.manager.save(this.manager.create(PasswordResetToken, { ...input, usedAt: null }));
  }

  /** The token's row without a lock (a cheap check before hashing). */
  findByHash(tokenHash: string): Promise<PasswordResetToken | null> {
    return this.manager.findOneBy(PasswordResetToken, { tokenHash });
  }

  /** Locks the row until the transaction ends, so two concurrent uses cannot both succeed. */
  findByHashForUpdate(tokenHash: string): Promise<PasswordResetToken | null> {
    return this.manager
      .createQueryBuilder(PasswordResetToken, 't')
      .where('t.token_hash = :tokenHash', { tokenHash })
      .setLock('pessimistic_write')
      .getOne();
  }

  /** Marks every unused token of the user used (the one just redeemed, and any older ones). */
  async useAllForUser(userId: string, at: Date): Promise<void> {
    await this.manager.update(PasswordResetToken, { userId, usedAt: IsNull() }, { usedAt: at });
  }
}
