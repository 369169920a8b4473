/** Smoothing of the exponentially smoothed moving average: 10 % (Walker, The Hacker's Diet). */
export const TREND_ALPHA = 0.1;

/**
 * The trend weight after the last weigh-in: Tₙ = Tₙ₋₁ + α·(Wₙ − Tₙ₋₁) with T₁ = W₁ and α = 0.1
 * (Walker J, The Hacker's Diet, fourmilab.ch: "exponentially smoothed moving average with 10 %
 * smoothing"). Weigh-ins are taken in date order, one step each (a missed day adds no step); the
 * increments are not rounded to 0.1 as Walker does by hand. Null without weigh-ins.
 */
export function trendWeightKg(weights: readonly { date: string; kg: number }[]): number | null {
  const ordered = [...weights].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  let trend: number | null = null;
  for (const { kg } of ordered) trend = trend === null ? kg : trend + TREND_ALPHA * (kg - trend);
  return trend;
}
