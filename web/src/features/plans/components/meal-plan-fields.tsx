import {
  DRIFT_METRIC_LABELS,
  DRIFT_METRIC_UNITS,
  mealPlanDayTotals,
  mealPlanVerdicts,
  plannedMealTotals,
  type FoodView,
  type MealPlanTotals,
  type PlannedMeal,
  type ResolvedTargets,
  type Tolerances,
} from '@driftmark/shared';
import { useEffect, useId, useState } from 'react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { controlClasses, FieldErrorText, useFieldError, useFieldIds } from '@/components/ui/field';
import { BowlIcon, ErrorIcon, PlusIcon, TrashIcon } from '@/components/ui/icons';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { DRIFT_STATE_STYLE } from '@/lib/drift-states';
import { FOOD_SEARCH_MIN_CHARS, useFoodSearch } from '@/lib/food-search';
import { formatNumber, NBSP } from '@/lib/format';
import { useFitMealPlan } from '../api/fit-meal-plan';
import {
  gramsText,
  newMealRow,
  plannedFoodRow,
  typedBound,
  type MealFormValues,
} from '../utils/meal-plan-form';

const MAX_MEALS = 10;

/** "520 kcal · P 40 g · C 60 g · F 12 g" */
function totalsLine(t: MealPlanTotals): string {
  const g = (v: number) => `${formatNumber(v, 0)}${NBSP}g`;
  return `${formatNumber(t.energyKcal, 0)}${NBSP}kcal · P ${g(t.proteinG)} · C ${g(t.carbohydrateG)} · F ${g(t.fatG)}`;
}

export interface MealPlanFieldsProps {
  /** Where the day's targets sit in the form ("content.dayTypes.0.targets"). */
  name: string;
  /** The day's meals as typed so far (liveDayTargets). */
  meals: readonly PlannedMeal[];
  /** The day's targets as typed so far, resolved; null while they cannot be worked out. */
  resolved: ResolvedTargets | null;
  tolerances: Tolerances;
}

/**
 * The day's meal plan: meals at clock times with foods and grams; each meal's figures and the
 * day's against the day's energy and macro targets, judged live by the shared day verdicts; and
 * "Fit the quantities", which asks the server for grams that meet the targets.
 */
export function MealPlanFields({ name, meals, resolved, tolerances }: MealPlanFieldsProps) {
  const { control, setValue } = useFormContext();
  const rows = useFieldArray({ control, name: `${name}.meals`, keyName: 'rowKey' });
  const fit = useFitMealPlan();
  const [fitNote, setFitNote] = useState<{ fits: boolean; unmet: string[] } | null>(null);

  const dayTotals = mealPlanDayTotals(meals);
  const targets = {
    energyKcal: resolved?.energyKcal ?? null,
    proteinG: resolved?.proteinG ?? null,
    carbohydrateG: resolved?.carbohydrateG ?? null,
    fatG: resolved?.fatG ?? null,
  };
  const hasTargets = Object.values(targets).some((v) => v !== null);
  const verdicts = hasTargets ? mealPlanVerdicts(dayTotals, targets, tolerances) : [];
  const foodCount = meals.reduce((n, m) => n + m.foods.length, 0);

  async function fitQuantities() {
    setFitNote(null);
    const answer = await fit
      .mutateAsync({
        targets,
        tolerances: {
          energyPct: tolerances.energyPct,
          proteinG: tolerances.proteinG,
          carbohydrateG: tolerances.carbohydrateG,
          fatG: tolerances.fatG,
        },
        meals: meals
          .filter((m) => m.foods.length > 0)
          .map((m) => ({
            id: m.id,
            foods: m.foods.map((f) => ({
              foodId: f.foodId,
              ...(f.minG !== undefined ? { minG: f.minG } : {}),
              ...(f.maxG !== undefined ? { maxG: f.maxG } : {}),
              ...(f.stepG !== undefined ? { stepG: f.stepG } : {}),
            })),
          })),
      })
      .catch(() => null);
    if (!answer) return;
    for (const proposed of answer.meals) {
      const i = meals.findIndex((m) => m.id === proposed.id);
      proposed.foods.forEach((f, j) =>
        setValue(`${name}.meals.${i}.foods.${j}.quantity`, gramsText(f.quantityG), { shouldDirty: true }),
      );
    }
    setFitNote({ fits: answer.fits, unmet: answer.unmet });
  }

  return (
    <section aria-label="Meal plan" className="mt-4 space-y-3 border-t border-line pt-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h4 className="flex items-center gap-2 text-sm font-semibold text-ink">
          <BowlIcon aria-hidden="true" /> Meal plan
        </h4>
        {rows.fields.length < MAX_MEALS ? (
          <Button
            variant="secondary"
            size="sm"
            icon={<PlusIcon />}
            onClick={() => rows.append(newMealRow(rows.fields.length))}
          >
            Add meal
          </Button>
        ) : null}
      </div>

      {rows.fields.length === 0 ? (
        <p className="text-sm text-ink-muted">No meals planned for this day.</p>
      ) : null}

      {rows.fields.map((row, i) => (
        <MealCard
          key={row.rowKey}
          path={`${name}.meals.${i}`}
          meal={meals[i]}
          onRemove={() => rows.remove(i)}
        />
      ))}

      {rows.fields.length > 0 ? (
        <div className="space-y-2 rounded-md bg-sunken/60 px-3 py-3" aria-live="polite">
          <p className="text-sm text-ink">
            <span className="font-semibold">Day as planned:</span>{' '}
            <span className="tabular-nums">{totalsLine(dayTotals)}</span>
          </p>
          {verdicts.length > 0 ? (
            <ul className="grid gap-1 sm:grid-cols-2" aria-label="Planned day against the targets">
              {verdicts.map((v) => {
                const style = DRIFT_STATE_STYLE[v.state];
                const unit = DRIFT_METRIC_UNITS[v.metric];
                return (
                  <li key={v.metric} className="flex flex-wrap items-center gap-2 text-sm tabular-nums">
                    <Badge tone={style.tone}>{style.label}</Badge>
                    <span>
                      {DRIFT_METRIC_LABELS[v.metric]} {formatNumber(v.actual ?? 0, 0)} of{' '}
                      {formatNumber(v.target, 0)}
                      {NBSP}
                      {unit} (±{formatNumber(v.tolerance, 0)})
                    </span>
                  </li>
                );
              })}
            </ul>
          ) : (
            <p className="text-sm text-ink-muted">
              Set energy or macro targets to judge the plan against them.
            </p>
          )}
          <div className="flex flex-wrap items-center gap-3">
            <Button
              variant="primary"
              size="sm"
              onClick={() => void fitQuantities()}
              disabled={!hasTargets || foodCount === 0 || fit.isPending}
            >
              {fit.isPending ? 'Fitting…' : 'Fit the quantities'}
            </Button>
            <span className="text-xs text-ink-muted">
              Grams for the chosen foods within each food’s bounds (default 0–400 g in steps of 5 g).
            </span>
          </div>
          {fit.error ? (
            <p className="flex items-center gap-2 text-sm text-off-plan" role="alert">
              <ErrorIcon aria-hidden="true" />
              {isApiError(fit.error) && fit.error.fields
                ? Object.values(fit.error.fields).join(' ')
                : 'The fit could not be worked out. Try again.'}
            </p>
          ) : null}
          {fitNote ? (
            fitNote.fits ? (
              <p className="text-sm font-medium text-on-plan" role="status">
                Fitted: every target is within its tolerance.
              </p>
            ) : (
              <div role="status" className="space-y-1 text-sm text-ink">
                <p className="font-medium text-off-plan">
                  No fit within every tolerance. Closest proposal applied:
                </p>
                <ul className="list-disc pl-5">
                  {fitNote.unmet.map((line) => (
                    <li key={line}>{line}</li>
                  ))}
                </ul>
              </div>
            )
          ) : null}
        </div>
      ) : null}
    </section>
  );
}

function MealCard({
  path,
  meal,
  onRemove,
}: {
  path: string;
  meal: PlannedMeal | undefined;
  onRemove: () => void;
}) {
  const { control, register } = useFormContext();
  const foods = useFieldArray({ control, name: `${path}.foods`, keyName: 'rowKey' });
  const nameIds = useFieldIds(`${path}.name`);
  const nameError = useFieldError(`${path}.name`);
  const timeError = useFieldError(`${path}.time`);
  const foodsError = useFieldError(`${path}.foods`);
  const totals = meal ? plannedMealTotals(meal) : null;
  return (
    <div className="rounded-md border border-line p-3" data-testid="planned-meal">
      <div className="grid grid-cols-[1fr_auto] items-end gap-2 sm:grid-cols-[1fr_8rem_auto]">
        <label className="col-span-2 min-w-0 text-xs font-medium text-ink-muted sm:col-span-1">
          Meal
          <input
            id={nameIds.inputId}
            className={cn(controlClasses, 'mt-1 border-line-strong py-1.5 text-sm')}
            aria-invalid={nameError ? true : undefined}
            {...register(`${path}.name`)}
          />
        </label>
        <label className="text-xs font-medium text-ink-muted">
          Time
          <input
            type="time"
            className={cn(controlClasses, 'mt-1 border-line-strong py-1.5 text-sm tabular-nums')}
            aria-invalid={timeError ? true : undefined}
            {...register(`${path}.time`)}
          />
        </label>
        <Button variant="ghost" size="sm" icon={<TrashIcon />} onClick={onRemove} aria-label="Remove meal">
          <span className="sr-only sm:not-sr-only">Remove</span>
        </Button>
      </div>
      <FieldErrorText id={nameIds.errorId} error={nameError ?? timeError} />

      <ul className="mt-3 space-y-2">
        {foods.fields.map((row, j) => (
          <FoodRow
            key={row.rowKey}
            path={`${path}.foods.${j}`}
            food={(meal?.foods[j] as PlannedMeal['foods'][number] | undefined) ?? null}
            onRemove={() => foods.remove(j)}
          />
        ))}
      </ul>
      <FieldErrorText id={`${nameIds.errorId}-foods`} error={foodsError} />

      <div className="mt-3 flex flex-col gap-2 sm:flex-row sm:items-center sm:justify-between">
        <AddFood onChoose={(f) => foods.append(plannedFoodRow(f))} />
        {totals ? (
          <p className="text-sm text-ink-muted tabular-nums" aria-label="Meal totals">
            {totalsLine(totals)}
          </p>
        ) : null}
      </div>
    </div>
  );
}

function FoodRow({
  path,
  food,
  onRemove,
}: {
  path: string;
  food: PlannedMeal['foods'][number] | null;
  onRemove: () => void;
}) {
  const { register, getValues } = useFormContext();
  const quantityIds = useFieldIds(`${path}.quantity`);
  const quantityError = useFieldError(`${path}.quantity`);
  const values = getValues(path) as MealFormValues['foods'][number] | undefined;
  const label = values?.name ?? 'Food';
  const bound = (key: 'minG' | 'maxG' | 'stepG', text: string) => (
    <label className="block text-[0.6875rem] font-medium text-ink-muted">
      {text}
      <input
        inputMode="decimal"
        autoComplete="off"
        placeholder={key === 'minG' ? '0' : key === 'maxG' ? '400' : '5'}
        aria-label={`${label}: ${text.toLowerCase()} for the fit`}
        className={cn(controlClasses, 'mt-0.5 border-line px-2 py-1 text-right text-xs tabular-nums')}
        {...register(`${path}.${key}`)}
      />
    </label>
  );
  const grams = food?.quantityG ?? typedBound(values?.quantity ?? '') ?? 0;
  return (
    <li className="grid grid-cols-[1fr_auto_auto] items-start gap-2 border-t border-line pt-2 first:border-t-0 first:pt-0">
      <div className="min-w-0">
        <p className="text-sm font-medium break-words text-ink">{label}</p>
        <p className="text-xs text-ink-faint tabular-nums">
          {values
            ? `${formatNumber((values.per100g.energyKcal * grams) / 100, 0)}${NBSP}kcal · P ${formatNumber((values.per100g.proteinG * grams) / 100, 0)}${NBSP}g`
            : null}
        </p>
      </div>
      <div className="w-24">
        <div className="relative">
          <input
            id={quantityIds.inputId}
            inputMode="decimal"
            autoComplete="off"
            aria-label={`${label}, grams`}
            aria-invalid={quantityError ? true : undefined}
            aria-describedby={quantityError ? quantityIds.errorId : undefined}
            className={cn(
              controlClasses,
              'py-1.5 pr-7 text-right tabular-nums',
              quantityError ? 'border-off-plan' : 'border-line-strong',
            )}
            {...register(`${path}.quantity`)}
          />
          <span
            aria-hidden="true"
            className="pointer-events-none absolute inset-y-0 right-2 flex items-center text-xs text-ink-faint"
          >
            g
          </span>
        </div>
        <FieldErrorText id={quantityIds.errorId} error={quantityError} />
      </div>
      <Button
        variant="ghost"
        size="sm"
        icon={<TrashIcon />}
        onClick={onRemove}
        aria-label={`Remove ${label}`}
      />
      <div
        className="col-span-3 grid max-w-[15rem] grid-cols-3 gap-1.5"
        role="group"
        aria-label={`${label}: bounds for the fit`}
      >
        {bound('minG', 'Min g')}
        {bound('maxG', 'Max g')}
        {bound('stepG', 'Step g')}
      </div>
    </li>
  );
}

function AddFood({ onChoose }: { onChoose: (food: FoodView) => void }) {
  const inputId = useId();
  const [q, setQ] = useState('');
  const [term, setTerm] = useState('');
  useEffect(() => {
    const id = window.setTimeout(() => setTerm(q), 250);
    return () => window.clearTimeout(id);
  }, [q]);
  // Eight results keep the editor's list short; nothing is asked with the box empty.
  const search = useFoodSearch(term, { search: 8 });
  const results = term.trim().length >= FOOD_SEARCH_MIN_CHARS ? (search.data ?? []) : [];
  return (
    <div className="relative w-full min-w-0 sm:max-w-xs">
      <label htmlFor={inputId} className="sr-only">
        Add a food
      </label>
      <input
        id={inputId}
        type="search"
        placeholder="Add a food…"
        autoComplete="off"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        className={cn(controlClasses, 'border-line-strong py-1.5 text-sm')}
      />
      {results.length > 0 ? (
        <ul
          className="absolute z-20 mt-1 max-h-64 w-full overflow-auto rounded-md border border-line bg-surface shadow-lg"
          aria-label="Foods found"
        >
          {results.map((f) => (
            <li key={f.id}>
              <button
                type="button"
                className="block w-full px-3 py-2 text-left text-sm hover:bg-sunken focus:bg-sunken"
                onClick={() => {
                  onChoose(f);
                  setQ('');
                  setTerm('');
                }}
              >
                <span className="block text-ink">{f.name}</span>
                <span className="block text-xs text-ink-faint tabular-nums">
                  {formatNumber(f.per100g.energyKcal, 0)}
                  {NBSP}kcal · P {formatNumber(f.per100g.proteinG, 1)}
                  {NBSP}g per 100{NBSP}g
                </span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
