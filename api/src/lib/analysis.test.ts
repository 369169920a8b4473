import { DEFAULT_TOLERANCES, type DriftEntry, type ResolvedTargets } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  cutoffBreachFor,
  driftFor,
  flagsFor,
  maintenanceEstimate,
  mean7,
  mondayOf,
  projectTo,
  rate14,
  rateGuidance,
  RESIDUAL_SD_FLOOR_KG,
  studentTQuantile,
  trendSeries,
  weeklyAdherence,
  type DayActuals,
  type WeighInPoint,
} from './analysis.js';
import { shiftDate } from './dates.js';

/** Day n of March 2026 (2026-03-02 is a Monday). */
const day = (n: number) => shiftDate('2026-03-01', n - 1);

// REFERENCES.md §8, the invented 14-day dataset (kg), days 1–14.
const INVENTED_KG = [80.0, 80.4, 79.6, 79.9, 79.5, 79.8, 79.2, 79.4, 79.0, 79.3, 78.8, 79.1, 78.6, 78.9];
const INVENTED: WeighInPoint[] = INVENTED_KG.map((kg, i) => ({ date: day(i + 1), kg }));

describe("trendSeries (EWMA α 0.1; Walker, The Hacker's Diet)", () => {
  it('matches the EWMA row of the invented dataset on every day', () => {
    // REFERENCES.md §8 EWMA row (Walker's formula; the row also matches @stdlib/stats-incr-ewmean).
    const ewmaRow = [
      80.0, 80.04, 79.996, 79.9864, 79.93776, 79.923984, 79.851586, 79.806427, 79.725784, 79.683206,
      79.594885, 79.545397, 79.450857, 79.395771,
    ];
    const series = trendSeries(INVENTED);
    expect(series.map((s) => s.date)).toEqual(INVENTED.map((p) => p.date));
    series.forEach((s, i) => expect(s.trendKg, s.date).toBeCloseTo(ewmaRow[i]!, 6));
  });

  it("gives Walker's worked step unrounded: trend 173.2, weigh-in 171.5 → 173.03", () => {
    // Walker, The Hacker's Diet (REFERENCES.md §8): 173.0 with his rounding to 0.1, 173.03 unrounded.
    const series = trendSeries([
      { date: day(1), kg: 173.2 },
      { date: day(2), kg: 171.5 },
    ]);
    expect(series[1]!.trendKg).toBeCloseTo(173.03, 6);
  });

  it("reproduces Walker's sequence from 173.6 (weights 172.5, 171.5, 172, 171.5): 173.5, 173.3, 173.2, 173.0", () => {
    // Walker, The Hacker's Diet (REFERENCES.md §8). Walker rounds each trend to 0.1 before the next
    // step; REFERENCES' "unrounded" 173.49, 173.30, 173.17, 173.03 are single steps from those rounded
    // trends (173.6, 173.5, 173.3, 173.2), which T₁ = W₁ lets us start from.
    const steps: [number, number, number, number][] = [
      [173.6, 172.5, 173.49, 173.5],
      [173.5, 171.5, 173.3, 173.3],
      [173.3, 172, 173.17, 173.2],
      [173.2, 171.5, 173.03, 173.0],
    ];
    for (const [previous, weight, unrounded, rounded] of steps) {
      const next = trendSeries([
        { date: day(1), kg: previous },
        { date: day(2), kg: weight },
      ])[1]!.trendKg;
      expect(next).toBeCloseTo(unrounded, 10);
      expect(Number(next.toFixed(1))).toBe(rounded);
    }
  });

  it('chains the same weigh-ins without rounding: 173.49, 173.291, 173.1619, 172.99571 (by hand)', () => {
    // Our trend is never rounded, so it drifts from Walker's hand-rounded row by a few hundredths:
    // 173.49 + 0.1·(171.5 − 173.49) = 173.291; then 173.1619; then 172.99571 (worked by hand).
    const kg = [173.6, 172.5, 171.5, 172, 171.5];
    const series = trendSeries(kg.map((w, i) => ({ date: day(i + 1), kg: w })));
    [173.49, 173.291, 173.1619, 172.99571].forEach((expected, i) =>
      expect(series[i + 1]!.trendKg).toBeCloseTo(expected, 9),
    );
  });

  it('skips missing days: a gap adds no smoothing step and no invented point', () => {
    // Walker's rule is one step per weigh-in; the brief: "missing days skipped, never invented".
    const withGap = trendSeries([
      { date: day(1), kg: 80 },
      { date: day(2), kg: 79 },
      { date: day(6), kg: 78 },
    ]);
    expect(withGap.map((s) => s.date)).toEqual([day(1), day(2), day(6)]);
    // 80 → 79.9 → 79.9 + 0.1·(78 − 79.9) = 79.71, exactly as if day 6 were day 3.
    expect(withGap[2]!.trendKg).toBeCloseTo(79.71, 10);
  });

  it('takes the weigh-ins in date order whatever order they come in; T₁ = W₁; none → []', () => {
    const series = trendSeries([...INVENTED].reverse());
    expect(series[0]).toEqual({ date: day(1), trendKg: 80 });
    expect(series[13]!.trendKg).toBeCloseTo(79.395771, 6);
    expect(trendSeries([])).toEqual([]);
  });
});

describe('mean7 (trailing 7-day mean of the weigh-ins present)', () => {
  it('matches the SMA7 row of the invented dataset from day 7', () => {
    // REFERENCES.md §8 SMA7 row (also what @stdlib/stats-incr-mmean incrmmean(7) gives from day 7).
    const sma7Row = [79.771429, 79.685714, 79.485714, 79.442857, 79.285714, 79.228571, 79.057143, 79.014286];
    sma7Row.forEach((expected, i) =>
      expect(mean7(INVENTED, day(i + 7)), day(i + 7)).toBeCloseTo(expected, 6),
    );
  });

  it('is null with fewer than 4 weigh-ins in the window and the mean of those present with 4', () => {
    // The brief: "shown only when at least 4 are in the window"; missing days are not filled in.
    const three = [1, 3, 5].map((n) => ({ date: day(n), kg: 80 + n / 10 }));
    expect(mean7(three, day(7))).toBeNull();
    const four = [...three, { date: day(7), kg: 81 }];
    expect(mean7(four, day(7))).toBeCloseTo((80.1 + 80.3 + 80.5 + 81) / 4, 10);
  });

  it('covers 7 calendar days ending on the date: a weigh-in 7 days earlier is outside', () => {
    const points = [0, 1, 2, 3, 4].map((n) => ({ date: day(1 + n), kg: 70 + n }));
    // Window for day 8 is days 2–8: day 1 (70 kg) is left out, leaving 4 weigh-ins.
    expect(mean7(points, day(8))).toBeCloseTo((71 + 72 + 73 + 74) / 4, 10);
    expect(mean7(points, day(9))).toBeNull();
  });
});

describe('rateGuidance (guidance per phase)', () => {
  it('dieting: −1 … −0.5 %/week (Helms 2014, JISSN 11:20)', () => {
    expect(rateGuidance({ goal: 'lose', countdown: false })).toMatchObject({
      band: { minPct: -1, maxPct: -0.5, source: expect.stringContaining('JISSN 11:20') },
      note: null,
      paused: false,
    });
  });

  it('maintaining: −0.25 … +0.25 %/week, labelled common practice, no source', () => {
    expect(rateGuidance({ goal: 'maintain', countdown: false })).toMatchObject({
      band: { minPct: -0.25, maxPct: 0.25, source: 'common practice, no source' },
      paused: false,
    });
  });

  it('gaining / after a show and no goal: no band, saying why (REFERENCES §4: no published numeric limit for regain)', () => {
    const gain = rateGuidance({ goal: 'gain', countdown: false });
    expect(gain).toMatchObject({ band: null, paused: false });
    expect(gain.note).toMatch(/regain/);
    expect(rateGuidance({ goal: null, countdown: false })).toMatchObject({ band: null, paused: false });
  });

  it('countdown: paused whatever the goal, with the reason to show (water manipulation makes a weekly rate meaningless)', () => {
    for (const goal of ['lose', 'maintain', 'gain', null] as const) {
      const guidance = rateGuidance({ goal, countdown: true });
      expect(guidance).toMatchObject({ band: null, paused: true });
      expect(guidance.note).toBe(
        'Rate guidance paused during the countdown (water and glycogen change on purpose).',
      );
    }
  });
});

describe('rate14 (least squares over 14 days)', () => {
  const guidance = rateGuidance({ goal: 'lose', countdown: false });
  const band = guidance.band;
  const none = rateGuidance({ goal: 'gain', countdown: false });

  it('gives the invented dataset’s slope, R² and %/week', () => {
    const rate = rate14(INVENTED, day(14), guidance)!;
    // REFERENCES.md §8 (and simple-statistics@7.12.1 linearRegression: m = −0.10879120879120904).
    expect(rate.kgPerWeek / 7).toBeCloseTo(-0.10879121, 8);
    expect(rate.kgPerWeek).toBeCloseTo(-0.761538, 6);
    // REFERENCES.md §8 (simple-statistics rSquared = 0.7991552649173981).
    expect(rate.r2).toBeCloseTo(0.799155, 6);
    // REFERENCES.md §8: −0.9592 %/week of the mean weight 79.392857 kg.
    expect(rate.percentPerWeek).toBeCloseTo(-0.9592, 4);
    expect(rate.percentPerWeek).toBeCloseTo((-0.761538 / 79.392857) * 100, 5);
    expect(rate).toMatchObject({ points: 14, from: day(1), to: day(14), band });
    // −0.96 %/week shows as −1.0: inside Helms 2014's −1 … −0.5 band.
    expect(rate.verdict).toEqual({ pace: 'inside', state: 'on_plan' });
    expect(rate14(INVENTED, day(14), none)!.verdict).toBeNull();
  });

  it('is null with fewer than 7 weigh-ins in the window (the brief: at least 7)', () => {
    const six = INVENTED.filter((_, i) => i % 2 === 0).slice(0, 6);
    expect(rate14(six, day(14), guidance)).toBeNull();
    const seven = INVENTED.filter((_, i) => i % 2 === 0);
    expect(rate14(seven, day(14), guidance)?.points).toBe(7);
  });

  it('only uses the 14 calendar days ending on the end date', () => {
    const withOld = [{ date: day(0), kg: 95 }, ...INVENTED];
    expect(rate14(withOld, day(14), guidance)!.kgPerWeek).toBeCloseTo(-0.761538, 6);
    // Ending on day 15, the window is days 2–15: day 1 drops out, 13 weigh-ins remain.
    expect(rate14(INVENTED, day(15), guidance)).toMatchObject({ points: 13, from: day(2), to: day(15) });
  });

  it('gives 0 kg/week and R² undefined (null) for an unchanging weight, whatever its rounding noise', () => {
    // R² = 1 − SSE/SST is 0/0 when every weigh-in is one reading; 69.4 and 70 both sit on binary
    // fractions that leave SST a tiny non-zero number, which used to read as R² 1 for one and 0 for
    // the other (simple-statistics' rSquared gives NaN for such a series: undefined too).
    for (const kg of [70, 69.4, 81.3]) {
      const flat = Array.from({ length: 8 }, (_, i) => ({ date: day(i + 1), kg }));
      const rate = rate14(flat, day(8), none)!;
      expect(rate.kgPerWeek).toBeCloseTo(0, 12);
      expect(rate.r2, String(kg)).toBeNull();
    }
  });

  it('gives R² 1 for perfectly straight weigh-ins a scale step apart (SST well above rounding noise)', () => {
    // 80.0, 79.9, … 79.4: slope −0.1 kg/day exactly, so SSE = 0 and R² = 1 (any textbook definition).
    const straight = Array.from({ length: 7 }, (_, i) => ({ date: day(i + 8), kg: 80 - i / 10 }));
    const rate = rate14(straight, day(14), guidance)!;
    expect(rate.kgPerWeek).toBeCloseTo(-0.7, 10);
    expect(rate.r2).toBeCloseTo(1, 10);
  });

  it('carries the band, the reason when there is none, and whether guidance is paused', () => {
    expect(rate14(INVENTED, day(14), guidance)).toMatchObject({ band, bandNote: null, paused: false });
    const paused = rateGuidance({ goal: 'lose', countdown: true });
    expect(rate14(INVENTED, day(14), paused)).toMatchObject({
      band: null,
      bandNote: paused.note,
      paused: true,
    });
  });
});

describe('studentTQuantile', () => {
  it('is exact for df 1 (Cauchy: tan(π(p − ½))) and df 2 ((2p − 1)/√(2p(1 − p)))', () => {
    // Closed forms of the t distribution for 1 and 2 degrees of freedom (standard results).
    expect(studentTQuantile(0.9, 1)).toBeCloseTo(Math.tan(0.4 * Math.PI), 10);
    expect(studentTQuantile(0.9, 2)).toBeCloseTo(0.8 / Math.sqrt(2 * 0.9 * 0.1), 10);
    expect(studentTQuantile(0.975, 2)).toBeCloseTo(0.95 / Math.sqrt(2 * 0.975 * 0.025), 10);
  });

  it('matches a standard t table for df 5 … 14 (values from memory)', () => {
    // Standard one-sided t table, t(0.90, df) and t(0.975, df), three decimals; from memory.
    const table: [number, number, number][] = [
      [5, 1.476, 2.571],
      [6, 1.44, 2.447],
      [7, 1.415, 2.365],
      [8, 1.397, 2.306],
      [9, 1.383, 2.262],
      [10, 1.372, 2.228],
      [11, 1.363, 2.201],
      [12, 1.356, 2.179],
      [13, 1.35, 2.16],
      [14, 1.345, 2.145],
    ];
    for (const [df, t90, t975] of table) {
      expect(studentTQuantile(0.9, df), `t(0.90, ${df})`).toBeCloseTo(t90, 3);
      expect(studentTQuantile(0.975, df), `t(0.975, ${df})`).toBeCloseTo(t975, 3);
    }
  });

  it('refuses p outside (0.5, 1) and a fractional or zero df', () => {
    expect(() => studentTQuantile(0.4, 10)).toThrow(RangeError);
    expect(() => studentTQuantile(0.9, 0)).toThrow(RangeError);
    expect(() => studentTQuantile(0.9, 2.5)).toThrow(RangeError);
  });
});

describe('projectTo (the 14-day line to the event, 80 % prediction interval)', () => {
  it('carries the invented dataset’s line to day 21 with ŷ ± t(0.9, 12)·s·√(1 + 1/n + (x₀ − x̄)²/Sxx)', () => {
    const p = projectTo(INVENTED, day(14), day(21))!;
    // Line from REFERENCES.md §8 (simple-statistics): 80.208791 − 0.10879121 × 21 = 77.924176.
    expect(p.kg).toBeCloseTo(77.924176, 6);
    // Half-width computed with simple-statistics' line (s = 0.2374699, Sxx = 227.5, x̄ = 7.5) and
    // t(0.90, 12) = 1.356 from a standard t table (from memory): 0.44064.
    expect(p.highKg - p.kg).toBeCloseTo(0.44064, 3);
    expect(p.kg - p.lowKg).toBeCloseTo(p.highKg - p.kg, 10);
    expect(p).toMatchObject({ date: day(21), level: 0.8 });
  });

  it('widens the further out the event is', () => {
    const near = projectTo(INVENTED, day(14), day(16))!;
    const far = projectTo(INVENTED, day(14), day(60))!;
    expect(far.highKg - far.lowKg).toBeGreaterThan(near.highKg - near.lowKg);
  });

  it('never gives an interval narrower than the scale allows: s is floored at 0.1 kg/√12', () => {
    // A reading rounded to a 0.1 kg step carries an error uniform over ±0.05 kg, SD = 0.1/√12
    // = 0.028868 kg (uniform quantisation noise; Widrow & Kollár 2008, Quantization Noise).
    expect(RESIDUAL_SD_FLOOR_KG).toBeCloseTo(0.028868, 6);
    // 7 perfectly flat weigh-ins on days 8–14 (x̄ = 11, Sxx = 28), event 100 days after day 14
    // (x₀ = 114): half-width = t(0.9, 5) · 0.028868 · √(1 + 1/7 + 103²/28); t(0.90, 5) = 1.476 from
    // a standard t table (from memory) → 0.8306 kg, not 69.40–69.40.
    const flat = Array.from({ length: 7 }, (_, i) => ({ date: day(i + 8), kg: 69.4 }));
    const p = projectTo(flat, day(14), day(114))!;
    expect(p.kg).toBeCloseTo(69.4, 9);
    const expected = 1.476 * 0.028868 * Math.sqrt(1 + 1 / 7 + 103 ** 2 / 28);
    expect(p.highKg - p.kg).toBeCloseTo(expected, 2);
    expect(p.kg - p.lowKg).toBeCloseTo(p.highKg - p.kg, 10);
    expect(p.lowKg.toFixed(2)).not.toBe(p.highKg.toFixed(2));
    // Perfectly straight: the same floor.
    const straight = Array.from({ length: 7 }, (_, i) => ({ date: day(i + 8), kg: 80 - i / 10 }));
    const q = projectTo(straight, day(14), day(114))!;
    expect(q.highKg - q.kg).toBeCloseTo(expected, 2);
  });

  it('leaves an interval from real scatter alone (the floor is below the invented dataset’s s = 0.237)', () => {
    const p = projectTo(INVENTED, day(14), day(21))!;
    expect(p.highKg - p.kg).toBeCloseTo(0.44064, 3);
  });

  it('is null without an event ahead or with fewer than 7 points', () => {
    expect(projectTo(INVENTED, day(14), null)).toBeNull();
    expect(projectTo(INVENTED, day(14), day(14))).toBeNull();
    expect(projectTo(INVENTED, day(14), day(10))).toBeNull();
    expect(projectTo(INVENTED.slice(0, 6), day(14), day(21))).toBeNull();
  });
});

const NO_TARGETS: ResolvedTargets = {
  energyKcal: null,
  proteinG: null,
  carbohydrateG: null,
  fatG: null,
  proteinPct: null,
  carbohydratePct: null,
  fatPct: null,
  waterMl: null,
  sodiumMg: null,
  fluidCutoff: null,
  foodCutoff: null,
  fluidCap: null,
  eventTimed: [],
  steps: null,
  cardioMinutes: null,
  supplements: [],
  note: null,
  basis: {},
};
const NOTHING_LOGGED: DayActuals = {
  energyKcal: null,
  proteinG: null,
  carbohydrateG: null,
  fatG: null,
  fluidMl: null,
  sodiumMg: null,
  steps: null,
  cardioMinutes: null,
};

/** The single drift entry of one metric with one target and one actual. */
function driftOf(targets: Partial<ResolvedTargets>, actuals: Partial<DayActuals>): DriftEntry {
  const entries = driftFor({ ...NO_TARGETS, ...targets }, DEFAULT_TOLERANCES, {
    ...NOTHING_LOGGED,
    ...actuals,
  });
  expect(entries).toHaveLength(1);
  return entries[0]!;
}

describe('driftFor (state per metric against the plan tolerances)', () => {
  it('energy ±5 % of the target: on plan within, drifting up to exactly 2×, off plan beyond', () => {
    // Tolerances: energy ±5 % (DEFAULT_TOLERANCES, from the product brief; common practice, no source).
    const at = (kcal: number) => driftOf({ energyKcal: 2400 }, { energyKcal: kcal });
    expect(at(2520)).toMatchObject({ tolerance: 120, diff: 120, state: 'on_plan' });
    expect(at(2280).state).toBe('on_plan');
    expect(at(2521).state).toBe('drifting');
    expect(at(2640).state).toBe('drifting');
    expect(at(2160).state).toBe('drifting');
    expect(at(2641).state).toBe('off_plan');
    expect(at(2640).relative).toBeCloseTo(0.1, 12);
  });

  it('protein ±10 g, carbohydrate ±15 g, fat ±7 g (grams, not %)', () => {
    expect(driftOf({ proteinG: 180 }, { proteinG: 190 }).state).toBe('on_plan');
    expect(driftOf({ proteinG: 180 }, { proteinG: 200 }).state).toBe('drifting');
    expect(driftOf({ proteinG: 180 }, { proteinG: 200.5 }).state).toBe('off_plan');
    expect(driftOf({ carbohydrateG: 250 }, { carbohydrateG: 235 })).toMatchObject({
      tolerance: 15,
      state: 'on_plan',
    });
    expect(driftOf({ fatG: 60 }, { fatG: 74 })).toMatchObject({ tolerance: 7, state: 'drifting' });
  });

  it('keeps exactly 2× the tolerance drifting despite binary rounding (133.3 − 113.3 ≠ 20 in floating point)', () => {
    expect(133.3 - 113.3).not.toBe(20);
    expect(driftOf({ proteinG: 113.3 }, { proteinG: 133.3 }).state).toBe('drifting');
  });

  it('water ±10 % and sodium ±15 % of the target; water is judged on the fluids logged', () => {
    expect(driftOf({ waterMl: 3000 }, { fluidMl: 3300 })).toMatchObject({
      metric: 'water',
      tolerance: 300,
      state: 'on_plan',
    });
    expect(driftOf({ waterMl: 3000 }, { fluidMl: 2399 }).state).toBe('off_plan');
    expect(driftOf({ sodiumMg: 2000 }, { sodiumMg: 2600 })).toMatchObject({
      tolerance: 300,
      state: 'drifting',
    });
  });

  it('steps and cardio are minimums: reached or passed is on plan; a shortfall is judged against 10 % (common practice, no source)', () => {
    expect(driftOf({ steps: 10000 }, { steps: 15998 })).toMatchObject({
      kind: 'at_least',
      tolerance: 1000,
      onPlan: { min: 9000, max: null },
      state: 'on_plan',
    });
    expect(driftOf({ steps: 10000 }, { steps: 9000 }).state).toBe('on_plan');
    expect(driftOf({ steps: 10000 }, { steps: 8000 }).state).toBe('drifting');
    expect(driftOf({ cardioMinutes: 30 }, { cardioMinutes: 36 }).state).toBe('on_plan');
    expect(driftOf({ cardioMinutes: 30 }, { cardioMinutes: 20 }).state).toBe('off_plan');
  });

  it('the athlete’s today is in progress whatever was logged: never on or off plan', () => {
    const today = driftFor(
      { ...NO_TARGETS, energyKcal: 2210, steps: 10000 },
      DEFAULT_TOLERANCES,
      { ...NOTHING_LOGGED, energyKcal: 849 },
      true,
    );
    expect(today.map((e) => [e.metric, e.actual, e.state])).toEqual([
      ['energy', 849, 'in_progress'],
      ['steps', null, 'in_progress'],
    ]);
  });

  it('nothing logged is not logged, never on plan, with no diff', () => {
    expect(driftOf({ energyKcal: 2400 }, {})).toEqual({
      metric: 'energy',
      target: 2400,
      actual: null,
      diff: null,
      relative: null,
      tolerance: 120,
      kind: 'range',
      onPlan: { min: 2280, max: 2520 },
      state: 'not_logged',
    });
  });

  it('gives one entry per metric with a target, in the DRIFT_METRICS order, and no relative drift for a 0 target', () => {
    const entries = driftFor(
      { ...NO_TARGETS, energyKcal: 2000, fatG: 50, cardioMinutes: 0 },
      DEFAULT_TOLERANCES,
      { ...NOTHING_LOGGED, energyKcal: 2000, cardioMinutes: 10 },
    );
    expect(entries.map((e) => e.metric)).toEqual(['energy', 'fat', 'cardio']);
    expect(entries[2]).toMatchObject({ diff: 10, relative: null, tolerance: 0, state: 'on_plan' });
    expect(driftFor(NO_TARGETS, DEFAULT_TOLERANCES, NOTHING_LOGGED)).toEqual([]);
  });
});

describe('cutoffBreachFor (fluids after the cut-off beyond the allowance)', () => {
  const cutoff = { time: '20:00', allowanceMl: 250 };

  it('counts fluids strictly after the cut-off and reports the excess over the allowance', () => {
    const fluids = [
      { time: '19:59', volumeMl: 500 },
      { time: '20:00', volumeMl: 300 },
      { time: '20:01', volumeMl: 200 },
      { time: '21:30', volumeMl: 150 },
    ];
    expect(cutoffBreachFor(cutoff, fluids)).toEqual({
      cutoff: '20:00',
      allowanceMl: 250,
      afterCutoffMl: 350,
      excessMl: 100,
    });
  });

  it('is null within the allowance (exactly at it too), without fluids after it, or without a cut-off', () => {
    expect(cutoffBreachFor(cutoff, [{ time: '22:00', volumeMl: 250 }])).toBeNull();
    expect(cutoffBreachFor(cutoff, [{ time: '20:00', volumeMl: 900 }])).toBeNull();
    expect(cutoffBreachFor(null, [{ time: '23:00', volumeMl: 900 }])).toBeNull();
  });

  it('reads clock times with seconds', () => {
    expect(cutoffBreachFor(cutoff, [{ time: '20:00:30', volumeMl: 300 }])?.excessMl).toBe(50);
  });
});

describe('weeklyAdherence (Monday weeks; share of logged days on plan)', () => {
  const energy = (target: number, actual: number | null) =>
    driftFor({ ...NO_TARGETS, energyKcal: target }, DEFAULT_TOLERANCES, {
      ...NOTHING_LOGGED,
      energyKcal: actual,
    });

  it('mondayOf: ISO weeks start on Monday, across a year boundary too', () => {
    expect(mondayOf('2026-03-02')).toBe('2026-03-02');
    expect(mondayOf('2026-03-08')).toBe('2026-03-02');
    expect(mondayOf('2026-01-01')).toBe('2025-12-29');
  });

  it('counts target, logged and on-plan days per week and metric', () => {
    const actuals = [2400, 2450, 2300, 2400, 2500, 2700, null, 2400];
    const days = actuals.map((a, i) => ({ date: day(i + 2), drift: energy(2400, a) }));
    const weeks = weeklyAdherence(days);
    expect(weeks).toEqual([
      {
        weekStart: '2026-03-02',
        metric: 'energy',
        targetDays: 7,
        loggedDays: 6,
        onPlanDays: 5,
        adherence: 5 / 6,
        loggedShare: 6 / 7,
      },
      {
        weekStart: '2026-03-09',
        metric: 'energy',
        targetDays: 1,
        loggedDays: 1,
        onPlanDays: 1,
        adherence: 1,
        loggedShare: 1,
      },
    ]);
  });

  it('gives no adherence when nothing was logged (not logged is never on plan), and a 0 logged share', () => {
    const weeks = weeklyAdherence([
      { date: day(2), drift: energy(2400, null) },
      { date: day(3), drift: energy(2400, null) },
    ]);
    expect(weeks).toEqual([expect.objectContaining({ onPlanDays: 0, adherence: null, loggedShare: 0 })]);
  });

  it('leaves the day in progress out entirely: neither a target day nor a logged one', () => {
    const inProgress = driftFor(
      { ...NO_TARGETS, energyKcal: 2210 },
      DEFAULT_TOLERANCES,
      {
        ...NOTHING_LOGGED,
        energyKcal: 849,
      },
      true,
    );
    const weeks = weeklyAdherence([
      { date: day(2), drift: energy(2400, 2400) },
      { date: day(3), drift: inProgress },
    ]);
    expect(weeks).toEqual([
      expect.objectContaining({ targetDays: 1, loggedDays: 1, onPlanDays: 1, adherence: 1, loggedShare: 1 }),
    ]);
  });

  it('lists each week’s metrics in DRIFT_METRICS order and leaves out days without targets', () => {
    const both = driftFor(
      { ...NO_TARGETS, waterMl: 3000, energyKcal: 2000 },
      DEFAULT_TOLERANCES,
      NOTHING_LOGGED,
    );
    const weeks = weeklyAdherence([
      { date: day(4), drift: both },
      { date: day(5), drift: [] },
    ]);
    expect(weeks.map((w) => [w.metric, w.targetDays])).toEqual([
      ['energy', 1],
      ['water', 1],
    ]);
  });
});

describe('maintenanceEstimate (mean intake − Δtrend × 7700 kcal/kg ÷ days; common practice, no source)', () => {
  /** n days ending on day(n) with the same intake, and a trend losing `kgPerDay` every day. */
  const steady = (n: number, kcal: number, kgPerDay: number) => ({
    days: Array.from({ length: n }, (_, i) => ({ date: day(i + 1), energyKcal: kcal, countdown: false })),
    trend: Array.from({ length: n }, (_, i) => ({ date: day(i + 1), trendKg: 80 - kgPerDay * i })),
  });

  it('adds back the energy of the trend’s loss: 2,000 kcal a day losing 0.1 kg a day → 2,770 kcal', () => {
    // 0.1 kg/day × 7,700 kcal/kg = 770 kcal/day (7,700 kcal/kg: common practice, no source).
    const { days, trend } = steady(28, 2000, 0.1);
    expect(maintenanceEstimate(days, trend, day(28))).toMatchObject({
      days: 28,
      from: day(1),
      to: day(28),
      note: expect.stringContaining('common practice, no source'),
    });
    expect(maintenanceEstimate(days, trend, day(28))!.kcalPerDay).toBeCloseTo(2770, 9);
  });

  it('is null with fewer than 14 logged days and gives a figure with 14', () => {
    const { days, trend } = steady(20, 2200, 0);
    const thirteen = days.map((d, i) => (i < 7 ? { ...d, energyKcal: null } : d));
    expect(maintenanceEstimate(thirteen, trend, day(20))).toBeNull();
    const fourteen = days.map((d, i) => (i < 6 ? { ...d, energyKcal: null } : d));
    expect(maintenanceEstimate(fourteen, trend, day(20))).toMatchObject({
      kcalPerDay: 2200,
      days: 14,
      from: day(7),
    });
  });

  it('uses the last 28 days at most', () => {
    const { days, trend } = steady(40, 1800, 0.05);
    expect(maintenanceEstimate(days, trend, day(40))).toMatchObject({ days: 28, from: day(13), to: day(40) });
  });

  it('leaves countdown days out and does not measure the trend across a countdown', () => {
    // Days 1–16 dieting, 17–20 countdown (a 3 kg water cut, a high intake), 21–24 after it.
    const { days, trend } = steady(24, 2000, 0.1);
    const marked = days.map((d, i) => (i >= 16 && i < 20 ? { ...d, countdown: true, energyKcal: 4000 } : d));
    const cut = trend.map((t, i) => (i >= 16 ? { ...t, trendKg: t.trendKg - 3 } : t));
    const estimate = maintenanceEstimate(marked, cut, day(24))!;
    expect(estimate).toMatchObject({ days: 16, from: day(1), to: day(16) });
    expect(estimate.kcalPerDay).toBeCloseTo(2770, 9);
  });

  it('leaves the day in progress out: a partial day’s intake never enters the estimate', () => {
    // 28 days at 2,000 kcal losing 0.1 kg/day, the 28th in progress with 849 kcal so far.
    const { days, trend } = steady(28, 2000, 0.1);
    const withToday = days.map((d, i) => (i === 27 ? { ...d, energyKcal: 849, inProgress: true } : d));
    const estimate = maintenanceEstimate(withToday, trend, day(28))!;
    expect(estimate).toMatchObject({ days: 27, from: day(1), to: day(27) });
    expect(estimate.kcalPerDay).toBeCloseTo(2770, 9);
  });

  it('divides the trend change by the calendar days between the trend values used', () => {
    // Weighed only on days 1 and 15: 1.4 kg over 14 days = 0.1 kg/day → 770 kcal/day.
    const { days } = steady(15, 2000, 0);
    const trend = [
      { date: day(1), trendKg: 80 },
      { date: day(15), trendKg: 78.6 },
    ];
    expect(maintenanceEstimate(days, trend, day(15))!.kcalPerDay).toBeCloseTo(2770, 9);
    expect(maintenanceEstimate(days, [trend[0]!], day(15))).toBeNull();
  });
});

describe('flagsFor', () => {
  const base = { rate: null, symptoms: [], from: day(1), today: day(20) };
  /** Weighed every day from day 1 to day 19 at 80 kg, with some days replaced. */
  const everyDay = (changes: Record<number, number | null> = {}): WeighInPoint[] =>
    Array.from({ length: 19 }, (_, i) => i + 1).flatMap((n) => {
      const kg = n in changes ? changes[n]! : 80;
      return kg === null ? [] : [{ date: day(n), kg }];
    });

  it('flags a drop of 2 % or more to the next weigh-in within 48 h (ACSM 2007, Sawka et al., MSSE 39:377)', () => {
    // ACSM 2007 position stand (REFERENCES.md §5, §7 rule 2): a water deficit > 2 % of body mass;
    // 2 % of 80 kg = 1.60 kg (REFERENCES.md §5 check for 80 kg).
    const flags = flagsFor({ ...base, points: everyDay({ 10: 78.4 }) });
    expect(flags).toEqual([
      expect.objectContaining({
        kind: 'acute_drop',
        date: day(10),
        severity: 'warning',
        source: expect.stringContaining('MSSE 39:377'),
        drop: { fromDate: day(9), fromKg: 80, toKg: 78.4, percent: expect.closeTo(2, 9) },
      }),
    ]);
  });

  it('does not flag a drop below 2 %, nor one spread over more than 48 h', () => {
    expect(flagsFor({ ...base, points: everyDay({ 10: 78.41 }) })).toEqual([]);
    // Day 9 missing: day 8 → day 10 is 48 h and flags; days 8 and 9 missing: 72 h, no acute flag.
    expect(flagsFor({ ...base, points: everyDay({ 9: null, 10: 78.4 }) }).map((f) => f.kind)).toEqual([
      'acute_drop',
    ]);
    const slow = flagsFor({ ...base, points: everyDay({ 8: null, 9: null, 10: 78.4 }) });
    expect(slow.map((f) => f.kind)).toEqual(['missed_weigh_ins']);
  });

  it('flags a drop of 2 % within 48 h whatever lies between: 80 → 79.0 → 78.05 kg (ACSM 2007)', () => {
    // ACSM 2007 (Sawka et al., MSSE 39:377–390): > 2 % of body mass within 48 h; 80 → 78.05 kg is
    // −1.95 kg = −2.44 % of 80 kg over two mornings, though each step is below 2 % (−1.25 %, −1.20 %).
    const flags = flagsFor({ ...base, points: everyDay({ 10: 79.0, 11: 78.05 }) });
    expect(flags).toEqual([
      expect.objectContaining({
        kind: 'acute_drop',
        date: day(11),
        drop: { fromDate: day(9), fromKg: 80, toKg: 78.05, percent: expect.closeTo(2.4375, 9) },
      }),
    ]);
    expect(flags[0]!.message).toContain('in 2 days');
    // The same figures with the middle weigh-in missing give the same flag.
    const gap = flagsFor({ ...base, points: everyDay({ 10: null, 11: 78.05 }) });
    expect(gap.map((f) => [f.kind, f.date, f.drop?.fromDate])).toEqual([['acute_drop', day(11), day(9)]]);
  });

  it('measures from the highest weigh-in of the 48 h before, not the nearest', () => {
    // 80.0 (day 9), 81.0 (day 10), 79.3 (day 11): −2.1 % from day 10's 81.0, −0.9 % from day 9.
    const flags = flagsFor({ ...base, points: everyDay({ 9: 80, 10: 81, 11: 79.3 }) });
    expect(flags.map((f) => f.drop)).toEqual([
      { fromDate: day(10), fromKg: 81, toKg: 79.3, percent: expect.closeTo((1.7 / 81) * 100, 9) },
    ]);
  });

  it('raises one drop once: the next weigh-in at the same low is not a second flag, a further fall is', () => {
    // 80 (day 9) → 78.4 (day 10, −2 %) → 78.4 (day 11: still −2 % from day 9, same episode).
    const same = flagsFor({ ...base, points: everyDay({ 10: 78.4, 11: 78.4, 12: 80, 13: 80 }) });
    expect(same.map((f) => f.date)).toEqual([day(10)]);
    // … → 78.0 on day 11: −2.5 % from day 9, worse than day 10's: flagged again.
    const worse = flagsFor({ ...base, points: everyDay({ 10: 78.4, 11: 78.0, 12: 80, 13: 80 }) });
    expect(worse.map((f) => [f.date, f.drop?.fromDate])).toEqual([
      [day(10), day(9)],
      [day(11), day(9)],
    ]);
  });

  it('flags a 14-day rate beyond −1 %/week as a warning (Helms 2014) and beyond −1.4 %/week as strong (Garthe 2011), one of the two, none in a countdown', () => {
    const rate = (percentPerWeek: number) => ({
      ...rate14(INVENTED, day(14), rateGuidance({ goal: 'lose', countdown: false }))!,
      percentPerWeek,
    });
    const kinds = (pct: number) =>
      flagsFor({ ...base, points: [], rate: rate(pct) }).map((f) => [f.kind, f.severity, f.date]);
    expect(kinds(-0.9592)).toEqual([]);
    expect(kinds(-1)).toEqual([]);
    expect(kinds(-1.2)).toEqual([['rate_beyond', 'warning', day(14)]]);
    expect(kinds(-1.4)).toEqual([['rate_beyond', 'warning', day(14)]]);
    expect(kinds(-1.5)).toEqual([['rate_far_beyond', 'strong', day(14)]]);
    expect(kinds(0.8)).toEqual([]);
    // Inside a countdown the guidance is paused: no rate flag at any speed (the band is withheld too).
    const paused = (pct: number) => ({ ...rate(pct), band: null, paused: true });
    expect(flagsFor({ ...base, points: [], rate: paused(-1.2) })).toEqual([]);
    expect(flagsFor({ ...base, points: [], rate: paused(-2.5) })).toEqual([]);
    const strong = flagsFor({ ...base, points: [], rate: rate(-1.5) })[0]!;
    expect(strong.source).toContain('IJSNEM 21:97');
    expect(flagsFor({ ...base, points: [], rate: rate(-1.2) })[0]!.source).toContain('JISSN 11:20');
  });

  it('flags every symptom report; an urgent one is strong', () => {
    const flags = flagsFor({
      ...base,
      points: everyDay(),
      symptoms: [
        { date: day(5), symptoms: ['headache'], urgent: false },
        { date: day(5), symptoms: ['dizziness', 'muscle_cramps'], urgent: true },
      ],
    });
    expect(flags.map((f) => [f.kind, f.severity, f.message])).toEqual([
      ['symptom', 'warning', 'Reported: Headache'],
      ['symptom', 'strong', 'Reported: Dizziness, Muscle cramps'],
    ]);
  });

  it('flags two or more missed weigh-ins in a row before today, once per run, dated on its last day', () => {
    // Missed: 3–4 (a run of 2), 7 (alone), 11–13 (a run of 3); today (day 20) does not count yet.
    const points = everyDay({ 3: null, 4: null, 7: null, 11: null, 12: null, 13: null, 19: null });
    const flags = flagsFor({ ...base, points });
    expect(flags.map((f) => [f.kind, f.date, f.message])).toEqual([
      ['missed_weigh_ins', day(4), `No weigh-in on 2 days in a row (${day(3)} – ${day(4)}).`],
      ['missed_weigh_ins', day(13), `No weigh-in on 3 days in a row (${day(11)} – ${day(13)}).`],
    ]);
  });

  it('counts a run that is still going up to yesterday, but not today itself', () => {
    const points = everyDay().filter((p) => p.date <= day(16));
    expect(flagsFor({ ...base, points }).map((f) => [f.kind, f.date])).toEqual([
      ['missed_weigh_ins', day(19)],
    ]);
    const onlyYesterdayMissed = everyDay({ 19: null });
    expect(flagsFor({ ...base, points: onlyYesterdayMissed })).toEqual([]);
  });

  it('returns only flags dated from `from` to today, in date order', () => {
    const points = everyDay({ 3: 78, 4: null, 5: null, 15: 77 });
    const flags = flagsFor({
      ...base,
      from: day(5),
      points,
      symptoms: [
        { date: day(2), symptoms: ['headache'], urgent: false },
        { date: day(12), symptoms: ['headache'], urgent: false },
      ],
    });
    expect(flags.map((f) => [f.kind, f.date])).toEqual([
      ['missed_weigh_ins', day(5)],
      ['symptom', day(12)],
      ['acute_drop', day(15)],
    ]);
  });
});
