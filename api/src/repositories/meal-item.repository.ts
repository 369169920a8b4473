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

  /**
   * How often each food was logged (meals eaten) since `since` across the team, and by the athlete whose user is
   * `userId` (0 for staff), with when that athlete last logged it: one statement, the most used 500.
   */
  async usage(
    teamId: string,
    userId: string,
    since: Date,
  ): Promise<Map<string, { mine: number; team: number; lastMineAt: number | null }>> {
    const rows = await this.manager.query<
      { food_id: string; mine: number; team: number; last_mine_at: Date | null }[]
    >(
      `SELECT lower(i.food_id) AS food_id,
              count(*) FILTER (WHERE a.user_id = $2)::int AS mine,
              count(*)::int AS team,
              max(e.logged_at) FILTER (WHERE a.user_id = $2) AS last_mine_at
         FROM meal_entry_items i
         JOIN meal_entries e ON e.id = i.meal_entry_id
         JOIN athletes a ON a.id = i.athlete_id
        WHERE a.team_id = $1 AND e.logged_at >= $3
        GROUP BY lower(i.food_id)
        ORDER BY mine DESC, team DESC
        LIMIT 500`,
      [teamId, userId, since],
    );
    return new Map(
      rows.map((r) => [
        r.food_id,
        {
          mine: r.mine,
          team: r.team,
          lastMineAt: r.last_mine_at ? new Date(r.last_mine_at).getTime() : null,
        },
      ]),
    );
  }
}
