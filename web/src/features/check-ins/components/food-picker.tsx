import type { FoodView } from '@driftmark/shared';
import { useEffect, useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { Spinner } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { formatNumber, NBSP } from '@/lib/format';
import { FOOD_SEARCH_MIN_CHARS, useFoodSearch } from '../api/search-foods';

const DEBOUNCE_MS = 250;

function useDebounced<T>(value: T, ms: number): T {
  const [current, setCurrent] = useState(value);
  useEffect(() => {
    const id = window.setTimeout(() => setCurrent(value), ms);
    return () => window.clearTimeout(id);
  }, [value, ms]);
  return current;
}

/** "130 kcal · P 2.7 g · C 28 g · F 0.3 g per 100 g" */
export function per100gLine(food: Pick<FoodView, 'per100g'>): string {
  const p = food.per100g;
  const g = (v: number) => `${formatNumber(v, 1)}${NBSP}g`;
  return `${formatNumber(p.energyKcal, 0)}${NBSP}kcal · P ${g(p.proteinG)} · C ${g(p.carbohydrateG)} · F ${g(p.fatG)} per 100${NBSP}g`;
}

/**
 * The reference table's own energy figure, when the server sent it (it differs from the Atwater
 * figure by more than 5 %): "The food table lists 384 kcal per 100 g; counted here from its macros."
 */
export function listedEnergyLine(food: Pick<FoodView, 'per100g'>): string | null {
  const listed = food.per100g.listedEnergyKcal;
  if (listed === null) return null;
  return `The food table lists ${formatNumber(listed, 0)}${NBSP}kcal per 100${NBSP}g; counted here from its protein, carbohydrate and fat (Atwater factors).`;
}

interface FoodPickerProps {
  chosen: FoodView | null;
  onChoose: (food: FoodView | null) => void;
  /** The schema's or server's message about the food (e.g. "Choose a food"). */
  errorId?: string;
  invalid?: boolean;
}

/** Search the food list (team foods and the reference table) and choose one. */
export function FoodPicker({ chosen, onChoose, errorId, invalid }: FoodPickerProps) {
  const inputId = useId();
  const resultsId = useId();
  const [q, setQ] = useState('');
  const term = useDebounced(q.trim(), DEBOUNCE_MS);
  const search = useFoodSearch(term);
  const short = q.trim().length < FOOD_SEARCH_MIN_CHARS;

  if (chosen) {
    return (
      <div className="rounded-md border border-accent bg-accent-soft px-3 py-3">
        <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">Food</p>
        <p className="font-semibold text-ink">{chosen.name}</p>
        <p className="text-sm text-ink-muted tabular-nums">{per100gLine(chosen)}</p>
        {listedEnergyLine(chosen) ? (
          <p className="mt-1 text-xs text-ink-muted tabular-nums">{listedEnergyLine(chosen)}</p>
        ) : null}
        <Button variant="ghost" className="mt-1 -ml-3" onClick={() => onChoose(null)}>
          Change food
        </Button>
      </div>
    );
  }

  return (
    <div>
      <label htmlFor={inputId} className="mb-1.5 block font-semibold text-ink">
        Search foods
      </label>
      <input
        id={inputId}
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        autoComplete="off"
        enterKeyHint="search"
        placeholder="e.g. rice, paneer, oats"
        aria-controls={resultsId}
        aria-invalid={invalid || undefined}
        aria-describedby={invalid ? errorId : undefined}
        className={cn(controlClasses, invalid ? 'border-off-plan' : 'border-line-strong')}
      />
      <div id={resultsId} aria-live="polite" className="mt-2">
        {short ? (
          <p className="text-sm text-ink-faint">
            Type at least {FOOD_SEARCH_MIN_CHARS} letters. Team foods come first, then the Indian Food
            Composition Tables 2017.
          </p>
        ) : search.isError ? (
          <div className="flex flex-wrap items-center gap-2 text-sm text-off-plan">
            <span>{search.error.message}</span>
            <Button variant="ghost" onClick={() => void search.refetch()}>
              Try again
            </Button>
          </div>
        ) : search.isPending || (search.isFetching && search.data === undefined) ? (
          <p className="flex items-center gap-2 text-sm text-ink-muted">
            <Spinner size="sm" label={null} /> Searching…
          </p>
        ) : search.data && search.data.length === 0 ? (
          <p className="text-sm text-ink-muted">
            No food matches “{term}”. Try another word, or enter grams of macros instead.
          </p>
        ) : search.data ? (
          <ul aria-label="Foods found" className={cn('space-y-1.5', search.isFetching && 'opacity-70')}>
            {search.data.map((food) => (
              <li key={food.id}>
                <button
                  type="button"
                  onClick={() => onChoose(food)}
                  className="flex min-h-touch w-full flex-col items-start rounded-md border border-line-strong bg-surface px-3 py-2 text-left hover:border-accent hover:bg-accent-soft"
                >
                  <span className="font-semibold text-ink">{food.name}</span>
                  <span className="text-xs text-ink-muted tabular-nums">
                    {food.source === 'team' ? 'Team food · ' : food.source === 'personal' ? 'My food · ' : ''}
                    {per100gLine(food)}
                  </span>
                  {food.per100g.listedEnergyKcal !== null ? (
                    <span className="text-xs text-ink-faint tabular-nums">
                      {food.source === 'reference' ? 'Food table' : 'Label'}:{' '}
                      {formatNumber(food.per100g.listedEnergyKcal, 0)}
                      {NBSP}kcal
                    </span>
                  ) : null}
                </button>
              </li>
            ))}
          </ul>
        ) : null}
      </div>
    </div>
  );
}
