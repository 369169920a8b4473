import { weightToKg, type WeightUnit } from '@driftmark/shared';
import { readBoxNumber } from '../../../lib/number-reader';

/** A weight box read in the coach's unit and handed on in kg (the API takes kg only). */
export function readWeightKg(unit: WeightUnit) {
  return (value: unknown): number => {
    const n = readBoxNumber(value);
    return Number.isNaN(n) ? n : weightToKg(n, unit);
  };
}
