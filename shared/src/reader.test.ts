import { describe, expect, it } from 'vitest';
import { inReaderUnits, massText, possessive, volumeText } from './reader.js';

// Factors: 1 lb = 0.45359237 kg, 1 US fl oz = 29.5735295625 mL (NIST SP 811, App. B).

describe('inReaderUnits', () => {
  const lbFloz = { weight: 'lb', volume: 'floz' } as const;

  it('leaves a metric reader’s text alone', () => {
    const text = 'Down 1.6 kg (2.0 %) since 2026-11-28; 1,500 mL after 18:00';
    expect(inReaderUnits(text, { weight: 'kg', volume: 'ml' })).toBe(text);
  });

  it('converts kg and mL figures for a reader in lb and fl oz', () => {
    // 1.6 kg = 3.527 lb; 1,500 mL = 50.72 fl oz; 80 kg = 176.37 lb.
    expect(inReaderUnits('Down 1.6 kg (2.0 %) since 2026-11-28: 80 kg', lbFloz)).toBe(
      'Down 3.5 lb (2.0 %) since 2026-11-28: 176.4 lb',
    );
    expect(inReaderUnits('fluids stop at 18:00 with 1,500 mL allowed after', lbFloz)).toBe(
      'fluids stop at 18:00 with 50.7 fl oz allowed after',
    );
    expect(inReaderUnits('350 mL of fluids after the 18:00 cut-off beyond the allowance', lbFloz)).toBe(
      '11.8 fl oz of fluids after the 18:00 cut-off beyond the allowance',
    );
  });

  it('converts each unit on its own and leaves g/kg, kcal and percentages', () => {
    expect(inReaderUnits('2.2 g/kg, 2,400 kcal, 250 mL', { weight: 'kg', volume: 'floz' })).toBe(
      '2.2 g/kg, 2,400 kcal, 8.5 fl oz',
    );
    expect(inReaderUnits('water 2,500 mL, weight 70.5 kg', { weight: 'lb', volume: 'ml' })).toBe(
      'water 2,500 mL, weight 155.4 lb',
    );
  });
});

describe('figures and wording', () => {
  it('formats in the reader’s unit', () => {
    expect(massText(80, 'lb')).toBe('176.4 lb');
    expect(volumeText(250, 'floz')).toBe('8.5 fl oz');
    expect(volumeText(250, 'ml')).toBe('250 mL');
  });

  it('says "your" to the athlete and names the athlete to staff', () => {
    expect(possessive({ aboutAthlete: null })).toBe('your');
    expect(possessive({ aboutAthlete: 'Mateo Ruiz' })).toBe("Mateo's");
    expect(possessive({ aboutAthlete: 'Jules' })).toBe("Jules'");
  });
});
