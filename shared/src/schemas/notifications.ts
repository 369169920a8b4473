import { z } from 'zod';

/** E-mails a user may choose to get. Coaches get the staff kinds, athletes the athlete kinds. */
export const STAFF_NOTIFICATION_KINDS = [
  'safety_flag',
  'weekly_check_in_received',
  'mark_reply',
  'weekly_summary',
  'over_limit',
] as const;
export const ATHLETE_NOTIFICATION_KINDS = ['morning_reminder', 'coach_note', 'weekly_check_in_due'] as const;
export const NOTIFICATION_KINDS = [...STAFF_NOTIFICATION_KINDS, ...ATHLETE_NOTIFICATION_KINDS] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_LABELS: Record<NotificationKind, string> = {
  safety_flag: 'Safety flags (at once)',
  weekly_check_in_received: 'A weekly check-in arrives',
  mark_reply: 'An athlete replies to a mark',
  weekly_summary: 'Weekly roster summary',
  over_limit: 'An athlete is first projected over the weigh-in limit (at once)',
  morning_reminder: 'Morning reminder when no weigh-in is logged',
  coach_note: "Your coach's new marks and replies",
  weekly_check_in_due: 'Weekly check-in due',
};

/** GET/PUT /api/me/notifications */
export const notificationPreferences = z.object({
  /** Kind → wanted. Kinds missing from a stored row count as wanted. */
  enabled: z.record(z.enum(NOTIFICATION_KINDS), z.boolean()),
  /** Athletes: the hour (0–23, own time zone) after which a missing weigh-in sends the reminder. */
  reminderHour: z.number().int().min(0, 'Between 0 and 23').max(23, 'Between 0 and 23').nullable(),
});
export type NotificationPreferences = z.infer<typeof notificationPreferences>;

/** POST /api/unsubscribe (one click, RFC 8058) and GET /api/unsubscribe?token= (what it would do). */
export const unsubscribeRequest = z.object({ token: z.string().min(10).max(2000) });
export const unsubscribeView = z.object({
  kind: z.enum(NOTIFICATION_KINDS),
  label: z.string(),
  email: z.string(),
  done: z.boolean(),
});
export type UnsubscribeView = z.infer<typeof unsubscribeView>;
