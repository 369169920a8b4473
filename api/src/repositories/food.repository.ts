import { In, type EntityManager } from 'typeorm';
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
>;

/** `%`, `_` and `\` taken literally inside an ILIKE pattern. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export class FoodRepository {
  constructor(private readonly manager: EntityManager) {}

  create(input: NewFood): Promise<Food> {
    return this.manager.save(this.manager.create(Food, input));
  }

  findInTeam(id: string, teamId: string): Promise<Food | null> {
    return this.manager.findOneBy(Food, { id, teamId });
  }

  /** The team's foods among `ids`, in one statement. */
  findManyInTeam(ids: readonly string[], teamId: string): Promise<Food[]> {
    return this.manager.findBy(Food, { id: In([...ids]), teamId });
  }

  /** Team foods whose name holds every word (any order, any case), at most `limit`, by name. */
  search(teamId: string, words: readonly string[], limit: number): Promise<Food[]> {
    const qb = this.manager.createQueryBuilder(Food, 'f').where('f.team_id = :teamId', { teamId });
    words.forEach((w, i) => {
      qb.andWhere(`f.name ILIKE :w${i} ESCAPE '\\'`, { [`w${i}`]: `%${likeEscape(w)}%` });
    });
    return qb.orderBy('lower(f.name)', 'ASC').addOrderBy('f.id', 'ASC').limit(limit).getMany();
  }
}
