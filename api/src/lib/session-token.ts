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

/** Signs the cookie's JWT (HS256). `expiresAt` is never later than the session's absolute end. */
export function signSessionToken(
  input: { userId: string; sessionId: string; expiresAt: Date },
  secret: string,
): string {
  const nowSeconds = Math.floor(Date.now() / 1000);
  const exp = Math.max(nowSeconds + 1, Math.floor(input.expiresAt.getTime() / 1000));
  return jwt.sign({ sid: input.sessionId, iat: nowSeconds, exp }, hmacKey(secret), {
    algorithm: 'HS256',
    subject: input.userId,
  });
}

/** Verifies signature, algorithm and expiry; null for anything that isn't a valid session token. */
export function verifySessionToken(token: string, secret: string): SessionClaims | null {
  try {
    const payload = jwt.verify(token, hmacKey(secret), { algorithms: ['HS256'] });
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
    return { sub, sid, iat, exp };
  } catch {
    return null;
  }
}
