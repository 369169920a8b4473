import { describe, expect, it } from 'vitest';
import { NBSP } from '../../../lib/format';
import {
  displayVolume,
  displayWeight,
  quickVolumeLabel,
  quickVolumes,
  volumeInputText,
  weightInputText,
} from './units';

describe('quick volumes', () => {
  it('offers common sizes in the athlete unit', () => {
    expect(quickVolumes('ml')).toEqual([250, 500, 750]);
    expect(quickVolumes('floz')).toEqual([8, 16, 24]);
    expect(quickVolumeLabel(250, 'ml')).toBe('+250 mL');
    expect(quickVolumeLabel(8, 'floz')).toBe('+8 fl oz');
  });
});

describe('display', () => {
  it('rounds weight to 0.1 in the reader unit (1 lb = 0.45359237 kg)', () => {
    expect(displayWeight(72.44, null, 'kg')).toBe(`72.4${NBSP}kg`);
    // 70 kg / 0.45359237 = 154.3234…
    expect(displayWeight(70, null, 'lb')).toBe(`154.3${NBSP}lb`);
    expect(displayWeight(70, null, 'kg')).toBe(`70.0${NBSP}kg`);
  });

  it('shows a value typed in the reader unit exactly as typed', () => {
    const kg = 154.3 * 0.45359237;
    expect(displayWeight(kg, { value: 154.3, unit: 'lb' }, 'lb')).toBe(`154.3${NBSP}lb`);
    expect(weightInputText(kg, { value: 154.3, unit: 'lb' }, 'lb')).toBe('154.3');
    // Read in the other unit it is converted: 69.989… kg
    expect(weightInputText(kg, { value: 154.3, unit: 'lb' }, 'kg')).toBe('70');
  });

  it('shows mL whole and fl oz to 0.1 (1 US fl oz = 29.5735295625 mL)', () => {
    expect(displayVolume(1249.6, null, 'ml')).toBe(`1,250${NBSP}mL`);
    // 1000 mL = 33.814 fl oz
    expect(displayVolume(1000, null, 'floz')).toBe(`33.8${NBSP}fl oz`);
    expect(displayVolume(8 * 29.5735295625, { value: 8, unit: 'floz' }, 'floz')).toBe(`8${NBSP}fl oz`);
    expect(volumeInputText(236.5882365, { value: 8, unit: 'floz' }, 'floz')).toBe('8');
    expect(volumeInputText(236.5882365, { value: 8, unit: 'floz' }, 'ml')).toBe('237');
  });
});
