import type { AdherenceWeekInRange } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { adherenceGrid, latestWeek, signed } from './figures';

describe('signed', () => {
  it('uses a true minus and never prints −0.0', () => {
    expect(signed(-0.84)).toBe('\u22120.8');
    expect(signed(0.25, 2)).toBe('+0.25');
    expect(signed(-0.01)).toBe('0.0');
  });
});

describe('adherence', () => {
  const week = (
    weekStart: string,
    metric: AdherenceWeekInRange['metric'],
    onPlanDays: number,
  ): AdherenceWeekInRange => ({
    weekStart,
    from: weekStart,
    to: weekStart.replace(/\d\d$/, (d) => String(Number(d) + 6).padStart(2, '0')),
    days: 7,
    partial: false,
    metric,
    targetDays: 7,
    loggedDays: 6,
    onPlanDays,
    adherence: onPlanDays / 6,
    loggedShare: 6 / 7,
  });
  const rows = [
    week('2026-05-04', 'energy', 5),
    week('2026-05-11', 'energy', 3),
    week('2026-05-11', 'water', 6),
  ];

  it('picks the newest week', () => {
    expect(latestWeek(rows).map((w) => [w.metric, w.onPlanDays])).toEqual([
      ['energy', 3],
      ['water', 6],
    ]);
    expect(latestWeek([])).toEqual([]);
  });

  it('lays weeks out newest first with the metrics that had targets', () => {
    const grid = adherenceGrid(rows, ['energy', 'protein', 'water']);
    expect(grid.weeks.map((w) => [w.weekStart, w.from, w.to])).toEqual([
      ['2026-05-11', '2026-05-11', '2026-05-17'],
      ['2026-05-04', '2026-05-04', '2026-05-10'],
    ]);
    expect(grid.metrics).toEqual(['energy', 'water']);
    expect(grid.at('2026-05-04', 'water')).toBeNull();
    expect(grid.at('2026-05-04', 'energy')?.onPlanDays).toBe(5);
  });
});
