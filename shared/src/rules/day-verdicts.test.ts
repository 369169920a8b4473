import { describe, expect, it } from 'vitest';
import { DEFAULT_TOLERANCES } from '../schemas/plans.js';
import { DRIFT_METRICS } from '../schemas/trends.js';
import { DRIFT_STATE_LABELS } from '../vocabulary.js';
import {
  ACTIVITY_TOLERANCE_PCT,
  adherenceOf,
  CUTOFF_RULE,
  cutoffVerdict,
  dayVerdicts,
  isInProgress,
  judge,
  METRIC_RULES,
  metricVerdict,
  onPlanBounds,
} from './day-verdicts.js';

const verdict = (metric: (typeof DRIFT_METRICS)[number], target: number, actual: number | null) =>
  metricVerdict({ metric, target, actual, tolerances: DEFAULT_TOLERANCES, inProgress: false });

describe('METRIC_RULES (each metric names its kind and where the kind comes from)', () => {
  it('a range for energy, macros, water and sodium (product brief: target ± the plan tolerance)', () => {
    for (const m of ['energy', 'protein', 'carbohydrate', 'fat', 'water', 'sodium'] as const) {
      expect(METRIC_RULES[m]).toEqual({ kind: 'range', source: expect.stringContaining('Product brief') });
    }
  });

  it('at least for steps and cardio: common practice, no source', () => {
    expect(METRIC_RULES.steps).toEqual({
      kind: 'at_least',
      source: expect.stringContaining('common practice, no source'),
    });
    expect(METRIC_RULES.cardio.kind).toBe('at_least');
    expect(METRIC_RULES.cardio.source).toContain('common practice, no source');
    expect(ACTIVITY_TOLERANCE_PCT).toBe(10);
  });

  it('at most for fluids after the cut-off, the allowance being the whole tolerance', () => {
    expect(CUTOFF_RULE).toMatchObject({ kind: 'at_most', toleranceMl: 0 });
  });

  it('covers every metric', () => {
    expect(Object.keys(METRIC_RULES).sort()).toEqual([...DRIFT_METRICS].sort());
  });
});

describe('judge (product brief: on plan within the tolerance, drifting up to twice it, off plan beyond)', () => {
  it('a range measures both sides', () => {
    expect(judge('range', 120, 120)).toBe('on_plan');
    expect(judge('range', -120, 120)).toBe('on_plan');
    expect(judge('range', 240, 120)).toBe('drifting');
    expect(judge('range', -241, 120)).toBe('off_plan');
  });

  it('at least: any amount over the target is on plan; a shortfall is judged by the same multiples', () => {
    expect(judge('at_least', 5998, 1000)).toBe('on_plan');
    expect(judge('at_least', -1000, 1000)).toBe('on_plan');
    expect(judge('at_least', -2000, 1000)).toBe('drifting');
    expect(judge('at_least', -2001, 1000)).toBe('off_plan');
  });

  it('at most: anything under the limit is on plan; with no tolerance any excess is off plan', () => {
    expect(judge('at_most', -500, 0)).toBe('on_plan');
    expect(judge('at_most', 0, 0)).toBe('on_plan');
    expect(judge('at_most', 1, 0)).toBe('off_plan');
  });
});

describe('metricVerdict', () => {
  it('steps far above target are on plan (15,998 of 10,000: a minimum, not a range)', () => {
    expect(verdict('steps', 10000, 15998)).toMatchObject({
      kind: 'at_least',
      diff: 5998,
      tolerance: 1000,
      onPlan: { min: 9000, max: null },
      state: 'on_plan',
    });
    expect(verdict('cardio', 30, 45).state).toBe('on_plan');
    expect(verdict('steps', 10000, 7500).state).toBe('off_plan');
  });

  it('a plan may set how far short of steps and cardio still counts (absent: the 10 % default)', () => {
    const steps = (activityPct: number | undefined) =>
      metricVerdict({
        metric: 'steps',
        target: 10000,
        actual: 8000,
        tolerances: { ...DEFAULT_TOLERANCES, activityPct },
        inProgress: false,
      });
    expect(steps(20)).toMatchObject({ tolerance: 2000, state: 'on_plan' });
    expect(steps(undefined)).toMatchObject({ tolerance: 1000, state: 'drifting' });
  });

  it('energy above its range is still drifting or off plan (a range, not a minimum)', () => {
    expect(verdict('energy', 2400, 2600)).toMatchObject({
      kind: 'range',
      tolerance: 120,
      onPlan: { min: 2280, max: 2520 },
      state: 'drifting',
    });
    expect(verdict('energy', 2400, 2700).state).toBe('off_plan');
  });

  it('a day in progress is "so far" whatever its figures, and keeps them (target − actual is "to go")', () => {
    const today = metricVerdict({
      metric: 'energy',
      target: 2210,
      actual: 849,
      tolerances: DEFAULT_TOLERANCES,
      inProgress: true,
    });
    expect(today).toMatchObject({ actual: 849, diff: 849 - 2210, state: 'in_progress' });
    expect(DRIFT_STATE_LABELS.in_progress).toBe('So far');
    expect(
      metricVerdict({
        metric: 'steps',
        target: 10000,
        actual: null,
        tolerances: DEFAULT_TOLERANCES,
        inProgress: true,
      }).state,
    ).toBe('in_progress');
  });

  it('nothing logged on a finished day is not logged, never on plan', () => {
    expect(verdict('water', 3000, null)).toMatchObject({ diff: null, state: 'not_logged' });
  });
});

describe('onPlanBounds', () => {
  it('is two-sided for a range, open above for at least, open below for at most; never below zero', () => {
    expect(onPlanBounds('range', 2400, 120)).toEqual({ min: 2280, max: 2520 });
    expect(onPlanBounds('at_least', 30, 3)).toEqual({ min: 27, max: null });
    expect(onPlanBounds('at_most', 250, 0)).toEqual({ min: null, max: 250 });
    expect(onPlanBounds('range', 5, 10)).toEqual({ min: 0, max: 15 });
  });
});

describe('dayVerdicts', () => {
  it('one entry per metric with a target, in DRIFT_METRICS order', () => {
    const entries = dayVerdicts({
      targets: {
        energyKcal: 2000,
        proteinG: null,
        carbohydrateG: null,
        fatG: null,
        waterMl: null,
        sodiumMg: null,
        steps: 10000,
        cardioMinutes: null,
      },
      tolerances: DEFAULT_TOLERANCES,
      actuals: {
        energyKcal: 2000,
        proteinG: null,
        carbohydrateG: null,
        fatG: null,
        fluidMl: null,
        sodiumMg: null,
        steps: 11250,
        cardioMinutes: null,
      },
      inProgress: false,
    });
    expect(entries.map((e) => [e.metric, e.state])).toEqual([
      ['energy', 'on_plan'],
      ['steps', 'on_plan'],
    ]);
  });
});

describe('isInProgress (the athlete’s today, until their local day ends)', () => {
  it('only the athlete’s own today', () => {
    expect(isInProgress('2026-03-10', '2026-03-10')).toBe(true);
    expect(isInProgress('2026-03-09', '2026-03-10')).toBe(false);
  });
});

describe('cutoffVerdict (fluids strictly after the cut-off, at most the allowance)', () => {
  const cutoff = { time: '18:00', allowanceMl: 250 };
  const fluids = [
    { time: '17:30', volumeMl: 500 },
    { time: '18:00', volumeMl: 200 },
    { time: '19:15', volumeMl: 150 },
  ];

  it('counts drinks later than the cut-off time; within the allowance is on plan', () => {
    expect(cutoffVerdict(cutoff, fluids, false)).toEqual({
      cutoff: '18:00',
      allowanceMl: 250,
      afterCutoffMl: 150,
      excessMl: 0,
      kind: 'at_most',
      state: 'on_plan',
    });
  });

  it('beyond the allowance is off plan; today it is "so far" with the excess still shown', () => {
    const late = [...fluids, { time: '21:00', volumeMl: 200 }];
    expect(cutoffVerdict(cutoff, late, false)).toMatchObject({ excessMl: 100, state: 'off_plan' });
    expect(cutoffVerdict(cutoff, late, true)).toMatchObject({ excessMl: 100, state: 'in_progress' });
  });

  it('not logged without fluids; null without a cut-off', () => {
    expect(cutoffVerdict(cutoff, [], false)?.state).toBe('not_logged');
    expect(cutoffVerdict(null, fluids, false)).toBeNull();
  });
});

describe('adherenceOf (product brief: the share of logged days on plan)', () => {
  it('counts not logged as a target day only, and the day in progress nowhere', () => {
    expect(adherenceOf(['on_plan', 'off_plan', 'drifting', 'not_logged', 'in_progress'])).toEqual({
      targetDays: 4,
      loggedDays: 3,
      onPlanDays: 1,
      adherence: 1 / 3,
    });
    expect(adherenceOf(['in_progress']).adherence).toBeNull();
  });
});
