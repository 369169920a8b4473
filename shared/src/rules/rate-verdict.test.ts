import { describe, expect, it } from 'vitest';
import { rateVerdict } from './rate-verdict.js';

// The band is Helms 2014's −1 … −0.5 %/week for dieting (JISSN 11:20); the drifting margin (half the
// band's width) is our own convention: common practice, no source.
describe('rateVerdict against the dieting band −1 … −0.5 %/week (Helms 2014)', () => {
  const band = { minPct: -1, maxPct: -0.5 };

  it('is on plan inside the band, edges included, judged at the one decimal shown', () => {
    for (const r of [-0.8, -1, -0.5, -0.46])
      expect(rateVerdict(r, band)).toEqual({ pace: 'inside', state: 'on_plan' });
  });

  it('drifts when outside by up to half the band width (0.25 %/week here), faster or slower', () => {
    expect(rateVerdict(-1.2, band)).toEqual({ pace: 'faster', state: 'drifting' });
    expect(rateVerdict(-0.3, band)).toEqual({ pace: 'slower', state: 'drifting' });
    expect(rateVerdict(-0.25, band)).toEqual({ pace: 'slower', state: 'drifting' });
  });

  it('is off plan further out, on either side', () => {
    expect(rateVerdict(-1.4, band)).toEqual({ pace: 'faster', state: 'off_plan' });
    expect(rateVerdict(0, band)).toEqual({ pace: 'slower', state: 'off_plan' });
    expect(rateVerdict(0.4, band)).toEqual({ pace: 'slower', state: 'off_plan' });
  });

  it('accepts a band given high to low', () => {
    expect(rateVerdict(-0.8, { minPct: -0.5, maxPct: -1 }).state).toBe('on_plan');
  });

  it('reads a gain band and a band around zero the same way', () => {
    expect(rateVerdict(0.6, { minPct: 0.25, maxPct: 0.5 })).toEqual({ pace: 'faster', state: 'drifting' });
    expect(rateVerdict(0.2, { minPct: 0.25, maxPct: 0.5 })).toEqual({ pace: 'slower', state: 'drifting' });
    expect(rateVerdict(0.1, { minPct: 0.25, maxPct: 0.5 })).toEqual({ pace: 'slower', state: 'off_plan' });
    expect(rateVerdict(0.4, { minPct: -0.25, maxPct: 0.25 })).toEqual({ pace: 'outside', state: 'drifting' });
  });
});
