import { preAcuteDate, type CutPlanView } from '@driftmark/shared';
import type { CutAcknowledgementWithAuthor, CutPlanWithAuthor } from '../repositories/cut-plan.repository.js';

export function presentCutPlan(
  p: CutPlanWithAuthor,
  acks: readonly CutAcknowledgementWithAuthor[],
): CutPlanView {
  return {
    id: p.id,
    startDate: p.startDate,
    startKg: p.startKg,
    preAcuteKg: p.preAcuteKg,
    preAcuteDate: preAcuteDate(p),
    acuteDays: p.acuteDays,
    path: p.path,
    notes: p.notes,
    createdAt: p.createdAt.toISOString(),
    createdBy: { id: p.createdBy.id, name: p.createdBy.name },
    acknowledgements: acks.map((a) => ({
      key: a.key,
      message: a.message,
      acknowledgedAt: a.acknowledgedAt.toISOString(),
      by: a.acknowledgedBy.name,
    })),
  };
}
