import type { MarkView, TrendDay, TrendView } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  barAxis,
  barPoints,
  clampPin,
  countdownRuns,
  fluidPoints,
  futurePadDays,
  marksOnChart,
  numberMarks,
  niceTicks,
  weightAxis,
  weightPoints,
} from './chart-data';
import { eachDay } from './dates';

function day(date: string, extra: Partial<TrendDay> = {}): TrendDay {
  return {
    date,
    weightKg: null,
    trendKg: null,
    mean7Kg: null,
    actuals: {
      energyKcal: null,
      proteinG: null,
      carbohydrateG: null,
      fatG: null,
      fluidMl: null,
      sodiumMg: null,
      steps: null,
      cardioMinutes: null,
    },
    targets: null,
    drift: [],
    breach: null,
    countdown: null,
    ...extra,
  };
}

function view(days: TrendDay[], extra: Partial<TrendView> = {}): TrendView {
  return {
    athleteId: '00000000-0000-4000-8000-000000000001',
    from: days[0]!.date,
    to: days[days.length - 1]!.date,
    today: days[days.length - 1]!.date,
    eventDate: null,
    days,
    rate: null,
    projection: null,
    adherence: [],
    maintenance: null,
    flags: [],
    ...extra,
  };
}

const dates = eachDay('2026-05-01', '2026-05-14');

describe('weightPoints', () => {
  it('converts to the viewer unit and leaves unweighed days empty', () => {
    const v = view(
      dates.map((d, i) => day(d, i === 1 ? { weightKg: 70, trendKg: 70 } : { trendKg: i > 1 ? 70 : null })),
    );
    const pts = weightPoints(v, 'lb');
    expect(pts).toHaveLength(14);
    expect(pts[0]!.weight).toBeNull();
    expect(pts[1]!.weight).toBeCloseTo(154.32, 2);
    expect(pts[2]!.weight).toBeNull();
    expect(pts[2]!.trend).toBeCloseTo(154.32, 2);
  });

  it('draws the guidance wedge from the first trend value at the band rates (Helms 2014 dieting band)', () => {
    const v = view(
      dates.map((d) => day(d, { weightKg: 80, trendKg: 80 })),
      {
        rate: {
          kgPerWeek: -0.6,
          percentPerWeek: -0.75,
          r2: 0.8,
          points: 14,
          from: dates[0]!,
          to: dates[13]!,
          band: { minPct: -1, maxPct: -0.5, label: 'Dieting', source: 'Helms 2014' },
          bandNote: null,
          paused: false,
          verdict: { pace: 'inside', state: 'on_plan' },
        },
      },
    );
    const pts = weightPoints(v, 'kg');
    expect(pts[0]!.band).toEqual([80, 80]);
    // One week on: 80 × (1 − 1 %) = 79.2 and 80 × (1 − 0.5 %) = 79.6.
    expect(pts[7]!.band).toEqual([79.2, 79.6]);
  });

  it('pads to a near event and carries the projection and its interval there', () => {
    const v = view(
      dates.map((d) => day(d, { weightKg: 80, trendKg: 80 })),
      {
        eventDate: '2026-05-24',
        projection: { date: '2026-05-24', kg: 79, lowKg: 78, highKg: 80, level: 0.8 },
      },
    );
    expect(futurePadDays(v)).toBe(10);
    const pts = weightPoints(v, 'kg');
    expect(pts).toHaveLength(24);
    expect(pts[23]!.future).toBe(true);
    expect(pts[13]!.projection).toBe(80);
    expect(pts[13]!.cone).toEqual([80, 80]);
    expect(pts[18]!.projection).toBe(79.5);
    expect(pts[23]!.cone).toEqual([78, 80]);
    expect(pts[12]!.projection).toBeNull();
  });

  it('leaves a far event off the chart', () => {
    const v = view(
      dates.map((d) => day(d)),
      { eventDate: '2026-09-01' },
    );
    expect(futurePadDays(v)).toBe(0);
    expect(weightPoints(v, 'kg')).toHaveLength(14);
  });

  it('finds a domain around every value and the limit', () => {
    const v = view(dates.map((d) => day(d, { weightKg: 70.2, trendKg: 70.4 })));
    expect(weightAxis(weightPoints(v, 'kg'), 68)).toEqual({ domain: [67, 71], ticks: [67, 68, 69, 70, 71] });
    expect(weightAxis([], null).domain).toEqual([0, 1]);
  });
});

describe('barPoints', () => {
  it('reads actual and target from the drift entry and marks cut-off breaches', () => {
    const d = day('2026-05-01', {
      actuals: { ...day('x').actuals, fluidMl: 3200 },
      drift: [
        {
          metric: 'water',
          target: 4000,
          actual: 3200,
          diff: -800,
          relative: -0.2,
          tolerance: 200,
          kind: 'range',
          onPlan: { min: 3800, max: 4200 },
          state: 'off_plan',
        },
      ],
      breach: { cutoff: '20:00', allowanceMl: 250, afterCutoffMl: 600, excessMl: 350 },
    });
    const [p] = fluidPoints([d], 'ml');
    expect(p).toMatchObject({ actual: 3200, target: 4000, state: 'off_plan', breachMl: 350, breachY: 3200 });
  });

  it('puts a not-logged glyph on the baseline and nothing on a day without target or entry', () => {
    const notLogged = day('2026-05-02', {
      drift: [
        {
          metric: 'energy',
          target: 2400,
          actual: null,
          diff: null,
          relative: null,
          tolerance: 120,
          kind: 'range',
          onPlan: { min: 2280, max: 2520 },
          state: 'not_logged',
        },
      ],
    });
    const [a, b] = barPoints([notLogged, day('2026-05-03')], 'energy');
    expect(a).toMatchObject({ actual: null, target: 2400, state: 'not_logged', glyphY: 0 });
    expect(b).toMatchObject({ actual: null, target: null, state: null, glyphY: null });
  });

  it('rounds the axis up past the highest bar or target', () => {
    const axis = barAxis([
      { date: 'x', actual: 2300, target: 2400, state: null, glyphY: 0, breachMl: null, breachY: null },
    ]);
    expect(axis).toEqual({ domain: [0, 3000], ticks: [0, 1000, 2000, 3000] });
    expect(barAxis([]).domain).toEqual([0, 1]);
  });

  it('spaces ticks evenly on round steps', () => {
    expect(niceTicks(77.2, 82.4, 6)).toEqual([77, 78, 79, 80, 81, 82, 83]);
    expect(niceTicks(0, 5645, 5)).toEqual([0, 2000, 4000, 6000]);
    expect(niceTicks(0, 4600, 5)).toEqual([0, 1000, 2000, 3000, 4000, 5000]);
    expect(niceTicks(68.9, 69.6, 6)).toEqual([68.8, 69, 69.2, 69.4, 69.6]);
  });
});

describe('countdownRuns', () => {
  it('joins consecutive countdown days', () => {
    const days = dates
      .slice(0, 6)
      .map((d, i) =>
        day(d, i === 1 || i === 2 || i === 4 ? { countdown: { offset: -i, dayLabel: `E-${6 - i}` } } : {}),
      );
    expect(countdownRuns(days)).toEqual([
      { from: '2026-05-02', to: '2026-05-03', firstLabel: 'E-5', lastLabel: 'E-4' },
      { from: '2026-05-05', to: '2026-05-05', firstLabel: 'E-2', lastLabel: 'E-2' },
    ]);
  });
});

describe('marks', () => {
  const mark = (id: string, metric: MarkView['metric'], fromDate: string, toDate: string): MarkView => ({
    id,
    athleteId: 'a',
    author: { id: 'c', name: 'Coach', role: 'coach' },
    metric,
    fromDate,
    toDate,
    note: 'n',
    createdAt: '2026-05-10T10:00:00.000Z',
    updatedAt: '2026-05-10T10:00:00.000Z',
    replies: [],
    unread: false,
    readByOtherAt: null,
  });

  it('numbers marks in date order across charts and clips them to the range', () => {
    const marks = [
      mark('b', 'weight', '2026-05-10', '2026-05-20'),
      mark('a', 'general', '2026-04-20', '2026-05-02'),
      mark('c', 'fluids', '2026-05-03', '2026-05-03'),
      mark('d', 'weight', '2026-03-01', '2026-03-02'),
    ];
    const on = marksOnChart(marks, 'weight', '2026-05-01', '2026-05-14');
    expect(on.map((m) => [m.mark.id, m.number, m.x1, m.x2])).toEqual([
      ['a', 1, '2026-05-01', '2026-05-02'],
      ['b', 3, '2026-05-10', '2026-05-14'],
    ]);
    expect(
      marksOnChart(marks, 'fluids', '2026-05-01', '2026-05-14').map((m) => [m.mark.id, m.number]),
    ).toEqual([['c', 2]]);
    expect([...numberMarks(marks, '2026-05-01', '2026-05-14').keys()]).toEqual(['a', 'c', 'b']);
  });

  it('drops a pin a row when it would sit on the previous one', () => {
    const close = [
      mark('a', 'weight', '2026-05-03', '2026-05-03'),
      mark('b', 'weight', '2026-05-03', '2026-05-05'),
    ];
    expect(marksOnChart(close, 'weight', '2026-05-01', '2026-05-14').map((m) => m.row)).toEqual([0, 1]);
  });

  it('orders a dragged range and keeps it inside the data', () => {
    expect(clampPin('2026-05-09', '2026-05-03', '2026-05-01', '2026-05-14')).toEqual({
      fromDate: '2026-05-03',
      toDate: '2026-05-09',
    });
    expect(clampPin('2026-05-12', '2026-05-20', '2026-05-01', '2026-05-14')).toEqual({
      fromDate: '2026-05-12',
      toDate: '2026-05-14',
    });
    expect(clampPin('2026-05-15', '2026-05-20', '2026-05-01', '2026-05-14')).toBeNull();
  });
});
