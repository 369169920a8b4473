import { z } from 'zod';
import { isoDate, text, uuid } from './common.js';
import { LIMITS } from '../limits.js';
import { WEEKDAYS } from './plans.js';
import { DRIFT_METRICS, rateView } from './trends.js';

/**
 * The weekly check-in. Each athlete has a check-in weekday; on that day (their date) the check-in for
 * the week just ended is due: the week is the 7 days before the due date (dueDate − 7 … dueDate − 1).
 */

export const QUESTION_KINDS = ['text', 'scale', 'yes_no'] as const;
export type QuestionKind = (typeof QUESTION_KINDS)[number];
export const QUESTION_KIND_LABELS: Record<QuestionKind, string> = {
  text: 'Short text',
  scale: 'Scale 1–5',
  yes_no: 'Yes / no',
};

/** One of the coach's questions (team-wide list). */
export const checkInQuestion = z.object({
  id: uuid,
  kind: z.enum(QUESTION_KINDS, { error: 'Choose a kind' }),
  prompt: text('Question', LIMITS.question),
});
export type CheckInQuestion = z.infer<typeof checkInQuestion>;

/** PUT /api/team/check-in-questions (owner or coach). */
export const checkInQuestionsRequest = z.object({
  questions: z.array(checkInQuestion).max(12, 'At most 12 questions'),
});
export type CheckInQuestionsRequest = z.infer<typeof checkInQuestionsRequest>;

/** PATCH /api/athletes/:athleteId/check-in-day (staff who may update the athlete). */
export const checkInDayRequest = z.object({ weekday: z.enum(WEEKDAYS, { error: 'Choose a weekday' }) });
export type CheckInDayRequest = z.infer<typeof checkInDayRequest>;

/** The week's figures, filled in by the server. */
export const weeklyFigures = z.object({
  weekStart: z.string(),
  weekEnd: z.string(),
  /**
   * Mean of the week's weigh-ins, and of the week before; null with fewer than 4 weigh-ins in that
   * week (a 7-day mean needs at least 4, as the trend's 7-day mean).
   */
  meanWeightKg: z.number().nullable(),
  previousMeanWeightKg: z.number().nullable(),
  /** Week-over-week change of the 7-day mean (this week's mean − the week before's); null unless both exist. */
  changeKg: z.number().nullable(),
  weighIns: z.number().int(),
  /**
   * The 14-day rate ending on the week's last day (weekEnd − 13 … weekEnd), as the trend computes it;
   * null with fewer than 7 weigh-ins. Absent from check-ins stored before it was added.
   */
  rate: rateView.nullable().optional(),
  adherence: z.array(
    z.object({
      metric: z.enum(DRIFT_METRICS),
      adherence: z.number().nullable(),
      loggedShare: z.number().nullable(),
    }),
  ),
  /** Mean of each evening rating (1–5) over the week. */
  ratings: z.record(z.string(), z.number().nullable()),
  stepsMean: z.number().nullable(),
  sleepHoursMean: z.number().nullable(),
  /** Condition photos of the week (ids; served through the photo routes). */
  photoIds: z.array(uuid),
});
export type WeeklyFigures = z.infer<typeof weeklyFigures>;

export const answerValue = z.union([
  text('Answer', LIMITS.answer),
  z.number().int().min(1).max(5),
  z.boolean(),
  z.null(),
]);

/** POST /api/athletes/:athleteId/weekly-check-ins: the athlete submits the check-in due now. */
export const submitWeeklyCheckInRequest = z.object({
  /** The due date this answers (from GET …/weekly-check-ins/current); held to the entry window by the server. */
  dueDate: isoDate,
  answers: z.array(z.object({ questionId: uuid, value: answerValue })).max(12),
  /** The athlete's own questions for the coach. */
  questionsForCoach: text('Questions for the coach', LIMITS.questionsForCoach).nullable(),
});
export type SubmitWeeklyCheckInRequest = z.infer<typeof submitWeeklyCheckInRequest>;

/** POST /api/weekly-check-ins/:checkInId/reply (staff who may annotate the athlete). */
export const replyWeeklyCheckInRequest = z.object({
  body: text('Reply', LIMITS.weeklyReply),
  /** A plan version saved from the same screen, linked to the reply. */
  planVersionId: uuid.nullable().optional(),
});
export type ReplyWeeklyCheckInRequest = z.infer<typeof replyWeeklyCheckInRequest>;

/** not_due: nothing is due yet (the athlete joined on or after the due date; nothing is due before joining). */
export const WEEKLY_STATUSES = ['due', 'submitted', 'answered', 'missed', 'not_due'] as const;
export type WeeklyStatus = (typeof WEEKLY_STATUSES)[number];

export const weeklyCheckInView = z.object({
  /** Null while only due (nothing stored yet). */
  id: uuid.nullable(),
  athleteId: uuid,
  dueDate: z.string(),
  status: z.enum(WEEKLY_STATUSES),
  /** While not_due: the first due date the athlete is expected to answer. */
  firstDueDate: z.string().nullable(),
  figures: weeklyFigures,
  /** The questions as asked (snapshot at submission; the team's current list while due). */
  questions: z.array(checkInQuestion),
  answers: z.array(z.object({ questionId: uuid, value: answerValue })),
  questionsForCoach: z.string().nullable(),
  submittedAt: z.string().nullable(),
  reply: z
    .object({
      body: z.string(),
      by: z.object({ id: uuid, name: z.string() }),
      at: z.string(),
      planVersionId: uuid.nullable(),
    })
    .nullable(),
});
export type WeeklyCheckInView = z.infer<typeof weeklyCheckInView>;
