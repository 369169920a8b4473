import type { ScheduleItem } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  amountProgress,
  cutoffProgress,
  minimumProgress,
  percentOf,
  sodiumLogged,
  supplementSlots,
} from './targets';

describe('amountProgress (tolerance from the plan; drifting up to twice it: our display rule, no source)', () => {
  const energy = (actual: number | null, inProgress = false) =>
    amountProgress({ target: 2000, actual, tolerance: percentOf(2000, 5), inProgress });

  it('is on plan inside the band, edges included', () => {
    expect(energy(2000).state).toBe('on-plan');
    expect(energy(1900).state).toBe('on-plan');
    expect(energy(2100).state).toBe('on-plan');
    expect(energy(2000)).toMatchObject({ low: 1900, high: 2100 });
  });

  it('grades a finished day by how far outside the band it is', () => {
    expect(energy(1850)).toMatchObject({ state: 'drifting', difference: -150 });
    expect(energy(2200).state).toBe('drifting');
    expect(energy(2201).state).toBe('off-plan');
    expect(energy(1500).state).toBe('off-plan');
  });

  it('calls being under the band "to go" while the day runs, but not being over it', () => {
    expect(energy(1200, true).state).toBe('to-go');
    expect(energy(2300, true).state).toBe('off-plan');
  });

  it('is not logged without entries, and clamps the band at zero', () => {
    expect(energy(null).state).toBe('not-logged');
    expect(amountProgress({ target: 5, actual: 0, tolerance: 10, inProgress: false })).toMatchObject({
      low: 0,
      high: 15,
      state: 'on-plan',
    });
  });
});

describe('minimumProgress (steps, cardio)', () => {
  it('is on plan once reached, to go today, and graded after the day', () => {
    expect(minimumProgress({ target: 10000, actual: 10400, inProgress: false }).state).toBe('on-plan');
    expect(minimumProgress({ target: 10000, actual: 6000, inProgress: true }).state).toBe('to-go');
    expect(minimumProgress({ target: 10000, actual: 9200, inProgress: false }).state).toBe('drifting');
    expect(minimumProgress({ target: 10000, actual: 6000, inProgress: false }).state).toBe('off-plan');
    expect(minimumProgress({ target: 30, actual: null, inProgress: false }).state).toBe('not-logged');
  });
});

describe('cutoffProgress', () => {
  const cutoff = { time: '18:00', allowanceMl: 250 };
  const fluids = [
    { time: '17:30', volumeMl: 500 },
    { time: '18:00', volumeMl: 200 },
    { time: '19:15', volumeMl: 150 },
  ];

  it('counts only drinks later than the cut-off time', () => {
    expect(cutoffProgress(fluids, cutoff, '20:00')).toMatchObject({
      afterMl: 150,
      started: true,
      state: 'within',
    });
  });

  it('is over beyond the allowance, and waiting before the cut-off', () => {
    expect(cutoffProgress([...fluids, { time: '21:00', volumeMl: 200 }], cutoff, null).state).toBe('over');
    expect(cutoffProgress(fluids.slice(0, 1), cutoff, '12:00')).toMatchObject({
      started: false,
      state: 'before',
    });
  });
});

describe('supplementSlots', () => {
  const creatine: ScheduleItem = {
    id: '11111111-1111-4111-8111-111111111111',
    item: 'Creatine',
    dose: 5,
    unit: 'g',
    times: ['20:00', '08:00'],
  };
  const magnesium: ScheduleItem = {
    id: '22222222-2222-4222-8222-222222222222',
    item: 'Magnesium',
    dose: 300,
    unit: 'mg',
    times: ['21:30'],
  };
  const entry = (id: string, time: string, name: string, scheduleItemId: string | null) => ({
    id,
    time,
    name,
    scheduleItemId,
  });

  it('lists each item × time in clock order with its state', () => {
    const slots = supplementSlots([creatine, magnesium], [], '08:40');
    expect(slots.map((s) => [s.item.item, s.time, s.state])).toEqual([
      ['Creatine', '08:00', 'due'],
      ['Creatine', '20:00', 'upcoming'],
      ['Magnesium', '21:30', 'upcoming'],
    ]);
    expect(supplementSlots([creatine], [], '09:01')[0]?.state).toBe('late');
    expect(supplementSlots([creatine], [], '07:30')[0]?.state).toBe('due');
    expect(supplementSlots([creatine], [], null).map((s) => s.state)).toEqual(['missed', 'missed']);
  });

  it('fills an item’s times in order from its entries, linked ones first, then same-named ones', () => {
    const slots = supplementSlots(
      [creatine, magnesium],
      [
        entry('a', '14:30', 'Creatine', creatine.id),
        entry('b', '21:00', 'magnesium ', null),
        entry('c', '22:00', 'Vitamin D', null),
      ],
      '22:10',
    );
    expect(slots.map((s) => [s.key, s.state, s.taken?.id ?? null])).toEqual([
      [`${creatine.id}@08:00`, 'taken', 'a'],
      [`${creatine.id}@20:00`, 'late', null],
      [`${magnesium.id}@21:30`, 'taken', 'b'],
    ]);
  });
});

describe('sodiumLogged', () => {
  it("reads the server's total: unknown (null) until a meal carries sodium", () => {
    const meal = (sodiumMg: number | null) => ({ sodiumMg }) as never;
    expect(sodiumLogged({ meals: [meal(null)], totals: { sodiumMg: null } as never })).toEqual({
      mg: null,
      known: 0,
      meals: 1,
    });
    expect(sodiumLogged({ meals: [meal(400), meal(null)], totals: { sodiumMg: 400 } as never }).mg).toBe(400);
  });
});
