import { describe, expect, it } from 'vitest';
import { trendWeightKg } from './analysis.js';

const day = (n: number) => `2026-03-${String(n).padStart(2, '0')}`;

// REFERENCES.md §8: Walker J, The Hacker's Diet (fourmilab.ch), Tₙ = Tₙ₋₁ + 0.1·(Wₙ − Tₙ₋₁), T₁ = W₁
// (basis P). The invented dataset and its EWMA row were cross-checked against
// @stdlib/stats-incr-ewmean increwmean(0.1).
const INVENTED_KG = [80.0, 80.4, 79.6, 79.9, 79.5, 79.8, 79.2, 79.4, 79.0, 79.3, 78.8, 79.1, 78.6, 78.9];
const EWMA_ROW = [
  80.0, 80.04, 79.996, 79.9864, 79.93776, 79.923984, 79.851586, 79.806427, 79.725784, 79.683206, 79.594885,
  79.545397, 79.450857, 79.395771,
];

describe("trendWeightKg (EWMA α 0.1, Walker, The Hacker's Diet)", () => {
  it('matches the EWMA row of the invented dataset on every day (REFERENCES.md §8)', () => {
    INVENTED_KG.forEach((_, i) => {
      const upTo = INVENTED_KG.slice(0, i + 1).map((kg, j) => ({ date: day(j + 1), kg }));
      expect(trendWeightKg(upTo), `day ${i + 1}`).toBeCloseTo(EWMA_ROW[i]!, 6);
    });
  });

  it('gives 79.395771 on day 14 (REFERENCES.md §8)', () => {
    const all = INVENTED_KG.map((kg, j) => ({ date: day(j + 1), kg }));
    expect(trendWeightKg(all)).toBeCloseTo(79.395771, 6);
  });

  it("reproduces Walker's worked step unrounded: trend 173.2, weigh-in 171.5 → 173.03 (REFERENCES.md §8)", () => {
    // T₁ = W₁ makes the first weigh-in the previous trend.
    expect(
      trendWeightKg([
        { date: day(1), kg: 173.2 },
        { date: day(2), kg: 171.5 },
      ]),
    ).toBeCloseTo(173.03, 6);
  });

  it('takes the weigh-ins in date order whatever order they come in', () => {
    const all = INVENTED_KG.map((kg, j) => ({ date: day(j + 1), kg })).reverse();
    expect(trendWeightKg(all)).toBeCloseTo(79.395771, 6);
  });

  it('is the weigh-in itself with only one (T₁ = W₁), and null with none', () => {
    expect(trendWeightKg([{ date: day(1), kg: 71.3 }])).toBe(71.3);
    expect(trendWeightKg([])).toBeNull();
  });
});
