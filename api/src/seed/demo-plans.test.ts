import {
  cautionsForDay,
  checkGuardrails,
  dayEntryFor,
  GUARDRAIL_DEFAULTS,
  PLAN_LIMITS,
  planContent,
  resolveTargets,
  templateRequest,
  validatePlanContent,
  validateTemplate,
  versionInForce,
} from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { trendWeightKg } from '../lib/analysis.js';
import { addDays, localDate } from './calendar.js';
import {
  BASELINE_TREND_DAYS,
  DEMO_TEMPLATES,
  demoBaseline,
  planDemoVersions,
  type DemoPlanVersion,
  type DemoTemplateKey,
  type SeededTemplate,
} from './demo-plans.js';
import { DEMO_ATHLETES, type DemoSituation } from './demo-team.js';
import { generateHistory, type AthleteHistory } from './history.js';

const now = new Date('2026-12-01T11:30:00Z');
const templates = new Map<DemoTemplateKey, SeededTemplate>(
  DEMO_TEMPLATES.map((t, i) => [
    t.key,
    { id: `00000000-0000-4000-8000-00000000000${i + 1}`, name: t.name, days: t.days },
  ]),
);
const athletes = DEMO_ATHLETES.map((def) => {
  const history = generateHistory(def, { seedDate: localDate(now, def.timeZone) });
  const versions = planDemoVersions({ def, history, now, floors: GUARDRAIL_DEFAULTS, templates });
  return { def, history, versions: versions.map((v, i) => ({ ...v, number: i + 1 })) };
});
const of = (key: DemoSituation) => athletes.find((a) => a.def.key === key)!;

/** Planned and eaten energy, averaged over the days of a version that have meals logged. */
function energyInWindow(
  history: AthleteHistory,
  v: DemoPlanVersion,
  until: string | null,
  skip: (t: number) => boolean,
) {
  const days = history.days.filter(
    (d) =>
      d.date >= v.effectiveFrom &&
      (until === null || d.date < until) &&
      d.meals.length > 0 &&
      !skip(d.daysBeforeSeed),
  );
  let planned = 0;
  let eaten = 0;
  for (const d of days) {
    const entry = dayEntryFor(v.content, d.date);
    planned +=
      resolveTargets(entry.kind === 'date' ? entry.override.targets : entry.dayType.targets, v.baseline)
        .energyKcal ?? 0;
    eaten += d.meals.reduce((a, m) => a + m.energyKcal, 0);
  }
  return { days: days.length, ratio: eaten / planned };
}

describe('demo countdown templates', () => {
  it('three of our own, one per event type, each a valid template', () => {
    expect(DEMO_TEMPLATES.map((t) => t.eventType).sort()).toEqual(['shoot', 'show', 'weigh_in']);
    expect(new Set(DEMO_TEMPLATES.map((t) => t.name)).size).toBe(3);
    for (const { key: _key, ...t } of DEMO_TEMPLATES) {
      expect(templateRequest.parse(t), t.name).toEqual(t);
      expect(validateTemplate(t), t.name).toEqual({});
    }
  });

  it('the show template runs E-7 … E+1; the weigh-in one ends with the bout the day after', () => {
    const offsets = (key: DemoTemplateKey) =>
      DEMO_TEMPLATES.find((t) => t.key === key)!.days.map((d) => d.offset);
    expect(offsets('show')).toEqual([-7, -6, -5, -4, -3, -2, -1, 0, 1]);
    const weighIn = DEMO_TEMPLATES.find((t) => t.key === 'weigh_in')!;
    expect(weighIn.days.find((d) => d.offset === 0)!.label).toBe('Weigh-in and refuel');
    expect(weighIn.days.find((d) => d.offset === 1)!.label).toBe('Bout day');
  });

  it('resolve against each athlete’s baseline: a water-load day at usual + 1 L (common practice, no source)', () => {
    const { def, history } = of('weigh_in');
    const baseline = demoBaseline(def, history, addDays(history.seedDate, -1));
    const e5 = DEMO_TEMPLATES.find((t) => t.key === 'weigh_in')!.days.find((d) => d.offset === -5)!;
    const r = resolveTargets(e5.targets, baseline);
    expect(r.waterMl).toBe(def.intake.usualWaterMl + 1000);
    expect(r.basis.water).toBe('usual water 2,800 mL + 1,000 mL');
    // Energy as a share of the usual intake: 0.9 × 2,100 kcal.
    expect(r.energyKcal).toBeCloseTo(1890, 6);
  });
});

describe('demo plans', () => {
  it('every athlete has 2–4 versions starting on the first day of history, in the past, in order', () => {
    for (const { def, history, versions } of athletes) {
      expect(versions.length, def.key).toBeGreaterThanOrEqual(2);
      expect(versions.length, def.key).toBeLessThanOrEqual(4);
      expect(versions[0]!.effectiveFrom, def.key).toBe(history.days[0]!.date);
      for (const [i, v] of versions.entries()) {
        expect(v.effectiveFrom < history.seedDate, def.key).toBe(true);
        expect(v.reason.length).toBeGreaterThanOrEqual(PLAN_LIMITS.reason.min);
        expect(v.reason.length).toBeLessThanOrEqual(PLAN_LIMITS.reason.max);
        // Saved on or before the day it starts (the API refuses past effective dates).
        expect(localDate(v.createdAt, def.timeZone) <= v.effectiveFrom, def.key).toBe(true);
        const previous = versions[i - 1];
        if (previous) {
          expect(v.effectiveFrom > previous.effectiveFrom, def.key).toBe(true);
          expect(v.createdAt.getTime()).toBeGreaterThan(previous.createdAt.getTime());
        }
      }
    }
  });

  it('each version is a valid content for its own baseline snapshot', () => {
    for (const { def, versions } of athletes) {
      for (const v of versions) {
        expect(planContent.parse(v.content)).toEqual(v.content);
        expect(validatePlanContent(v.content, v.baseline), `${def.key} v${v.number}`).toEqual({});
      }
    }
  });

  it('the baseline is the intake figures and the EWMA trend of the 60 days of weigh-ins up to the save (Walker, The Hacker’s Diet)', () => {
    for (const { def, history, versions } of athletes) {
      for (const v of versions) {
        const saved = localDate(v.createdAt, def.timeZone);
        const weights = history.days
          .filter((d) => d.weighIn && d.date <= saved && d.date >= addDays(saved, -(BASELINE_TREND_DAYS - 1)))
          .map((d) => ({ date: d.date, kg: d.weighIn!.weightKg }));
        expect(v.baseline).toEqual({
          usualWaterMl: def.intake.usualWaterMl,
          usualEnergyKcal: def.intake.usualEnergyKcal,
          weightKg: trendWeightKg(weights),
          sex: def.intake.sex,
        });
      }
    }
  });

  it('planned energy matches what the generated history eats while each version is in force (within 5 %)', () => {
    for (const { def, history, versions } of athletes) {
      // Show day and the two days of celebration after it are not eaten to plan.
      const skip = (t: number) => def.key === 'regain' && t >= 19 && t <= 21;
      for (const [i, v] of versions.entries()) {
        const { days, ratio } = energyInWindow(history, v, versions[i + 1]?.effectiveFrom ?? null, skip);
        if (days === 0) continue;
        expect(Math.abs(ratio - 1), `${def.key} v${v.number}: ${ratio.toFixed(3)}`).toBeLessThan(0.05);
      }
    }
  });

  it('each version carries exactly the guardrail warnings it raised when saved, acknowledged', () => {
    for (const { def, versions } of athletes) {
      for (const v of versions) {
        const keys = v.acknowledgements.map((w) => w.key);
        expect(new Set(keys).size).toBe(keys.length);
        for (const w of v.acknowledgements) expect(w.source.length, w.key).toBeGreaterThan(0);
        // No pattern week of the demo sits on a strong warning.
        if (!v.content.countdown) {
          expect(
            v.acknowledgements.filter((w) => w.severity === 'strong'),
            def.key,
          ).toEqual([]);
        }
      }
    }
    // Recomputed independently for the countdown version.
    const { def, versions } = of('final_week');
    const countdown = versions.find((v) => v.content.countdown)!;
    const savedOn = localDate(countdown.createdAt, def.timeZone);
    expect(
      checkGuardrails(countdown.content, {
        baseline: countdown.baseline,
        floors: GUARDRAIL_DEFAULTS,
        today: savedOn,
        eventType: 'show',
        eventDate: countdown.content.countdown!.eventDate,
        weighInLimitKg: null,
      }),
    ).toEqual(countdown.acknowledgements);
    // The carbohydrate-up days and the top-up day are carbohydrate loads (de Moraes 2019; thresholds
    // common practice); the show day's "only sips after 15:00" is a fluid restriction.
    const eventDate = countdown.content.countdown!.eventDate;
    expect(countdown.acknowledgements.map((w) => w.key)).toEqual([
      ...[-3, -2, -1].map((o) => `carb_load:date:${addDays(eventDate, o)}`),
      `fluid_restriction:date:${eventDate}`,
    ]);
  });
});

describe('the countdown athlete', () => {
  const { def, history, versions } = of('final_week');
  const today = history.seedDate;
  const eventDate = addDays(localDate(now, 'Europe/Madrid'), 4);

  it('is at E-4 today, inside the show countdown applied the evening before E-7', () => {
    const current = versionInForce(versions, today)!;
    expect(current.number).toBe(versions.length);
    expect(current.content.countdown).toEqual({
      templateId: templates.get('show')!.id,
      templateName: 'Classic show week',
      eventDate,
      eventType: 'show',
    });
    expect(current.effectiveFrom).toBe(addDays(eventDate, -7));
    expect(localDate(current.createdAt, def.timeZone)).toBe(addDays(eventDate, -8));
    expect(current.reason).toBe(`Countdown "Classic show week" for ${eventDate}`);
    const entry = dayEntryFor(current.content, today);
    expect(entry).toMatchObject({ kind: 'date', override: { countdownOffset: -4, label: 'Steady' } });
  });

  it('today the athlete sees the countdown caution; on E-3 also the acknowledged carbohydrate-load warning', () => {
    const current = versionInForce(versions, today)!;
    const acknowledgements = current.acknowledgements.map((w) => ({
      ...w,
      at: current.createdAt.toISOString(),
    }));
    const reader = { units: { weight: 'kg', volume: 'ml' }, aboutAthlete: null } as const;
    const todays = cautionsForDay({ content: current.content, date: today, acknowledgements, reader });
    expect(todays.map((c) => c.code)).toEqual(['countdown']);
    expect(todays[0]!.message).toMatch(/^E-4 of your countdown/);
    const e3 = cautionsForDay({
      content: current.content,
      date: addDays(eventDate, -3),
      acknowledgements,
      reader,
    });
    expect(e3.map((c) => c.code)).toEqual(['countdown', 'carb_load']);
  });

  it('the lower-carbohydrate days already lived (E-7 … E-5) match the generated meals: 0.7 × usual energy', () => {
    const current = versionInForce(versions, today)!;
    for (const offset of [-7, -6, -5]) {
      const date = addDays(eventDate, offset);
      const entry = dayEntryFor(current.content, date);
      expect(entry.kind).toBe('date');
      if (entry.kind !== 'date') continue;
      expect(resolveTargets(entry.override.targets, current.baseline).energyKcal).toBeCloseTo(0.7 * 2600, 6);
      const eaten = history.days.find((d) => d.date === date)!.meals.reduce((a, m) => a + m.energyKcal, 0);
      expect(Math.abs(eaten / 1820 - 1)).toBeLessThan(0.15);
    }
  });

  it('nobody else is in a countdown today', () => {
    for (const a of athletes.filter((x) => x.def.key !== 'final_week')) {
      expect(versionInForce(a.versions, a.history.seedDate)!.content.countdown, a.def.key).toBeNull();
    }
  });
});
