import {
  adherenceOf,
  DRIFT_METRIC_LABELS,
  DRIFT_METRICS,
  DRIFT_STATE_LABELS,
  type DayView,
  type DriftEntry,
  type DriftMetric,
  type DriftState,
  type ReviewQueueItem,
  type RosterRow,
  type TrendView,
  type WeeklyCheckInView,
} from '@driftmark/shared';
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, localDate } from '../../api/src/seed/calendar.js';
import { DEMO_ATHLETES, DEMO_OWNER_EMAIL, DEMO_PASSWORD } from '../../api/src/seed/demo-team.js';
import { seedDemo } from '../../api/src/seed/seed-demo.js';
import { newId } from './check-ins-helpers.js';
import { buildTestApp, signedIn, type TestApp } from './setup/app.js';
import { readTrend } from './trend-helpers.js';

/**
 * One judgement: every demo athlete's last 28 days read the same verdict per metric in the day
 * view, the trend rows, the CSV export, the roster's adherence, the review queue's reasons and the
 * weekly figures; the day in progress is "so far" everywhere and counted nowhere.
 *
 * The clock is pinned at 10:00 UTC: mid-morning in Madrid, where the final-week athlete logs a
 * first meal of today before the test reads anything.
 */
const NOW = new Date('2026-12-01T10:00:00Z');
const DAYS = 28;

let t: TestApp;
let coach: Awaited<ReturnType<typeof signedIn>>;

interface AthleteViews {
  name: string;
  today: string;
  dates: string[];
  days: Map<string, DayView>;
  trend: TrendView;
  csv: Record<string, string>[];
}
const views = new Map<string, AthleteViews>();
let roster: RosterRow[] = [];
let queue: ReviewQueueItem[] = [];
const weekly = new Map<string, WeeklyCheckInView>();

const states = (drift: readonly DriftEntry[]): Record<string, DriftState> =>
  Object.fromEntries(drift.map((e) => [e.metric, e.state]));

/** The day view's states of one metric over `from`..`to` (every metric when none is named). */
function dayViewStates(v: AthleteViews, from: string, to: string, metric?: DriftMetric): DriftState[] {
  return v.dates
    .filter((d) => d >= from && d <= to)
    .flatMap((d) =>
      v.days
        .get(d)!
        .drift.filter((e) => !metric || e.metric === metric)
        .map((e) => e.state),
    );
}

beforeAll(async () => {
  t = await buildTestApp({}, { clock: () => NOW });
  await t.reset();
  await seedDemo(t.dataSource, { now: NOW, storage: null, appMode: 'test' });

  // Mateo, mid-morning: breakfast logged (843 kcal by Atwater 4/4/9), the rest of the day to come.
  const mateo = DEMO_ATHLETES.find((a) => a.key === 'final_week')!;
  const athleteAgent = await signedIn(t.app, mateo.email, DEMO_PASSWORD);
  const me = (await athleteAgent.get('/api/me')).body.data as { athleteId: string };
  const mateoToday = localDate(NOW, mateo.timeZone);
  const logged = await athleteAgent.post(`/api/athletes/${me.athleteId}/days/${mateoToday}/meals`).send({
    clientId: newId(),
    time: '09:00',
    name: 'Breakfast',
    source: 'macros',
    proteinG: 50,
    carbohydrateG: 100,
    fatG: 27,
  });
  expect(logged.status).toBe(201);

  coach = await signedIn(t.app, DEMO_OWNER_EMAIL, DEMO_PASSWORD);
  const rosterRes = await coach.get('/api/roster');
  expect(rosterRes.status).toBe(200);
  roster = rosterRes.body.data as RosterRow[];
  const queueRes = await coach.get('/api/review-queue');
  expect(queueRes.status).toBe(200);
  queue = queueRes.body.data as ReviewQueueItem[];

  for (const row of roster) {
    const def = DEMO_ATHLETES.find((a) => a.email === row.email)!;
    const today = localDate(NOW, def.timeZone);
    const from = addDays(today, -(DAYS - 1));
    const dates = Array.from({ length: DAYS }, (_, i) => addDays(from, i));
    const base = `/api/athletes/${row.athleteId}`;
    const days = new Map<string, DayView>();
    for (const date of dates) {
      const res = await coach.get(`${base}/days/${date}`);
      expect(res.status).toBe(200);
      days.set(date, res.body.data as DayView);
    }
    const trend = await coach.get(`${base}/trend?from=${from}&to=${today}`);
    expect(trend.status).toBe(200);
    const csv = await coach.get(`${base}/days.csv?from=${from}&to=${today}`);
    expect(csv.status).toBe(200);
    const current = await coach.get(`${base}/weekly-check-ins/current`);
    expect(current.status).toBe(200);
    weekly.set(row.athleteId, current.body.data as WeeklyCheckInView);
    views.set(row.athleteId, {
      name: row.name,
      today,
      dates,
      days,
      trend: readTrend(trend.body),
      csv: parse(csv.text, { columns: true, bom: true }) as Record<string, string>[],
    });
  }
}, 120_000);

afterAll(async () => {
  await t?.reset();
  await t?.close();
});

describe('one judgement per metric and day, for every demo athlete over the last 28 days', () => {
  it('sees every demo athlete, each with verdicts to compare', () => {
    expect(roster).toHaveLength(DEMO_ATHLETES.length);
    for (const v of views.values()) {
      expect(
        v.dates.some((d) => v.days.get(d)!.drift.length > 0),
        v.name,
      ).toBe(true);
    }
  });

  it('the day view, the trend rows and the CSV agree on every metric of every day', () => {
    for (const v of views.values()) {
      expect(v.trend.days.map((d) => d.date)).toEqual(v.dates);
      expect(v.csv.map((r) => r.Date)).toEqual(v.dates);
      v.dates.forEach((date, i) => {
        const day = v.days.get(date)!;
        const row = v.trend.days[i]!;
        expect(row.drift, `${v.name} ${date} trend`).toEqual(day.drift);
        const byMetric = states(day.drift);
        for (const metric of DRIFT_METRICS) {
          const label = byMetric[metric] ? DRIFT_STATE_LABELS[byMetric[metric]] : '';
          expect(v.csv[i]![`Drift: ${DRIFT_METRIC_LABELS[metric]}`], `${v.name} ${date} CSV ${metric}`).toBe(
            label,
          );
        }
      });
    }
  });

  it('the day in progress is "so far" everywhere, never on or off plan, and no earlier day is', () => {
    for (const v of views.values()) {
      const today = v.days.get(v.today)!;
      expect(today.isToday).toBe(true);
      for (const e of today.drift) expect(e.state, `${v.name} today ${e.metric}`).toBe('in_progress');
      if (today.cutoff) expect(today.cutoff.state).toBe('in_progress');
      const csvToday = v.csv.at(-1)!;
      for (const metric of DRIFT_METRICS) {
        expect(['', DRIFT_STATE_LABELS.in_progress]).toContain(
          csvToday[`Drift: ${DRIFT_METRIC_LABELS[metric]}`],
        );
      }
      for (const date of v.dates.slice(0, -1)) {
        for (const e of v.days.get(date)!.drift) expect(e.state, `${v.name} ${date}`).not.toBe('in_progress');
      }
    }
    // Mateo's breakfast is on the day view as logged figures, judged by nobody yet.
    const mateo = [...views.values()].find((v) => v.name.startsWith('Mateo'))!;
    const energy = mateo.days.get(mateo.today)!.drift.find((e) => e.metric === 'energy')!;
    expect(energy).toMatchObject({ actual: 4 * 50 + 4 * 100 + 9 * 27, state: 'in_progress' });
    expect(energy.diff).toBeCloseTo(843 - energy.target, 9);
  });

  it('the trend’s weekly adherence counts the day view’s verdicts, leaving the day in progress out', () => {
    for (const v of views.values()) {
      for (const week of v.trend.adherence) {
        const weekEnd = addDays(week.weekStart, 6);
        const counts = adherenceOf(dayViewStates(v, week.weekStart, weekEnd, week.metric));
        expect(week, `${v.name} week of ${week.weekStart} ${week.metric}`).toMatchObject({
          targetDays: counts.targetDays,
          loggedDays: counts.loggedDays,
          onPlanDays: counts.onPlanDays,
        });
      }
    }
  });

  it('the roster’s 7-day adherence is the day view’s verdicts of the 7 days before today', () => {
    for (const row of roster) {
      const v = views.get(row.athleteId)!;
      const expected = adherenceOf(dayViewStates(v, addDays(v.today, -7), addDays(v.today, -1))).adherence;
      if (expected === null) expect(row.figures.adherence7, v.name).toBeNull();
      else expect(row.figures.adherence7, v.name).toBeCloseTo(expected, 12);
    }
  });

  it('the review queue’s drift reasons are the day view’s verdicts of the last 3 finished days', () => {
    for (const row of roster) {
      const v = views.get(row.athleteId)!;
      const reasons = queue.find((q) => q.athleteId === row.athleteId)?.reasons ?? [];
      const drift = reasons.filter((r) => r.kind === 'drift').map((r) => r.text);
      for (const metric of DRIFT_METRICS) {
        const label = DRIFT_METRIC_LABELS[metric];
        const off = dayViewStates(v, addDays(v.today, -3), addDays(v.today, -1), metric).filter(
          (s) => s === 'off_plan',
        ).length;
        const text = `${label} off plan ${off} of the last 3 days`;
        if (off >= 2) expect(drift, `${v.name} ${metric}`).toContain(text);
        else
          expect(
            drift.filter((d) => d.startsWith(`${label} off plan`)),
            `${v.name} ${metric}`,
          ).toEqual([]);
      }
      const adherence = adherenceOf(dayViewStates(v, addDays(v.today, -7), addDays(v.today, -1))).adherence;
      const low = drift.find((d) => d.startsWith('On plan '));
      if (adherence !== null && adherence < 0.6) {
        expect(low, v.name).toBe(
          `On plan ${Math.round(adherence * 100)} % of logged targets over the last 7 days`,
        );
      } else {
        expect(low, v.name).toBeUndefined();
      }
      // Nothing about today's day verdicts: it is not over yet. (The 14-day rate ends today by
      // definition: a weigh-in is a morning reading, complete once logged; it is not a day verdict.)
      expect(
        reasons.filter((r) => r.kind === 'drift' && r.date === v.today && !/^(Losing|Gaining) /.test(r.text)),
        v.name,
      ).toEqual([]);
    }
  });

  it('the weekly figures’ adherence is the day view’s verdicts of the week', () => {
    for (const [athleteId, check] of weekly) {
      const v = views.get(athleteId)!;
      const { weekStart, weekEnd, adherence } = check.figures;
      expect(weekStart >= v.dates[0]!, v.name).toBe(true);
      for (const row of adherence) {
        const counts = adherenceOf(dayViewStates(v, weekStart, weekEnd, row.metric));
        const round3 = (x: number) => Math.round(x * 1000) / 1000;
        expect(row.adherence, `${v.name} ${row.metric}`).toBe(
          counts.adherence === null ? null : round3(counts.adherence),
        );
        expect(row.loggedShare, `${v.name} ${row.metric}`).toBe(
          round3(counts.loggedDays / counts.targetDays),
        );
      }
    }
  });

  it('steps at or over the target are on plan on every finished day (a minimum, not a range)', () => {
    let over = 0;
    for (const v of views.values()) {
      for (const date of v.dates.slice(0, -1)) {
        const steps = v.days.get(date)!.drift.find((e) => e.metric === 'steps');
        if (!steps || steps.actual === null || steps.actual < steps.target) continue;
        over += 1;
        expect(steps.state, `${v.name} ${date}`).toBe('on_plan');
      }
    }
    // The demo has such days (Mateo walks well over 10,000 steps); the check is not vacuous.
    expect(over).toBeGreaterThan(0);
  });
});
