import { type EntityManager, type SelectQueryBuilder } from 'typeorm';
import { Food } from '../entities/food.entity.js';

export type NewFood = Pick<
  Food,
  | 'teamId'
  | 'name'
  | 'proteinG'
  | 'carbohydrateG'
  | 'fatG'
  | 'fibreG'
  | 'alcoholG'
  | 'sodiumMg'
  | 'createdById'
> &
  Partial<Pick<Food, 'athleteId' | 'barcode' | 'labelEnergyKcal'>>;

export class FoodRepository {
  constructor(private readonly manager: EntityManager) {}

  create(input: NewFood): Promise<Food> {
    return this.manager.save(this.manager.create(Food, input));
  }

  /** A food by id, whoever it belongs to (the caller authorizes). */
  findById(id: string): Promise<Food | null> {
    return this.manager.findOneBy(Food, { id });
  }

  /**
   * The foods of a team an athlete's meal and search may use: the team's foods, plus the athlete's
   * own personal foods when `athleteId` is given (never another athlete's); the team's foods only
   * when it is null (staff). The one place this rule lives.
   */
  private usableBy(teamId: string, athleteId: string | null): SelectQueryBuilder<Food> {
    const qb = this.manager.createQueryBuilder(Food, 'f').where('f.team_id = :teamId', { teamId });
    if (athleteId) qb.andWhere('(f.athlete_id IS NULL OR f.athlete_id = :athleteId)', { athleteId });
    else qb.andWhere('f.athlete_id IS NULL');
    return qb;
  }

  /**
   * Of `ids`, the foods this athlete's meal may use (`usableBy`), in one statement; with a null
   * athlete (staff planning a meal), the team's foods only.
   */
  findManyForAthleteMeal(ids: readonly string[], teamId: string, athleteId: string | null): Promise<Food[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return this.usableBy(teamId, athleteId)
      .andWhere('f.id IN (:...ids)', { ids: [...ids] })
      .getMany();
  }

  /** The athlete's personal food made from this barcode, if any (index on athlete_id, barcode). */
  findPersonalByBarcode(athleteId: string, barcode: string): Promise<Food | null> {
    return this.manager.findOne(Food, { where: { athleteId, barcode }, order: { createdAt: 'ASC' } });
  }

  /**
   * The foods search matches in memory (by the one rule, `lib/food-search.ts`): the team's, plus the
   * athlete's own personal foods when `athleteId` is given; at most 5,000.
   */
  listForTeam(teamId: string, athleteId: string | null): Promise<Food[]> {
    return this.usableBy(teamId, athleteId)
      .orderBy('f.name', 'ASC')
      .addOrderBy('f.id', 'ASC')
      .limit(5000)
      .getMany();
  }
}
