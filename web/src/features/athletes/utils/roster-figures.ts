import type { FlagKind, JudgedState, RosterFigures } from '@driftmark/shared';
import { daysBetween, formatNumber } from '../../../lib/format';

/** U+2212, the minus sign typography uses for figures (a hyphen is shorter and sits lower). */
export const MINUS = '\u2212';

/** A figure with its sign always shown: "+0.3", "−0.8", "0". */
export function formatSigned(value: number, digits = 1): string {
  const text = formatNumber(Math.abs(value), digits, digits);
  if (Number(text.replace(/,/g, '')) === 0) return formatNumber(0, digits, digits);
  return `${value < 0 ? MINUS : '+'}${text}`;
}

/**
 * Where a 14-day rate stands against the phase's guidance band, in the drift states' words: inside
 * the band is on plan; outside it by up to half the band's width is drifting; further is off plan.
 * This mirrors the drift rule for daily targets (within tolerance, up to twice it, beyond) with the
 * band's half-width as the tolerance around its middle — our own convention, common practice, no
 * source. The rate is judged as shown (one decimal), so "−0.5" never reads as outside −1 … −0.5.
 */
export function rateStanding(
  ratePercentPerWeek: number,
  band: NonNullable<RosterFigures['rateBand']>,
): JudgedState {
  // Half away from zero, as Intl rounds the figure on screen.
  const rate = (Math.sign(ratePercentPerWeek) * Math.round(Math.abs(ratePercentPerWeek) * 10)) / 10;
  const low = Math.min(band.minPct, band.maxPct);
  const high = Math.max(band.minPct, band.maxPct);
  if (rate >= low - 1e-9 && rate <= high + 1e-9) return 'on_plan';
  const outside = rate < low ? low - rate : rate - high;
  return outside <= (high - low) / 2 + 1e-9 ? 'drifting' : 'off_plan';
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
