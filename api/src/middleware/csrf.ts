import type { RequestHandler } from 'express';
import type { Config } from '../config.js';
import { AppError } from '../errors.js';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
/**
 * Requests authorized only by a signed token they carry, never by the session cookie, so a
 * cross-site sender gains nothing: RFC 8058 one-click unsubscribe is POSTed by mail clients.
 */
const TOKEN_ONLY_PATHS = new Set(['/api/unsubscribe']);

function originOf(value: string | undefined): string | null {
  if (!value || value === 'null') return null;
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

/**
 * OWASP origin verification: every state-changing request must carry an `Origin` (or, lacking
 * it, a `Referer`) naming the app's own origin or one of EXTRA_ORIGINS. Together with SameSite
 * cookies this refuses cross-site request forgery without tokens in forms.
 */
export function originCheck(config: Pick<Config, 'appOrigin' | 'extraOrigins'>): RequestHandler {
  const allowed = new Set([config.appOrigin, ...config.extraOrigins]);
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    if (req.method === 'POST' && TOKEN_ONLY_PATHS.has(req.path)) return next();
    const origin = req.get('origin');
    const source = origin !== undefined ? originOf(origin) : originOf(req.get('referer'));
    if (source && allowed.has(source)) return next();
    next(new AppError('csrf_rejected', 'This request did not come from the Driftmark app and was refused.'));
  };
}
