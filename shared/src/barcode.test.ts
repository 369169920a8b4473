import { describe, expect, it } from 'vitest';
import { barcodeProblem, gtinCheckDigit, normaliseBarcode } from './barcode.js';

describe('GTIN check digit', () => {
  // Worked examples of the GS1 mod-10 check digit as printed in the encyclopedia articles on EAN-13
  // and UPC (secondary source): 400638133393|1 and 03600029145|2.
  it('matches the published EAN-13 example 4006381333931', () => {
    expect(gtinCheckDigit('400638133393')).toBe(1);
    expect(barcodeProblem('4006381333931')).toBeNull();
  });

  it('matches the published UPC-A example 036000291452', () => {
    expect(gtinCheckDigit('03600029145')).toBe(2);
    expect(barcodeProblem('036000291452')).toBeNull();
  });

  // GS1 General Specifications §7.9.1 worked example, from memory: GTIN-13 629104150021|3.
  it('matches the GS1 check-digit example 6291041500213 (from memory)', () => {
    expect(gtinCheckDigit('629104150021')).toBe(3);
  });

  it('refuses a wrong last digit, letters and other lengths, naming why', () => {
    expect(barcodeProblem('4006381333932')).toMatch(/last digit/);
    expect(barcodeProblem('036000291453')).toMatch(/last digit/);
    expect(barcodeProblem('40063813339X1')).toMatch(/digits/);
    expect(barcodeProblem('40063813')).toMatch(/13 digits/);
  });

  it('reads a UPC-A as the EAN-13 with a leading 0', () => {
    expect(normaliseBarcode('036000291452')).toBe('0036000291452');
    expect(barcodeProblem(normaliseBarcode('036000291452'))).toBeNull();
    expect(normaliseBarcode('4006381333931')).toBe('4006381333931');
  });
});
