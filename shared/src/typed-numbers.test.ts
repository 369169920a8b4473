import { describe, expect, it } from 'vitest';
import { parseTypedNumber, toTypedText } from './typed-numbers.js';

// The rule is the product's own (documented in typed-numbers.ts); the cases pin each clause.
describe('parseTypedNumber', () => {
  it.each([
    ['', undefined],
    ['   ', undefined],
    ['72.5', 72.5],
    ['72,5', 72.5],
    ['0,75', 0.75],
    ['.5', 0.5],
    ['2 300', 2300],
    ['2,300', 2300],
    ['12,500.5', 12500.5],
    ['1,234,567', 1234567],
    ['-1,5', -1.5],
    ['+3', 3],
    ['2,30', 2.3],
    ['2,3000', 2.3],
  ])('reads %j as %s', (text, expected) => {
    expect(parseTypedNumber(text)).toBe(expected);
  });

  it.each(['abc', '1.2.3', '1,2,3', '72kg', '1e3', '0x10', ',', '--1'])('refuses %j as NaN', (text) => {
    expect(parseTypedNumber(text)).toBeNaN();
  });
});

describe('toTypedText', () => {
  it('rounds without trailing zeros and never shows -0', () => {
    expect(toTypedText(72.04)).toBe('72');
    expect(toTypedText(72.05, 2)).toBe('72.05');
    expect(toTypedText(2839.4, 0)).toBe('2839');
    expect(toTypedText(-0.01)).toBe('0');
    expect(toTypedText(null)).toBe('');
    expect(toTypedText(Number.NaN)).toBe('');
  });
});
