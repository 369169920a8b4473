/** What a number box says when its text is not a number. */
export const NOT_A_NUMBER = 'Enter a number, e.g. 72.5';

/**
 * Reads a typed number: "" → undefined (the schema then says what is required), a decimal comma
 * is accepted ("72,5"), anything else that is not a plain number → NaN.
 */
export function parseDecimal(text: string | null | undefined): number | undefined {
  const t = (text ?? '').trim().replace(/\s+/g, '').replace(',', '.');
  if (t === '') return undefined;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return Number(t);
}

/** A number put back into a box: rounded to `digits`, without trailing zeros ("72.5", "2839"). */
export function toInputText(value: number | null | undefined, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const f = 10 ** digits;
  const rounded = Math.round(value * f) / f;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/** Reads several boxes at once and collects "not a number" errors by field name. */
export function numberReader<F extends string>() {
  const errors: Partial<Record<F, string>> = {};
  return {
    errors,
    /** Empty → undefined; text that is not a number → NaN and an error on `field`. */
    required(field: F, text: string): number | undefined {
      const n = parseDecimal(text);
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
