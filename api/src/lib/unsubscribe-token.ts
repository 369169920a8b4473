/**
 * The token in one-click unsubscribe links: a JWT (HS256, the app's JWT secret) naming the user
 * and one notification kind. It has its own audience, so a session token is never accepted here
 * and an unsubscribe token never signs anyone in. It does not expire: an old e-mail's link still
 * stops that kind of e-mail (it can do nothing else).
 */
import { NOTIFICATION_KINDS, type NotificationKind } from '@driftmark/shared';
import jwt from 'jsonwebtoken';

const AUDIENCE = 'driftmark:unsubscribe';

export function signUnsubscribeToken(userId: string, kind: NotificationKind, secret: string): string {
  return jwt.sign({ sub: userId, kind }, secret, {
    algorithm: 'HS256',
    audience: AUDIENCE,
    noTimestamp: true,
  });
}

/** The user and kind a valid token names, or null for anything else. */
export function verifyUnsubscribeToken(
  token: string,
  secret: string,
): { userId: string; kind: NotificationKind } | null {
  try {
    const payload = jwt.verify(token, secret, { algorithms: ['HS256'], audience: AUDIENCE });
    if (typeof payload !== 'object' || payload === null) return null;
    const { sub, kind } = payload as { sub?: unknown; kind?: unknown };
    if (typeof sub !== 'string' || typeof kind !== 'string') return null;
    if (!(NOTIFICATION_KINDS as readonly string[]).includes(kind)) return null;
    return { userId: sub, kind: kind as NotificationKind };
  } catch {
    return null;
  }
}
