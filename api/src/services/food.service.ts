import type { CreateFoodRequest, FoodView } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { findReferenceFood, listReferenceFoods } from '../adapters/reference-foods.js';
import { compareByRelevance, nameMatches, searchWords } from '../lib/food-search.js';
import type { Per100g } from '@driftmark/shared';
import type { Actor } from '../policies/actor.js';
import { presentReferenceFood, presentTeamFood, teamFoodEnergyKcal } from '../presenters/food.presenter.js';
import { FoodRepository } from '../repositories/food.repository.js';

/** A food resolved for a meal entry: what the entry keeps of it. */
export interface ResolvedFood {
  id: string;
  name: string;
  per100g: Per100g;
}

const REFERENCE_PREFIX = 'ifct:';
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
  if (foodId.toLowerCase().startsWith(REFERENCE_PREFIX)) {
    const ref = await findReferenceFood(foodId.slice(REFERENCE_PREFIX.length));
    return ref ? { id: ref.id, name: ref.name, per100g: ref.per100g } : null;
  }
  if (!UUID.test(foodId)) return null;
  const food = await new FoodRepository(manager).findInTeam(foodId.toLowerCase(), teamId);
  if (!food) return null;
  return {
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
  };
}

type FoodDeps = { dataSource: DataSource };

export class FoodService {
  constructor(private readonly deps: FoodDeps) {}

  /**
   * The team's foods, then reference foods, whose names hold every word of `q` (any order, any
   * case); at most `limit` in all. An empty query lists from the start of each.
   */
  async search(actor: Actor, q: string | undefined, limit: number): Promise<FoodView[]> {
    const words = searchWords(q);
    const team = await new FoodRepository(this.deps.dataSource.manager).search(actor.teamId, words, limit);
    team.sort(compareByRelevance(words));
    const room = limit - team.length;
    const reference =
      room > 0
        ? (await listReferenceFoods())
            .filter((f) => nameMatches(f.name, words))
            .sort(compareByRelevance(words))
            .slice(0, room)
        : [];
    return [...team.map(presentTeamFood), ...reference.map(presentReferenceFood)];
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
