/**
 * How a number typed into a box is read, on every form of the product (one rule, one place).
 *
 * - Spaces are ignored ("2 300" → 2300).
 * - Commas that group thousands are dropped: a comma followed by exactly three digits, in a number
 *   whose every comma does so, starting with 1–3 digits ("2,300" → 2300, "12,500.5" → 12500.5).
 *   Figures are shown with thousands commas, so a figure copied back reads as shown.
 * - Otherwise one comma is a decimal comma ("72,5" → 72.5, "0,75" → 0.75).
 * - "" (or only spaces) → undefined: the schema then says what is required.
 * - Anything else that is not a plain decimal number → NaN, which the form reports as "not a number".
 *
 * The one ambiguous case, a single comma before exactly three digits ("2,300"), is read as
 * thousands: a decimal comma with three decimals is rare in what athletes type (weights to 0.1,
 * volumes in whole mL), and a misread value then fails the field's range check rather than
 * passing silently (72,500 kg is refused).
 */
export function parseTypedNumber(text: string | null | undefined): number | undefined {
  let t = (text ?? '').trim().replace(/\s+/g, '');
  if (t === '') return undefined;
  t = /^[+-]?[1-9]\d{0,2}(,\d{3})+(\.\d+)?$/.test(t) ? t.replaceAll(',', '') : t.replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return Number(t);
}

/** A number put back into a box: rounded to `digits` decimals, without trailing zeros, never "-0". */
export function toTypedText(value: number | null | undefined, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const f = 10 ** digits;
  const rounded = Math.round(value * f) / f;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}
