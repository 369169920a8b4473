import { z } from 'zod';
import { MARK_METRICS } from '../vocabulary.js';
import { isoDate, text, uuid } from './common.js';

export const MARK_LIMITS = {
  note: { min: 1, max: 2000 },
  reply: { min: 1, max: 2000 },
  rangeDays: 400,
} as const;

/** POST /api/athletes/:athleteId/marks */
export const createMarkRequest = z
  .object({
    /** The chart it is pinned to. */
    metric: z.enum(MARK_METRICS, { error: 'Choose a chart' }),
    /** First day, the athlete's date. */
    fromDate: isoDate,
    /** Last day (same as fromDate for a single day). */
    toDate: isoDate,
    note: text('Note', MARK_LIMITS.note),
  })
  .refine((v) => v.toDate >= v.fromDate, { path: ['toDate'], message: 'Must be on or after the first day' });
export type CreateMarkRequest = z.infer<typeof createMarkRequest>;

/** PATCH /api/marks/:markId (author only): edit the note. */
export const updateMarkRequest = z.object({
  note: text('Note', MARK_LIMITS.note),
});
export type UpdateMarkRequest = z.infer<typeof updateMarkRequest>;

/** POST /api/marks/:markId/replies */
export const createReplyRequest = z.object({
  body: text('Reply', MARK_LIMITS.reply),
});
export type CreateReplyRequest = z.infer<typeof createReplyRequest>;

const person = z.object({
  id: uuid,
  name: z.string(),
  role: z.enum(['owner', 'coach', 'assistant', 'athlete']),
});

export const markReplyView = z.object({
  id: uuid,
  author: person,
  body: z.string(),
  createdAt: z.string(),
});
export type MarkReplyView = z.infer<typeof markReplyView>;

export const markView = z.object({
  id: uuid,
  athleteId: uuid,
  author: person,
  metric: z.enum(MARK_METRICS),
  fromDate: z.string(),
  toDate: z.string(),
  note: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  replies: z.array(markReplyView),
  /** For the viewer: something in the thread (the mark or a reply by someone else) is newer than their last read. */
  unread: z.boolean(),
  /** When the other side last read the thread (the athlete for staff viewers, the author for the athlete). */
  readByOtherAt: z.string().nullable(),
});
export type MarkView = z.infer<typeof markView>;

/** GET /api/athletes/:athleteId/marks?from&to (both optional; newest first). */
export const listMarksQuery = z.object({ from: isoDate.optional(), to: isoDate.optional() });
export type ListMarksQuery = z.infer<typeof listMarksQuery>;
