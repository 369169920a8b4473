import bwipjs from 'bwip-js';
import { barcodeProblem, gtinCheckDigit } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { FAKE_PRODUCTS } from './food-products-fake.js';

/** bwip-js (a barcode writer) refuses an EAN-13 whose last digit is not the GS1 check digit. */
const bwipAccepts = async (code: string) =>
  bwipjs.toBuffer({ bcid: 'ean13', text: code }).then(
    () => true,
    () => false,
  );

describe('EAN-13 check digit against bwip-js', () => {
  it('agrees with bwip-js on the fake’s barcodes and on random ones', async () => {
    // A seeded walk over 12-digit bodies, so the check is the same on every run.
    let seed = 20261203;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31);
    const bodies = Array.from({ length: 40 }, () => String(next()).padStart(12, '7').slice(-12));
    for (const body of bodies) {
      const digit = gtinCheckDigit(body);
      expect(await bwipAccepts(`${body}${digit}`), body).toBe(true);
      expect(await bwipAccepts(`${body}${(digit + 1) % 10}`), body).toBe(false);
    }
  });

  it('gives every invented product a valid barcode in the GS1 in-store range (200–299)', () => {
    for (const product of FAKE_PRODUCTS) {
      expect(barcodeProblem(product.code), product.code).toBeNull();
      expect(product.code).toMatch(/^2\d{12}$/);
    }
  });
});
