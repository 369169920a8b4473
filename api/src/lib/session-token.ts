import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';

export const SESSION_COOKIE = 'dm_session';

export interface SessionClaims {
  /** User id. */
  sub: string;
  /** Session row id. */
  sid: string;
  /** Issued at, seconds since the epoch. */
  iat: number;
  /** Expires at, seconds since the epoch. */
  exp: number;
  /** True when `exp` has passed: the token names its session but no longer opens it. */
  expired: boolean;
}

/**
 * The HMAC key object of a secret, made once. Given a string, jsonwebtoken derives a key object on
 * every call (first trying, and failing, to read it as a public key), about a millisecond per
 * request; the process has one secret (tests a few), so the keys are kept.
 */
const keys = new Map<string, KeyObject>();
function hmacKey(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) {
    if (keys.size >= 8) keys.clear();
    key = createSecretKey(Buffer.from(secret, 'utf8'));
    keys.set(secret, key);
  }
  return key;
}

/**
 * Signs the cookie's JWT (HS256), issued at `issuedAt` (the app's clock) and expiring at
 * `expiresAt`, which the caller keeps within the session's idle and absolute ends.
 */
export function signSessionToken(
  input: { userId: string; sessionId: string; issuedAt: Date; expiresAt: Date },
  secret: string,
): string {
  const iat = Math.floor(input.issuedAt.getTime() / 1000);
  const exp = Math.max(iat + 1, Math.floor(input.expiresAt.getTime() / 1000));
  return jwt.sign({ sid: input.sessionId, iat, exp }, hmacKey(secret), {
    algorithm: 'HS256',
    subject: input.userId,
  });
}

/**
 * Verifies signature and algorithm, and reads expiry against `now`; null for anything that isn't
 * a session token of ours. An expired token still answers (with `expired`), so the caller can say
 * why the session ended.
 */
export function verifySessionToken(token: string, secret: string, now: Date): SessionClaims | null {
  try {
    // Expiry is checked below against the app's clock, not the process's.
    const payload = jwt.verify(token, hmacKey(secret), { algorithms: ['HS256'], ignoreExpiration: true });
    if (typeof payload !== 'object' || payload === null) return null;
    const { sub, sid, iat, exp } = payload as Partial<SessionClaims>;
    if (
      typeof sub !== 'string' ||
      typeof sid !== 'string' ||
      typeof iat !== 'number' ||
      typeof exp !== 'number'
    ) {
      return null;
    }
    return { sub, sid, iat, exp, expired: exp * 1000 <= now.getTime() };
  } catch {
    return null;
  }
}
