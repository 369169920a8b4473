/**
 * Barcodes of packaged food: EAN-13 and UPC-A (GTIN-13 and GTIN-12). The last digit is a check
 * digit: from the right, the other digits are weighted 3, 1, 3, 1 … and the check digit brings the
 * sum up to a multiple of 10 (GS1 General Specifications §7.9.1, "standard check digit
 * calculation"; secondary source: the worked examples in the tests). Zod-free: the scanner reads it.
 */

/** Digits a GTIN-12 (UPC-A) or GTIN-13 (EAN-13) barcode carries. */
export const GTIN_LENGTHS = [12, 13] as const;

/** The check digit for the digits before it (any GTIN length). */
export function gtinCheckDigit(body: string): number {
  let sum = 0;
  for (let i = 0; i < body.length; i++) {
    const digit = body.charCodeAt(body.length - 1 - i) - 48;
    sum += digit * (i % 2 === 0 ? 3 : 1);
  }
  return (10 - (sum % 10)) % 10;
}

/** Why a typed barcode is refused, or null when it is a valid EAN-13 or UPC-A. */
export function barcodeProblem(code: string): string | null {
  if (!/^\d+$/.test(code)) return 'Type the digits under the barcode only';
  if (!(GTIN_LENGTHS as readonly number[]).includes(code.length))
    return 'A barcode has 13 digits (EAN-13) or 12 (UPC-A)';
  if (gtinCheckDigit(code.slice(0, -1)) !== Number(code.at(-1)))
    return 'Check the number: its last digit does not match the others';
  return null;
}

/**
 * The 13-digit form of a valid barcode: a UPC-A is the EAN-13 with a leading 0 (GS1), so both
 * printings of one product find the same food.
 */
export function normaliseBarcode(code: string): string {
  return code.length === 12 ? `0${code}` : code;
}
