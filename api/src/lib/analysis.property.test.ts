/**
 * Property-based checks of analysis.ts against independent reference implementations from the npm
 * registry, on generated weight series (realistic kg, random gaps between weigh-ins):
 * - @stdlib/stats-incr-ewmean@0.2.3 (Apache-2.0) for the smoothed trend;
 * - simple-statistics@7.12.1 (ISC) for the least-squares slope, R² and the mean.
 */
import increwmean from '@stdlib/stats-incr-ewmean';
import { DEFAULT_TOLERANCES, DRIFT_METRICS, type ResolvedTargets } from '@driftmark/shared';
import fc from 'fast-check';
import { linearRegression, linearRegressionLine, mean, rSquared } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import {
  driftFor,
  mean7,
  mean7Series,
  projectTo,
  rate14,
  rateGuidance,
  RESIDUAL_SD_FLOOR_KG,
  studentTQuantile,
  trendSeries,
  weeklyAdherence,
  type WeighInPoint,
} from './analysis.js';
import { daysBetween, shiftDate } from './dates.js';

/** Starts just before a year end so that series cross it. */
const START = '2025-12-20';
const RUNS = { numRuns: 200 };

/**
 * A morning-weight series: a start between 45 and 140 kg, then weigh-ins 1–4 days apart (the gaps are
 * missed days, never filled in) moving −1.5 … +1.5 kg each, kept at 0.1 kg resolution as a scale shows it.
 */
const weightSeries = fc
  .record({
    startDg: fc.integer({ min: 450, max: 1400 }),
    steps: fc.array(
      fc.record({
        // Mostly daily, sometimes 1–3 missed days, so windows fall on both sides of 7 weigh-ins.
        gap: fc.oneof(
          { weight: 3, arbitrary: fc.constant(1) },
          { weight: 1, arbitrary: fc.integer({ min: 2, max: 4 }) },
        ),
        deltaDg: fc.integer({ min: -15, max: 15 }),
      }),
      { minLength: 0, maxLength: 45, size: 'max' },
    ),
  })
  .map(({ startDg, steps }): WeighInPoint[] => {
    const points: WeighInPoint[] = [{ date: START, kg: startDg / 10 }];
    let offset = 0;
    let dg = startDg;
    for (const { gap, deltaDg } of steps) {
      offset += gap;
      dg = Math.min(2000, Math.max(350, dg + deltaDg));
      points.push({ date: shiftDate(START, offset), kg: dg / 10 });
    }
    return points;
  });

/** A series in a random order (the functions must not rely on the caller sorting). */
const shuffledSeries = weightSeries.chain((points) =>
  fc.shuffledSubarray(points, { minLength: points.length, maxLength: points.length }).map((shuffled) => ({
    points,
    shuffled,
  })),
);

/** Every calendar day from the first weigh-in to a few days after the last. */
const daysOf = (points: readonly WeighInPoint[]): string[] => {
  const last = points[points.length - 1]!.date;
  return Array.from({ length: daysBetween(START, last) + 4 }, (_, i) => shiftDate(START, i));
};

describe('trendSeries against @stdlib/stats-incr-ewmean increwmean(0.1)', () => {
  it("starts at the first weigh-in: @stdlib's first output is W₁, as Walker's T₁ = W₁", () => {
    fc.assert(
      fc.property(fc.integer({ min: 350, max: 2000 }), (dg) => {
        const accumulator = increwmean(0.1);
        expect(accumulator(dg / 10)).toBe(dg / 10);
        expect(trendSeries([{ date: START, kg: dg / 10 }])[0]!.trendKg).toBe(dg / 10);
      }),
      RUNS,
    );
  });

  it('matches the exponentially weighted mean fed the weigh-ins in date order, one step per weigh-in', () => {
    fc.assert(
      fc.property(shuffledSeries, ({ points, shuffled }) => {
        const accumulator = increwmean(0.1);
        const reference = points.map((p) => accumulator(p.kg)!);
        const series = trendSeries(shuffled);
        expect(series.map((s) => s.date)).toEqual(points.map((p) => p.date));
        series.forEach((s, i) => expect(Math.abs(s.trendKg - reference[i]!)).toBeLessThan(1e-9));
      }),
      RUNS,
    );
  });
});

describe('rate14 against simple-statistics linearRegression and rSquared (x = day number)', () => {
  it('gives the same slope × 7, R² and %/week of the mean on every window end, or null below 7 weigh-ins', () => {
    let compared = 0;
    fc.assert(
      fc.property(weightSeries, fc.nat(), (points, pick) => {
        const days = daysOf(points);
        const endDate = days[pick % days.length]!;
        const from = shiftDate(endDate, -13);
        const window = points.filter((p) => p.date >= from && p.date <= endDate);
        const rate = rate14(points, endDate, rateGuidance({ goal: null, countdown: false }));
        if (window.length < 7) {
          expect(rate).toBeNull();
          return;
        }
        compared += 1;
        const pairs = window.map((p) => [daysBetween(from, p.date) + 1, p.kg]);
        const line = linearRegression(pairs);
        expect(rate).not.toBeNull();
        expect(Math.abs(rate!.kgPerWeek - line.m * 7)).toBeLessThan(1e-9);
        expect(
          Math.abs(rate!.percentPerWeek - ((line.m * 7) / mean(window.map((p) => p.kg))) * 100),
        ).toBeLessThan(1e-9);
        expect(rate!.points).toBe(window.length);
        // For an unchanging weight R² is 1 − 0/0, which simple-statistics returns as NaN or, when the
        // mean's rounding leaves a tiny sum of squares, as chance; ours calls it undefined (null).
        if (new Set(window.map((p) => p.kg)).size > 1) {
          expect(Math.abs(rate!.r2! - rSquared(pairs, linearRegressionLine(line)))).toBeLessThan(1e-9);
        } else {
          expect(rate!.r2).toBeNull();
        }
      }),
      RUNS,
    );
    // The generator must reach the comparison, not only the null branch.
    expect(compared).toBeGreaterThan(RUNS.numRuns / 5);
  });

  it("projects onto simple-statistics' line, with an interval that holds it and widens with the horizon", () => {
    fc.assert(
      fc.property(weightSeries, fc.integer({ min: 1, max: 120 }), (points, ahead) => {
        const endDate = points[points.length - 1]!.date;
        const from = shiftDate(endDate, -13);
        const window = points.filter((p) => p.date >= from);
        const near = projectTo(points, endDate, shiftDate(endDate, ahead));
        if (window.length < 7) {
          expect(near).toBeNull();
          return;
        }
        const line = linearRegressionLine(
          linearRegression(window.map((p) => [daysBetween(from, p.date) + 1, p.kg])),
        );
        expect(Math.abs(near!.kg - line(14 + ahead))).toBeLessThan(1e-8);
        expect(near!.lowKg).toBeLessThanOrEqual(near!.kg);
        expect(near!.highKg).toBeGreaterThanOrEqual(near!.kg);
        const far = projectTo(points, endDate, shiftDate(endDate, ahead + 30))!;
        expect(far.highKg - far.lowKg).toBeGreaterThanOrEqual(near!.highKg - near!.lowKg);
        // Never narrower than the scale's quantisation allows: t(0.9, n − 2) > 1.28 (normal quantile),
        // so each half is at least 1.28 · 0.1/√12 · √(1 + 1/n) (Widrow & Kollár 2008 for q/√12).
        const floor = 1.2815 * RESIDUAL_SD_FLOOR_KG * Math.sqrt(1 + 1 / window.length);
        expect(near!.highKg - near!.kg).toBeGreaterThan(floor);
      }),
      RUNS,
    );
  });
});

describe('mean7 against a straightforward filter-and-mean (simple-statistics mean)', () => {
  it('is the mean of the weigh-ins dated within the 7 days ending on each day, or null below 4', () => {
    fc.assert(
      fc.property(weightSeries, (points) => {
        for (const date of daysOf(points)) {
          const from = shiftDate(date, -6);
          const present = points.filter((p) => p.date >= from && p.date <= date).map((p) => p.kg);
          const value = mean7(points, date);
          if (present.length < 4) expect(value, date).toBeNull();
          else expect(Math.abs(value! - mean(present)), date).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('gives in one pass over a whole range, input in any order, the same means (simple-statistics mean)', () => {
    fc.assert(
      fc.property(weightSeries, fc.boolean(), (points, reversed) => {
        const dates = daysOf(points);
        const series = mean7Series(reversed ? [...points].reverse() : points, dates);
        dates.forEach((date, i) => {
          const from = shiftDate(date, -6);
          const present = points.filter((p) => p.date >= from && p.date <= date).map((p) => p.kg);
          if (present.length < 4) expect(series[i], date).toBeNull();
          else expect(Math.abs(series[i]! - mean(present)), date).toBeLessThan(1e-9);
        });
      }),
      { numRuns: 100 },
    );
  });
});

describe('studentTQuantile', () => {
  it('falls with df towards the normal quantile 1.2816 and stays above it (t(0.9, df) properties)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 300 }), (df) => {
        const t = studentTQuantile(0.9, df);
        expect(t).toBeGreaterThan(1.2815);
        expect(studentTQuantile(0.9, df + 1)).toBeLessThan(t);
      }),
      RUNS,
    );
  });
});

describe('driftFor and weeklyAdherence invariants', () => {
  const targets: ResolvedTargets = {
    energyKcal: 2400,
    proteinG: 180,
    carbohydrateG: 250,
    fatG: 60,
    proteinPct: null,
    carbohydratePct: null,
    fatPct: null,
    waterMl: 3000,
    sodiumMg: 2300,
    fluidCutoff: null,
    foodCutoff: null,
    fluidCap: null,
    eventTimed: [],
    steps: 10000,
    cardioMinutes: 30,
    supplements: [],
    note: null,
    basis: {},
  };
  const actual = fc.option(fc.double({ min: 0, max: 20000, noNaN: true }), { nil: null });
  const actuals = fc.record({
    energyKcal: actual,
    proteinG: actual,
    carbohydrateG: actual,
    fatG: actual,
    fluidMl: actual,
    sodiumMg: actual,
    steps: actual,
    cardioMinutes: actual,
  });

  it('states follow the shortfall on the wrong side (|diff| for a range, target − actual for a minimum) against 1× and 2× the tolerance; nothing logged is never on plan', () => {
    fc.assert(
      fc.property(actuals, (a) => {
        const entries = driftFor(targets, DEFAULT_TOLERANCES, a);
        expect(entries.map((e) => e.metric)).toEqual([...DRIFT_METRICS]);
        for (const e of entries) {
          if (e.actual === null) {
            expect(e.state).toBe('not_logged');
            continue;
          }
          // Steps and cardio are minimums (common practice, no source): only falling short counts.
          const off = e.kind === 'at_least' ? Math.max(0, -e.diff!) : Math.abs(e.diff!);
          // Right at a boundary the module allows for binary rounding (analysis.test.ts checks that).
          if (Math.abs(off - e.tolerance) < 1e-6 || Math.abs(off - 2 * e.tolerance) < 1e-6) continue;
          const expected = off <= e.tolerance ? 'on_plan' : off <= 2 * e.tolerance ? 'drifting' : 'off_plan';
          expect(e.state).toBe(expected);
        }
      }),
      RUNS,
    );
  });

  it('weekly counts add up: on plan ≤ logged ≤ target days, and every drift entry is counted once', () => {
    fc.assert(
      fc.property(fc.array(actuals, { minLength: 1, maxLength: 40 }), (daysActuals) => {
        const days = daysActuals.map((a, i) => ({
          date: shiftDate(START, i),
          drift: driftFor(targets, DEFAULT_TOLERANCES, a),
        }));
        const weeks = weeklyAdherence(days);
        expect(weeks.reduce((s, w) => s + w.targetDays, 0)).toBe(days.length * DRIFT_METRICS.length);
        for (const w of weeks) {
          expect(w.onPlanDays).toBeLessThanOrEqual(w.loggedDays);
          expect(w.loggedDays).toBeLessThanOrEqual(w.targetDays);
          expect(new Date(`${w.weekStart}T00:00:00Z`).getUTCDay()).toBe(1);
        }
      }),
      RUNS,
    );
  });
});
