import {
  DEFAULT_TOLERANCES,
  starterPlanContent,
  type GuardrailWarning,
  type PlanContent,
} from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  dayTypeKey,
  issuesFor,
  PLAN_MESSAGE_FIELD,
  planFormPath,
  planFormResolver,
  planFormValues,
  toPlanContent,
  warningsFor,
} from './plan-form';

const opts = { fields: {}, shouldUseNativeValidation: false } as never;

function content(): PlanContent {
  const c = starterPlanContent();
  c.dayTypes[0]!.targets.energy = { kind: 'kcal', kcal: 2400 };
  c.dates = [
    {
      date: '2026-12-04',
      label: 'Water load',
      countdownOffset: -3,
      targets: { ...c.dayTypes[0]!.targets, water: { kind: 'usual_plus', ml: 1000 } },
    },
  ];
  c.countdown = { templateId: null, templateName: 'Show week', eventDate: '2026-12-07', eventType: 'show' };
  return c;
}

describe('plan form', () => {
  it('round-trips a content, countdown included', () => {
    const c = content();
    expect(toPlanContent(planFormValues(c, '2026-12-01').content)).toEqual({ content: c, numberErrors: {} });
  });

  it('drops the countdown once none of its days is left', () => {
    const v = planFormValues(content(), '2026-12-01');
    v.content.dates = [];
    expect(toPlanContent(v.content).content.countdown).toBeNull();
  });

  it('lenient reading falls back to default tolerances for a half-typed box', () => {
    const v = planFormValues(content(), '2026-12-01');
    v.content.tolerances.energyPct = 'x';
    expect(toPlanContent(v.content, true).content.tolerances.energyPct).toBe(DEFAULT_TOLERANCES.energyPct);
    expect(toPlanContent(v.content).numberErrors).toHaveProperty(['content.tolerances.energyPct']);
  });

  it('maps schema and server paths, with or without "content.", to the boxes', () => {
    expect(planFormPath('content.dayTypes.0.targets.protein.pct')).toBe(
      'content.dayTypes.0.targets.protein.value',
    );
    expect(planFormPath('dayTypes.1.targets.water')).toBe('content.dayTypes.1.targets.water.value');
    expect(planFormPath('dates.0.date')).toBe('content.dates.0.date');
    expect(planFormPath('weekdays.sun')).toBe('content.weekdays.sun');
    expect(planFormPath('effectiveFrom')).toBe('effectiveFrom');
    expect(planFormPath('content.dayTypes')).toBe(PLAN_MESSAGE_FIELD);
  });

  it("the resolver refuses a first day before the athlete's today and a missing reason", async () => {
    const v = planFormValues(content(), '2026-11-30');
    const result = await planFormResolver('2026-12-01')(v, undefined, opts);
    expect(Object.keys(result.errors)).toEqual(expect.arrayContaining(['effectiveFrom', 'reason']));
  });

  it('the resolver hands over the request when all is well', async () => {
    const v = { ...planFormValues(content(), '2026-12-01'), reason: 'Lower carbs' };
    const result = await planFormResolver('2026-12-01')(v, undefined, opts);
    expect(result.errors).toEqual({});
    expect(result.values).toMatchObject({
      effectiveFrom: '2026-12-01',
      reason: 'Lower carbs',
      acknowledgedKeys: [],
    });
  });

  it('gives new day types unique keys', () => {
    expect(dayTypeKey('Peak day', ['training'])).toBe('peak-day');
    expect(dayTypeKey('Training', ['training', 'training-2'])).toBe('training-3');
    expect(dayTypeKey('  ', [])).toBe('day');
  });

  it('places messages and warnings on their day, relative to its targets', () => {
    expect(issuesFor({ 'dates.0.targets.protein': 'x', 'dayTypes.0.targets.fat': 'y' }, 'dates', 0)).toEqual({
      protein: 'x',
    });
    const w = (over: Partial<GuardrailWarning>): GuardrailWarning => ({
      key: 'k',
      code: 'sodium_low',
      severity: 'warning',
      scope: { kind: 'plan' },
      message: 'm',
      source: 's',
      field: null,
      ...over,
    });
    const list = [
      w({ key: 'a', scope: { kind: 'date', date: '2026-12-04' }, field: 'dates.0.targets.sodiumMg' }),
      w({ key: 'b', scope: { kind: 'date', date: '2026-12-04' }, code: 'loss_rate' }),
      w({ key: 'c', scope: { kind: 'day_type', key: 'rest' }, field: 'dayTypes.1.targets.water' }),
    ];
    expect(warningsFor(list, 'dates', 0, '2026-12-04').map((x) => [x.key, x.field])).toEqual([
      ['a', 'sodiumMg'],
      ['b', null],
    ]);
    expect(warningsFor(list, 'dayTypes', 1, 'rest').map((x) => x.field)).toEqual(['water']);
  });
});
