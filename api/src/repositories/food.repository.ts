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

  /** The team's foods, at most 5,000 (search matches them in memory, by the one rule). */
  listForTeam(teamId: string): Promise<Food[]> {
    return this.manager.find(Food, { where: { teamId }, order: { name: 'ASC', id: 'ASC' }, take: 5000 });
  }
}
