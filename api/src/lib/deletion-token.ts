/**
 * The token in an account deletion link: a JWT (HS256, the app's JWT secret) with its own audience,
 * so neither a session nor an unsubscribe token is ever accepted here. It names the user and
 * expires after DELETION_TOKEN_TTL_SECONDS; once the account is gone it names no one.
 */
import jwt from 'jsonwebtoken';

const AUDIENCE = 'driftmark:account-deletion';
/** How long a deletion link stays valid (one hour). */
export const DELETION_TOKEN_TTL_SECONDS = 60 * 60;

export function signDeletionToken(userId: string, secret: string, now: Date): string {
  const iat = Math.floor(now.getTime() / 1000);
  return jwt.sign({ sub: userId, iat, exp: iat + DELETION_TOKEN_TTL_SECONDS }, secret, {
    algorithm: 'HS256',
    audience: AUDIENCE,
  });
}

/** The user a valid, unexpired token names, or null. */
export function verifyDeletionToken(token: string, secret: string, now: Date): string | null {
  try {
    const payload = jwt.verify(token, secret, {
      algorithms: ['HS256'],
      audience: AUDIENCE,
      clockTimestamp: Math.floor(now.getTime() / 1000),
    });
    if (typeof payload !== 'object' || payload === null) return null;
    return typeof payload.sub === 'string' ? payload.sub : null;
  } catch {
    return null;
  }
}
