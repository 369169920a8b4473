import { z } from 'zod';

/**
 * Reports and data rights: the days as CSV (GET /api/athletes/:athleteId/days.csv?from&to, the trend's
 * `trendQuery`), the athlete's archive (GET /api/me/export, a zip), ending the coaching
 * (POST /api/athletes/:athleteId/end-coaching) and deleting one's own account in two steps.
 */

/** POST /api/me/deletion/confirm: the token from the e-mailed link (no session needed). */
export const confirmDeletionRequest = z.object({
  /** The signed token from the confirm link; it expires after an hour. */
  token: z.string({ error: 'The link is incomplete' }).min(1, 'The link is incomplete').max(2000),
});
export type ConfirmDeletionRequest = z.infer<typeof confirmDeletionRequest>;

/** What POST /api/me/deletion-request answers (202): where the link went. */
export const deletionRequestView = z.object({
  sentTo: z.string(),
  /** Minutes the link stays valid. */
  expiresInMinutes: z.number().int(),
});
export type DeletionRequestView = z.infer<typeof deletionRequestView>;
