import type { EntityManager } from 'typeorm';
import { CutPlan } from '../entities/cut-plan.entity.js';
import { CutPlanAcknowledgement } from '../entities/cut-plan-acknowledgement.entity.js';
import { CutRehearsalNote } from '../entities/cut-rehearsal-note.entity.js';
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
  | 'rehearsal'
  | 'createdById'
>;
export type RehearsalNoteWithAuthor = CutRehearsalNote & { author: User | null };
export type NewCutAcknowledgement = Pick<
  CutPlanAcknowledgement,
  'key' | 'severity' | 'message' | 'source' | 'acknowledgedById' | 'acknowledgedAt'
>;

export class CutPlanRepository {
  constructor(private readonly manager: EntityManager) {}

  /** The athlete's plan in force: the latest saved that is not a rehearsal. */
  latest(athleteId: string): Promise<CutPlanWithAuthor | null> {
    return this.manager.findOne(CutPlan, {
      where: { athleteId, rehearsal: false },
      relations: { createdBy: true },
      order: { createdAt: 'DESC', id: 'DESC' },
    }) as Promise<CutPlanWithAuthor | null>;
  }

  /** The athlete's latest practice run: the latest practice weigh-in (then the latest saved). */
  latestRehearsal(athleteId: string): Promise<CutPlan | null> {
    return this.manager.findOne(CutPlan, {
      where: { athleteId, rehearsal: true },
      order: { weighInDate: 'DESC', createdAt: 'DESC', id: 'DESC' },
    });
  }

  /** One of the athlete's rehearsals by id; null for another athlete's plan or a cut that is not one. */
  findRehearsal(athleteId: string, id: string): Promise<CutPlan | null> {
    return this.manager.findOneBy(CutPlan, { id, athleteId, rehearsal: true });
  }

  /** A rehearsal's day notes with their writers, by date. */
  notes(cutPlanId: string): Promise<RehearsalNoteWithAuthor[]> {
    return this.manager.find(CutRehearsalNote, {
      where: { cutPlanId },
      relations: { author: true },
      order: { localDate: 'ASC' },
    }) as Promise<RehearsalNoteWithAuthor[]>;
  }

  /** Writes the day's note (one a day: the latest writer's), in one statement. */
  async setNote(plan: Pick<CutPlan, 'id' | 'athleteId'>, date: string, note: string, authorId: string) {
    await this.manager
      .createQueryBuilder()
      .insert()
      .into(CutRehearsalNote)
      .values({ cutPlanId: plan.id, athleteId: plan.athleteId, localDate: date, note, authorId })
      .orUpdate(['note', 'author_id', 'updated_at'], ['cut_plan_id', 'local_date'])
      .execute();
  }

  async removeNote(cutPlanId: string, date: string): Promise<void> {
    await this.manager.delete(CutRehearsalNote, { cutPlanId, localDate: date });
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
