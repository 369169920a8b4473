import {
  DEFAULT_FIT_BOUNDS,
  DRIFT_METRIC_LABELS,
  DRIFT_METRIC_UNITS,
  mealPlanDayTotals,
  mealPlanVerdicts,
  type DriftEntry,
  type FitTargets,
  type MealPlanFit,
  type PlannedPer100g,
  type Tolerances,
} from '@driftmark/shared';
import * as highsModule from 'highs';
import type { LegacyHighs } from 'highs';

// The package's types read as CommonJS under NodeNext (the loader at `.default.default`) while
// Node loads its ES build (the loader at `.default`); take whichever is the function.
type HighsLoader = () => Promise<LegacyHighs>;
const highsExports = highsModule as unknown as { default: HighsLoader | { default: HighsLoader } };
const loadHighs: HighsLoader =
  typeof highsExports.default === 'function' ? highsExports.default : highsExports.default.default;

/*
 * "Fit the quantities" as a mixed-integer linear programme, solved by HiGHS (highs on npm, the
 * Edinburgh solver compiled to WebAssembly: runs in Node 20 with no native build, solves integer
 * steps exactly, where javascript-lp-solver's branch and bound is known to stall and round).
 *
 * Variables: n_f, whole steps of food f (grams = step × n_f, within the food's bounds). For each
 * target t with a figure: total_t − target_t = over_t − under_t, and excess_t ≥ over_t − tol_t,
 * excess_t ≥ under_t − tol_t. Objective: first the excess beyond the tolerances, then the
 * deviations themselves, both in units of each target's tolerance, so energy in kcal and protein
 * in g weigh alike (weighted goal programming, Charnes & Cooper 1961, from memory; the diet problem
 * as an LP is Stigler 1945 / Dantzig 1990, Interfaces 20(4):43). With a fit within every tolerance
 * the excess is zero; without one, the excess left is by how much each target cannot be met.
 */

/** A food to fit: its per-100 g values and bounds in grams. */
export interface FitFood {
  mealId: string;
  foodId: string;
  per100g: PlannedPer100g;
  minG?: number | undefined;
  maxG?: number | undefined;
  stepG?: number | undefined;
}

type Metric = 'energy' | 'protein' | 'carbohydrate' | 'fat';
const METRICS: readonly { metric: Metric; target: keyof FitTargets; per100g: keyof PlannedPer100g }[] = [
  { metric: 'energy', target: 'energyKcal', per100g: 'energyKcal' },
  { metric: 'protein', target: 'proteinG', per100g: 'proteinG' },
  { metric: 'carbohydrate', target: 'carbohydrateG', per100g: 'carbohydrateG' },
  { metric: 'fat', target: 'fatG', per100g: 'fatG' },
];

/**
 * The search stops once the proposal is within a fifth of a tolerance (summed over the targets) of
 * the best the relaxation allows, or after 2 s: many near-equal proposals exist and proving the very
 * best among them can take HiGHS far longer without changing what the coach sees.
 */
const SOLVER_OPTIONS = { output_flag: false, mip_abs_gap: 0.2, time_limit: 2 } as const;

/** Excess beyond a tolerance weighs this much more than the deviation within it. */
const EXCESS_WEIGHT = 1000;

let highsPromise: Promise<LegacyHighs> | null = null;
/** The WebAssembly module, instantiated once per process. */
function highs(): Promise<LegacyHighs> {
  highsPromise ??= loadHighs();
  return highsPromise;
}

const num = (x: number): string => {
  // The LP format takes plain decimals; 12 significant digits keep per-gram values exact enough.
  const s = Number(x.toPrecision(12)).toString();
  return s.includes('e') ? x.toFixed(12) : s;
};

function term(coef: number, name: string): string {
  return `${coef < 0 ? '-' : '+'} ${num(Math.abs(coef))} ${name}`;
}

function boundsOf(f: FitFood): { step: number; lo: number; hi: number } {
  const step = f.stepG ?? DEFAULT_FIT_BOUNDS.stepG;
  const minG = f.minG ?? DEFAULT_FIT_BOUNDS.minG;
  const maxG = Math.max(minG, f.maxG ?? DEFAULT_FIT_BOUNDS.maxG);
  return { step, lo: Math.ceil(minG / step - 1e-9), hi: Math.floor(maxG / step + 1e-9) };
}

/** One line per target outside its tolerance, saying by how much it cannot be met. */
export function unmetLines(verdicts: readonly DriftEntry[]): string[] {
  return verdicts
    .filter((v) => v.state !== 'on_plan' && v.diff !== null)
    .map((v) => {
      const unit = DRIFT_METRIC_UNITS[v.metric];
      const diff = v.diff ?? 0;
      const beyond = Math.abs(diff) - v.tolerance;
      const side = diff < 0 ? 'short of' : 'over';
      return (
        `${DRIFT_METRIC_LABELS[v.metric]} cannot be met with these foods and bounds: at best ` +
        `${Math.round(Math.abs(diff))} ${unit} ${side} ${Math.round(v.target)} ${unit}, ` +
        `${Math.round(beyond)} ${unit} beyond the tolerance of ±${Math.round(v.tolerance)} ${unit}`
      );
    });
}

/**
 * Proposes grams for each food so the day's energy and macros land within tolerance; where they
 * cannot, the closest proposal and what stays unmet. Foods are fitted for the whole day.
 */
export async function fitQuantities(
  foods: readonly FitFood[],
  targets: FitTargets,
  tolerances: Pick<Tolerances, 'energyPct' | 'proteinG' | 'carbohydrateG' | 'fatG'>,
): Promise<{ grams: number[]; fits: boolean; verdicts: DriftEntry[]; unmet: string[] }> {
  const tol: Record<Metric, (target: number) => number> = {
    energy: (t) => (t * tolerances.energyPct) / 100,
    protein: () => tolerances.proteinG,
    carbohydrate: () => tolerances.carbohydrateG,
    fat: () => tolerances.fatG,
  };
  const bounds = foods.map(boundsOf);
  const objective: string[] = [];
  const rows: string[] = [];
  const colBounds: string[] = bounds.map((b, i) => `${b.lo} <= n${i} <= ${b.hi}`);

  for (const { metric, target, per100g } of METRICS) {
    const goal = targets[target];
    if (goal === null) continue;
    // A tolerance of 0 still needs a unit to weigh the deviation by.
    const t = Math.max(tol[metric](goal), 1e-3);
    const perStep = foods.map((f, i) => ((f.per100g[per100g] ?? 0) / 100) * (bounds[i]?.step ?? 1));
    const lhs = perStep.map((c, i) => term(c, `n${i}`)).join(' ');
    rows.push(` d_${metric}: ${lhs} - over_${metric} + under_${metric} = ${num(goal)}`);
    rows.push(` xo_${metric}: over_${metric} - excess_${metric} <= ${num(t)}`);
    rows.push(` xu_${metric}: under_${metric} - excess_${metric} <= ${num(t)}`);
    objective.push(
      term(EXCESS_WEIGHT / t, `excess_${metric}`),
      term(1 / t, `over_${metric}`),
      term(1 / t, `under_${metric}`),
    );
  }

  let steps = bounds.map((b) => b.lo);
  if (objective.length > 0 && foods.length > 0) {
    const lp = [
      'Minimize',
      ` obj: ${objective.join(' ')}`,
      'Subject To',
      ...rows,
      'Bounds',
      ...colBounds,
      'Generals',
      ` ${foods.map((_, i) => `n${i}`).join(' ')}`,
      'End',
    ].join('\n');
    const solver = await highs();
    const result = solver.solve(lp, SOLVER_OPTIONS);
    // A time limit still leaves the best proposal found; only no proposal at all is an error.
    const usable =
      result.Status === 'Optimal' || (result.Status === 'Time limit reached' && result.Columns['n0']);
    if (!usable) throw new Error(`Meal-plan fit ended with status ${result.Status}`);
    steps = foods.map((_, i) => Math.round(result.Columns[`n${i}`]?.Primal ?? 0));
  }

  const grams = steps.map((n, i) => n * (bounds[i]?.step ?? 1));
  const totals = mealPlanDayTotals([
    { foods: foods.map((f, i) => ({ per100g: f.per100g, quantityG: grams[i] ?? 0 })) },
  ]);
  const verdicts = mealPlanVerdicts(
    totals,
    targets,
    // Water, sodium and activity take no part; their tolerances are never read.
    { ...tolerances, waterPct: 0, sodiumPct: 0 },
  );
  const unmet = unmetLines(verdicts);
  return { grams, fits: unmet.length === 0, verdicts, unmet };
}

/** The fit's answer, meal by meal in the request's order. */
export function fitAnswer(
  foods: readonly FitFood[],
  fit: Awaited<ReturnType<typeof fitQuantities>>,
): MealPlanFit {
  const meals: MealPlanFit['meals'] = [];
  foods.forEach((f, i) => {
    let meal = meals.find((m) => m.id === f.mealId);
    if (!meal) {
      meal = { id: f.mealId, foods: [] };
      meals.push(meal);
    }
    meal.foods.push({ foodId: f.foodId, quantityG: fit.grams[i] ?? 0 });
  });
  const totals = mealPlanDayTotals([
    { foods: foods.map((f, i) => ({ per100g: f.per100g, quantityG: fit.grams[i] ?? 0 })) },
  ]);
  return { fits: fit.fits, meals, totals, verdicts: fit.verdicts, unmet: fit.unmet };
}
