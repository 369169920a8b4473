/**
 * Calendar dates (YYYY-MM-DD) and the clock in a time zone: the one implementation every part of
 * the product uses (api, web, seed and shared rules). A date is a label, not an instant: date
 * arithmetic runs on UTC midnights so no time zone or daylight-saving change can shift it; "today"
 * and the clock time are read in an IANA zone through Intl (the tz database the runtime ships).
 */

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const DAY_MS = 86_400_000;

/**
 * True for a real calendar date written YYYY-MM-DD ("2026-02-30" is not one), from the year 1000
 * on: nothing here predates it, and PostgreSQL has no year 0.
 */
export function isIsoDate(text: string | null | undefined): text is string {
  const m = ISO_DATE.exec(text ?? '');
  if (!m || Number(m[1]) < 1000) return false;
  return utcMidnight(text!).toISOString().slice(0, 10) === text;
}

/** A calendar date as its UTC midnight (calendar arithmetic only). */
export function utcMidnight(date: string): Date {
  const m = ISO_DATE.exec(date);
  if (!m) throw new RangeError(`Not a YYYY-MM-DD date: ${date}`);
  const d = new Date(0);
  d.setUTCFullYear(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
  return d;
}

/** `date` moved by `days` calendar days (negative goes back). */
export function addDays(date: string, days: number): string {
  const d = utcMidnight(date);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/** `date` moved by whole years; 29 February becomes 28 February in a common year. */
export function addYears(date: string, years: number): string {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const target = new Date(0);
  target.setUTCFullYear(y + years, m - 1, 1);
  const monthEnd = new Date(0);
  monthEnd.setUTCFullYear(y + years, m, 0);
  target.setUTCDate(Math.min(d, monthEnd.getUTCDate()));
  return target.toISOString().slice(0, 10);
}

/** Whole calendar days from `from` to `to`; negative when `to` is earlier. */
export function daysBetween(from: string, to: string): number {
  return Math.round((utcMidnight(to).getTime() - utcMidnight(from).getTime()) / DAY_MS);
}

/** Every date from `from` to `to`, both included (empty when `to` is earlier). */
export function eachDay(from: string, to: string): string[] {
  const out: string[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) out.push(d);
  return out;
}

/** Day of the week of a date, 0 = Sunday … 6 = Saturday. */
export function weekdayNumber(date: string): number {
  return utcMidnight(date).getUTCDay();
}

const formatters = new Map<string, Intl.DateTimeFormat>();

/** The wall-clock fields of an instant in an IANA time zone (one cached formatter per zone). */
export function wallClock(at: Date | number, timeZone: string) {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    formatters.set(timeZone, f);
  }
  const parts = Object.fromEntries(f.formatToParts(at).map((p) => [p.type, p.value]));
  return {
    year: Number(parts.year),
    month: Number(parts.month),
    day: Number(parts.day),
    hour: Number(parts.hour),
    minute: Number(parts.minute),
    second: Number(parts.second),
  };
}

const pad = (n: number, width = 2) => String(n).padStart(width, '0');

/** The calendar date a clock in `timeZone` shows at `now`. */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  const w = wallClock(now, timeZone);
  return `${pad(w.year, 4)}-${pad(w.month)}-${pad(w.day)}`;
}

/** The clock time "HH:MM" (24 h) in `timeZone` at `now`. */
export function clockIn(timeZone: string, now: Date = new Date()): string {
  const w = wallClock(now, timeZone);
  return `${pad(w.hour)}:${pad(w.minute)}`;
}

/**
 * The final week before an event: from 7 days out to the event day (E-7 … E-0), where energy,
 * water and sodium are changed on purpose and the product shows its cautions (common practice, no
 * source). `daysToEvent` is counted in the athlete's own calendar; null (no event) is never in it.
 */
export const FINAL_WEEK_DAYS = 7;
export function inFinalWeek(daysToEvent: number | null | undefined): boolean {
  return (
    daysToEvent !== null && daysToEvent !== undefined && daysToEvent >= 0 && daysToEvent <= FINAL_WEEK_DAYS
  );
}
