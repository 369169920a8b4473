import type { FlagKind } from '@driftmark/shared';
import { daysBetween, formatNumber } from '../../../lib/format';

/** U+2212, the minus sign typography uses for figures (a hyphen is shorter and sits lower). */
export const MINUS = '\u2212';

/** A figure with its sign always shown: "+0.3", "−0.8", "0". */
export function formatSigned(value: number, digits = 1): string {
  const text = formatNumber(Math.abs(value), digits, digits);
  if (Number(text.replace(/,/g, '')) === 0) return formatNumber(0, digits, digits);
  return `${value < 0 ? MINUS : '+'}${text}`;
}

/** "Today", "Yesterday", "3 days ago" from a calendar date and the reader's today (both YYYY-MM-DD). */
export function formatDaysAgo(date: string, today: string): string {
  const days = daysBetween(date, today);
  if (days <= 0) return 'Today';
  if (days === 1) return 'Yesterday';
  return `${formatNumber(days)} days ago`;
}

/** Short names for the safety flags in the roster (the athlete page gives the full sentences). */
export const FLAG_LABELS: Record<FlagKind, string> = {
  acute_drop: 'Rapid drop',
  rate_beyond: 'Fast rate',
  rate_far_beyond: 'Very fast rate',
  symptom: 'Symptom',
  missed_weigh_ins: 'Missed weigh-ins',
};
