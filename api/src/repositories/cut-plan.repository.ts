import type { EntityManager } from 'typeorm';
import { CutPlan } from '../entities/cut-plan.entity.js';
import { CutPlanAcknowledgement } from '../entities/cut-plan-acknowledgement.entity.js';
import type { User } from '../entities/user.entity.js';

export type CutPlanWithAuthor = CutPlan & { createdBy: User };
export type CutAcknowledgementWithAuthor = CutPlanAcknowledgement & { acknowledgedBy: User };

export type NewCutPlan = Pick<
  CutPlan,
  | 'athleteId'
  | 'weighInDate'
  | 'limitKg'
  | 'startDate'
  | 'startKg'
  | 'preAcuteKg'
  | 'acuteDays'
  | 'path'
  | 'thresholdPct'
  | 'notes'
  | 'createdById'
>;
export type NewCutAcknowledgement = Pick<
  CutPlanAcknowledgement,
  'key' | 'severity' | 'message' | 'source' | 'acknowledgedById' | 'acknowledgedAt'
>;

export class CutPlanRepository {
  constructor(private readonly manager: EntityManager) {}

  /** The athlete's plan in force: the latest saved. */
  latest(athleteId: string): Promise<CutPlanWithAuthor | null> {
    return this.manager.findOne(CutPlan, {
      where: { athleteId },
      relations: { createdBy: true },
      order: { createdAt: 'DESC', id: 'DESC' },
    }) as Promise<CutPlanWithAuthor | null>;
  }

  acknowledgements(cutPlanId: string): Promise<CutAcknowledgementWithAuthor[]> {
    return this.manager.find(CutPlanAcknowledgement, {
      where: { cutPlanId },
      relations: { acknowledgedBy: true },
      order: { acknowledgedAt: 'ASC', key: 'ASC' },
    }) as Promise<CutAcknowledgementWithAuthor[]>;
  }

  /** Saves a plan and its acknowledgements (call inside the caller's transaction). */
  async create(input: NewCutPlan, acks: readonly NewCutAcknowledgement[]): Promise<CutPlan> {
    const plan = await this.manager.save(this.manager.create(CutPlan, input));
    if (acks.length > 0) {
      await this.manager.save(
        acks.map((a) => this.manager.create(CutPlanAcknowledgement, { ...a, cutPlanId: plan.id })),
      );
    }
    return plan;
  }
}
