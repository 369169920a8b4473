import { utcMidnight } from '../calendar.js';
import type { Weekday } from '../schemas/plans.js';

/** One Intl.NumberFormat per digit setting: building one costs far more than formatting with it. */
const formatters = new Map<string, Intl.NumberFormat>();
function numberFormat(min: number, max: number): Intl.NumberFormat {
  const key = `${min}:${max}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { maximumFractionDigits: max, minimumFractionDigits: min });
    formatters.set(key, f);
  }
  return f;
}

/** Plain-words number formatting for messages: thousands separated by commas ("3,000"). */
export function fmt(n: number, maxFractionDigits = 0): string {
  return numberFormat(0, maxFractionDigits).format(n);
}

/** The same with a fixed number of decimals ("1.10"). */
export function fmtFixed(n: number, digits: number): string {
  return numberFormat(digits, digits).format(n);
}

const WEEKDAY_INDEX: Weekday[] = ['sun', 'mon', 'tue', 'wed', 'thu', 'fri', 'sat'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const DAY_NAMES: Record<Weekday, string> = {
  mon: 'Mon',
  tue: 'Tue',
  wed: 'Wed',
  thu: 'Thu',
  fri: 'Fri',
  sat: 'Sat',
  sun: 'Sun',
};

/** A calendar date as a UTC midnight instant (calendar arithmetic only, no time zone involved). */
export const utcDate = utcMidnight;

export function weekdayIndex(date: string): Weekday {
  return WEEKDAY_INDEX[utcDate(date).getUTCDay()] as Weekday;
}

// Calendar arithmetic lives in ../calendar.ts; the plan rules import it from here too.
export { addDays, daysBetween } from '../calendar.js';

/** "Fri 4 Dec". */
export function fmtDate(date: string): string {
  const d = utcDate(date);
  return `${DAY_NAMES[weekdayIndex(date)]} ${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]}`;
}

/** "A, B and C". */
export function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** A deep copy of plain JSON data (plan contents are JSON). */
export function cloneJson<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
