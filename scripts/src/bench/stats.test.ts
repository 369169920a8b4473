import { describe, expect, it } from 'vitest';
import { median, percentile } from './stats.js';

describe('bench statistics', () => {
  // The nearest-rank worked example of Wikipedia's "Percentile" article (values from memory):
  // 15, 20, 35, 40, 50 → p30 = 20, p40 = 20, p50 = 35, p100 = 50.
  it('takes the nearest-rank percentile', () => {
    const s = [40, 15, 50, 35, 20];
    expect(percentile(s, 30)).toBe(20);
    expect(percentile(s, 40)).toBe(20);
    expect(percentile(s, 50)).toBe(35);
    expect(percentile(s, 100)).toBe(50);
    expect(percentile([], 50)).toBeNaN();
  });

  it('takes the median of odd and even counts', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
  });
});
