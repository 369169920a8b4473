import { mealEntryRequest, type DayView, type FoodView, type MealEntryRequest } from '@driftmark/shared';
import { useMemo, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { FieldErrorText, useFieldError } from '@/components/ui/field';
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
import { foodPortionPreview, macroEnergyPreview } from '../utils/energy';
import { mealFormValues, toMealRequest, withoutClientId, type MealFormValues } from '../utils/form-values';
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
              {m.food ? (
                <p className="text-ink-muted">
                  {m.food.name}, <span className="tabular-nums">{grams(m.food.quantityG)}</span>
                </p>
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

/** A saved food meal carries no per-100 g values: derive them from what was eaten, for the preview. */
function foodFromEntry(entry: DayView['meals'][number]): FoodView | null {
  if (!entry.food || entry.food.quantityG <= 0) return null;
  const f = 100 / entry.food.quantityG;
  return {
    id: entry.food.id,
    name: entry.food.name,
    source: entry.food.id.startsWith('ifct:') ? 'reference' : 'team',
    barcode: null,
    per100g: {
      energyKcal: entry.energyKcal * f,
      listedEnergyKcal: null,
      proteinG: entry.proteinG * f,
      carbohydrateG: entry.carbohydrateG * f,
      fatG: entry.fatG * f,
      fibreG: entry.fibreG === null ? null : entry.fibreG * f,
      sodiumMg: entry.sodiumMg === null ? null : entry.sodiumMg * f,
    },
  };
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
  const [food, setFood] = useState<FoodView | null>(() => (entry ? foodFromEntry(entry) : null));
  const keeper = useRef(createClientIdKeeper()).current;
  const create = useCreateMeal(athleteId, date);
  const update = useUpdateMeal(athleteId, date);
  const values = useWatch({ control: form.control });
  const source = values.source ?? 'macros';

  const energy =
    source === 'food'
      ? food
        ? (foodPortionPreview(food, values.quantityG ?? '')?.energyKcal ?? null)
        : null
      : macroEnergyPreview({
          proteinG: values.proteinG ?? '',
          carbohydrateG: values.carbohydrateG ?? '',
          fatG: values.fatG ?? '',
          alcoholG: values.alcoholG ?? '',
        });
  const portion = source === 'food' && food ? foodPortionPreview(food, values.quantityG ?? '') : null;

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
          { value: 'macros', label: 'Grams of macros' },
          { value: 'food', label: 'Food from the list' },
        ]}
      />
      {source === 'food' ? (
        <FoodFields
          food={food}
          onChoose={(f) => {
            setFood(f);
            form.setValue('foodId', f?.id ?? '', { shouldDirty: true });
            if (f) form.clearErrors('foodId');
          }}
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
        <span className="text-ink-muted">Energy</span>
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

function FoodFields({
  food,
  onChoose,
}: {
  food: FoodView | null;
  onChoose: (food: FoodView | null) => void;
}) {
  const error = useFieldError('foodId');
  const errorId = 'meal-food-error';
  return (
    <div className="space-y-4">
      <div>
        <FoodPicker chosen={food} onChoose={onChoose} errorId={errorId} invalid={Boolean(error)} />
        <FieldErrorText id={errorId} error={error} />
        <p className="mt-2 text-sm">
          <Link to={paths.athleteFoodNew}>Not in the list? Scan a barcode or copy a label</Link>
        </p>
      </div>
      {food ? (
        <TextField
          name="quantityG"
          label="Quantity (g)"
          suffix="g"
          inputMode="decimal"
          autoComplete="off"
          required
          inputClassName="tabular-nums"
        />
      ) : null}
    </div>
  );
}
