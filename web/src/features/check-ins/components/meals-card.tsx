import {
  LIMITS,
  mealEntryRequest,
  per100gFromEaten,
  type DayView,
  type FoodView,
  type MealEntryRequest,
  type MealItemView,
} from '@driftmark/shared';
import { useId, useMemo, useRef, useState } from 'react';
import { useFieldArray, useForm, useFormContext, useWatch } from 'react-hook-form';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { controlClasses, FieldErrorText, useFieldError } from '@/components/ui/field';
import { cn } from '@/lib/cn';
import { Form, SubmitButton } from '@/components/ui/form';
import { BowlIcon } from '@/components/ui/icons';
import { SegmentedField } from '@/components/ui/segmented-field';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { formatEnergy, formatNumber, NBSP } from '@/lib/format';
import { useCreateMeal } from '../api/create-meal';
import { useDeleteMeal } from '../api/delete-meal';
import { useUpdateMeal } from '../api/update-meal';
import { createClientIdKeeper } from '../utils/client-id';
import { macroEnergyPreview, mealItemsPreview } from '../utils/energy';
import {
  itemAmountField,
  mealFormValues,
  toMealRequest,
  withoutClientId,
  type MealFormValues,
} from '../utils/form-values';
import { createRequestResolver } from '@/lib/request-resolver';
import { CheckInCard, HeaderFigure, NotLogged } from './check-in-card';
import type { DayCardProps } from './day-card-props';
import { AddEntry, ConfirmDelete, EditableEntries } from './entry-row';
import { FoodPicker } from './food-picker';
import { useFollowClock } from './use-follow-clock';

const grams = (g: number) => `${formatNumber(g, 1)}${NBSP}g`;
const milligrams = (mg: number) => `${formatNumber(mg, 0)}${NBSP}mg`;

const MEAL_NAMES = ['Breakfast', 'Lunch', 'Dinner', 'Snack', 'Pre-training', 'Post-training'];

export function MealsCard({ athleteId, day, canEdit, now }: DayCardProps) {
  const [adding, setAdding] = useState(false);
  const remove = useDeleteMeal(athleteId, day.date);
  const t = day.totals;

  return (
    <CheckInCard
      id="meals"
      title="Meals"
      icon={<BowlIcon />}
      summary={
        <HeaderFigure
          value={formatEnergy(t.energyKcal)}
          caption={day.isToday ? 'so far today' : 'that day'}
        />
      }
    >
      <dl aria-label="Day totals" className="mb-4 grid grid-cols-3 gap-2 text-center">
        {[
          { label: 'Protein', value: t.proteinG },
          { label: 'Carbohydrate', value: t.carbohydrateG },
          { label: 'Fat', value: t.fatG },
        ].map((m) => (
          <div key={m.label} className="flex flex-col rounded-md bg-paper px-2 py-2">
            <dt className="text-xs text-ink-muted">{m.label}</dt>
            <dd className="order-first font-bold text-ink tabular-nums">{grams(m.value)}</dd>
          </div>
        ))}
      </dl>

      {day.meals.length > 0 ? (
        <EditableEntries
          label="Meals logged"
          entries={day.meals}
          canEdit={canEdit}
          describe={(m) => `${m.name} at ${m.time}`}
          form={(m, done) => (
            <MealForm
              athleteId={athleteId}
              date={day.date}
              entry={m}
              onDelete={() => remove.mutateAsync(m.id)}
              now={now}
              onDone={done}
            />
          )}
        >
          {(m) => (
            <>
              <p className="flex flex-wrap items-baseline justify-between gap-x-3">
                <span className="font-semibold">{m.name}</span>
                <span className="font-semibold tabular-nums">{formatEnergy(m.energyKcal)}</span>
              </p>
              {m.items.length > 0 ? (
                <ul aria-label={`Foods in ${m.name}`} className="text-ink-muted">
                  {m.items.map((item, i) => (
                    <li key={i} className="flex flex-wrap justify-between gap-x-3">
                      <span>
                        {item.foodName}, <span className="tabular-nums">{amountText(item)}</span>
                      </span>
                      <span className="tabular-nums">{formatEnergy(item.energyKcal)}</span>
                    </li>
                  ))}
                </ul>
              ) : null}
              <p className="text-xs text-ink-muted tabular-nums">
                P {grams(m.proteinG)} · C {grams(m.carbohydrateG)} · F {grams(m.fatG)}
                {m.alcoholG ? ` · alcohol ${grams(m.alcoholG)}` : ''}
                {m.fibreG ? ` · fibre ${grams(m.fibreG)}` : ''}
                {m.sodiumMg !== null ? ` · sodium ${milligrams(m.sodiumMg)}` : ''}
              </p>
            </>
          )}
        </EditableEntries>
      ) : !canEdit ? (
        <NotLogged>No meals logged this day.</NotLogged>
      ) : null}

      {canEdit ? (
        <AddEntry
          label="Add a meal"
          open={adding}
          onOpen={() => setAdding(true)}
          divided={day.meals.length > 0}
        >
          <MealForm
            athleteId={athleteId}
            date={day.date}
            entry={null}
            now={now}
            onDone={() => setAdding(false)}
          />
        </AddEntry>
      ) : null}
    </CheckInCard>
  );
}

/** "2 × large egg (100 g)" or "150 g". */
function amountText(item: MealItemView): string {
  if (!item.portion) return grams(item.quantityG);
  return `${formatNumber(item.portion.count, 2)} × ${item.portion.label} (${grams(item.quantityG)})`;
}

/**
 * A saved meal's foods carry no per-100 g values: derive them from what was eaten (the shared
 * rule's inverse), with the portion it was eaten in, for the live figures of an edit.
 */
function foodsFromEntry(entry: DayView['meals'][number]): Record<string, FoodView> {
  const foods: Record<string, FoodView> = {};
  for (const item of entry.items) {
    const known = foods[item.foodId];
    const portions = item.portion
      ? [{ unit: item.portion.unit, label: item.portion.label, grams: item.portion.grams }]
      : [];
    if (known) {
      known.portions.push(...portions.filter((p) => !known.portions.some((k) => k.unit === p.unit)));
      continue;
    }
    const per100g = per100gFromEaten(item, item.quantityG);
    foods[item.foodId] = {
      id: item.foodId,
      name: item.foodName,
      source: item.foodId.startsWith('ifct:')
        ? 'reference'
        : item.foodId.startsWith('dm:')
          ? 'everyday'
          : // a stored food: the team's or the athlete's own (the item does not say which)
            'team',
      barcode: null,
      preparation: null,
      portions,
      uses: { mine: 0, team: 0 },
      per100g: {
        energyKcal: per100g.energyKcal,
        listedEnergyKcal: null,
        proteinG: per100g.proteinG,
        carbohydrateG: per100g.carbohydrateG,
        fatG: per100g.fatG,
        fibreG: per100g.fibreG,
        sodiumMg: per100g.sodiumMg ?? null,
      },
    };
  }
  return foods;
}

function MealForm({
  athleteId,
  date,
  entry,
  now,
  onDone,
  onDelete,
}: {
  athleteId: string;
  date: string;
  entry: DayView['meals'][number] | null;
  now: string;
  onDone: () => void;
  /** Set when editing an entry that exists. */
  onDelete?: () => Promise<unknown>;
}) {
  const resolver = useMemo(() => createRequestResolver(mealEntryRequest, toMealRequest), []);
  const form = useForm<MealFormValues, unknown, MealEntryRequest>({
    resolver,
    defaultValues: mealFormValues(entry, now),
  });
  useFollowClock(form, 'time', now, entry === null);
  const [foods, setFoods] = useState<Record<string, FoodView>>(() => (entry ? foodsFromEntry(entry) : {}));
  const keeper = useRef(createClientIdKeeper()).current;
  const create = useCreateMeal(athleteId, date);
  const update = useUpdateMeal(athleteId, date);
  const values = useWatch({ control: form.control });
  const source = values.source ?? 'macros';

  const typed = (values.items ?? []).map((item) => ({
    food: foods[item?.foodId ?? ''] ?? NO_FOOD,
    amount: item?.amount ?? '',
    unit: item?.unit ?? 'g',
  }));
  const preview = mealItemsPreview(typed);
  const energy =
    source === 'foods'
      ? (preview.total?.energyKcal ?? null)
      : macroEnergyPreview({
          proteinG: values.proteinG ?? '',
          carbohydrateG: values.carbohydrateG ?? '',
          fatG: values.fatG ?? '',
          alcoholG: values.alcoholG ?? '',
        });
  const portion = source === 'foods' ? preview.total : null;

  return (
    <Form
      form={form}
      onSubmit={async (body) => {
        if (entry) {
          await update.mutateAsync({ entryId: entry.id, body: withoutClientId(body) });
        } else {
          const clientId = keeper.take();
          await create.mutateAsync({ ...body, clientId });
          keeper.settle(clientId);
        }
        onDone();
      }}
      aria-label={entry ? `Edit ${entry.name}` : 'Add a meal'}
      className="space-y-4"
    >
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_10rem] sm:gap-3">
        <TextField
          name="name"
          label="Meal name"
          list="meal-name-suggestions"
          autoComplete="off"
          maxLength={120}
          placeholder="Breakfast"
          required
        />
        <TextField name="time" label="Meal time" type="time" required inputClassName="tabular-nums" />
      </div>
      <datalist id="meal-name-suggestions">
        {MEAL_NAMES.map((n) => (
          <option key={n} value={n} />
        ))}
      </datalist>
      <SegmentedField
        name="source"
        legend="Enter as"
        options={[
          { value: 'foods', label: 'Foods from the list' },
          { value: 'macros', label: 'Grams of macros' },
        ]}
      />
      {source === 'foods' ? (
        <FoodsFields
          foods={foods}
          figures={preview.items}
          onAdd={(f) => setFoods((known) => ({ ...known, [f.id]: f }))}
        />
      ) : (
        <>
          <div className="grid grid-cols-3 gap-2">
            <TextField
              name="proteinG"
              label="Protein (g)"
              suffix="g"
              inputMode="decimal"
              autoComplete="off"
              inputClassName="tabular-nums"
            />
            <TextField
              name="carbohydrateG"
              label="Carbs (g)"
              suffix="g"
              inputMode="decimal"
              autoComplete="off"
              inputClassName="tabular-nums"
            />
            <TextField
              name="fatG"
              label="Fat (g)"
              suffix="g"
              inputMode="decimal"
              autoComplete="off"
              inputClassName="tabular-nums"
            />
          </div>
          <div className="grid grid-cols-3 gap-2">
            <TextField
              name="fibreG"
              label="Fibre (g)"
              hint="Optional"
              suffix="g"
              inputMode="decimal"
              autoComplete="off"
              inputClassName="tabular-nums"
            />
            <TextField
              name="alcoholG"
              label="Alcohol (g)"
              hint="Optional"
              suffix="g"
              inputMode="decimal"
              autoComplete="off"
              inputClassName="tabular-nums"
            />
            <TextField
              name="sodiumMg"
              label="Sodium (mg)"
              hint="Optional"
              suffix="mg"
              inputMode="numeric"
              autoComplete="off"
              inputClassName="tabular-nums"
            />
          </div>
        </>
      )}
      <p
        aria-live="polite"
        className="flex items-baseline justify-between rounded-md bg-paper px-3 py-2 text-sm"
      >
        <span className="text-ink-muted">{source === 'foods' ? 'Meal total' : 'Energy'}</span>
        <span className="text-lg font-bold text-ink tabular-nums">
          {energy === null ? '—' : formatEnergy(energy)}
        </span>
      </p>
      {portion ? (
        <p className="-mt-2 text-xs text-ink-muted tabular-nums">
          P {grams(portion.proteinG)} · C {grams(portion.carbohydrateG)} · F {grams(portion.fatG)}
          {portion.sodiumMg !== null ? ` · sodium ${milligrams(portion.sodiumMg)}` : ''}
        </p>
      ) : source === 'macros' ? (
        <p className="-mt-2 text-xs text-ink-faint">Protein and carbohydrate 4 kcal/g, fat 9, alcohol 7.</p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <SubmitButton size="lg" className="flex-1" pendingLabel="Saving…">
          Save meal
        </SubmitButton>
        <Button variant="ghost" size="lg" onClick={onDone}>
          Cancel
        </Button>
        {onDelete ? <ConfirmDelete what="this meal" onDelete={onDelete} /> : null}
      </div>
    </Form>
  );
}

/** Stands in for a food whose figures the form does not hold (never shown). */
const NO_FOOD: Pick<FoodView, 'per100g' | 'portions'> = {
  portions: [],
  per100g: {
    energyKcal: 0,
    listedEnergyKcal: null,
    proteinG: 0,
    carbohydrateG: 0,
    fatG: 0,
    fibreG: null,
    sodiumMg: null,
  },
};

function FoodsFields({
  foods,
  figures,
  onAdd,
}: {
  foods: Record<string, FoodView>;
  figures: ReturnType<typeof mealItemsPreview>['items'];
  onAdd: (food: FoodView) => void;
}) {
  const { control, clearErrors } = useFormContext<MealFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'items' });
  const listError = useFieldError('items');
  const errorId = 'meal-items-error';
  return (
    <div className="space-y-3">
      {fields.length > 0 ? (
        <ol aria-label="Foods in this meal" className="space-y-2">
          {fields.map((field, i) => (
            <MealItemRow
              key={field.id}
              index={i}
              food={foods[field.foodId] ?? null}
              figures={figures[i] ?? null}
              onRemove={() => remove(i)}
            />
          ))}
        </ol>
      ) : (
        <p className="text-sm text-ink-muted">No foods yet: search below and add each food of the meal.</p>
      )}
      {listError?.message ? <FieldErrorText id={errorId} error={listError} /> : null}
      {fields.length < LIMITS.mealItems.max ? (
        <FoodPicker
          invalid={Boolean(listError?.message)}
          errorId={errorId}
          onChoose={(food) => {
            onAdd(food);
            const portion = food.portions[0];
            append(
              { foodId: food.id, amount: portion ? '1' : '', unit: portion?.unit ?? 'g' },
              { shouldFocus: true, focusName: `items.${fields.length}.amount` },
            );
            clearErrors('items');
          }}
        />
      ) : (
        <p className="text-sm text-ink-muted">A meal holds at most {LIMITS.mealItems.max} foods.</p>
      )}
      <p className="text-sm">
        <Link to={paths.athleteFoodNew}>Not in the list? Scan a barcode or copy a label</Link>
      </p>
    </div>
  );
}

function MealItemRow({
  index,
  food,
  figures,
  onRemove,
}: {
  index: number;
  food: FoodView | null;
  figures: ReturnType<typeof mealItemsPreview>['items'][number];
  onRemove: () => void;
}) {
  const { register, control } = useFormContext<MealFormValues>();
  const unit = useWatch({ control, name: `items.${index}.unit` }) ?? 'g';
  const amountId = useId();
  const errorId = useId();
  const amountError = useFieldError(itemAmountField(index, unit));
  const portionError = useFieldError(`items.${index}.portionUnit`);
  const foodError = useFieldError(`items.${index}.foodId`);
  const error = amountError ?? portionError ?? foodError;
  const name = food?.name ?? 'Food';
  return (
    <li className="rounded-md border border-line-strong bg-surface px-3 py-2">
      <div className="flex flex-wrap items-baseline justify-between gap-x-2">
        <p className="font-semibold text-ink">
          {name}
          {food?.preparation ? (
            <span className="ml-2 text-xs font-normal text-ink-muted">{food.preparation}</span>
          ) : null}
        </p>
        <Button variant="ghost" className="-mr-3" onClick={onRemove} aria-label={`Remove ${name}`}>
          Remove
        </Button>
      </div>
      <div className="mt-1 grid grid-cols-[minmax(0,6rem)_minmax(0,1fr)] gap-2">
        <div>
          <label htmlFor={amountId} className="sr-only">
            Amount of {name}
          </label>
          <input
            id={amountId}
            {...register(`items.${index}.amount`)}
            inputMode="decimal"
            autoComplete="off"
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? errorId : undefined}
            className={cn(controlClasses, 'tabular-nums', error ? 'border-off-plan' : 'border-line-strong')}
          />
        </div>
        <div>
          <label htmlFor={`${amountId}-unit`} className="sr-only">
            Unit for {name}
          </label>
          <select
            id={`${amountId}-unit`}
            {...register(`items.${index}.unit`)}
            className={cn(controlClasses, 'border-line-strong')}
          >
            <option value="g">grams</option>
            {(food?.portions ?? []).map((p) => (
              <option key={p.unit} value={p.unit}>
                {p.label} ({formatNumber(p.grams, 1)}
                {NBSP}g)
              </option>
            ))}
          </select>
        </div>
      </div>
      <FieldErrorText id={errorId} error={error} />
      <p className="mt-1 text-xs text-ink-muted tabular-nums">
        {figures
          ? `${grams(figures.grams)} · ${formatEnergy(figures.energyKcal)} · P ${grams(figures.proteinG)} · C ${grams(figures.carbohydrateG)} · F ${grams(figures.fatG)}`
          : 'Type how much'}
      </p>
    </li>
  );
}
