/**
 * Writes the demo countdown templates and every demo athlete's plan versions (demo-plans.ts) inside
 * the seed's transaction, through the same repositories the API uses.
 */
import type { EntityManager } from 'typeorm';
import { CountdownTemplateRepository } from '../repositories/countdown-template.repository.js';
import { PlanRepository } from '../repositories/plan.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { withDemoMealPlans } from './demo-meal-plans.js';
import { DEMO_TEMPLATES, planDemoVersions, type DemoTemplateKey, type SeededTemplate } from './demo-plans.js';
import type { DemoHistoryPlan } from './seed-history.js';

export interface DemoPlanIds {
  teamId: string;
  ownerId: string;
  assistantId: string;
  /** Athlete ids by definition key. */
  athleteIds: ReadonlyMap<string, string>;
}

export async function writeDemoPlans(
  manager: EntityManager,
  plans: readonly DemoHistoryPlan[],
  ids: DemoPlanIds,
  now: Date,
): Promise<void> {
  const templateRepo = new CountdownTemplateRepository(manager);
  const templates = new Map<DemoTemplateKey, SeededTemplate>();
  for (const { key, ...values } of DEMO_TEMPLATES) {
    const id = await templateRepo.create({ ...values, teamId: ids.teamId, createdById: ids.ownerId });
    templates.set(key, { id, name: values.name, days: values.days });
  }

  const floors = await new TeamRepository(manager).guardrailFloors(ids.teamId);
  const planRepo = new PlanRepository(manager);
  for (const { def, history } of plans) {
    const athleteId = ids.athleteIds.get(def.key);
    if (!athleteId) throw new Error(`No athlete for ${def.key}`);
    const versions = await withDemoMealPlans(
      def.key,
      def.history.seed,
      planDemoVersions({ def, history, now, floors, templates }),
    );
    for (const v of versions) {
      await planRepo.insertVersion({
        athleteId,
        effectiveFrom: v.effectiveFrom,
        reason: v.reason,
        content: v.content,
        baseline: v.baseline,
        createdById: v.createdBy === 'assistant' ? ids.assistantId : ids.ownerId,
        createdAt: v.createdAt,
        acknowledgements: v.acknowledgements,
      });
    }
  }
}
