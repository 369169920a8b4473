import { MARK_METRIC_LABELS, type MarkReplyView, type MarkView } from '@driftmark/shared';
import { daysBetween, DISPLAY_LOCALE, todayIn } from '../../../lib/format';

/** Whose screen the marks are on: staff read the athlete's side of the thread, the athlete the coach's. */
export type MarkPerspective = 'coach' | 'athlete';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

function utcDate(isoDate: string): Date {
  const m = ISO_DATE.exec(isoDate);
  if (!m) throw new RangeError(`Not a YYYY-MM-DD date: ${isoDate}`);
  return new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
}

function yearOf(isoDate: string): number {
  return Number(isoDate.slice(0, 4));
}

const dayFormat = new Intl.DateTimeFormat(DISPLAY_LOCALE, {
  weekday: 'short',
  day: 'numeric',
  month: 'short',
  timeZone: 'UTC',
});
const dayYearFormat = new Intl.DateTimeFormat(DISPLAY_LOCALE, {
  weekday: 'short',
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  timeZone: 'UTC',
});

/** A calendar date as "Tue 24 Nov", or "Tue 24 Nov 2026" with the year. */
export function formatMarkDay(isoDate: string, withYear = false): string {
  return (withYear ? dayYearFormat : dayFormat).format(utcDate(isoDate)).replace(',', '');
}

/**
 * A mark's date or range: "Tue 24 Nov" for one day, "Tue 24 Nov – Sun 29 Nov" for a range. The year
 * is added when the range crosses a new year, or when it is not `referenceYear` (the viewer's current
 * year), so a mark from last season is never read as this one.
 */
export function formatMarkRange(fromDate: string, toDate: string, referenceYear?: number): string {
  const withYear =
    yearOf(fromDate) !== yearOf(toDate) ||
    (referenceYear !== undefined && (yearOf(fromDate) !== referenceYear || yearOf(toDate) !== referenceYear));
  if (fromDate === toDate) return formatMarkDay(fromDate, withYear);
  return `${formatMarkDay(fromDate, withYear)} – ${formatMarkDay(toDate, withYear)}`;
}

/** Calendar days a mark covers, both ends included (1 for a single day). */
export function markRangeDays(fromDate: string, toDate: string): number {
  return daysBetween(fromDate, toDate) + 1;
}

function browserTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

/**
 * When something in a thread was written or read, as the viewer's clock reads it: "Today 09:14",
 * "Yesterday 18:02", "2 Dec, 09:14", or "2 Dec 2025, 09:14" from another year.
 */
export function formatMarkTime(iso: string, now: Date = new Date(), timeZone = browserTimeZone()): string {
  const at = new Date(iso);
  if (Number.isNaN(at.getTime())) return iso;
  const clock = new Intl.DateTimeFormat(DISPLAY_LOCALE, {
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
  }).format(at);
  const day = todayIn(timeZone, at);
  const today = todayIn(timeZone, now);
  const ago = daysBetween(day, today);
  if (ago === 0) return `Today ${clock}`;
  if (ago === 1) return `Yesterday ${clock}`;
  const sameYear = day.slice(0, 4) === today.slice(0, 4);
  const date = new Intl.DateTimeFormat(DISPLAY_LOCALE, {
    day: 'numeric',
    month: 'short',
    ...(sameYear ? {} : { year: 'numeric' }),
    timeZone,
  }).format(at);
  return `${date}, ${clock}`;
}

/** How many marks hold something the viewer has not read (the nav badge). */
export function countUnread(marks: readonly Pick<MarkView, 'unread'>[]): number {
  return marks.reduce((n, m) => (m.unread ? n + 1 : n), 0);
}

/** Newest first by when the mark was pinned (ties: the later id last, so the order is stable). */
export function sortNewestFirst<T extends Pick<MarkView, 'id' | 'createdAt'>>(marks: readonly T[]): T[] {
  return [...marks].sort((a, b) => {
    const byTime = Date.parse(b.createdAt) - Date.parse(a.createdAt);
    return byTime !== 0 ? byTime : a.id.localeCompare(b.id);
  });
}

/** Edited when the note changed well after it was pinned (a write's own timestamps may differ by a few ms). */
export function isEdited(mark: Pick<MarkView, 'createdAt' | 'updatedAt'>): boolean {
  return Date.parse(mark.updatedAt) - Date.parse(mark.createdAt) > 60_000;
}

export type ReadReceipt = { seen: true; at: string } | { seen: false } | null;

/**
 * Whether the other side has read what the viewer's side wrote. For staff: the athlete's last read
 * against the mark (or its last edit) and staff replies. For the athlete: the coach's last read
 * against the athlete's own replies; null when the athlete has not replied (nothing to be seen).
 */
export function readReceipt(
  mark: Pick<MarkView, 'createdAt' | 'updatedAt' | 'replies' | 'readByOtherAt'>,
  perspective: MarkPerspective,
): ReadReceipt {
  const ours = (r: MarkReplyView) =>
    perspective === 'athlete' ? r.author.role === 'athlete' : r.author.role !== 'athlete';
  const times = mark.replies.filter(ours).map((r) => Date.parse(r.createdAt));
  if (perspective === 'coach') times.push(Date.parse(mark.createdAt), Date.parse(mark.updatedAt));
  const valid = times.filter((t) => !Number.isNaN(t));
  if (valid.length === 0) return null;
  const latest = Math.max(...valid);
  if (mark.readByOtherAt && Date.parse(mark.readByOtherAt) >= latest) {
    return { seen: true, at: mark.readByOtherAt };
  }
  return { seen: false };
}

/** Replies oldest first; collapsed threads show only the last `limit`, with how many are hidden. */
export function visibleReplies<T>(
  replies: readonly T[],
  expanded: boolean,
  limit = 3,
): { shown: readonly T[]; hidden: number } {
  if (expanded || replies.length <= limit) return { shown: replies, hidden: 0 };
  return { shown: replies.slice(replies.length - limit), hidden: replies.length - limit };
}

/** Words that name a mark for assistive technology and tests: "Weight mark, Tue 24 Nov – Sun 29 Nov". */
export function describeMark(
  mark: Pick<MarkView, 'metric' | 'fromDate' | 'toDate'>,
  referenceYear?: number,
): string {
  return `${MARK_METRIC_LABELS[mark.metric]} mark, ${formatMarkRange(mark.fromDate, mark.toDate, referenceYear)}`;
}
