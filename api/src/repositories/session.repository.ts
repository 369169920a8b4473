import { IsNull, LessThan, MoreThan, Not, type EntityManager } from 'typeorm';
import { Session } from '../entities/session.entity.js';
import type { User } from '../entities/user.entity.js';

export class SessionRepository {
  constructor(private readonly manager: EntityManager) {}

  create(
    input: Pick<Session, 'userId' | 'createdAt' | 'expiresAt' | 'lastSeenAt' | 'userAgent' | 'ip'>,
  ): Promise<Session> {
    return this.manager.save(this.manager.create(Session, { ...input, revokedAt: null }));
  }

  /** A user's sessions that are not revoked and not past their absolute end (idle ends are the caller's rule). */
  listUnrevoked(userId: string, now: Date): Promise<Session[]> {
    return this.manager.find(Session, {
      where: { userId, revokedAt: IsNull(), expiresAt: MoreThan(now) },
      order: { lastSeenAt: 'DESC', createdAt: 'DESC' },
    });
  }

  /**
   * The session with its user, or null, in one statement (every request asks). Validity (revoked,
   * expired) is the caller's check.
   */
  findWithUser(id: string): Promise<(Session & { user: User }) | null> {
    return this.manager
      .createQueryBuilder(Session, 's')
      .innerJoinAndSelect('s.user', 'u')
      .where('s.id = :id', { id })
      .getOne() as Promise<(Session & { user: User }) | null>;
  }

  findById(id: string): Promise<Session | null> {
    return this.manager.findOneBy(Session, { id });
  }

  async touch(id: string, at: Date): Promise<void> {
    await this.manager.update(Session, { id }, { lastSeenAt: at });
  }

  async revoke(id: string, at: Date): Promise<void> {
    await this.manager.update(Session, { id, revokedAt: IsNull() }, { revokedAt: at });
  }

  /** Revokes every live session of a user, except `exceptId` when given. */
  async revokeAllForUser(userId: string, options: { exceptId?: string; at: Date }): Promise<number> {
    const where = options.exceptId
      ? { userId, revokedAt: IsNull(), id: Not(options.exceptId) }
      : { userId, revokedAt: IsNull() };
    const result = await this.manager.update(Session, where, { revokedAt: options.at });
    return result.affected ?? 0;
  }

  /** Deletes a user's sessions that ended (absolute end passed) or were revoked before `revokedBefore`. */
  async pruneForUser(userId: string, now: Date, revokedBefore: Date): Promise<void> {
    await this.manager.delete(Session, [
      { userId, expiresAt: LessThan(now) },
      { userId, revokedAt: LessThan(revokedBefore) },
    ]);
  }
}
