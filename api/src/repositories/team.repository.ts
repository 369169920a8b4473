import type { EntityManager } from 'typeorm';
import { Team } from '../entities/team.entity.js';

export class TeamRepository {
  constructor(private readonly manager: EntityManager) {}

  findById(id: string): Promise<Team | null> {
    return this.manager.findOneBy(Team, { id });
  }

  create(input: Pick<Team, 'name'> & Partial<Pick<Team, 'settings'>>): Promise<Team> {
    return this.manager.save(this.manager.create(Team, { settings: {}, ...input }));
  }
}
