import type { EntityManager } from 'typeorm';
import { localInstant } from '../lib/local-time.js';
import { CutPlanRepository } from '../repositories/cut-plan.repository.js';
import { addDays, localDate } from './calendar.js';
import { DEMO_ATHLETES, type DemoSituation } from './demo-team.js';
import { modelWeightKg } from './history.js';
import type { DemoPlanIds } from './seed-plans.js';

/** A demo practice run, placed relative to the seed day in the athlete's time zone. */
export interface DemoRehearsal {
  /** The practice weigh-in, days before the seed day. */
  weighInDaysBeforeSeed: number;
  acuteDays: number;
  /** The chronic part's length before the acute days, days. */
  chronicDays: number;
  steps: string;
  /** Day notes by days before the seed; `athlete` or the coach wrote each. */
  notes: readonly { daysBeforeSeed: number; by: 'athlete' | 'coach'; text: string }[];
}

/**
 * Aroha (weigh-in) rehearsed her cut a month out: two acute days down to a practice weigh-in at
 * t = 31 (her scripted weigh-ins and symptom report in history.ts SCRIPTS), the coach and Aroha
 * wrote what was done each day. The plan's weights are her model curve's on those days.
 */
export const DEMO_REHEARSALS: Partial<Record<DemoSituation, DemoRehearsal>> = {
  weigh_in: {
    weighInDaysBeforeSeed: 31,
    acuteDays: 2,
    chronicDays: 14,
    steps:
      'Low-fibre, low-residue food from two days out; sodium kept as usual; fluid as usual until the ' +
      'evening before, then to thirst; a practice weigh-in at 18:00 on the club scale.',
    notes: [
      {
        daysBeforeSeed: 33,
        by: 'coach',
        text: 'Low-residue food from breakfast; normal training, normal fluid.',
      },
      { daysBeforeSeed: 32, by: 'athlete', text: 'Low-fibre day. Felt flat at randori, otherwise fine.' },
      {
        daysBeforeSeed: 31,
        by: 'athlete',
        text: 'Practice weigh-in at 18:00 on the club scale. Headache in the evening, drank and ate after.',
      },
      {
        daysBeforeSeed: 30,
        by: 'coach',
        text: 'Ate and drank to the recovery checklist; light technique session.',
      },
    ],
  },
};

const tenth = (kg: number) => Math.round(kg * 10) / 10;

/** Writes the demo rehearsals (rehearsal cut plans) and their day notes, saved by the owner. */
export async function writeDemoRehearsals(
  manager: EntityManager,
  ids: DemoPlanIds,
  now: Date,
): Promise<void> {
  const repo = new CutPlanRepository(manager);
  for (const def of DEMO_ATHLETES) {
    const athleteId = ids.athleteIds.get(def.key);
    const r = DEMO_REHEARSALS[def.key];
    if (!athleteId || !r || def.event.type !== 'weigh_in' || def.event.weighInLimitKg === null) continue;
    const seedDay = localDate(now, def.timeZone);
    const preAcuteT = r.weighInDaysBeforeSeed + r.acuteDays;
    const startT = preAcuteT + r.chronicDays;
    const plan = await repo.create(
      {
        athleteId,
        weighInDate: addDays(seedDay, -r.weighInDaysBeforeSeed),
        limitKg: def.event.weighInLimitKg,
        startDate: addDays(seedDay, -startT),
        startKg: tenth(modelWeightKg(def, startT)),
        preAcuteKg: tenth(modelWeightKg(def, preAcuteT)),
        acuteDays: r.acuteDays,
        path: 'linear',
        thresholdPct: 5,
        notes: r.steps,
        rehearsal: true,
        createdById: ids.ownerId,
      },
      [],
    );
    // Saved the evening the chronic part started, on the athlete's clock.
    await manager.query(`UPDATE cut_plans SET created_at = $2, updated_at = $2 WHERE id = $1`, [
      plan.id,
      localInstant(addDays(seedDay, -startT), '19:00', def.timeZone),
    ]);
    const rows = await manager.query<{ user_id: string }[]>(`SELECT user_id FROM athletes WHERE id = $1`, [
      athleteId,
    ]);
    const athleteUserId = rows[0]!.user_id;
    for (const n of r.notes) {
      const date = addDays(seedDay, -n.daysBeforeSeed);
      await repo.setNote(plan, date, n.text, n.by === 'athlete' ? athleteUserId : ids.ownerId);
      // Written that evening, on the athlete's clock.
      await manager.query(
        `UPDATE cut_rehearsal_notes SET created_at = $3, updated_at = $3 WHERE cut_plan_id = $1 AND local_date = $2`,
        [plan.id, date, localInstant(date, '21:00', def.timeZone)],
      );
    }
  }
}
