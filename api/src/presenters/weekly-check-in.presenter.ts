import type { WeeklyCheckInView } from '@driftmark/shared';
import type { WeeklyCheckInWithReplier } from '../repositories/weekly-check-in.repository.js';

/** A stored check-in: submitted until a staff member replies, then answered. */
export function presentWeeklyCheckIn(row: WeeklyCheckInWithReplier): WeeklyCheckInView {
  const reply =
    row.replyBody !== null && row.repliedAt !== null
      ? {
          body: row.replyBody,
          by: { id: row.repliedById ?? '', name: row.repliedBy?.name ?? 'Former staff member' },
          at: row.repliedAt.toISOString(),
          planVersionId: row.planVersionId,
        }
      : null;
  return {
    id: row.id,
    athleteId: row.athleteId,
    dueDate: row.dueDate,
    status: reply ? 'answered' : 'submitted',
    firstDueDate: null,
    // Stored before the 14-day rate was part of the figures: none then.
    figures: { ...row.figures, rate: row.figures.rate ?? null },
    questions: row.questions,
    answers: row.answers,
    questionsForCoach: row.questionsForCoach,
    submittedAt: row.submittedAt.toISOString(),
    reply,
  };
}
