import type { BodyFatEstimate, BodyMeasurementView } from '@driftmark/shared';
import type { BodyMeasurementWithAuthor } from '../repositories/body-measurement.repository.js';

/** A measurement with its estimate and the masses the service worked out. */
export function presentBodyMeasurement(
  row: BodyMeasurementWithAuthor,
  figures: {
    estimate: BodyFatEstimate | null;
    trendWeightKg: number | null;
    fatMassKg: number | null;
    leanMassKg: number | null;
  },
): BodyMeasurementView {
  return {
    id: row.id,
    date: row.localDate,
    method: row.method,
    densityEquation: row.densityEquation,
    skinfoldsMm: row.skinfoldsMm,
    neckCm: row.neckCm,
    waistCm: row.waistCm,
    hipCm: row.hipCm,
    heightCm: row.heightCm,
    measuredBy: row.measuredBy,
    enteredBy: { id: row.enteredBy.id, name: row.enteredBy.name },
    ...figures,
  };
}
