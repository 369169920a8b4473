import type { EntityManager } from 'typeorm';
import { CountdownTemplate } from '../entities/countdown-template.entity.js';
import type { User } from '../entities/user.entity.js';

export type TemplateWithAuthor = CountdownTemplate & { createdBy: User };

export type TemplateValues = Pick<CountdownTemplate, 'name' | 'eventType' | 'description' | 'days'>;

/** A team's countdown templates. Every query names the team, so another team's id finds nothing. */
export class CountdownTemplateRepository {
  constructor(private readonly manager: EntityManager) {}

  listForTeam(teamId: string): Promise<TemplateWithAuthor[]> {
    return this.manager
      .createQueryBuilder(CountdownTemplate, 't')
      .innerJoinAndSelect('t.createdBy', 'u')
      .where('t.team_id = :teamId', { teamId })
      .orderBy('lower(t.name)', 'ASC')
      .addOrderBy('t.id', 'ASC')
      .getMany() as Promise<TemplateWithAuthor[]>;
  }

  findInTeam(id: string, teamId: string): Promise<TemplateWithAuthor | null> {
    return this.manager.findOne(CountdownTemplate, {
      where: { id, teamId },
      relations: { createdBy: true },
    }) as Promise<TemplateWithAuthor | null>;
  }

  async create(input: TemplateValues & Pick<CountdownTemplate, 'teamId' | 'createdById'>): Promise<string> {
    const saved = await this.manager.save(this.manager.create(CountdownTemplate, input));
    return saved.id;
  }

  async update(id: string, teamId: string, values: TemplateValues): Promise<void> {
    await this.manager.update(CountdownTemplate, { id, teamId }, values);
  }

  async remove(id: string, teamId: string): Promise<void> {
    await this.manager.delete(CountdownTemplate, { id, teamId });
  }
}
