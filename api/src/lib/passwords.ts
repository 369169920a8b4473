import { passwordFitsHash } from '@driftmark/shared';
import bcrypt from 'bcryptjs';

/** bcrypt cost factor for new hashes (2^12 rounds, roughly 250 ms on one core). */
export const BCRYPT_COST = 12;

/** Hashes a new password; the schemas have refused anything bcrypt would cut (over 72 bytes). */
export function hashPassword(password: string): Promise<string> {
  if (!passwordFitsHash(password)) throw new Error('Password longer than bcrypt reads (72 bytes)');
  return bcrypt.hash(password, BCRYPT_COST);
}

/**
 * True when the password matches the hash. A password over 72 bytes never matches: bcrypt would
 * compare only its first 72 bytes, so a different tail would sign in. It still costs one compare,
 * like any wrong password.
 */
export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  if (!passwordFitsHash(password)) return verifyAgainstDummy(password.slice(0, 8));
  return bcrypt.compare(password, hash);
}

/**
 * A cost-12 bcrypt hash of a random string nobody knows. Verifying against it takes as long as
 * verifying a real password, and never succeeds (the function answers false regardless).
 */
const DUMMY_HASH = '$2b$12$4mEuO2tEwK1Lxdj1R1deZeQ8tNZ2MqEY7V2M8WnSDf/vHvXa6LD.m';

/**
 * Compares the password against a throwaway hash of the same cost and answers false, so a
 * sign-in for an unknown e-mail takes about as long as one for a known e-mail.
 */
export async function verifyAgainstDummy(password: string): Promise<false> {
  await bcrypt.compare(password, DUMMY_HASH);
  return false;
}
