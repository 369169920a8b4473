import { createHash, randomBytes } from 'node:crypto';

/** A URL-safe secret for e-mailed links: 32 random bytes, base64url (43 characters). */
export function generateToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What is stored for a token: its sha256, hex. A leaked table cannot be replayed. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
