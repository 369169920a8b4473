import type { FoodView } from '@driftmark/shared';
import { useEffect, useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { Spinner } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { formatNumber, NBSP } from '@/lib/format';
import { FOOD_SEARCH_MIN_CHARS, useFoodSearch } from '@/lib/food-search';

const DEBOUNCE_MS = 250;
/** Twelve foods for a typed term; eight recent and frequent ones with the box empty, to keep the phone's form short. */
const FOOD_LIMITS = { search: 12, recent: 8 };

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
 * The energy the source prints, when the server sent it (it judged it off the Atwater figure: the
 * reference table beyond 5 %, a label beyond the label check's tolerance): "The food table lists
 * 384 kcal per 100 g; counted here from its macros." / "The label prints …".
 */
export function listedEnergyLine(food: Pick<FoodView, 'per100g' | 'source'>): string | null {
  const listed = food.per100g.listedEnergyKcal;
  if (listed === null) return null;
  const who = food.source === 'reference' ? 'The food table lists' : 'The label prints';
  return `${who} ${formatNumber(listed, 0)}${NBSP}kcal per 100${NBSP}g; counted here from its protein, carbohydrate and fat (Atwater factors).`;
}

interface FoodPickerProps {
  /** Adds the chosen food to the meal. */
  onChoose: (food: FoodView) => void;
  /** The form's message about the meal's foods (e.g. "Add at least one food"). */
  errorId?: string;
  invalid?: boolean;
}

/** "In 3 of your meals · 7 of the team's" over the server's window; null when never logged. */
function usesLine(food: FoodView): string | null {
  const { mine, team } = food.uses;
  if (mine === 0 && team === 0) return null;
  const parts = [mine > 0 ? `in ${mine} of your meals` : null, team > mine ? `${team} of the team’s` : null];
  const text = parts.filter(Boolean).join(' · ');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Where a food comes from, in a word beside its name. */
function sourceWord(food: FoodView): string | null {
  if (food.source === 'team') return 'Team food';
  if (food.source === 'personal') return 'My food';
  if (food.source === 'reference') return 'IFCT 2017';
  return null;
}

/**
 * Search the food list (team foods, the athlete's own foods, our everyday foods, the reference
 * table) and add a food.
 * With the box empty it lists the athlete's recent and frequent foods, then the team's.
 */
export function FoodPicker({ onChoose, errorId, invalid }: FoodPickerProps) {
  const inputId = useId();
  const resultsId = useId();
  const [q, setQ] = useState('');
  const term = useDebounced(q.trim(), DEBOUNCE_MS);
  const search = useFoodSearch(term, FOOD_LIMITS);
  const short = q.trim().length > 0 && q.trim().length < FOOD_SEARCH_MIN_CHARS;

  return (
    <div>
      <label htmlFor={inputId} className="mb-1.5 block font-semibold text-ink">
        Add a food
      </label>
      <input
        id={inputId}
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        autoComplete="off"
        enterKeyHint="search"
        placeholder="e.g. oats, whey, rice cooked"
        aria-controls={resultsId}
        aria-invalid={invalid || undefined}
        aria-describedby={invalid ? errorId : undefined}
        className={cn(controlClasses, invalid ? 'border-off-plan' : 'border-line-strong')}
      />
      <div id={resultsId} aria-live="polite" className="mt-2">
        {short ? (
          <p className="text-sm text-ink-faint">Type at least {FOOD_SEARCH_MIN_CHARS} letters.</p>
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
            {term
              ? `No food matches “${term}”. Try another word, or enter grams of macros instead.`
              : 'Foods you log will be listed here first.'}
          </p>
        ) : search.data ? (
          <>
            {term ? null : (
              <p className="mb-1.5 text-xs font-semibold tracking-wide text-ink-faint uppercase">
                {search.data.some((f) => f.uses.mine + f.uses.team > 0)
                  ? 'Recent and frequent'
                  : 'Everyday foods'}
              </p>
            )}
            <ul aria-label="Foods found" className={cn('space-y-1.5', search.isFetching && 'opacity-70')}>
              {search.data.map((food) => (
                <li key={food.id}>
                  <button
                    type="button"
                    onClick={() => {
                      onChoose(food);
                      setQ('');
                    }}
                    className="flex min-h-touch w-full flex-col items-start rounded-md border border-line-strong bg-surface px-3 py-2 text-left hover:border-accent hover:bg-accent-soft"
                  >
                    <span className="font-semibold text-ink">
                      {food.name}
                      {food.preparation ? (
                        <span className="ml-2 text-xs font-normal text-ink-muted">{food.preparation}</span>
                      ) : null}
                    </span>
                    <span className="text-xs text-ink-muted tabular-nums">
                      {sourceWord(food) ? `${sourceWord(food)} · ` : ''}
                      {per100gLine(food)}
                    </span>
                    {usesLine(food) ? (
                      <span className="text-xs text-ink-faint tabular-nums">{usesLine(food)}</span>
                    ) : null}
                    {food.per100g.listedEnergyKcal !== null ? (
                      <span className="text-xs text-ink-faint tabular-nums">{listedEnergyLine(food)}</span>
                    ) : null}
                  </button>
                </li>
              ))}
            </ul>
          </>
        ) : null}
      </div>
    </div>
  );
}
