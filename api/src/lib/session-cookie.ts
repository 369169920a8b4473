import type { CookieOptions, Response } from 'express';
import type { Config } from '../config.js';
import { SESSION_COOKIE } from './session-token.js';

function baseOptions(config: Pick<Config, 'appOrigin'>): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    // A Secure cookie is never sent over plain http, so only when the app itself is https.
    secure: config.appOrigin.startsWith('https:'),
    path: '/',
  };
}

/**
 * Sets the session cookie. It lives a little past the session's absolute end (IssuedToken), longer
 * than the JWT inside, so a browser back after its session ended is told why; the JWT's own expiry
 * and the session row decide whether it still opens anything.
 */
export function setSessionCookie(
  res: Response,
  config: Pick<Config, 'appOrigin'>,
  issued: { token: string; cookieMaxAgeMs: number },
): void {
  // Express writes Max-Age and an Expires counted from the process clock.
  res.cookie(SESSION_COOKIE, issued.token, { ...baseOptions(config), maxAge: issued.cookieMaxAgeMs });
}

export function clearSessionCookie(res: Response, config: Pick<Config, 'appOrigin'>): void {
  res.clearCookie(SESSION_COOKIE, baseOptions(config));
}
