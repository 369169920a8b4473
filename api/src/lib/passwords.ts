import os from 'node:os';
import { passwordFitsHash } from '@driftmark/shared';
import { Piscina } from 'piscina';

/** bcrypt cost factor for new hashes (2^12 rounds, roughly 250 ms on one core). */
export const BCRYPT_COST = 12;

type PasswordTask =
  { op: 'hash'; password: string; cost: number } | { op: 'compare'; password: string; hash: string };

/**
 * bcrypt runs in a small pool of worker threads (api/workers/password-worker.mjs), never on the
 * event loop: one hash is ~250 ms of CPU, and a burst of sign-ins would otherwise hold up every
 * other request. The same relative path works from src/lib (tsx, vitest) and dist/lib (built).
 * Idle workers end after a minute and never keep the process alive.
 */
let pool: Piscina<PasswordTask, string | boolean> | undefined;

function passwordPool(): Piscina<PasswordTask, string | boolean> {
  pool ??= new Piscina<PasswordTask, string | boolean>({
    filename: new URL('../../workers/password-worker.mjs', import.meta.url).href,
    minThreads: 0,
    // One core stays with the event loop, so a burst of sign-ins queues here instead of slowing every request.
    maxThreads: Math.min(4, Math.max(1, os.availableParallelism() - 1)),
    idleTimeout: 60_000,
  });
  return pool;
}

/** Ends the pool's workers (graceful shutdown); the next use starts a new pool. */
export async function closePasswordPool(): Promise<void> {
  const current = pool;
  pool = undefined;
  await current?.close();
}

/** Hashes a new password; the schemas have refused anything bcrypt would cut (over 72 bytes). */
export async function hashPassword(password: string): Promise<string> {
  if (!passwordFitsHash(password)) throw new Error('Password longer than bcrypt reads (72 bytes)');
  return (await passwordPool().run({ op: 'hash', password, cost: BCRYPT_COST })) as string;
}

/**
 * True when the password matches the hash. A password over 72 bytes never matches: bcrypt would
 * compare only its first 72 bytes, so a different tail would sign in. It still costs one compare,
 * like any wrong password.
 */
export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  if (!passwordFitsHash(password)) return verifyAgainstDummy(password.slice(0, 8));
  return (await passwordPool().run({ op: 'compare', password, hash })) as boolean;
}

/**
 * A cost-12 bcrypt hash of a random string nobody knows. Verifying against it takes as long as
 * verifying a real password, and never succeeds (the function answers false regardless).
 */
const DUMMY_HASH = '$2b$12$4mEuO2tEwK1Lxdj1R1deZeQ8tNZ2MqEY7V2M8WnSDf/vHvXa6LD.m';

/**
 * Compares the password against a throwaway hash of the same cost and answers false, so a
 * sign-in for an unknown e-mail takes about as long as one for a known e-mail (in the pool, off
 * the event loop).
 */
export async function verifyAgainstDummy(password: string): Promise<false> {
  await passwordPool().run({ op: 'compare', password, hash: DUMMY_HASH });
  return false;
}
