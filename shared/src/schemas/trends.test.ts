import { describe, expect, it } from 'vitest';
import {
  trendDayColumns,
  trendDaysFromColumns,
  trendDaysToColumns,
  trendDay,
  type DriftEntry,
  type TrendDay,
} from './trends.js';

const entry = (
  metric: DriftEntry['metric'],
  state: DriftEntry['state'],
  actual: number | null,
): DriftEntry => ({
  metric,
  target: 2400,
  actual,
  diff: actual === null ? null : actual - 2400,
  relative: actual === null ? null : (actual - 2400) / 2400,
  tolerance: 120,
  kind: 'range',
  onPlan: { min: 2280, max: 2520 },
  state,
});
const actuals = (energyKcal: number | null): TrendDay['actuals'] => ({
  energyKcal,
  proteinG: null,
  carbohydrateG: null,
  fatG: null,
  fluidMl: energyKcal === null ? null : 2500,
  sodiumMg: null,
  steps: null,
  cardioMinutes: 20,
});
const targets: NonNullable<TrendDay['targets']> = {
  energyKcal: 2400,
  proteinG: null,
  carbohydrateG: null,
  fatG: null,
  waterMl: 3000,
  sodiumMg: null,
  steps: 8000,
  cardioMinutes: null,
  fluidCutoff: { time: '20:00', allowanceMl: 250 },
  versionNumber: 2,
};

// Invented days covering each shape a day takes: no plan, a plan with some metrics judged, a
// breach, a countdown day, the day in progress.
const DAYS: TrendDay[] = [
  {
    date: '2026-11-28',
    weightKg: null,
    trendKg: null,
    mean7Kg: null,
    actuals: actuals(null),
    targets: null,
    drift: [],
    breach: null,
    countdown: null,
  },
  {
    date: '2026-11-29',
    weightKg: 80.2,
    trendKg: 80.02,
    mean7Kg: null,
    actuals: actuals(2600),
    targets,
    drift: [entry('energy', 'drifting', 2600), { ...entry('water', 'not_logged', null), kind: 'range' }],
    breach: { cutoff: '20:00', allowanceMl: 250, afterCutoffMl: 400, excessMl: 150 },
    countdown: null,
  },
  {
    date: '2026-11-30',
    weightKg: 79.9,
    trendKg: 80.008,
    mean7Kg: 80.05,
    actuals: actuals(2400),
    targets: { ...targets, fluidCutoff: null, versionNumber: 3 },
    drift: [
      entry('energy', 'on_plan', 2400),
      { ...entry('steps', 'off_plan', 4000), kind: 'at_least', onPlan: { min: 7200, max: null } },
    ],
    breach: null,
    countdown: { offset: -1, dayLabel: 'E-1' },
  },
  {
    date: '2026-12-01',
    weightKg: null,
    trendKg: 80.008,
    mean7Kg: 80.05,
    actuals: actuals(900),
    targets,
    drift: [entry('energy', 'in_progress', 900)],
    breach: null,
    countdown: { offset: 0, dayLabel: 'E-0' },
  },
];

describe('trend days as columns', () => {
  it('gives back exactly the rows they were made from, through JSON', () => {
    const wire = JSON.parse(JSON.stringify(trendDaysToColumns(DAYS))) as unknown;
    const rows = trendDaysFromColumns(trendDayColumns.strict().parse(wire));
    expect(rows).toEqual(DAYS);
    for (const row of rows) expect(trendDay.strict().safeParse(row).success).toBe(true);
  });

  it('sends only the metrics judged somewhere in the range, and an empty range as empty columns', () => {
    expect(Object.keys(trendDaysToColumns(DAYS).drift)).toEqual(['energy', 'water', 'steps']);
    expect(trendDaysFromColumns(trendDaysToColumns([]))).toEqual([]);
  });
});
