import { describe, expect, it } from 'vitest';
import { csvField, toCsv } from './csv.js';

describe('csv', () => {
  it('quotes only fields that need it and doubles quotes', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField(12.5)).toBe('12.5');
    expect(csvField(null)).toBe('');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
  });

  it('ends every record with CRLF', () => {
    expect(
      toCsv([
        ['a', 'b'],
        [1, null],
      ]),
    ).toBe('a,b\r\n1,\r\n');
  });
});
