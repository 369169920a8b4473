import type { JudgedState } from '../vocabulary.js';

/** Where a rate runs against its band: inside, faster or slower than it, or outside a band around zero. */
export type RatePace = 'inside' | 'faster' | 'slower' | 'outside';

/** The 14-day rate judged against the phase's guidance band: what the roster and trend pages show. */
export interface RateVerdict {
  pace: RatePace;
  state: JudgedState;
}

/**
 * The rate against its guidance band (%/week, negative = loss), judged at the one decimal the
 * screens show, so "−0.5" never reads as outside −1 … −0.5:
 * - state: inside the band (edges included) is on plan; outside it by up to half the band's width is
 *   drifting; further is off plan — the drift rule for daily targets (within the tolerance, up to
 *   twice it, beyond) with the band's half-width as the tolerance around its middle (our own
 *   convention: common practice, no source);
 * - pace: "faster" beyond the band's far end (losing faster than a loss band, gaining faster than a
 *   gain band), "slower" short of it, "outside" for a band around zero.
 */
export function rateVerdict(percentPerWeek: number, band: { minPct: number; maxPct: number }): RateVerdict {
  // Half away from zero, as Intl rounds the figure on screen.
  const rate = (Math.sign(percentPerWeek) * Math.round(Math.abs(percentPerWeek) * 10)) / 10;
  const lo = Math.min(band.minPct, band.maxPct);
  const hi = Math.max(band.minPct, band.maxPct);
  const eps = 1e-9;
  if (rate >= lo - eps && rate <= hi + eps) return { pace: 'inside', state: 'on_plan' };
  const below = rate < lo;
  const outside = below ? lo - rate : rate - hi;
  const state: JudgedState = outside <= (hi - lo) / 2 + eps ? 'drifting' : 'off_plan';
  const pace: RatePace =
    hi <= 0 ? (below ? 'faster' : 'slower') : lo >= 0 ? (below ? 'slower' : 'faster') : 'outside';
  return { pace, state };
}
