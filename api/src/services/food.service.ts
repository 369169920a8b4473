import {
  labelRequestPer100g,
  normaliseBarcode,
  type CreateFoodRequest,
  type FoodPortion,
  type FoodView,
  type LabelFoodRequest,
  type LabelFoodResult,
  type LabelNutrients,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { findEverydayFood, listEverydayFoods } from '../adapters/everyday-foods.js';
import { FoodProductsUnavailable, lookupProduct } from '../adapters/food-products.js';
import { findReferenceFood, listReferenceFoods } from '../adapters/reference-foods.js';
import type { Config } from '../config.js';
import type { Athlete } from '../entities/athlete.entity.js';
import type { Food } from '../entities/food.entity.js';
import { AppError } from '../errors.js';
import { indexFood, rankFoods, type IndexedFood, type SearchableFood } from '../lib/food-search.js';
import type { Per100g } from '../lib/meal-nutrients.js';
import type { Actor } from '../policies/actor.js';
import {
  labelCheckOf,
  preparationOf,
  presentEverydayFood,
  presentReferenceFood,
  presentTeamFood,
  teamFoodPer100g,
} from '../presenters/food.presenter.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { FoodRepository } from '../repositories/food.repository.js';
import { MealItemRepository } from '../repositories/meal-item.repository.js';

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
 * Foods an athlete's meal may use by id, keyed by the lower-cased id: team foods and the athlete's
 * own personal foods (`FoodRepository.findManyForAthleteMeal`), our everyday foods, the reference
 * table; ids with no such food for them are left out. A null athlete id (staff planning a meal)
 * takes the team's foods without any personal food. Stored foods are read in one statement,
 * whatever their number.
 */
export async function resolveFoods(
  manager: EntityManager,
  athlete: { id: string | null; teamId: string },
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
    for (const food of await new FoodRepository(manager).findManyForAthleteMeal(
      teamIds,
      athlete.teamId,
      athlete.id,
    )) {
      found.set(food.id.toLowerCase(), {
        id: food.id,
        name: food.name,
        per100g: teamFoodPer100g(food),
        portions: [],
      });
    }
  }
  return found;
}

type FoodDeps = {
  dataSource: DataSource;
  clock: () => Date;
  config: Pick<Config, 'foodProductsUrl'>;
};

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
   * The foods answering `q` (the team's, the signed-in athlete's own personal foods, our everyday
   * foods, the reference table), best first,
   * ranked by how well they match and by how often this athlete and the team log them; at most
   * `limit`. An empty query lists the recent and frequent foods first (`lib/food-search.ts`).
   */
  async search(actor: Actor, q: string | undefined, limit: number): Promise<FoodView[]> {
    const manager = this.deps.dataSource.manager;
    const now = this.deps.clock();
    const since = new Date(now.getTime() - USAGE_WINDOW_DAYS * 86_400_000);
    // An athlete also finds their own personal foods; staff search the team's list.
    const ownAthlete =
      actor.role === 'athlete' ? await new AthleteRepository(manager).findByUserId(actor.userId) : null;
    const [teamFoods, usage, fixed] = await Promise.all([
      new FoodRepository(manager).listForTeam(actor.teamId, ownAthlete?.id ?? null),
      new MealItemRepository(manager).usage(actor.teamId, actor.userId, since),
      indexedFixedFoods(),
    ]);
    const team = teamFoods.map((f) =>
      indexFood<Candidate>({
        id: f.id.toLowerCase(),
        name: f.name,
        preparation: preparationOf(f.name),
        source: f.athleteId ? 'personal' : 'team',
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
