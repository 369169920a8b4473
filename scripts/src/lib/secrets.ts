import { randomBytes } from 'node:crypto';
import { chmodSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { resolveDataRoot } from './data-root.js';

/** A random secret long enough for HS256 (api/src/config.ts requires at least 32 characters). */
export function generateSecret(): string {
  return randomBytes(48).toString('base64url');
}

/**
 * The JWT secret of this checkout: generated on first use and kept (0600) in the data folder, so
 * sessions survive restarts of `npm start`.
 */
export async function ensureJwtSecret(): Promise<string> {
  const file = path.join((await resolveDataRoot()).dir, 'jwt-secret');
  try {
    const existing = readFileSync(file, 'utf8').trim();
    if (existing.length >= 32) {
      chmodSync(file, 0o600);
      return existing;
    }
  } catch {
    // Not created yet.
  }
  const secret = generateSecret();
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  chmodSync(file, 0o600);
  return secret;
}
