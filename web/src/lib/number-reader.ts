import { parseTypedNumber } from '@driftmark/shared';

/**
 * A form box's value as a number for a schema (`setValueAs`): typed text ("1 200", "1,200") by the
 * shared rule; empty or not a number → NaN, which the schema refuses with its own message.
 */
export function readBoxNumber(value: unknown): number {
  if (typeof value === 'number') return value;
  return parseTypedNumber(String(value ?? '')) ?? Number.NaN;
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
