import {
  labelRequestPer100g,
  normaliseBarcode,
  type CreateFoodRequest,
  type FoodView,
  type LabelFoodRequest,
  type LabelFoodResult,
  type LabelNutrients,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { FoodProductsUnavailable, lookupProduct } from '../adapters/food-products.js';
import { findReferenceFood, listReferenceFoods } from '../adapters/reference-foods.js';
import type { Config } from '../config.js';
import type { Athlete } from '../entities/athlete.entity.js';
import type { Food } from '../entities/food.entity.js';
import { AppError } from '../errors.js';
import { compareByRelevance, nameMatches, searchWords } from '../lib/food-search.js';
import type { Per100g } from '../lib/meal-nutrients.js';
import type { Actor } from '../policies/actor.js';
import {
  labelCheckOf,
  presentReferenceFood,
  presentTeamFood,
  teamFoodEnergyKcal,
} from '../presenters/food.presenter.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
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
 * A food an athlete's meal may use by id (`<uuid>` for a team food or the athlete's own personal
 * food, `ifct:<code>` for a reference food), or null when there is no such food for them.
 */
export async function resolveFood(
  manager: EntityManager,
  athlete: Pick<Athlete, 'id' | 'teamId'>,
  foodId: string,
): Promise<ResolvedFood | null> {
  if (foodId.toLowerCase().startsWith(REFERENCE_PREFIX)) {
    const ref = await findReferenceFood(foodId.slice(REFERENCE_PREFIX.length));
    return ref ? { id: ref.id, name: ref.name, per100g: ref.per100g } : null;
  }
  if (!UUID.test(foodId)) return null;
  const food = await new FoodRepository(manager).findForAthleteMeal(
    foodId.toLowerCase(),
    athlete.teamId,
    athlete.id,
  );
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

type FoodDeps = { dataSource: DataSource; config: Pick<Config, 'foodProductsUrl'> };

/** Who a food made from a label belongs to: the team, or one athlete of it. */
export type FoodOwner = { teamId: string; athleteId: string | null };

/** The answer when the barcode finds nothing to copy: the athlete types the label instead. */
const barcodeNotFound = (listedWithoutFigures: boolean): AppError =>
  new AppError(
    'barcode_not_found',
    listedWithoutFigures
      ? 'This product is listed without nutrition figures: enter the label instead.'
      : 'No product with this barcode was found: enter the label instead.',
    { barcode: listedWithoutFigures ? 'Listed without nutrition figures' : 'Not found' },
  );

export class FoodService {
  constructor(private readonly deps: FoodDeps) {}

  /**
   * The team's foods, then reference foods, whose names hold every word of `q` (any order, any
   * case); at most `limit` in all. An empty query lists from the start of each.
   */
  async search(actor: Actor, q: string | undefined, limit: number): Promise<FoodView[]> {
    const words = searchWords(q);
    const manager = this.deps.dataSource.manager;
    // An athlete also finds their own personal foods; staff search the team's list.
    const ownAthlete =
      actor.role === 'athlete' ? await new AthleteRepository(manager).findByUserId(actor.userId) : null;
    const team = await new FoodRepository(manager).search(actor.teamId, words, limit, ownAthlete?.id ?? null);
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

  /** A food by id, for the route that authorizes it (team or personal; reference foods have no uuid). */
  findById(id: string): Promise<Food | null> {
    return new FoodRepository(this.deps.dataSource.manager).findById(id);
  }

  /**
   * A team or personal food from a nutrition label: stored per 100 g (per-serving figures scaled by
   * the serving's grams), with the printed energy kept and checked against the macros.
   */
  async createFromLabel(actor: Actor, owner: FoodOwner, input: LabelFoodRequest): Promise<LabelFoodResult> {
    const food = await this.save(actor, owner, input.name, labelRequestPer100g(input), null);
    return { food: presentTeamFood(food), labelCheck: labelCheckOf(food)!, created: true };
  }

  /**
   * The athlete's personal food for a packaged product's barcode: the one they already have, or a
   * new one from the food-products database's label. Only the barcode leaves the server.
   */
  async fromBarcode(actor: Actor, athlete: Athlete, typed: string): Promise<LabelFoodResult> {
    const barcode = normaliseBarcode(typed);
    const repo = new FoodRepository(this.deps.dataSource.manager);
    const existing = await repo.findPersonalByBarcode(athlete.id, barcode);
    if (existing)
      return { food: presentTeamFood(existing), labelCheck: labelCheckOf(existing)!, created: false };
    let lookup;
    try {
      lookup = await lookupProduct(this.deps.config.foodProductsUrl, barcode);
    } catch (error) {
      if (!(error instanceof FoodProductsUnavailable)) throw error;
      throw new AppError(
        'food_products_unavailable',
        'The food-products database is not answering right now: enter the label, or try the barcode again later.',
      );
    }
    if (lookup.kind === 'not_found') throw barcodeNotFound(lookup.listedWithoutFigures);
    const owner = { teamId: athlete.teamId, athleteId: athlete.id };
    const food = await this.save(actor, owner, lookup.product.name, lookup.product.per100g, barcode);
    return { food: presentTeamFood(food), labelCheck: labelCheckOf(food)!, created: true };
  }

  private save(
    actor: Actor,
    owner: FoodOwner,
    name: string,
    per100g: LabelNutrients,
    barcode: string | null,
  ): Promise<Food> {
    return new FoodRepository(this.deps.dataSource.manager).create({
      teamId: owner.teamId,
      athleteId: owner.athleteId,
      name,
      proteinG: per100g.proteinG,
      carbohydrateG: per100g.carbohydrateG,
      fatG: per100g.fatG,
      fibreG: per100g.fibreG ?? null,
      alcoholG: per100g.alcoholG ?? null,
      sodiumMg: per100g.sodiumMg ?? null,
      labelEnergyKcal: per100g.energyKcal,
      barcode,
      createdById: actor.userId,
    });
  }
}
