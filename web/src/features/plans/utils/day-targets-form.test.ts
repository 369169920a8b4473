import { dayTargets, emptyDayTargets, type DayTargets } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  dayTargetsFormValues,
  emptyDayTargetsFormValues,
  liveDayTargets,
  NOT_A_NUMBER,
  splitTimes,
  targetsFormPath,
  toDayTargets,
} from './day-targets-form';

const full: DayTargets = {
  energy: { kind: 'usual_times', factor: 0.9 },
  protein: { kind: 'g_per_kg', perKg: 2.2 },
  carbohydrate: { kind: 'pct', pct: 40 },
  fat: { kind: 'g', g: 60 },
  water: { kind: 'usual_plus', ml: 1000 },
  sodiumMg: 2300,
  fluidCutoff: { time: '19:00', allowanceMl: 150 },
  foodCutoff: { time: '13:00', allowanceKcal: 200 },
  fluidCap: { maxMl: 300, after: '15:00' },
  steps: 10000,
  cardioMinutes: 30,
  supplements: [
    { id: '5b0e1c8e-3f41-4c59-9d7e-1d7c2a6f0b11', item: 'Creatine', dose: 5, unit: 'g', times: ['08:00'] },
    {
      id: '5b0e1c8e-3f41-4c59-9d7e-1d7c2a6f0b12',
      item: 'Rice cakes',
      dose: 2,
      unit: 'pieces',
      times: [],
      minutesBeforeEvent: [180],
    },
  ],
  note: 'Salt your meals as usual.',
};

describe('day targets form', () => {
  it('round-trips every kind of target through the typed form', () => {
    const { targets, numberErrors } = toDayTargets(dayTargetsFormValues(full));
    expect(numberErrors).toEqual({});
    expect(targets).toEqual(full);
    expect(dayTargets.safeParse(targets).success).toBe(true);
  });

  it('an empty form is a day without targets', () => {
    expect(toDayTargets(emptyDayTargetsFormValues()).targets).toEqual(emptyDayTargets());
  });

  it('marks a box that holds no number, and leaves an empty chosen figure for the schema to name', () => {
    const v = emptyDayTargetsFormValues();
    v.energy = { kind: 'kcal', value: 'lots' };
    v.protein = { kind: 'g', value: '' };
    v.sodiumMg = '2,300';
    const { targets, numberErrors } = toDayTargets(v);
    expect(numberErrors).toEqual({ 'energy.value': NOT_A_NUMBER });
    expect(targets.sodiumMg).toBe(2300);
    const parsed = dayTargets.safeParse(targets);
    expect(parsed.success).toBe(false);
    const paths = parsed.error?.issues.map((i) => targetsFormPath(i.path.join('.')));
    expect(paths).toEqual(expect.arrayContaining(['energy.value', 'protein.value']));
  });

  it('live figures skip half-typed boxes instead of failing', () => {
    const v = dayTargetsFormValues(full);
    v.fat = { kind: 'g', value: '6x' };
    v.fluidCutoff.time = '';
    v.supplements.push({ itemId: 'x', item: '', dose: '', unit: '', times: '', beforeEventHours: '' });
    const live = liveDayTargets(v);
    expect(live.fat).toBeNull();
    expect(live.fluidCutoff).toBeNull();
    expect(live.supplements).toHaveLength(2);
    expect(live.protein).toEqual({ kind: 'g_per_kg', perKg: 2.2 });
  });

  it('reads a decimal comma, and a comma grouping thousands as the figures are shown', () => {
    const v = emptyDayTargetsFormValues();
    v.sodiumMg = '1,500';
    v.steps = '12,000';
    v.cardioMinutes = '22,5';
    v.supplements = [
      { itemId: 'i', item: 'Caffeine', dose: '0,125', unit: 'g', times: '07:00', beforeEventHours: '' },
    ];
    const { targets } = toDayTargets(v);
    expect([targets.sodiumMg, targets.steps, targets.cardioMinutes, targets.supplements[0]?.dose]).toEqual([
      1500, 12000, 22.5, 0.125,
    ]);
  });

  it('reads the food cut-off, the fluid cap and hours before the event (as minutes)', () => {
    const v = emptyDayTargetsFormValues();
    v.foodCutoff = { on: true, time: '13:00', allowanceKcal: '150' };
    v.fluidCap = { on: true, maxMl: '250', after: '' };
    v.supplements = [
      { itemId: 'i', item: 'Caffeine', dose: '200', unit: 'mg', times: '', beforeEventHours: '3, 0,5' },
    ];
    const { targets, numberErrors } = toDayTargets(v);
    expect(numberErrors).toEqual({});
    expect(targets.foodCutoff).toEqual({ time: '13:00', allowanceKcal: 150 });
    expect(targets.fluidCap).toEqual({ maxMl: 250, after: null });
    expect(targets.supplements[0]!.minutesBeforeEvent).toEqual([180, 30]);
    expect(targets.supplements[0]!.times).toEqual([]);
    // Back into the form as hours.
    expect(dayTargetsFormValues(targets).supplements[0]!.beforeEventHours).toBe('3, 0.5');
    expect(targetsFormPath('supplements.0.minutesBeforeEvent.1')).toBe('supplements.0.beforeEventHours');
    expect(targetsFormPath('foodCutoff.allowanceKcal')).toBe('foodCutoff.allowanceKcal');
    expect(targetsFormPath('fluidCap.maxMl')).toBe('fluidCap.maxMl');
  });

  it('reads clock times separated by commas or spaces, padding 7:30', () => {
    expect(splitTimes('7:30, 12:00 19:45;')).toEqual(['07:30', '12:00', '19:45']);
  });

  it('puts schema paths on the box that shows them', () => {
    expect(targetsFormPath('protein.pct')).toBe('protein.value');
    expect(targetsFormPath('energy')).toBe('energy.value');
    expect(targetsFormPath('supplements.2.times.1')).toBe('supplements.2.times');
    expect(targetsFormPath('supplements.0.id')).toBe('supplements.0.item');
    expect(targetsFormPath('fluidCutoff')).toBe('fluidCutoff.time');
    expect(targetsFormPath('sodiumMg')).toBe('sodiumMg');
  });
});
