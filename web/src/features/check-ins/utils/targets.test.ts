import type { ScheduleItem } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { sodiumLogged, supplementSlots } from './targets';

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
