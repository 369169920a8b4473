import {
  applyTemplate,
  emptyDayTargets,
  starterPlanContent,
  type DayTargets,
  type PlanBaseline,
} from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { shiftDate } from './dates.js';
import { dayPlanner, plannedDay, type PlanVersionLike } from './day-plan.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const baseline: PlanBaseline = { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'male' };

// Invented targets for the test (common practice, no source): relative ones so each day has a `basis`.
const first = starterPlanContent();
first.dayTypes[0]!.targets = day({
  energy: { kind: 'usual_times', factor: 0.9 },
  protein: { kind: 'g_per_kg', perKg: 2.2 },
  water: { kind: 'usual_plus', ml: 500 },
});
first.dayTypes[1]!.targets = day({ energy: { kind: 'usual_times', factor: 0.8 } });
const countdown = applyTemplate({
  base: first,
  template: {
    id: '8c1b9f2e-6d2a-4b7e-9a55-0c0f3b1d2e11',
    name: 'Show week',
    days: [
      { offset: -2, label: 'Carb up', targets: day({ carbohydrate: { kind: 'g_per_kg', perKg: 6 } }) },
      { offset: 0, label: 'Show day', targets: day({ water: { kind: 'usual_times', factor: 0.8 } }) },
    ],
  },
  eventDate: '2026-03-14',
  eventType: 'show',
  today: '2026-02-01',
  baseline,
});
const versions: PlanVersionLike[] = [
  { id: 'v1', number: 1, effectiveFrom: '2026-01-05', content: first, baseline },
  {
    id: 'v2',
    number: 2,
    effectiveFrom: '2026-02-01',
    content: countdown.content,
    baseline: { ...baseline, weightKg: 78 },
  },
];

describe('dayPlanner', () => {
  it('answers every date of a range as plannedDay does for that date alone', () => {
    const place = { eventTime: '18:00', eventTimeZone: 'Europe/Paris', athleteTimeZone: 'Europe/Paris' };
    for (const where of [undefined, place]) {
      const planner = dayPlanner(versions, where);
      for (let date = '2026-01-01'; date <= '2026-03-20'; date = shiftDate(date, 1)) {
        expect(planner(date), date).toEqual(plannedDay(versions, date, where));
      }
    }
  });

  it('resolves each day type of a version once, not once per date', () => {
    const planner = dayPlanner(versions);
    const a = planner('2026-01-05');
    const b = planner('2026-01-12');
    expect(a?.targets.basis.energy).toBe('usual energy 2,400 kcal × 0.9');
    expect(b).toBe(a);
  });
});
