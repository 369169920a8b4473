import type { CreateFoodRequest, FoodPortion, FoodView } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { findEverydayFood, listEverydayFoods } from '../adapters/everyday-foods.js';
import { findReferenceFood, listReferenceFoods } from '../adapters/reference-foods.js';
import { indexFood, rankFoods, type IndexedFood, type SearchableFood } from '../lib/food-search.js';
import { MealItemRepository } from '../repositories/meal-item.repository.js';
import type { Per100g } from '../lib/meal-nutrients.js';
import type { Actor } from '../policies/actor.js';
import {
  preparationOf,
  presentEverydayFood,
  presentReferenceFood,
  presentTeamFood,
  teamFoodEnergyKcal,
} from '../presenters/food.presenter.js';
import { FoodRepository } from '../repositories/food.repository.js';

/** A food resolved for a meal item: what the item keeps of it. */
export interface ResolvedFood {
  id: string;
  name: string;
  per100g: Per100g;
  portions: readonly FoodPortion[];
}

const REFERENCE_PREFIX = 'ifct:';
const EVERYDAY_PREFIX = 'dm:';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * A food of the team's list by id (`<uuid>` for a team food, `ifct:<code>` for a reference
 * food), or null when the team has no such food.
 */
export async function resolveFood(
  manager: EntityManager,
  teamId: string,
  foodId: string,
): Promise<ResolvedFood | null> {
  return (await resolveFoods(manager, teamId, [foodId])).get(foodId.toLowerCase()) ?? null;
}

/**
 * Foods of the team's list by id, keyed by the lower-cased id; ids the team has no food for are
 * left out. Team foods are read in one statement, whatever their number.
 */
export async function resolveFoods(
  manager: EntityManager,
  teamId: string,
  foodIds: readonly string[],
): Promise<Map<string, ResolvedFood>> {
  const found = new Map<string, ResolvedFood>();
  const teamIds: string[] = [];
  for (const raw of new Set(foodIds.map((id) => id.toLowerCase()))) {
    if (raw.startsWith(REFERENCE_PREFIX)) {
      const ref = await findReferenceFood(raw.slice(REFERENCE_PREFIX.length));
      if (ref) found.set(raw, { id: ref.id, name: ref.name, per100g: ref.per100g, portions: [] });
    } else if (raw.startsWith(EVERYDAY_PREFIX)) {
      const own = findEverydayFood(raw);
      if (own) found.set(raw, { id: own.id, name: own.name, per100g: own.per100g, portions: own.portions });
    } else if (UUID.test(raw)) {
      teamIds.push(raw);
    }
  }
  if (teamIds.length > 0) {
    for (const food of await new FoodRepository(manager).findManyInTeam(teamIds, teamId)) {
      found.set(food.id.toLowerCase(), {
        id: food.id,
        name: food.name,
        per100g: {
          energyKcal: teamFoodEnergyKcal(food),
          proteinG: food.proteinG,
          carbohydrateG: food.carbohydrateG,
          fatG: food.fatG,
          fibreG: food.fibreG,
          alcoholG: food.alcoholG,
          sodiumMg: food.sodiumMg,
        },
        portions: [],
      });
    }
  }
  return found;
}

type FoodDeps = { dataSource: DataSource; clock: () => Date };

/** How far back use counts for ranking: 180 days (common practice, no source). */
const USAGE_WINDOW_DAYS = 180;

type Candidate = SearchableFood & { view: () => FoodView };

/** Our everyday foods and the reference table, indexed for search once. */
let fixedFoods: Promise<IndexedFood<Candidate>[]> | null = null;
function indexedFixedFoods(): Promise<IndexedFood<Candidate>[]> {
  fixedFoods ??= listReferenceFoods()
    .then((reference) => [
      ...listEverydayFoods().map((f) =>
        indexFood<Candidate>({
          id: f.id,
          name: f.name,
          terms: f.terms,
          preparation: f.preparation,
          source: 'everyday',
          view: () => presentEverydayFood(f),
        }),
      ),
      ...reference.map((f) =>
        indexFood<Candidate>({
          id: f.id,
          name: f.name,
          preparation: preparationOf(f.name),
          source: 'reference',
          view: () => presentReferenceFood(f),
        }),
      ),
    ])
    .catch((err: unknown) => {
      fixedFoods = null;
      throw err;
    });
  return fixedFoods;
}

export class FoodService {
  constructor(private readonly deps: FoodDeps) {}

  /**
   * The foods answering `q` (the team's, our everyday foods, the reference table), best first,
   * ranked by how well they match and by how often this athlete and the team log them; at most
   * `limit`. An empty query lists the recent and frequent foods first (`lib/food-search.ts`).
   */
  async search(actor: Actor, q: string | undefined, limit: number): Promise<FoodView[]> {
    const manager = this.deps.dataSource.manager;
    const now = this.deps.clock();
    const since = new Date(now.getTime() - USAGE_WINDOW_DAYS * 86_400_000);
    const [teamFoods, usage, fixed] = await Promise.all([
      new FoodRepository(manager).listForTeam(actor.teamId),
      new MealItemRepository(manager).usage(actor.teamId, actor.userId, since),
      indexedFixedFoods(),
    ]);
    const team = teamFoods.map((f) =>
      indexFood<Candidate>({
        id: f.id.toLowerCase(),
        name: f.name,
        preparation: preparationOf(f.name),
        source: 'team',
        view: () => presentTeamFood(f),
      }),
    );
    return rankFoods(q, [...team, ...fixed], usage, limit, now.getTime()).map((f) => {
      const used = usage.get(f.id.toLowerCase());
      return { ...f.view(), uses: { mine: used?.mine ?? 0, team: used?.team ?? 0 } };
    });
  }

  async create(actor: Actor, input: CreateFoodRequest): Promise<FoodView> {
    const food = await new FoodRepository(this.deps.dataSource.manager).create({
      teamId: actor.teamId,
      name: input.name,
      proteinG: input.proteinG,
      carbohydrateG: input.carbohydrateG,
      fatG: input.fatG,
      fibreG: input.fibreG ?? null,
      alcoholG: input.alcoholG ?? null,
      sodiumMg: input.sodiumMg ?? null,
      createdById: actor.userId,
    });
    return presentTeamFood(food);
  }
}
