import { describe, expect, it } from 'vitest';
import {
  dayTargetsFormValues,
  emptyDayTargetsFormValues,
  liveDayTargets,
  targetsFormPath,
  toDayTargets,
} from './day-targets-form';
import { emptyDayTargets } from '@driftmark/shared';

const MEAL = {
  id: '00000000-0000-4000-8000-0000000000b1',
  name: 'Breakfast',
  time: '08:00',
  foods: [
    {
      foodId: 'ifct:A015',
      name: 'Rice, raw, milled',
      quantityG: 80,
      per100g: { energyKcal: 349, proteinG: 7.9, carbohydrateG: 78.2, fatG: 0.5, sodiumMg: null },
      stepG: 10,
    },
  ],
};

describe('meal plans in the day form', () => {
  it('round-trips a saved meal plan', () => {
    const targets = { ...emptyDayTargets(), meals: [MEAL] };
    expect(toDayTargets(dayTargetsFormValues(targets)).targets.meals).toEqual([MEAL]);
  });

  it('a day without meals stays without them', () => {
    expect(toDayTargets(emptyDayTargetsFormValues()).targets).not.toHaveProperty('meals');
  });

  it('a quantity that is not a number: the box is named, live figures count it as 0 g', () => {
    const v = dayTargetsFormValues({ ...emptyDayTargets(), meals: [MEAL] });
    v.meals![0]!.foods[0]!.quantity = 'lots';
    expect(toDayTargets(v).numberErrors).toEqual({
      'meals.0.foods.0.quantityG': 'Enter a number, e.g. 2400',
    });
    expect(liveDayTargets(v).meals?.[0]?.foods[0]?.quantityG).toBe(0);
  });

  it('server paths land on their boxes', () => {
    expect(targetsFormPath('meals.0.foods.1.quantityG')).toBe('meals.0.foods.1.quantity');
    expect(targetsFormPath('meals.0.foods.1.foodId')).toBe('meals.0.foods.1.quantity');
    expect(targetsFormPath('meals.2.time')).toBe('meals.2.time');
  });
});
