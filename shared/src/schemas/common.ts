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

/** A new password: length only, long passphrases welcome. */
export const newPassword = z
  .string({ error: 'Password is required' })
  .min(LIMITS.password.min, `At least ${LIMITS.password.min} characters`)
  .max(LIMITS.password.max, `At most ${LIMITS.password.max} characters`);

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
