import type { Request, RequestHandler } from 'express';
import type { RequestAuth } from '../context.js';
import { unauthenticated } from '../errors.js';
import { clearSessionCookie, setSessionCookie } from '../lib/session-cookie.js';
import { SESSION_COOKIE } from '../lib/session-token.js';
import { SessionService } from '../services/session.service.js';

/**
 * Reads the `dm_session` cookie, checks the session row behind it and sets `req.auth`.
 * Answers 401 `unauthenticated` without a live session. Past half its life the JWT is replaced
 * by a fresh one (sliding expiry), never beyond the session's absolute end.
 */
export function authenticate(): RequestHandler {
  return async (req, res, next) => {
    const { config, dataSource } = req.ctx;
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string' || token === '') return next(unauthenticated());

    const resolved = await new SessionService(dataSource.manager, config).resolve(token);
    if (!resolved) {
      clearSessionCookie(res, config);
      return next(unauthenticated('Your session has ended. Please sign in again.'));
    }
    if (resolved.refreshed)
      setSessionCookie(res, config, resolved.refreshed.token, resolved.refreshed.expiresAt);

    const { user, session } = resolved;
    req.auth = {
      actor: { userId: user.id, role: user.role, teamId: user.teamId },
      user,
      sessionId: session.id,
    };
    next();
  };
}

/** The signed-in user of a request that passed `authenticate()`. */
export function requireAuth(req: Request): RequestAuth {
  if (!req.auth) throw unauthenticated();
  return req.auth;
}
