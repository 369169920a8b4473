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

/** Sets the session cookie; the browser drops it when the JWT inside expires. */
export function setSessionCookie(
  res: Response,
  config: Pick<Config, 'appOrigin'>,
  token: string,
  expiresAt: Date,
): void {
  res.cookie(SESSION_COOKIE, token, { ...baseOptions(config), expires: expiresAt });
}

export function clearSessionCookie(res: Response, config: Pick<Config, 'appOrigin'>): void {
  res.clearCookie(SESSION_COOKIE, baseOptions(config));
}
