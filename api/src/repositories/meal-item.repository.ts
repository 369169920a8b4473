import { In, type EntityManager } from 'typeorm';
import { MealEntryItem } from '../entities/meal-entry-item.entity.js';

export type NewMealItem = Omit<
  MealEntryItem,
  'id' | 'createdAt' | 'updatedAt' | 'mealEntry' | 'athlete' | 'mealEntryId' | 'athleteId' | 'position'
>;

export class MealItemRepository {
  constructor(private readonly manager: EntityManager) {}

  /** The items of these meals, in one statement, grouped by meal in their order. */
  async listForMeals(mealIds: readonly string[]): Promise<Map<string, MealEntryItem[]>> {
    const byMeal = new Map<string, MealEntryItem[]>(mealIds.map((id) => [id, []]));
    if (mealIds.length === 0) return byMeal;
    const rows = await this.manager.find(MealEntryItem, {
      where: { mealEntryId: In([...mealIds]) },
      order: { mealEntryId: 'ASC', position: 'ASC' },
    });
    for (const row of rows) byMeal.get(row.mealEntryId)?.push(row);
    return byMeal;
  }

  /** Replaces a meal's items (a delete, then one insert of them all); answers the new rows. */
  async replaceForMeal(
    mealEntryId: string,
    athleteId: string,
    items: readonly NewMealItem[],
    hadItems: boolean,
  ): Promise<MealEntryItem[]> {
    if (hadItems) await this.manager.delete(MealEntryItem, { mealEntryId });
    if (items.length === 0) return [];
    const rows = items.map((item, position) =>
      this.manager.create(MealEntryItem, { ...item, mealEntryId, athleteId, position }),
    );
    const result = await this.manager
      .createQueryBuilder()
      .insert()
      .into(MealEntryItem)
      .values(rows)
      .returning('*')
      .execute();
    const raw = result.raw as Record<string, unknown>[];
    return rows.map((row, i) => Object.assign(row, { id: raw[i]?.id as string }));
  }
}
