import { isIsoDate } from '../calendar.js';
import { z } from 'zod';
import { LIMITS } from '../limits.js';
import { isValidTimeZone } from '../time-zones.js';

/** An e-mail address, trimmed and lower-cased. */
export const email = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .max(LIMITS.email.max, `At most ${LIMITS.email.max} characters`)
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

/** Bytes of a string in UTF-8 (what bcrypt reads), in the browser and on the server alike. */
export function utf8Bytes(s: string): number {
  let bytes = 0;
  // Code points (a surrogate pair is one): 1 byte up to U+007F, 2 up to U+07FF, 3 up to U+FFFF,
  // 4 beyond (RFC 3629 §3). A lone surrogate becomes U+FFFD when encoded: 3 bytes.
  for (const ch of s) {
    const cp = ch.codePointAt(0) ?? 0;
    bytes += cp <= 0x7f ? 1 : cp <= 0x7ff ? 2 : cp <= 0xffff ? 3 : 4;
  }
  return bytes;
}

/** True when bcrypt would read the whole password (at most `LIMITS.password.maxBytes` UTF-8 bytes). */
export function passwordFitsHash(password: string): boolean {
  return utf8Bytes(password) <= LIMITS.password.maxBytes;
}

/**
 * A new password: length only, passphrases welcome up to 72 bytes (bcrypt ignores anything
 * beyond, so a longer one is refused instead of silently cut).
 */
export const newPassword = z
  .string({ error: 'Password is required' })
  .min(LIMITS.password.min, `At least ${LIMITS.password.min} characters`)
  .max(LIMITS.password.max, `At most ${LIMITS.password.max} characters`)
  .refine(
    passwordFitsHash,
    `At most ${LIMITS.password.maxBytes} bytes: ${LIMITS.password.maxBytes} plain letters and digits, fewer with accented letters or emoji`,
  );

/** A person's display name. */
export const personName = z
  .string({ error: 'Name is required' })
  .trim()
  .min(LIMITS.name.min, 'Name is required')
  .max(LIMITS.name.max, `At most ${LIMITS.name.max} characters`);

/** A calendar date, `YYYY-MM-DD`. */
export const isoDate = z
  .string({ error: 'Date is required' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use the form YYYY-MM-DD')
  .refine(isIsoDate, 'Not a real date');

/** A clock time, `HH:MM` (24 h). */
export const clockTime = z
  .string({ error: 'Time is required' })
  .regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use the form HH:MM (24 h)');

/** An IANA time zone such as `Europe/Lisbon`. */
export const timeZone = z
  .string({ error: 'Time zone is required' })
  .refine(isValidTimeZone, 'Choose a time zone from the list');

/** A uuid (ids in paths and bodies). */
export const uuid = z.uuid({ error: 'Not a valid id' });
