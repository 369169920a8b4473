import { DISPLAY_LOCALE, formatNumber } from '../../../lib/format';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/**
 * How long ago an instant was, in the coarse words a queue needs: "just now", "12 min ago",
 * "2 h ago", "3 days ago"; from four weeks on, the date itself ("2 Dec 2026"). A time a little in
 * the future (clock skew between server and browser) reads as "just now".
 */
export function formatTimeSince(iso: string, now: number = Date.now()): string {
  const then = new Date(iso).getTime();
  if (Number.isNaN(then)) return iso;
  const elapsed = now - then;
  if (elapsed < MINUTE) return 'just now';
  if (elapsed < HOUR) return `${formatNumber(Math.floor(elapsed / MINUTE))} min ago`;
  if (elapsed < DAY) return `${formatNumber(Math.floor(elapsed / HOUR))} h ago`;
  const days = Math.floor(elapsed / DAY);
  if (days < 28) return `${formatNumber(days)} ${days === 1 ? 'day' : 'days'} ago`;
  return new Intl.DateTimeFormat(DISPLAY_LOCALE, { day: 'numeric', month: 'short', year: 'numeric' }).format(
    new Date(then),
  );
}
