import { isStaffRole, type Role } from '@driftmark/shared';
import type { Config } from '../config.js';

/**
 * How long a session lives, the one place that decides it (the cookie, the JWT, the devices list
 * and `authenticate()` all ask here).
 *
 * Two clocks per session: an idle end that slides (last seen + idle lifetime; "last seen" moves
 * when the cookie is replaced, at most once per SESSION_REFRESH_MINUTES) and an absolute end fixed
 * at sign-in that no activity moves. Defaults (config.ts), common practice, no source: an athlete
 * on their own phone logs morning and evening and should not retype a password for weeks, so
 * 30 days idle and 90 days absolute; staff read many athletes' health data, often on shared or
 * office machines, so 12 hours idle (a working day) and 14 days absolute. For comparison, from
 * memory: NIST SP 800-63B-3 §4.1.3 asks for reauthentication at least every 30 days at its lowest
 * assurance level and every 12 hours at the next; the athlete's 90 days is a deliberate trade for
 * a phone-first daily log and stays revocable from any signed-in device.
 */
export type SessionLifetimeConfig = Pick<Config, 'sessionLifetimes'>;

export function lifetimeFor(
  role: Role,
  config: SessionLifetimeConfig,
): { idleMs: number; absoluteMs: number } {
  return isStaffRole(role) ? config.sessionLifetimes.staff : config.sessionLifetimes.athlete;
}

/** The absolute end of a session opened at `startedAt` by a user with `role`. */
export function absoluteEnd(role: Role, startedAt: Date, config: SessionLifetimeConfig): Date {
  return new Date(startedAt.getTime() + lifetimeFor(role, config).absoluteMs);
}

/** When the session ends if nobody uses it again: last seen + idle lifetime, never past the absolute end. */
export function sessionEnd(
  session: { lastSeenAt: Date; expiresAt: Date },
  role: Role,
  config: SessionLifetimeConfig,
): Date {
  const idleEnd = session.lastSeenAt.getTime() + lifetimeFor(role, config).idleMs;
  return new Date(Math.min(idleEnd, session.expiresAt.getTime()));
}

export type SessionState = 'live' | 'revoked' | 'ended';

/** Live, revoked (signed out: this device, another one, a password change) or ended (idle or absolute end passed). */
export function sessionState(
  session: { lastSeenAt: Date; expiresAt: Date; revokedAt: Date | null },
  role: Role,
  config: SessionLifetimeConfig,
  now: Date,
): SessionState {
  if (session.revokedAt) return 'revoked';
  return sessionEnd(session, role, config).getTime() > now.getTime() ? 'live' : 'ended';
}
