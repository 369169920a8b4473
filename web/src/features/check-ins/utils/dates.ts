const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** True for a real calendar date written YYYY-MM-DD. */
export function isIsoDate(text: string | null | undefined): text is string {
  const m = ISO_DATE.exec(text ?? '');
  if (!m) return false;
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  return d.toISOString().slice(0, 10) === text;
}

/** A calendar date moved by whole days (no time zone involved: dates are labels, not instants). */
export function addDays(isoDate: string, days: number): string {
  const m = ISO_DATE.exec(isoDate);
  if (!m) throw new RangeError(`Not a YYYY-MM-DD date: ${isoDate}`);
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]) + days));
  return d.toISOString().slice(0, 10);
}

/** The clock time "HH:MM" (24 h) in `timeZone` at `now`. */
export function clockIn(timeZone: string, now: Date = new Date()): string {
  const parts = new Intl.DateTimeFormat('en-GB', {
    timeZone,
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(now);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '00';
  return `${get('hour')}:${get('minute')}`;
}

/**
 * The pages of the history list: the newest `pageDays` days up to `to`, then the block before it,
 * and so on (inclusive ranges, newest first).
 */
export function historyPageRange(to: string, page: number, pageDays: number): { from: string; to: string } {
  const end = addDays(to, -page * pageDays);
  return { from: addDays(end, -(pageDays - 1)), to: end };
}
