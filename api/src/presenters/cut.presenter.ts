import {
  acuteShare,
  preAcuteDate,
  SYMPTOM_LABELS,
  type CutPlanView,
  type RehearsalFigures,
  type RehearsalView,
} from '@driftmark/shared';
import type { CutPlan } from '../entities/cut-plan.entity.js';
import type {
  CutAcknowledgementWithAuthor,
  CutPlanWithAuthor,
  RehearsalNoteWithAuthor,
} from '../repositories/cut-plan.repository.js';
import type { SymptomRow } from '../repositories/trend.repository.js';

export function presentCutPlan(
  p: CutPlanWithAuthor,
  acks: readonly CutAcknowledgementWithAuthor[],
): CutPlanView {
  return {
    id: p.id,
    rehearsal: p.rehearsal,
    weighInDate: p.weighInDate,
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

/** A practice run's record: the planned last days beside the figures, notes and symptoms of each day. */
export function presentRehearsal(
  plan: CutPlan,
  figures: RehearsalFigures,
  notes: readonly RehearsalNoteWithAuthor[],
  symptoms: readonly SymptomRow[],
  today: string,
): RehearsalView {
  const planned = acuteShare(plan.preAcuteKg, plan.limitKg, plan.thresholdPct);
  const noteOn = new Map(notes.map((n) => [n.localDate, n]));
  return {
    planId: plan.id,
    weighInDate: plan.weighInDate,
    preAcuteDate: preAcuteDate(plan),
    limitKg: plan.limitKg,
    planned: { acuteKg: planned.kg, acutePct: planned.pct, acuteDays: plan.acuteDays, steps: plan.notes },
    days: figures.days.map((d) => {
      const note = noteOn.get(d.date);
      return {
        ...d,
        note: note
          ? { text: note.note, by: note.author?.name ?? 'A former member', at: note.updatedAt.toISOString() }
          : null,
        symptoms: symptoms
          .filter((s) => s.date === d.date)
          .map((s) => ({ time: s.time, labels: s.symptoms.map((k) => SYMPTOM_LABELS[k]), urgent: s.urgent })),
      };
    }),
    underWay: figures.days.some((d) => d.date === today),
    achieved: figures.achieved,
    regained: figures.regained,
  };
}
