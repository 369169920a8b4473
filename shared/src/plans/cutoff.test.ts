import { describe, expect, it } from 'vitest';
import { amountAfter, timingBreaches } from './cutoff.js';

// The cut-off rule is the product's own (common practice, no source): strictly after the clock time.

describe('amountAfter: one rule for every cut-off', () => {
  const entries = [
    { time: '12:59', amount: 500 },
    { time: '13:00', amount: 300 },
    { time: '13:01:30', amount: 120 },
    { time: '19:45', amount: 80 },
  ];

  it('counts entries strictly after the cut-off minute, minus the allowance', () => {
    expect(amountAfter(entries, '13:00', 150)).toEqual({ logged: 200, excess: 50 });
    expect(amountAfter(entries, '13:00', 250)).toEqual({ logged: 200, excess: -50 });
  });

  it('without a time, counts the whole day', () => {
    expect(amountAfter(entries, null, 250)).toEqual({ logged: 1000, excess: 750 });
  });
});

describe('timingBreaches', () => {
  const fluids = [
    { time: '08:00', volumeMl: 150 },
    { time: '14:00', volumeMl: 200 },
  ];
  const meals = [
    { time: '11:30', energyKcal: 600 },
    { time: '13:00', energyKcal: 100 },
    { time: '15:10', energyKcal: 350 },
  ];

  it('food after "all food before 13:00" beyond 150 kcal: 350 kcal logged, 200 beyond', () => {
    expect(
      timingBreaches(
        { fluidCutoff: null, foodCutoff: { time: '13:00', allowanceKcal: 150 }, fluidCap: null },
        fluids,
        meals,
      ),
    ).toEqual([
      { kind: 'food_cutoff', after: '13:00', unit: 'kcal', allowance: 150, logged: 350, excess: 200 },
    ]);
  });

  it('the fluid cut-off and an "only sips" cap for the whole day use the same rule', () => {
    expect(
      timingBreaches(
        {
          fluidCutoff: { time: '12:00', allowanceMl: 100 },
          foodCutoff: { time: '16:00', allowanceKcal: 0 },
          fluidCap: { maxMl: 250, after: null },
        },
        fluids,
        meals,
      ),
    ).toEqual([
      { kind: 'fluid_cutoff', after: '12:00', unit: 'ml', allowance: 100, logged: 200, excess: 100 },
      { kind: 'fluid_cap', after: null, unit: 'ml', allowance: 250, logged: 350, excess: 100 },
    ]);
  });

  it('nothing within the allowances', () => {
    expect(
      timingBreaches(
        {
          fluidCutoff: null,
          foodCutoff: { time: '13:00', allowanceKcal: 400 },
          fluidCap: { maxMl: 200, after: '12:00' },
        },
        fluids,
        meals,
      ),
    ).toEqual([]);
  });
});
