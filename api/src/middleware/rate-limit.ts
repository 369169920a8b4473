import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Config } from '../config.js';
import { AppError } from '../errors.js';

const WINDOW_MS = 15 * 60 * 1000;

function limited(message: string): RequestHandler {
  return (_req, _res, next) => next(new AppError('rate_limited', message));
}

const ip = (req: { ip?: string | undefined }): string => ipKeyGenerator(req.ip ?? 'unknown');

/**
 * Failed sign-in attempts per 15 minutes per IP + e-mail (guessing one account's password).
 * Successful sign-ins don't count, so people and test suites that sign in often are not locked out.
 */
export function signInRateLimit(config: Pick<Config, 'signInRateLimit'>): RequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: config.signInRateLimit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const body: unknown = req.body;
      const raw =
        body && typeof body === 'object' && 'email' in body ? (body as { email: unknown }).email : '';
      const email = typeof raw === 'string' ? raw.trim().toLowerCase().slice(0, 254) : '';
      return `${ip(req)}|${email}`;
    },
    handler: limited('Too many sign-in attempts. Wait a few minutes and try again.'),
  });
}

/** Forgot/reset requests per 15 minutes per IP (mail flooding, token guessing). */
export function resetRateLimit(config: Pick<Config, 'resetRateLimit'>): RequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: config.resetRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => ip(req),
    handler: limited('Too many requests. Wait a few minutes and try again.'),
  });
}
