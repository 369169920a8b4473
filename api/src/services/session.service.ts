import type { Role } from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import type { Config } from '../config.js';
import type { Session } from '../entities/session.entity.js';
import type { User } from '../entities/user.entity.js';
import { notFound } from '../errors.js';
import type { ClientInfo } from '../lib/client-info.js';
import { addDays } from '../lib/dates.js';
import { absoluteEnd, sessionEnd, sessionState } from '../lib/session-lifetime.js';
import { signSessionToken, verifySessionToken } from '../lib/session-token.js';
import { SessionRepository } from '../repositories/session.repository.js';

export type { ClientInfo };

/** A JWT for the cookie, when it expires, and when the cookie holding it expires. */
export interface IssuedToken {
  token: string;
  /** The JWT's own end: the session's idle end as of now, never past its absolute end. */
  expiresAt: Date;
  /**
   * How long the cookie lives from now: until ENDED_NOTICE_DAYS past the absolute end, longer than
   * the JWT, so a browser that comes back after its session ended still says which session it was
   * and hears why it ended. A duration (Max-Age), so the browser counts it on its own clock.
   */
  cookieMaxAgeMs: number;
}

export interface ResolvedSession {
  session: Session;
  user: User;
  /** Set when the token was older than SESSION_REFRESH_MINUTES: the caller puts it in a fresh cookie. */
  refreshed?: IssuedToken;
}

/** Why a cookie no longer opens a session: ended (idle, absolute end, unknown) or revoked (signed out). */
export interface EndedSession {
  ended: 'ended' | 'revoked';
}

type SessionConfig = Pick<Config, 'jwtSecret' | 'sessionRefreshMinutes' | 'sessionLifetimes'>;

/** Revoked sessions stay visible this long (e.g. to show "signed out elsewhere"). */
const REVOKED_KEPT_DAYS = 7;
/** How long past its session's absolute end a cookie is kept (see IssuedToken.cookieExpiresAt). */
const ENDED_NOTICE_DAYS = 7;

const clip = (value: string | null, max: number): string | null => (value ? value.slice(0, max) : null);

/**
 * Server-side sessions behind JWT cookies. The JWT names a session row; the row decides (revoked,
 * idle end, absolute end: `lib/session-lifetime.ts`), the JWT only saves a lookup of who is asking.
 */
export class SessionService {
  constructor(
    private readonly manager: EntityManager,
    private readonly config: SessionConfig,
  ) {}

  /** Opens a session for a user who just proved who they are, with their role's lifetimes. */
  async start(
    user: Pick<User, 'id' | 'role'>,
    client: ClientInfo,
    now: Date,
    manager: EntityManager = this.manager,
  ): Promise<IssuedToken & { session: Session }> {
    const sessions = new SessionRepository(manager);
    // Housekeeping while we are here: ended sessions, and revoked ones after a week.
    await sessions.pruneForUser(user.id, now, addDays(now, -REVOKED_KEPT_DAYS));
    const session = await sessions.create({
      userId: user.id,
      // Signed in "now" on the app's clock, like every other time of the session.
      createdAt: now,
      expiresAt: absoluteEnd(user.role, now, this.config),
      lastSeenAt: now,
      userAgent: clip(client.userAgent, 500),
      ip: clip(client.ip, 64),
    });
    return { session, ...this.issue(session, user.role, now) };
  }

  /** A JWT for the session as seen now: it expires at the idle end counted from now. */
  issue(session: Pick<Session, 'id' | 'userId' | 'expiresAt'>, role: Role, now: Date): IssuedToken {
    const end = sessionEnd({ lastSeenAt: now, expiresAt: session.expiresAt }, role, this.config);
    const token = signSessionToken(
      { userId: session.userId, sessionId: session.id, issuedAt: now, expiresAt: end },
      this.config.jwtSecret,
    );
    // The JWT carries whole seconds.
    return {
      token,
      expiresAt: new Date(Math.floor(end.getTime() / 1000) * 1000),
      cookieMaxAgeMs: addDays(session.expiresAt, ENDED_NOTICE_DAYS).getTime() - now.getTime(),
    };
  }

  /**
   * The live session behind a cookie value, or why there is none. A token older than
   * SESSION_REFRESH_MINUTES is replaced and the row's "last seen" moves: one write per refresh,
   * never one per request.
   */
  async resolve(token: string, now: Date): Promise<ResolvedSession | EndedSession> {
    const claims = verifySessionToken(token, this.config.jwtSecret, now);
    if (!claims) return { ended: 'ended' };
    const sessions = new SessionRepository(this.manager);
    const found = await sessions.findWithUser(claims.sid);
    if (!found || found.userId !== claims.sub) return { ended: 'ended' };
    const state = sessionState(found, found.user.role, this.config, now);
    if (state === 'revoked') return { ended: 'revoked' };
    if (state === 'ended' || claims.expired) return { ended: 'ended' };
    const { user, ...session } = found;

    const ageMs = now.getTime() - claims.iat * 1000;
    if (ageMs >= this.config.sessionRefreshMinutes * 60_000) {
      const refreshed = this.issue(found, user.role, now);
      await sessions.touch(found.id, now);
      return { session: { ...session, lastSeenAt: now } as Session, user, refreshed };
    }
    return { session: session as Session, user };
  }

  /** The user's live sessions, most recently seen first. */
  async listLive(user: Pick<User, 'id' | 'role'>, now: Date): Promise<Session[]> {
    const rows = await new SessionRepository(this.manager).listUnrevoked(user.id, now);
    return rows.filter((s) => sessionState(s, user.role, this.config, now) === 'live');
  }

  /**
   * Signs out one of the user's sessions (the caller has authorized it as the user's own); one that
   * already ended answers 404 like one that never existed.
   */
  async revokeOwn(user: Pick<User, 'role'>, session: Session, now: Date): Promise<void> {
    if (sessionState(session, user.role, this.config, now) !== 'live') throw notFound();
    await this.revoke(session.id, now);
  }

  /** Signs out every live session of the user but `currentId`; answers how many. */
  async revokeOthers(user: Pick<User, 'id' | 'role'>, currentId: string, now: Date): Promise<number> {
    const others = (await this.listLive(user, now)).filter((s) => s.id !== currentId);
    const sessions = new SessionRepository(this.manager);
    for (const s of others) await sessions.revoke(s.id, now);
    return others.length;
  }

  async revoke(sessionId: string, now: Date): Promise<void> {
    await new SessionRepository(this.manager).revoke(sessionId, now);
  }

  async revokeAllForUser(
    userId: string,
    options: { exceptId?: string; at: Date },
    manager: EntityManager = this.manager,
  ): Promise<number> {
    return new SessionRepository(manager).revokeAllForUser(userId, options);
  }
}
