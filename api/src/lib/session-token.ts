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

/** Signs the cookie's JWT (HS256). `expiresAt` is never later than the session's absolute end. */
export function signSessionToken(
  input: { userId: string; sessionId: string; expiresAt: Date },
  secret: string,
): string {
  const nowSeconds = Math.floor(Date.now() / 1000);
  const exp = Math.max(nowSeconds + 1, Math.floor(input.expiresAt.getTime() / 1000));
  return jwt.sign({ sid: input.sessionId, iat: nowSeconds, exp }, secret, {
    algorithm: 'HS256',
    subject: input.userId,
  });
}

/** Verifies signature, algorithm and expiry; null for anything that isn't a valid session token. */
export function verifySessionToken(token: string, secret: string): SessionClaims | null {
  try {
    const payload = jwt.verify(token, secret, { algorithms: ['HS256'] });
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
