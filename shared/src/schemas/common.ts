import { addYears, isIsoDate } from '../calendar.js';
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

/**
 * Control characters other than tab (U+0009) and newline (U+000A): C0, DEL and C1. A NUL cannot
 * be stored in PostgreSQL text and the others only hide or mangle what a reader sees.
 */
const CONTROL_CHARACTERS = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/;

/** Half of a surrogate pair without its other half: not a character, cannot be encoded as UTF-8. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** True when `value` has no control character other than tab and newline. */
export function hasNoControlCharacters(value: string): boolean {
  return !CONTROL_CHARACTERS.test(value);
}

/** Removes control characters other than tab and newline (file names and other text we only show). */
export function stripControlCharacters(value: string): string {
  return value.replace(new RegExp(CONTROL_CHARACTERS.source, 'g'), '');
}

/**
 * The one input policy for free text (notes, names, questions, reasons, replies…): line ends
 * become `\n`; any other control character (NUL included) or a broken surrogate pair is refused
 * with a message naming the field; the value is trimmed and NFC-normalised, then its length is
 * checked (`min` only when given; a required field says "<label> is required").
 */
export function text(label: string, limits: { min?: number; max: number }, minMessage?: string) {
  let schema = z
    .string({ error: `${label} is required` })
    .overwrite((v) => v.replace(/\r\n?/g, '\n'))
    .refine(hasNoControlCharacters, `${label} contains a control character; remove it`)
    .refine((v) => !LONE_SURROGATE.test(v), `${label} contains a broken character; retype it`)
    .trim()
    .normalize('NFC');
  if (limits.min !== undefined && limits.min > 0) {
    schema = schema.min(
      limits.min,
      minMessage ?? (limits.min === 1 ? `${label} is required` : `At least ${limits.min} characters`),
    );
  }
  return schema.max(limits.max, `At most ${limits.max} characters`);
}

/** A person's display name. */
export const personName = text('Name', LIMITS.name);

/** A calendar date, `YYYY-MM-DD`. */
export const isoDate = z
  .string({ error: 'Date is required' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use the form YYYY-MM-DD')
  .refine(isIsoDate, 'Not a real date');

/**
 * The windows a date may fall in, from `today` (YYYY-MM-DD): `past` for what has happened (entries,
 * history: back LIMITS.dateWindow.historyYears, not after today), `any` for what may also be ahead
 * (events, plan versions, marks, query ranges: up to LIMITS.dateWindow.aheadYears ahead).
 */
export function dateWindow(today: string, kind: 'past' | 'any'): { earliest: string; latest: string } {
  return {
    earliest: addYears(today, -LIMITS.dateWindow.historyYears),
    latest: kind === 'past' ? today : addYears(today, LIMITS.dateWindow.aheadYears),
  };
}

/** Why `date` is outside its window, or null. */
export function dateWindowProblem(date: string, today: string, kind: 'past' | 'any'): string | null {
  const { earliest, latest } = dateWindow(today, kind);
  if (date < earliest) return `No earlier than ${earliest} (${LIMITS.dateWindow.historyYears} years back)`;
  if (date > latest)
    return kind === 'past'
      ? 'That date is still in the future'
      : `No later than ${latest} (${LIMITS.dateWindow.aheadYears} years ahead)`;
  return null;
}

/**
 * `schema` (an object) with its top-level date fields held to their windows as of `today`; each
 * refusal names its field. Routes build it per request from their clock:
 * `validate({ body: (req) => datesWithin(schema, todayOf(req), { eventDate: 'any' }) })`.
 */
export function datesWithin<T extends z.ZodType>(
  schema: T,
  today: string,
  fields: Record<string, 'past' | 'any'>,
): T {
  return schema.superRefine((value, ctx) => {
    if (!value || typeof value !== 'object') return;
    for (const [field, kind] of Object.entries(fields)) {
      const date = (value as Record<string, unknown>)[field];
      if (typeof date !== 'string') continue;
      const problem = dateWindowProblem(date, today, kind);
      if (problem) ctx.addIssue({ code: 'custom', path: [field], message: problem });
    }
  }) as unknown as T;
}

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
