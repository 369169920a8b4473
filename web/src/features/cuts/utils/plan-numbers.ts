import { parseTypedNumber, weightToKg, type WeightUnit } from '@driftmark/shared';

/** A cut-plan box's text as a number (the shared typing rule); empty or not a number → NaN. */
export function readNumber(value: unknown): number {
  if (typeof value === 'number') return value;
  return parseTypedNumber(String(value ?? '')) ?? Number.NaN;
}

/** A weight box read in the coach's unit and handed on in kg (the API takes kg only). */
export function readWeightKg(unit: WeightUnit) {
  return (value: unknown): number => {
    const n = readNumber(value);
    return Number.isNaN(n) ? n : weightToKg(n, unit);
  };
}
