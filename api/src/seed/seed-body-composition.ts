import type { SkinfoldSite } from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import { localInstant } from '../lib/local-time.js';
import { BodyMeasurementRepository } from '../repositories/body-measurement.repository.js';
import { addDays, localDate } from './calendar.js';
import { DEMO_ATHLETES, type DemoSituation } from './demo-team.js';
import type { DemoPlanIds } from './seed-plans.js';

/** One demo measurement, placed relative to the seed day in the athlete's time zone. */
export interface DemoBodyMeasurement {
  daysBeforeSeed: number;
  skinfoldsMm: Partial<Record<SkinfoldSite, number>>;
}

/**
 * Hannah (long diet) is measured by her coach every four weeks with the 3 sites of Jackson,
 * Pollock & Ward (triceps, suprailiac, thigh): the sums fall from 72 to 54 mm over twelve weeks,
 * about 25 → 21 % fat, so her coach sees % fat, lean mass and a lean-mass protein target. Placed on
 * purpose (never drawn), within her 120 days of weigh-ins, so each has a trend weight.
 */
export const DEMO_BODY_MEASUREMENTS: Partial<Record<DemoSituation, readonly DemoBodyMeasurement[]>> = {
  long_diet: [
    { daysBeforeSeed: 85, skinfoldsMm: { triceps: 21, suprailiac: 19, thigh: 32 } },
    { daysBeforeSeed: 57, skinfoldsMm: { triceps: 19.5, suprailiac: 17, thigh: 30 } },
    { daysBeforeSeed: 29, skinfoldsMm: { triceps: 18, suprailiac: 15, thigh: 27.5 } },
    { daysBeforeSeed: 1, skinfoldsMm: { triceps: 16.5, suprailiac: 13, thigh: 24.5 } },
  ],
};

/** Writes the demo measurements, entered and taken by each athlete's coach (the owner). */
export async function writeDemoBodyMeasurements(
  manager: EntityManager,
  ids: DemoPlanIds,
  now: Date,
  coachName: string,
): Promise<void> {
  const repo = new BodyMeasurementRepository(manager);
  for (const def of DEMO_ATHLETES) {
    const athleteId = ids.athleteIds.get(def.key);
    const list = DEMO_BODY_MEASUREMENTS[def.key];
    if (!athleteId || !list) continue;
    const seedDay = localDate(now, def.timeZone);
    for (const m of list) {
      const localDate = addDays(seedDay, -m.daysBeforeSeed);
      await repo.insert({
        athleteId,
        localDate,
        // Entered that morning, after the weigh-in, on the athlete's clock.
        createdAt: localInstant(localDate, '08:30', def.timeZone),
        method: 'skinfold_3',
        densityEquation: 'siri',
        skinfoldsMm: m.skinfoldsMm,
        neckCm: null,
        waistCm: null,
        hipCm: null,
        heightCm: null,
        measuredBy: coachName,
        enteredById: ids.ownerId,
      });
    }
  }
}
