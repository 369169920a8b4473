import { describe, expect, it } from 'vitest';
import type { DayTargets, PlanBaseline, TemplateDay } from '../schemas/plans.js';
import { planContent } from '../schemas/plans.js';
import { applyTemplate, moveCountdown } from './countdown.js';
import { emptyDayTargets, starterPlanContent } from './resolve.js';
import { validatePlanContent } from './validate.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const baseline: PlanBaseline = { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'male' };

// An invented three-phase show week; the numbers are rules of thumb for the test (common practice, no source).
const days: TemplateDay[] = [
  { offset: -7, label: 'Steady', targets: day({ energy: { kind: 'usual_times', factor: 0.9 } }) },
  // A water-load day at usual intake + 1 L: common practice, no source.
  { offset: -5, label: 'Water load', targets: day({ water: { kind: 'usual_plus', ml: 1000 } }) },
  { offset: -2, label: 'Carb up', targets: day({ carbohydrate: { kind: 'g_per_kg', perKg: 6 } }) },
  { offset: 0, label: 'Show day', targets: day({ water: { kind: 'usual_times', factor: 0.8 } }) },
  { offset: 1, label: 'Day after', targets: day({ energy: { kind: 'usual_times', factor: 1 } }) },
];
const template = { id: '8c1b9f2e-6d2a-4b7e-9a55-0c0f3b1d2e11', name: 'Show week', days };
const eventDate = '2026-12-12';

describe('applyTemplate', () => {
  it('places each template day at eventDate + offset and resolves it against the athlete’s baseline', () => {
    const a = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-12-01',
      baseline,
    });
    expect(a.days.map((d) => [d.date, d.dayLabel, d.past])).toEqual([
      ['2026-12-05', 'E-7', false],
      ['2026-12-07', 'E-5', false],
      ['2026-12-10', 'E-2', false],
      ['2026-12-12', 'E-0', false],
      ['2026-12-13', 'E+1', false],
    ]);
    // usual water 3000 mL + 1000 mL on the water-load day (common practice, no source)
    expect(a.days[1]!.targets.waterMl).toBe(4000);
    expect(a.days[1]!.targets.basis.water).toBe('usual water 3,000 mL + 1,000 mL');
    expect(a.days[0]!.targets.energyKcal).toBeCloseTo(2160, 6);
    expect(a.days[2]!.targets.carbohydrateG).toBeCloseTo(480, 6);
    expect(a.days[3]!.targets.waterMl).toBeCloseTo(2400, 6);
    // The saved content keeps the expressions; the version's own baseline snapshot resolves them.
    expect(a.content.dates[1]).toEqual({
      date: '2026-12-07',
      label: 'Water load',
      countdownOffset: -5,
      targets: days[1]!.targets,
    });
    expect(a.content.countdown).toEqual({
      templateId: template.id,
      templateName: 'Show week',
      eventDate,
      eventType: 'show',
    });
    // First countdown day is ahead: the version starts then.
    expect(a.effectiveFrom).toBe('2026-12-05');
    expect(planContent.parse(a.content)).toEqual(a.content);
    expect(validatePlanContent(a.content, baseline)).toEqual({});
  });

  it('days before today are listed as past and not added; effectiveFrom is today', () => {
    const a = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-12-08',
      baseline,
    });
    expect(a.days.filter((d) => d.past).map((d) => d.dayLabel)).toEqual(['E-7', 'E-5']);
    expect(a.content.dates.map((d) => d.date)).toEqual(['2026-12-10', '2026-12-12', '2026-12-13']);
    expect(a.effectiveFrom).toBe('2026-12-08');
  });

  it('the first countdown day being today is not past', () => {
    const a = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-12-05',
      baseline,
    });
    expect(a.days[0]!.past).toBe(false);
    expect(a.effectiveFrom).toBe('2026-12-05');
  });

  it('keeps the base pattern, replaces its earlier countdown days, keeps later plain dated days', () => {
    const base = starterPlanContent();
    base.dayTypes[0]!.targets = day({ energy: { kind: 'kcal', kcal: 2200 } });
    base.dates = [
      // An earlier countdown, already over.
      { date: '2026-10-03', label: 'Old show', countdownOffset: 0, targets: emptyDayTargets() },
      // A plain dated day that collides with E-0 gives way; one after the countdown stays.
      { date: '2026-12-12', label: 'Birthday', countdownOffset: null, targets: emptyDayTargets() },
      { date: '2026-12-20', label: 'Holiday', countdownOffset: null, targets: emptyDayTargets() },
      // A plain dated day before the new version starts is never read under it.
      { date: '2026-11-20', label: 'Old refeed', countdownOffset: null, targets: emptyDayTargets() },
    ];
    base.countdown = {
      templateId: null,
      templateName: 'Autumn show',
      eventDate: '2026-10-03',
      eventType: 'show',
    };
    const a = applyTemplate({ base, template, eventDate, eventType: 'show', today: '2026-12-01', baseline });
    expect(a.content.dates.map((d) => [d.date, d.label])).toEqual([
      ['2026-12-05', 'Steady'],
      ['2026-12-07', 'Water load'],
      ['2026-12-10', 'Carb up'],
      ['2026-12-12', 'Show day'],
      ['2026-12-13', 'Day after'],
      ['2026-12-20', 'Holiday'],
    ]);
    expect(a.content.dayTypes).toEqual(base.dayTypes);
    expect(a.content.countdown?.templateName).toBe('Show week');
    // The base is not changed in place.
    expect(base.dates).toHaveLength(4);
  });

  it('a countdown of the base still ahead is replaced from its next day, so its days stop applying', () => {
    const first = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-12-01',
      baseline,
    });
    // The show moves a week later; another template is applied on 2026-12-06: the old E-5 (7 Dec) is
    // ahead, so the new version starts then rather than at the new E-7 (12 Dec).
    const again = applyTemplate({
      base: first.content,
      template: { ...template, name: 'Show week, longer' },
      eventDate: '2026-12-19',
      eventType: 'show',
      today: '2026-12-06',
      baseline,
    });
    expect(again.effectiveFrom).toBe('2026-12-07');
    expect(again.content.dates.map((d) => d.date)).toEqual([
      '2026-12-12',
      '2026-12-14',
      '2026-12-17',
      '2026-12-19',
      '2026-12-20',
    ]);
  });
});

describe('moveCountdown', () => {
  it('each countdown day keeps its offset and targets; the countdown info follows the new date', () => {
    const first = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-11-20',
      baseline,
    });
    const moved = moveCountdown({
      content: first.content,
      eventDate: '2026-12-19',
      today: '2026-11-20',
      baseline,
    });
    expect(moved.content.dates.map((d) => [d.date, d.countdownOffset, d.label])).toEqual([
      ['2026-12-12', -7, 'Steady'],
      ['2026-12-14', -5, 'Water load'],
      ['2026-12-17', -2, 'Carb up'],
      ['2026-12-19', 0, 'Show day'],
      ['2026-12-20', 1, 'Day after'],
    ]);
    expect(moved.content.dates[1]!.targets).toEqual(days[1]!.targets);
    expect(moved.content.countdown).toEqual({ ...first.content.countdown, eventDate: '2026-12-19' });
    // The old days (from 5 Dec) are dropped: the new version must start by then.
    expect(moved.effectiveFrom).toBe('2026-12-05');
    expect(moved.days[1]!.targets.waterMl).toBe(4000);
  });

  it('moved earlier: days now in the past are skipped, the version starts today', () => {
    const first = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-12-01',
      baseline,
    });
    const moved = moveCountdown({
      content: first.content,
      eventDate: '2026-12-06',
      today: '2026-12-01',
      baseline,
    });
    // E-7 = 29 Nov is past; E-5 = 1 Dec is today and stays.
    expect(moved.days.filter((d) => d.past).map((d) => d.dayLabel)).toEqual(['E-7']);
    expect(moved.content.dates.map((d) => d.date)).toEqual([
      '2026-12-01',
      '2026-12-04',
      '2026-12-06',
      '2026-12-07',
    ]);
    expect(moved.effectiveFrom).toBe('2026-12-01');
  });

  it('moved later: a day dropped as past by a later version comes back from an earlier one', () => {
    const v1 = applyTemplate({
      base: null,
      template,
      eventDate,
      eventType: 'show',
      today: '2026-11-20',
      baseline,
    });
    // Saved again on 6 Dec: E-7 (5 Dec) had passed, so this version no longer carries it.
    const v2 = moveCountdown({ content: v1.content, eventDate, today: '2026-12-06', baseline });
    expect(v2.content.dates.some((d) => d.countdownOffset === -7)).toBe(false);
    // On 7 Dec the show moves to 14 Dec: today is E-7 again.
    const without = moveCountdown({
      content: v2.content,
      eventDate: '2026-12-14',
      today: '2026-12-07',
      baseline,
    });
    expect(without.content.dates.find((d) => d.date === '2026-12-07')).toBeUndefined();
    const moved = moveCountdown({
      content: v2.content,
      eventDate: '2026-12-14',
      today: '2026-12-07',
      baseline,
      earlier: [v1.content],
    });
    expect(moved.content.dates.map((d) => [d.date, d.countdownOffset, d.label])).toEqual([
      ['2026-12-07', -7, 'Steady'],
      ['2026-12-09', -5, 'Water load'],
      ['2026-12-12', -2, 'Carb up'],
      ['2026-12-14', 0, 'Show day'],
      ['2026-12-15', 1, 'Day after'],
    ]);
    expect(moved.effectiveFrom).toBe('2026-12-07');
  });

  it('refuses a content without a countdown', () => {
    expect(() =>
      moveCountdown({ content: starterPlanContent(), eventDate, today: '2026-12-01', baseline }),
    ).toThrow(/no countdown/);
  });
});
