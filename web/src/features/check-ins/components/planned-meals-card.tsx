import { parseTypedNumber, toTypedText, type FoodView, type PlannedMealView } from '@driftmark/shared';
import { useRef, useState } from 'react';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { CircleCheckIcon, TargetIcon } from '@/components/ui/icons';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { DRIFT_STATE_STYLE } from '@/lib/drift-states';
import { formatNumber, NBSP } from '@/lib/format';
import { useLogPlannedMeal } from '../api/log-planned-meal';
import { createClientIdKeeper } from '../utils/client-id';
import { CheckInCard } from './check-in-card';
import type { DayCardProps } from './day-card-props';
import { FoodPicker } from './food-picker';

const g = (v: number) => `${formatNumber(v, 0)}${NBSP}g`;

function totalsLine(t: PlannedMealView['totals']): string {
  return `${formatNumber(t.energyKcal, 0)}${NBSP}kcal · P ${g(t.proteinG)} · C ${g(t.carbohydrateG)} · F ${g(t.fatG)}`;
}

/**
 * The day's planned meals from the coach's meal plan: each one logged as eaten with one tap, or
 * opened to change grams or swap a food first. The adherence verdict is the server's.
 */
export function PlannedMealsCard({ athleteId, day, canEdit }: DayCardProps) {
  const plan = day.mealPlan;
  if (!plan) return null;
  const { adherence } = plan;
  const style = DRIFT_STATE_STYLE[adherence.state];
  return (
    <CheckInCard
      id="planned-meals"
      title="Meal plan"
      icon={<TargetIcon />}
      subtitle={`${totalsLine(plan.totals)} planned`}
      summary={
        <div className="space-y-1" aria-label="Meal plan adherence">
          <p className="text-sm font-semibold text-ink tabular-nums">
            {adherence.logged} of {adherence.planned} logged
          </p>
          <Badge tone={style.tone}>{style.label}</Badge>
        </div>
      }
    >
      <ul className="space-y-3">
        {plan.meals.map((meal) => (
          <PlannedMealRow key={meal.id} athleteId={athleteId} date={day.date} meal={meal} canEdit={canEdit} />
        ))}
      </ul>
    </CheckInCard>
  );
}

interface EditedFood {
  food: { id: string; name: string };
  quantity: string;
  swapping: boolean;
}

function PlannedMealRow({
  athleteId,
  date,
  meal,
  canEdit,
}: {
  athleteId: string;
  date: string;
  meal: PlannedMealView;
  canEdit: boolean;
}) {
  const log = useLogPlannedMeal(athleteId, date);
  const ids = useRef(createClientIdKeeper());
  const [editing, setEditing] = useState<EditedFood[] | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const logged = meal.loggedEntryId !== null;

  async function submit(foods?: { foodId: string; quantityG: number }[]) {
    setProblem(null);
    const clientId = ids.current.take(JSON.stringify(foods ?? null));
    try {
      await log.mutateAsync({ mealId: meal.id, body: { clientId, ...(foods ? { foods } : {}) } });
      ids.current.settle(clientId);
      setEditing(null);
    } catch (error) {
      setProblem(
        isApiError(error) && Object.keys(error.fields).length > 0
          ? Object.values(error.fields).join(' ')
          : isApiError(error)
            ? error.message
            : 'The meal could not be logged. Try again.',
      );
    }
  }

  function submitEdited() {
    if (!editing) return;
    const foods = editing.map((f) => ({
      foodId: f.food.id,
      quantityG: parseTypedNumber(f.quantity) ?? Number.NaN,
    }));
    const bad = foods.findIndex((f) => !Number.isFinite(f.quantityG) || f.quantityG <= 0);
    if (bad >= 0) {
      setProblem(`Enter the grams of ${editing[bad]?.food.name ?? 'each food'}.`);
      return;
    }
    void submit(foods);
  }

  return (
    <li className="rounded-md border border-line px-3 py-3" data-testid="planned-meal-row">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <p className="font-semibold text-ink">
            <span className="mr-2 text-ink-muted tabular-nums">{meal.time}</span>
            {meal.name}
          </p>
          <p className="text-sm text-ink-muted tabular-nums">{totalsLine(meal.totals)}</p>
        </div>
        {logged ? (
          <span className="flex items-center gap-1 text-sm font-semibold text-on-plan">
            <CircleCheckIcon aria-hidden="true" /> Logged
          </span>
        ) : canEdit && !editing ? (
          <div className="flex gap-2">
            <Button variant="ghost" size="sm" onClick={() => setEditing(editFoods(meal))}>
              Change
            </Button>
            <Button
              variant="primary"
              size="sm"
              loading={log.isPending}
              onClick={() => void submit()}
              aria-label={`Log ${meal.name} as eaten`}
            >
              Log as eaten
            </Button>
          </div>
        ) : null}
      </div>

      {editing ? (
        <div className="mt-3 space-y-3">
          {editing.map((f, i) => (
            <div key={`${f.food.id}-${i}`} className="space-y-2">
              {f.swapping ? (
                <FoodPicker
                  onChoose={(food: FoodView) =>
                    setEditing(editing.map((e, j) => (j === i ? { ...e, food, swapping: false } : e)))
                  }
                />
              ) : (
                <div className="grid grid-cols-[1fr_auto_auto] items-center gap-2">
                  <span className="min-w-0 truncate text-sm text-ink">{f.food.name}</span>
                  <div className="relative w-24">
                    <input
                      inputMode="decimal"
                      autoComplete="off"
                      aria-label={`${f.food.name}, grams`}
                      value={f.quantity}
                      onChange={(e) =>
                        setEditing(editing.map((x, j) => (j === i ? { ...x, quantity: e.target.value } : x)))
                      }
                      className={cn(controlClasses, 'border-line-strong py-1.5 pr-7 text-right tabular-nums')}
                    />
                    <span
                      aria-hidden="true"
                      className="pointer-events-none absolute inset-y-0 right-2 flex items-center text-xs text-ink-faint"
                    >
                      g
                    </span>
                  </div>
                  <Button
                    variant="ghost"
                    size="sm"
                    onClick={() =>
                      setEditing(editing.map((x, j) => (j === i ? { ...x, swapping: true } : x)))
                    }
                  >
                    Swap
                  </Button>
                </div>
              )}
            </div>
          ))}
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="ghost" size="sm" onClick={() => setEditing(null)}>
              Cancel
            </Button>
            <Button variant="primary" size="sm" loading={log.isPending} onClick={submitEdited}>
              Log with these changes
            </Button>
          </div>
        </div>
      ) : (
        <ul className="mt-2 space-y-0.5 text-sm text-ink">
          {meal.foods.map((f, i) => (
            <li key={`${f.foodId}-${i}`} className="flex justify-between gap-3">
              <span className="min-w-0 truncate">{f.name}</span>
              <span className="shrink-0 text-ink-muted tabular-nums">{g(f.quantityG)}</span>
            </li>
          ))}
        </ul>
      )}
      {problem ? (
        <p role="alert" className="mt-2 text-sm font-medium text-off-plan">
          {problem}
        </p>
      ) : null}
    </li>
  );
}

function editFoods(meal: PlannedMealView): EditedFood[] {
  return meal.foods.map((f) => ({
    food: { id: f.foodId, name: f.name },
    quantity: toTypedText(f.quantityG, 1),
    swapping: false,
  }));
}
