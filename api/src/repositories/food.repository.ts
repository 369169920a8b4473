import type { EntityManager } from 'typeorm';
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

/** `%`, `_` and `\` taken literally inside an ILIKE pattern. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

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
   * A food a meal of this athlete may use: a team food of the team, or the athlete's own personal
   * food (never another athlete's).
   */
  findForAthleteMeal(id: string, teamId: string, athleteId: string): Promise<Food | null> {
    return this.manager
      .createQueryBuilder(Food, 'f')
      .where('f.id = :id AND f.team_id = :teamId', { id, teamId })
      .andWhere('(f.athlete_id IS NULL OR f.athlete_id = :athleteId)', { athleteId })
      .getOne();
  }

  /** The athlete's personal food made from this barcode, if any (index on athlete_id, barcode). */
  findPersonalByBarcode(athleteId: string, barcode: string): Promise<Food | null> {
    return this.manager.findOne(Food, { where: { athleteId, barcode }, order: { createdAt: 'ASC' } });
  }

  /**
   * Team foods, plus the personal foods of `athleteId` when given, whose name holds every word
   * (any order, any case), at most `limit`, by name.
   */
  search(
    teamId: string,
    words: readonly string[],
    limit: number,
    athleteId: string | null = null,
  ): Promise<Food[]> {
    const qb = this.manager.createQueryBuilder(Food, 'f').where('f.team_id = :teamId', { teamId });
    if (athleteId) qb.andWhere('(f.athlete_id IS NULL OR f.athlete_id = :athleteId)', { athleteId });
    else qb.andWhere('f.athlete_id IS NULL');
    words.forEach((w, i) => {
      qb.andWhere(`f.name ILIKE :w${i} ESCAPE '\\'`, { [`w${i}`]: `%${likeEscape(w)}%` });
    });
    return qb.orderBy('lower(f.name)', 'ASC').addOrderBy('f.id', 'ASC').limit(limit).getMany();
  }
}
