import bcrypt from 'bcryptjs';

/** bcrypt cost factor for new hashes (2^12 rounds, roughly 250 ms on one core). */
export const BCRYPT_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
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
