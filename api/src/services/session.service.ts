import type { EntityManager } from 'typeorm';
import type { Config } from '../config.js';
import type { Session } from '../entities/session.entity.js';
import type { User } from '../entities/user.entity.js';
import type { ClientInfo } from '../lib/client-info.js';
import { addDays, addMinutes } from '../lib/dates.js';
import { signSessionToken, verifySessionToken } from '../lib/session-token.js';
import { SessionRepository } from '../repositories/session.repository.js';

export type { ClientInfo };

/** A JWT for the cookie and the moment it (and the cookie) expires. */
export interface IssuedToken {
  token: string;
  expiresAt: Date;
}

export interface ResolvedSession {
  session: Session;
  user: User;
  /** Set when the token was past half its life: the caller puts it in a fresh cookie. */
  refreshed?: IssuedToken;
}

type SessionConfig = Pick<Config, 'jwtSecret' | 'sessionTtlMinutes' | 'sessionMaxDays'>;

/** Revoked sessions stay visible this long (e.g. to show "signed out elsewhere"). */
const REVOKED_KEPT_DAYS = 7;

const clip = (value: string | null, max: number): string | null => (value ? value.slice(0, max) : null);

/**
 * Server-side sessions behind short-lived JWTs. The JWT names a session row; the row decides
 * (revoked, absolute end), the JWT only saves a lookup of who is asking.
 */
export class SessionService {
  constructor(
    private readonly manager: EntityManager,
    private readonly config: SessionConfig,
  ) {}

  /** Opens a session for a user who just proved who they are. */
  async start(
    userId: string,
    client: ClientInfo,
    manager: EntityManager = this.manager,
  ): Promise<IssuedToken & { session: Session }> {
    const now = new Date();
    const sessions = new SessionRepository(manager);
    // Housekeeping while we are here: ended sessions, and revoked ones after a week.
    await sessions.pruneForUser(userId, now, addDays(now, -REVOKED_KEPT_DAYS));
    const session = await sessions.create({
      userId,
      expiresAt: addDays(now, this.config.sessionMaxDays),
      userAgent: clip(client.userAgent, 500),
      ip: clip(client.ip, 64),
    });
    return { session, ...this.issue(session, now) };
  }

  /** A JWT for the session: the configured lifetime, never past the session's absolute end. */
  issue(session: Pick<Session, 'id' | 'userId' | 'expiresAt'>, now: Date = new Date()): IssuedToken {
    const ttlEnd = addMinutes(now, this.config.sessionTtlMinutes);
    const expiresAt = ttlEnd < session.expiresAt ? ttlEnd : session.expiresAt;
    const token = signSessionToken(
      { userId: session.userId, sessionId: session.id, expiresAt },
      this.config.jwtSecret,
    );
    // The JWT carries whole seconds; the cookie must not outlive it.
    return { token, expiresAt: new Date(Math.floor(expiresAt.getTime() / 1000) * 1000) };
  }

  /** The live session behind a cookie value, or null (bad signature, expired, revoked, ended). */
  async resolve(token: string, now: Date = new Date()): Promise<ResolvedSession | null> {
    const claims = verifySessionToken(token, this.config.jwtSecret);
    if (!claims) return null;
    const sessions = new SessionRepository(this.manager);
    const found = await sessions.findWithUser(claims.sid);
    if (!found || found.userId !== claims.sub || found.revokedAt || found.expiresAt <= now) return null;
    const { user, ...session } = found;

    const lifetimeMs = (claims.exp - claims.iat) * 1000;
    const ageMs = now.getTime() - claims.iat * 1000;
    if (ageMs > lifetimeMs / 2) {
      const refreshed = this.issue(found, now);
      await sessions.touch(found.id, now);
      return { session: session as Session, user, refreshed };
    }
    return { session: session as Session, user };
  }

  async revoke(sessionId: string): Promise<void> {
    await new SessionRepository(this.manager).revoke(sessionId);
  }

  async revokeAllForUser(
    userId: string,
    options: { exceptId?: string } = {},
    manager: EntityManager = this.manager,
  ): Promise<number> {
    return new SessionRepository(manager).revokeAllForUser(userId, options);
  }
}
