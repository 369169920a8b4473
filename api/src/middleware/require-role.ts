import type { RequestHandler } from 'express';
import type { Role } from '@driftmark/shared';
import { forbidden, unauthenticated } from '../errors.js';

/** After `authenticate()`: 403 unless the user holds one of the roles. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.auth) return next(unauthenticated());
    if (!roles.includes(req.auth.actor.role)) return next(forbidden());
    next();
  };
}
