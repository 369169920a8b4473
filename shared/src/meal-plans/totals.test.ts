import { describe, expect, it } from 'vitest';
import { DEFAULT_TOLERANCES } from '../schemas/plans.js';
import { mealPlanAdherence } from '../rules/day-verdicts.js';
import { mealPlanDayTotals, mealPlanVerdicts, plannedMealTotals } from './totals.js';

// Invented foods, worked out by hand: per-100 g × grams / 100 (the meal-entry rule).
const OATS = { energyKcal: 380, proteinG: 13, carbohydrateG: 60, fatG: 7, sodiumMg: 5 };
const MILK = { energyKcal: 64, proteinG: 3.4, carbohydrateG: 4.8, fatG: 3.6, sodiumMg: null };

describe('planned meal totals', () => {
  it('sums foods by weight; sodium only from the foods that list it', () => {
    // 80 g oats: 304 kcal, 10.4 g P, 48 g C, 5.6 g F, 4 mg Na; 250 g milk: 160 kcal, 8.5 g P,
    // 12 g C, 9 g F. Meal: 464 kcal, 18.9 g P, 60 g C, 14.6 g F, 4 mg Na.
    const t = plannedMealTotals({
      foods: [
        { per100g: OATS, quantityG: 80 },
        { per100g: MILK, quantityG: 250 },
      ],
    });
    expect(t.energyKcal).toBeCloseTo(464, 9);
    expect(t.proteinG).toBeCloseTo(18.9, 9);
    expect(t.carbohydrateG).toBeCloseTo(60, 9);
    expect(t.fatG).toBeCloseTo(14.6, 9);
    expect(t.sodiumMg).toBeCloseTo(4, 9);
    expect(mealPlanDayTotals([{ foods: [{ per100g: MILK, quantityG: 100 }] }]).sodiumMg).toBeNull();
  });

  it('judges the planned day by the shared day verdicts', () => {
    // 464 kcal against 500 ± 5 % (± 25): 36 over the tolerance but within twice it → drifting.
    const totals = plannedMealTotals({
      foods: [
        { per100g: OATS, quantityG: 80 },
        { per100g: MILK, quantityG: 250 },
      ],
    });
    const v = mealPlanVerdicts(
      totals,
      { energyKcal: 500, proteinG: 20, carbohydrateG: null, fatG: null },
      DEFAULT_TOLERANCES,
    );
    expect(v.map((e) => [e.metric, e.state])).toEqual([
      ['energy', 'drifting'],
      ['protein', 'on_plan'],
    ]);
  });
});

describe('mealPlanAdherence (common practice, no source: a quarter of the planned meals short)', () => {
  const finished = (planned: number, logged: number) =>
    mealPlanAdherence({ planned, logged, anyMealLogged: true, inProgress: false })?.state;
  it('four meals: one missed on plan, two drifting, three off plan', () => {
    expect(finished(4, 4)).toBe('on_plan');
    expect(finished(4, 3)).toBe('on_plan');
    expect(finished(4, 2)).toBe('drifting');
    expect(finished(4, 1)).toBe('off_plan');
  });
  it('three meals: one missed drifting', () => {
    expect(finished(3, 2)).toBe('drifting');
  });
  it('no plan, a day in progress, a day without meals', () => {
    expect(mealPlanAdherence({ planned: 0, logged: 0, anyMealLogged: true, inProgress: false })).toBeNull();
    expect(mealPlanAdherence({ planned: 3, logged: 3, anyMealLogged: true, inProgress: true })?.state).toBe(
      'in_progress',
    );
    expect(mealPlanAdherence({ planned: 3, logged: 0, anyMealLogged: false, inProgress: false })?.state).toBe(
      'not_logged',
    );
  });
});
