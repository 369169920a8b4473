import type { Request, RequestHandler } from 'express';
import type { RequestAuth } from '../context.js';
import { AppError, unauthenticated } from '../errors.js';
import { clearSessionCookie, setSessionCookie } from '../lib/session-cookie.js';
import { SESSION_COOKIE } from '../lib/session-token.js';
import { SessionService } from '../services/session.service.js';

/** What a browser whose session is over is told (the web app shows its own words on sign-in). */
const ENDED = {
  ended: { code: 'session_ended', message: 'Your session ended. Sign in again to continue.' },
  revoked: {
    code: 'session_revoked',
    message: 'This device was signed out from another device. Sign in again to continue.',
  },
} as const;

/**
 * Reads the `dm_session` cookie, checks the session row behind it and sets `req.auth`.
 * Answers 401 `unauthenticated` without a cookie, `session_ended` or `session_revoked` when the
 * cookie's session is over (and clears the cookie). A JWT older than SESSION_REFRESH_MINUTES is
 * replaced by a fresh one (sliding idle end), never beyond the session's absolute end.
 */
/** The marker `authenticate` puts on its handler: the route needs a session (read by `lib/route-table.ts`). */
export const AUTHENTICATES = Symbol('authenticates');

export function authenticate(): RequestHandler {
  const handler: RequestHandler = async (req, res, next) => {
    const { config, dataSource } = req.ctx;
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string' || token === '') return next(unauthenticated());

    const resolved = await new SessionService(dataSource.manager, config).resolve(token, req.ctx.clock());
    if ('ended' in resolved) {
      clearSessionCookie(res, config);
      const { code, message } = ENDED[resolved.ended];
      return next(new AppError(code, message));
    }
    if (resolved.refreshed) setSessionCookie(res, config, resolved.refreshed);

    const { user, session } = resolved;
    req.auth = {
      actor: { userId: user.id, role: user.role, teamId: user.teamId },
      user,
      sessionId: session.id,
    };
    next();
  };
  Object.defineProperty(handler, AUTHENTICATES, { value: true });
  return handler;
}

/** The signed-in user of a request that passed `authenticate()`. */
export function requireAuth(req: Request): RequestAuth {
  if (!req.auth) throw unauthenticated();
  return req.auth;
}
