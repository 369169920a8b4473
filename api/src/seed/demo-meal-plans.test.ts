import {
  GUARDRAIL_DEFAULTS,
  mealPlanDayTotals,
  mealPlanVerdicts,
  planContent,
  resolveTargets,
  type DayTargets,
} from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { localDate } from './calendar.js';
import { findReferenceFood } from '../adapters/reference-foods.js';
import { fitQuantities } from '../lib/meal-plan-fit.js';
import { DEMO_MEAL_PLANS, withDemoMealPlans } from './demo-meal-plans.js';
import { DEMO_TEMPLATES, planDemoVersions, type DemoTemplateKey, type SeededTemplate } from './demo-plans.js';
import { DEMO_ATHLETES } from './demo-team.js';
import { generateHistory } from './history.js';

const now = new Date('2026-12-01T11:30:00Z');
const templates = new Map<DemoTemplateKey, SeededTemplate>(
  DEMO_TEMPLATES.map((t, i) => [
    t.key,
    { id: `00000000-0000-4000-8000-00000000000${i + 1}`, name: t.name, days: t.days },
  ]),
);

async function versionsOf(key: string) {
  const def = DEMO_ATHLETES.find((d) => d.key === key)!;
  const history = generateHistory(def, { seedDate: localDate(now, def.timeZone) });
  return withDemoMealPlans(
    key,
    def.history.seed,
    planDemoVersions({ def, history, now, floors: GUARDRAIL_DEFAULTS, templates }),
  );
}

describe('the demo coach’s meal plans (grams from the fit)', () => {
  it('Mateo: every countdown day has a meal plan within the tolerances of its targets', async () => {
    // The countdown is applied 4 days before the seed day, with the show 4 days after it.
    const versions = await versionsOf('final_week');
    const countdown = versions.at(-1)!;
    const days = countdown.content.dates.filter((d) => d.countdownOffset !== null);
    expect(days.length).toBeGreaterThan(3);
    for (const d of days) checkDay(d.targets, countdown.baseline, countdown.content.tolerances, d.date);
    // Earlier versions stay without meal plans.
    expect(versions[0]!.content.dayTypes.every((t) => !t.targets.meals)).toBe(true);
  });

  it('Hannah: the diet and refeed days of her latest version have meal plans within tolerance', async () => {
    const versions = await versionsOf('long_diet');
    const latest = versions.at(-1)!;
    expect(latest.content.dayTypes.map((t) => t.key)).toEqual(['diet', 'refeed']);
    for (const t of latest.content.dayTypes)
      checkDay(t.targets, latest.baseline, latest.content.tolerances, t.key);
    expect(planContent.safeParse(latest.content).success).toBe(true);
    expect(versions.slice(0, -1).every((v) => v.content.dayTypes.every((t) => !t.targets.meals))).toBe(true);
  });

  it('the fit, given the refeed day’s foods and bounds, finds a fit within every tolerance', async () => {
    const latest = (await versionsOf('long_diet')).at(-1)!;
    const refeed = latest.content.dayTypes.find((t) => t.key === 'refeed')!.targets;
    const foods = [];
    for (const [m, meal] of DEMO_MEAL_PLANS.long_diet!.meals.entries()) {
      for (const f of meal.foods) {
        const ref = (await findReferenceFood(f.code))!;
        foods.push({ ...f, mealId: String(m), foodId: ref.id, per100g: { ...ref.per100g, sodiumMg: null } });
      }
    }
    const fit = await fitQuantities(
      foods,
      resolveTargets(refeed, latest.baseline),
      latest.content.tolerances,
    );
    expect(fit.unmet).toEqual([]);
  }, 30_000);
});

function checkDay(
  targets: DayTargets,
  baseline: Parameters<typeof resolveTargets>[1],
  tolerances: Parameters<typeof mealPlanVerdicts>[2],
  what: string,
) {
  expect(targets.meals?.length, what).toBeGreaterThanOrEqual(3);
  const verdicts = mealPlanVerdicts(
    mealPlanDayTotals(targets.meals ?? []),
    resolveTargets(targets, baseline),
    tolerances,
  );
  expect(verdicts.length, what).toBe(4);
  for (const v of verdicts) expect([what, v.metric, v.state]).toEqual([what, v.metric, 'on_plan']);
}
