import { parseTypedNumber } from '@driftmark/shared';

/**
 * A form box's value as a number for a schema (`setValueAs`): typed text ("1 200", "1,200") by the
 * shared rule; empty or not a number → NaN, which the schema refuses with its own message.
 */
export function readBoxNumber(value: unknown): number {
  if (typeof value === 'number') return value;
  return parseTypedNumber(String(value ?? '')) ?? Number.NaN;
}

/**
 * The saved SI value while its box still shows it as `show` wrote it, so a round trip through the
 * viewer's unit (0.1 lb, 0.1 in) does not nudge it; undefined once the box says something else.
 */
export function savedIfShown(
  text: string,
  saved: number | null | undefined,
  show: (si: number) => string,
): number | undefined {
  return saved !== null && saved !== undefined && text.trim() === show(saved) ? saved : undefined;
}

/** What a number box says when its text is not a number. */
export const NOT_A_NUMBER = 'Enter a number, e.g. 72.5';

/** Reads several boxes at once and collects "not a number" errors by field name. */
export function numberReader<F extends string>() {
  const errors: Partial<Record<F, string>> = {};
  return {
    errors,
    /** Empty → undefined; text that is not a number → NaN and an error on `field`. */
    required(field: F, text: string): number | undefined {
      const n = parseTypedNumber(text);
      if (n !== undefined && Number.isNaN(n)) errors[field] = NOT_A_NUMBER;
      return n;
    },
    /** Empty → null (clears a saved value); otherwise like `required`. */
    optional(field: F, text: string): number | null {
      const n = this.required(field, text);
      return n === undefined ? null : n;
    },
  };
}

/** A schema's SI range said in the reader's unit, rounded inward to `digits` so both ends are allowed. */
export function rangeInUnit(
  limits: { min: number; max: number },
  fromSi: (si: number) => number,
  digits = 1,
): { min: number; max: number } {
  const f = 10 ** digits;
  return {
    min: Math.ceil(fromSi(limits.min) * f - 1e-9) / f,
    max: Math.floor(fromSi(limits.max) * f + 1e-9) / f,
  };
}

/**
 * A box typed in the reader's unit but checked by a schema in SI ("Waist must be at least 40 cm"):
 * the schema's range message said again in the reader's unit ("… at least 15.8 in"), by the issue
 * type the resolver reports. Other messages pass unchanged.
 */
export function rangeMessageInUnit(
  error: { type?: string; message?: string },
  box: {
    subject: string;
    limits: { min: number; max: number };
    fromSi: (si: number) => number;
    unit: string;
  },
): string | undefined {
  const range = rangeInUnit(box.limits, box.fromSi);
  if (error.type === 'too_small') return `${box.subject} must be at least ${range.min} ${box.unit}`;
  if (error.type === 'too_big') return `${box.subject} must be at most ${range.max} ${box.unit}`;
  return error.message;
}
