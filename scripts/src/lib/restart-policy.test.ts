import { describe, expect, it } from 'vitest';
import { API_RESTART, nextRestart } from './restart-policy.js';

describe('nextRestart', () => {
  const shortRun = API_RESTART.healthyAfterMs - 1;

  it('doubles the wait after each short-lived run: 1, 2, 4, 8, 16 s, then stays at 30 s', () => {
    const delays: number[] = [];
    let streak = 0;
    for (let i = 0; i < 8; i++) {
      const next = nextRestart(streak, shortRun);
      delays.push(next.delayMs);
      streak = next.streak;
    }
    expect(delays).toEqual([1000, 2000, 4000, 8000, 16_000, 30_000, 30_000, 30_000]);
    expect(streak).toBe(8);
  });

  it('starts over at 1 s after a run that lasted long enough to count as healthy', () => {
    expect(nextRestart(6, API_RESTART.healthyAfterMs)).toEqual({ delayMs: 1000, streak: 1 });
    expect(nextRestart(6, shortRun)).toEqual({ delayMs: 30_000, streak: 7 });
  });

  it('stays at the cap however long the streak', () => {
    expect(nextRestart(5000, 0).delayMs).toBe(30_000);
  });
});
