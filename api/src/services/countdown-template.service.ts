import { validateTemplate, type TemplateRequest, type TemplateView } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { notFound, validationFailed } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { presentTemplate } from '../presenters/plan.presenter.js';
import {
  CountdownTemplateRepository,
  type TemplateValues,
} from '../repositories/countdown-template.repository.js';
import { withPlannedFoods } from './meal-plan.service.js';

type TemplateDeps = { dataSource: DataSource };

/**
 * The stored form of a request: rules beyond the zod shape checked, planned foods filled from the
 * team's food list, days ordered by offset.
 */
async function templateValues(
  manager: EntityManager,
  teamId: string,
  input: TemplateRequest,
): Promise<TemplateValues> {
  const errors = validateTemplate(input);
  if (Object.keys(errors).length > 0) throw validationFailed(errors);
  const targets = await withPlannedFoods(
    manager,
    teamId,
    input.days.map((d, i) => ({ path: `days.${i}.targets`, targets: d.targets })),
  );
  const days = input.days.map((d, i) => ({ ...d, targets: targets[i] ?? d.targets }));
  return {
    name: input.name,
    eventType: input.eventType,
    description: input.description || null,
    days: days.sort((a, b) => a.offset - b.offset),
  };
}

/** The team's countdown template library. The caller has authorized the action on the team. */
export class CountdownTemplateService {
  constructor(private readonly deps: TemplateDeps) {}

  private get repo(): CountdownTemplateRepository {
    return new CountdownTemplateRepository(this.deps.dataSource.manager);
  }

  async list(teamId: string): Promise<TemplateView[]> {
    return (await this.repo.listForTeam(teamId)).map(presentTemplate);
  }

  async get(teamId: string, id: string): Promise<TemplateView> {
    const template = await this.repo.findInTeam(id, teamId);
    if (!template) throw notFound();
    return presentTemplate(template);
  }

  async create(actor: Actor, input: TemplateRequest): Promise<TemplateView> {
    const id = await this.repo.create({
      ...(await templateValues(this.deps.dataSource.manager, actor.teamId, input)),
      teamId: actor.teamId,
      createdById: actor.userId,
    });
    return this.get(actor.teamId, id);
  }

  /** Replaces a template; versions already applied keep the days they were given. */
  async update(teamId: string, id: string, input: TemplateRequest): Promise<TemplateView> {
    const values = await templateValues(this.deps.dataSource.manager, teamId, input);
    await this.repo.update(id, teamId, values);
    return this.get(teamId, id);
  }

  async remove(teamId: string, id: string): Promise<void> {
    await this.repo.remove(id, teamId);
  }
}
