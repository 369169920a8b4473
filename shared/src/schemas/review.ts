import { z } from 'zod';
import { uuid } from './common.js';
import { EVENT_TYPES } from '../vocabulary.js';
import { GOALS } from './athletes.js';

export const REVIEW_REASON_KINDS = ['safety', 'missed', 'drift', 'reply', 'countdown', 'over_limit'] as const;
export type ReviewReasonKind = (typeof REVIEW_REASON_KINDS)[number];

/** GET /api/review-queue: one row per athlete that needs attention, most urgent first. */
export const reviewQueueItem = z.object({
  athleteId: uuid,
  name: z.string(),
  eventType: z.enum(EVENT_TYPES).nullable(),
  goal: z.enum(GOALS).nullable(),
  daysToEvent: z.number().int().nullable(),
  countdownLabel: z.string().nullable(),
  /** 1 safety, 2 missed check-ins, 3 drift, 4 unread replies (lower first). */
  priority: z.number().int().min(1).max(4),
  /** Why it is here, most important first ("Weight down 2.4 % in 24 h", "No weigh-in for 3 days"). */
  reasons: z.array(
    z.object({ kind: z.enum(REVIEW_REASON_KINDS), text: z.string(), date: z.string().nullable() }),
  ),
  /** The oldest unreviewed item's time (ISO). */
  since: z.string(),
  lastReviewedAt: z.string().nullable(),
});
export type ReviewQueueItem = z.infer<typeof reviewQueueItem>;

/** POST /api/review-queue/:athleteId/reviewed: clears the athlete's current items. */
export const markReviewedResponse = z.object({ athleteId: uuid, reviewedAt: z.string() });
