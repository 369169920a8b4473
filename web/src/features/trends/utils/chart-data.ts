import {
  volumeFromMl,
  weightFromKg,
  type DriftMetric,
  type DriftState,
  type MarkMetric,
  type MarkView,
  type TrendDay,
  type TrendView,
  type VolumeUnit,
  type WeightUnit,
} from '@driftmark/shared';
import { addDays, dayDiff, eachDay } from './dates';

/** Which charts exist; each pins marks of one metric. */
export const CHART_METRICS = ['weight', 'fluids', 'energy', 'macros'] as const;
export type ChartMetric = (typeof CHART_METRICS)[number];

/** The marks a chart shows: its own metric; general notes sit on the weight chart. */
export const MARKS_ON_CHART: Record<ChartMetric, readonly MarkMetric[]> = {
  weight: ['weight', 'general'],
  fluids: ['fluids'],
  energy: ['energy'],
  macros: ['macros'],
};

/** What a chart asks for when the coach clicks a day or drags across days. */
export interface PinRequest {
  metric: MarkMetric;
  fromDate: string;
  toDate: string;
}

// Weight -------------------------------------------------------------------------------------------

export interface WeightPoint {
  date: string;
  /** A day past the range, shown only to carry the guidance and the projection to the event. */
  future: boolean;
  /** Values in the viewer's unit. */
  weight: number | null;
  trend: number | null;
  /** The guidance wedge [low, high]. */
  band: [number, number] | null;
  /** The rate's line carried to the event date, from the last trend value. */
  projection: number | null;
  /** The projection's 80 % interval, widening from the last trend value to [low, high] on the event date. */
  cone: [number, number] | null;
}

/**
 * Days shown after the range's end so a near event (and the projection to it) fits on the chart:
 * up to half the range, at least two weeks, at most 60 days (our display rule, no source).
 */
export function futurePadDays(view: Pick<TrendView, 'from' | 'to' | 'eventDate'>): number {
  if (view.eventDate === null || view.eventDate <= view.to) return 0;
  const ahead = dayDiff(view.to, view.eventDate);
  const rangeDays = dayDiff(view.from, view.to) + 1;
  const limit = Math.min(60, Math.max(14, Math.round(rangeDays / 2)));
  return ahead <= limit ? ahead : 0;
}

const round = (v: number, digits = 2) => Math.round(v * 10 ** digits) / 10 ** digits;

/** The chart's rows: the range's days (plus padding to a near event), weights in the viewer's unit. */
export function weightPoints(view: TrendView, unit: WeightUnit): WeightPoint[] {
  const conv = (kg: number) => round(weightFromKg(kg, unit));
  const pad = futurePadDays(view);
  const end = pad > 0 ? addDays(view.to, pad) : view.to;
  const byDate = new Map(view.days.map((d) => [d.date, d]));

  // The guidance wedge starts at the range's first trend value, at the band's two rates
  // (percent of that weight per week, Helms 2014 for the dieting band).
  const first = view.days.find((d) => d.trendKg !== null);
  const band = view.rate?.band ?? null;

  // The projection starts at the last trend value on or before the rate's last day.
  const rateEnd = view.rate?.to ?? view.to;
  const anchor = [...view.days].reverse().find((d) => d.trendKg !== null && d.date <= rateEnd);
  const proj = view.projection;
  const projection =
    proj && anchor && proj.date > anchor.date && proj.date <= end
      ? { from: anchor.date, start: anchor.trendKg!, ...proj }
      : null;

  return eachDay(view.from, end).map((date) => {
    const day = byDate.get(date);
    let bandValue: [number, number] | null = null;
    if (band && first && date >= first.date) {
      const weeks = dayDiff(first.date, date) / 7;
      const a = first.trendKg! * (1 + (band.minPct / 100) * weeks);
      const b = first.trendKg! * (1 + (band.maxPct / 100) * weeks);
      bandValue = [conv(Math.min(a, b)), conv(Math.max(a, b))];
    }
    let projValue: number | null = null;
    let cone: [number, number] | null = null;
    if (projection && date >= projection.from && date <= projection.date) {
      const f = dayDiff(projection.from, date) / dayDiff(projection.from, projection.date);
      const at = (target: number) => projection.start + (target - projection.start) * f;
      projValue = conv(at(projection.kg));
      cone = [conv(at(projection.lowKg)), conv(at(projection.highKg))];
    }
    return {
      date,
      future: date > view.to,
      weight: day?.weightKg != null ? conv(day.weightKg) : null,
      trend: day?.trendKg != null ? conv(day.trendKg) : null,
      band: bandValue,
      projection: projValue,
      cone,
    };
  });
}

/**
 * Evenly spaced ticks covering [lo, hi]: the smallest step of 1, 2, 2.5 or 5 × 10ⁿ that needs at
 * most `count` intervals, the ends rounded out to whole steps.
 */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo, lo + 1];
  const exponent = Math.floor(Math.log10((hi - lo) / count));
  let step = 10 ** (exponent + 2);
  outer: for (let e = exponent - 1; e <= exponent + 1; e++) {
    for (const f of [1, 2, 2.5, 5]) {
      const s = f * 10 ** e;
      if (Math.ceil(hi / s - 1e-9) - Math.floor(lo / s + 1e-9) <= count) {
        step = s;
        break outer;
      }
    }
  }
  const start = Math.floor(lo / step + 1e-9);
  const end = Math.ceil(hi / step - 1e-9);
  const ticks: number[] = [];
  for (let i = start; i <= end; i++) ticks.push(Math.round(i * step * 1e6) / 1e6);
  return ticks;
}

/** The y-axis around every value drawn (weights, band, cone, the weigh-in limit): domain and ticks. */
export function weightAxis(
  points: WeightPoint[],
  limit: number | null = null,
): { domain: [number, number]; ticks: number[] } {
  const values: number[] = [];
  for (const p of points) {
    if (p.weight !== null) values.push(p.weight);
    if (p.trend !== null) values.push(p.trend);
    if (p.band) values.push(...p.band);
    if (p.cone) values.push(...p.cone);
  }
  if (limit !== null) values.push(limit);
  if (values.length === 0) return { domain: [0, 1], ticks: [0, 1] };
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = Math.max(0.3, (hi - lo) * 0.06);
  const ticks = niceTicks(lo - pad, hi + pad, 6);
  return { domain: [ticks[0]!, ticks[ticks.length - 1]!], ticks };
}

// Bars against targets ----------------------------------------------------------------------------

export interface BarPoint {
  date: string;
  /** In the chart's unit; null when nothing was logged. */
  actual: number | null;
  /** The day's target in the chart's unit; null without one. */
  target: number | null;
  /** The day's drift state for the metric; null without a target. */
  state: DriftState | null;
  /** Where the state glyph sits: the bar's top, or the baseline when nothing was logged. */
  glyphY: number | null;
  /** Fluids only: mL after the cut-off beyond the allowance (> 0), null otherwise. */
  breachMl: number | null;
  breachY: number | null;
}

const ACTUAL_OF: Record<DriftMetric, (d: TrendDay) => number | null> = {
  energy: (d) => d.actuals.energyKcal,
  protein: (d) => d.actuals.proteinG,
  carbohydrate: (d) => d.actuals.carbohydrateG,
  fat: (d) => d.actuals.fatG,
  water: (d) => d.actuals.fluidMl,
  sodium: (d) => d.actuals.sodiumMg,
  steps: (d) => d.actuals.steps,
  cardio: (d) => d.actuals.cardioMinutes,
};

const TARGET_OF: Record<DriftMetric, (d: TrendDay) => number | null> = {
  energy: (d) => d.targets?.energyKcal ?? null,
  protein: (d) => d.targets?.proteinG ?? null,
  carbohydrate: (d) => d.targets?.carbohydrateG ?? null,
  fat: (d) => d.targets?.fatG ?? null,
  water: (d) => d.targets?.waterMl ?? null,
  sodium: (d) => d.targets?.sodiumMg ?? null,
  steps: (d) => d.targets?.steps ?? null,
  cardio: (d) => d.targets?.cardioMinutes ?? null,
};

/** The day's logged value and target of a metric (from the drift entry when there is one). */
export function actualAndTarget(
  day: TrendDay,
  metric: DriftMetric,
): { actual: number | null; target: number | null } {
  const entry = day.drift.find((e) => e.metric === metric);
  if (entry) return { actual: entry.actual, target: entry.target };
  return { actual: ACTUAL_OF[metric](day), target: TARGET_OF[metric](day) };
}

export function driftStateOf(day: TrendDay, metric: DriftMetric): DriftState | null {
  return day.drift.find((e) => e.metric === metric)?.state ?? null;
}

/** One bar per day of a metric against its target, in the chart's unit (`convert` from the API's unit). */
export function barPoints(
  days: TrendDay[],
  metric: DriftMetric,
  convert: (value: number) => number = (v) => v,
): BarPoint[] {
  return days.map((day) => {
    const { actual, target } = actualAndTarget(day, metric);
    const state = driftStateOf(day, metric);
    const a = actual !== null ? round(convert(actual), 1) : null;
    const breach = metric === 'water' && day.breach && day.breach.excessMl > 0 ? day.breach.excessMl : null;
    return {
      date: day.date,
      actual: a,
      target: target !== null ? round(convert(target), 1) : null,
      state,
      glyphY: state !== null || a !== null ? (a ?? 0) : null,
      breachMl: breach,
      breachY: breach !== null ? (a ?? 0) : null,
    };
  });
}

/** Fluids in the viewer's volume unit. */
export function fluidPoints(days: TrendDay[], unit: VolumeUnit): BarPoint[] {
  return barPoints(days, 'water', (ml) => volumeFromMl(ml, unit));
}

/** The y-axis from zero to a little above the highest bar or target: domain and ticks. */
export function barAxis(points: BarPoint[]): { domain: [number, number]; ticks: number[] } {
  let hi = 0;
  for (const p of points) hi = Math.max(hi, p.actual ?? 0, p.target ?? 0);
  if (hi <= 0) return { domain: [0, 1], ticks: [0, 1] };
  const ticks = niceTicks(0, hi * 1.12, 5);
  return { domain: [0, ticks[ticks.length - 1]!], ticks };
}

// Countdown days and marks ------------------------------------------------------------------------

export interface DayRun {
  from: string;
  to: string;
  /** Countdown labels of the first and last day ("E-6", "E-0"). */
  firstLabel: string;
  lastLabel: string;
}

/** Consecutive countdown days, as runs to shade. */
export function countdownRuns(days: TrendDay[]): DayRun[] {
  const runs: DayRun[] = [];
  let current: DayRun | null = null;
  for (const day of days) {
    if (day.countdown) {
      if (current && addDays(current.to, 1) === day.date) {
        current.to = day.date;
        current.lastLabel = day.countdown.dayLabel;
      } else {
        current = {
          from: day.date,
          to: day.date,
          firstLabel: day.countdown.dayLabel,
          lastLabel: day.countdown.dayLabel,
        };
        runs.push(current);
      }
    } else {
      current = null;
    }
  }
  return runs;
}

export interface ChartMark {
  mark: MarkView;
  /** 1, 2, … in date order across every chart of the range (see numberMarks). */
  number: number;
  /** The mark's days clipped to the chart. */
  x1: string;
  x2: string;
  /** 0, or 1 when the pin would sit on top of the previous one (drawn a row lower). */
  row: 0 | 1;
}

/**
 * Numbers for the marks overlapping [from, to], in date order (then creation), counted across all
 * charts so one number means one mark on the page (charts, their lists and the thread list).
 */
export function numberMarks(marks: readonly MarkView[], from: string, to: string): Map<string, number> {
  const inRange = marks
    .filter((m) => m.toDate >= from && m.fromDate <= to)
    .sort((a, b) => a.fromDate.localeCompare(b.fromDate) || a.createdAt.localeCompare(b.createdAt));
  return new Map(inRange.map((m, i) => [m.id, i + 1]));
}

/** The marks a chart shows over [from, to], clipped to the range, with their page-wide numbers. */
export function marksOnChart(
  marks: readonly MarkView[],
  chart: ChartMetric,
  from: string,
  to: string,
): ChartMark[] {
  const metrics = MARKS_ON_CHART[chart];
  const numbers = numberMarks(marks, from, to);
  // Pins closer than about a thirtieth of the range would overlap: every other one drops a row.
  const near = Math.max(1, Math.ceil((dayDiff(from, to) + 1) / 30));
  const shown = marks
    .filter((m) => metrics.includes(m.metric) && numbers.has(m.id))
    .map((mark) => ({
      mark,
      number: numbers.get(mark.id)!,
      x1: mark.fromDate < from ? from : mark.fromDate,
      x2: mark.toDate > to ? to : mark.toDate,
      row: 0 as 0 | 1,
    }))
    .sort((a, b) => a.number - b.number);
  for (let i = 1; i < shown.length; i++) {
    const prev = shown[i - 1]!;
    const cur = shown[i]!;
    if (prev.row === 0 && Math.abs(dayDiff(prev.x1, cur.x1)) < near) cur.row = 1;
  }
  return shown;
}

/** A pin's two days in order and inside the data's range, or null when both fall outside. */
export function clampPin(
  a: string,
  b: string,
  from: string,
  to: string,
): { fromDate: string; toDate: string } | null {
  let lo = a <= b ? a : b;
  let hi = a <= b ? b : a;
  if (hi < from || lo > to) return null;
  if (lo < from) lo = from;
  if (hi > to) hi = to;
  return { fromDate: lo, toDate: hi };
}
