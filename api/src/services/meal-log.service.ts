import { mealEntryRequest, type MealItemRequest } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import type { MealEntry } from '../entities/meal-entry.entity.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { CheckInService, type EntryResult } from './check-in.service.js';
import { mealKind } from './day-entry-kinds.js';

/** A meal of foods as another feature builds it (a planned meal, a copied meal). */
export interface MealFromItems {
  /** Idempotency: the same id again returns the first meal and adds nothing. */
  clientId: string;
  /** HH:MM on the athlete's clock. */
  time: string;
  name: string;
  /** 1–20 foods, each with grams or a count of one of the food's portions. */
  items: MealItemRequest[];
  /** The planned meal of the day's meal plan this meal logs; written in the same insert. */
  plannedMealId?: string;
}

/**
 * Logs a meal of foods on the athlete's `date` exactly as the athlete's own POST …/meals would:
 * the same schema (a bad item answers 400 naming `items.<i>.<field>`), the same lookup and
 * nutrients as eaten, the same per-day limit and client-id idempotency (a replay returns the first
 * meal as stored). The caller has
 * authorized `log` on the athlete. `result.entry.items` holds the stored items.
 */
export async function logMealFromItems(
  deps: { dataSource: DataSource; clock: () => Date },
  athlete: AthleteWithPeople,
  date: string,
  meal: MealFromItems,
): Promise<EntryResult<MealEntry>> {
  const { plannedMealId, ...fields } = meal;
  const input = mealEntryRequest.parse({ ...fields, source: 'foods' });
  // The meal kind itself, with the planned meal's id among the inserted columns (one insert,
  // inside the transaction that writes the items).
  const kind: typeof mealKind = plannedMealId
    ? { ...mealKind, columns: async (i, ctx) => ({ ...(await mealKind.columns(i, ctx)), plannedMealId }) }
    : mealKind;
  return new CheckInService(deps).createEntry(kind, athlete, date, input);
}
