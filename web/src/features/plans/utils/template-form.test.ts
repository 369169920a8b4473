import { emptyDayTargets, templateRequest, type TemplateView } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { dayTargetsFormValues } from './day-targets-form';
import {
  describeTargets,
  liveTemplateIssues,
  nextOffset,
  offsetLabel,
  offsetRange,
  templateFormPath,
  templateFormResolver,
  templateFormValues,
  toTemplateRequest,
  type TemplateFormValues,
} from './template-form';

const opts = { fields: {}, shouldUseNativeValidation: false } as never;

const view: TemplateView = {
  id: '33333333-3333-4333-8333-333333333333',
  name: 'Show week',
  eventType: 'show',
  description: null,
  createdBy: { id: '44444444-4444-4444-8444-444444444444', name: 'Coach' },
  updatedAt: '2026-11-01T10:00:00.000Z',
  days: [
    { offset: 1, label: 'Refeed', targets: emptyDayTargets() },
    {
      offset: -3,
      label: 'Water load',
      targets: { ...emptyDayTargets(), water: { kind: 'usual_plus', ml: 1000 }, sodiumMg: 2300 },
    },
  ],
};

describe('template form values', () => {
  it('puts a saved template in countdown order and reads it back unchanged', () => {
    const values = templateFormValues(view);
    expect(values.days.map((d) => d.offset)).toEqual(['-3', '1']);
    const { request, numberErrors } = toTemplateRequest(values);
    expect(numberErrors).toEqual({});
    expect(templateRequest.parse(request).days[0]).toEqual(view.days[1]);
  });

  it('starts a new template with one empty event day', () => {
    const values = templateFormValues(null);
    expect(values.days).toHaveLength(1);
    expect(toTemplateRequest(values).request.days[0]).toEqual({
      offset: 0,
      label: null,
      targets: emptyDayTargets(),
    });
  });
});

describe('templateFormResolver', () => {
  const base = (): TemplateFormValues => ({ ...templateFormValues(view), name: 'Show week' });

  it('hands over the request when the template is fine', async () => {
    const result = await templateFormResolver()(base(), undefined, opts);
    expect(result.errors).toEqual({});
    expect(result.values).toMatchObject({ name: 'Show week', eventType: 'show' });
  });

  it('puts schema messages, duplicate days and boxes that hold no number beside their boxes', async () => {
    const v = base();
    v.eventType = '';
    v.days[1]!.offset = '-3';
    const noType = await templateFormResolver()(v, undefined, opts);
    expect(noType.errors.eventType?.message).toBe('Choose an event type');

    const dup = await templateFormResolver()(
      { ...base(), days: [base().days[0]!, base().days[0]!] },
      undefined,
      opts,
    );
    expect(dup.errors.days?.[1]?.offset?.message).toBe('E-3 is listed twice');

    const nan = base();
    nan.days[0]!.targets.sodiumMg = 'lots';
    const bad = await templateFormResolver()(nan, undefined, opts);
    expect(bad.errors.days?.[0]?.targets?.sodiumMg?.message).toMatch(/number/);
  });

  it('refuses shares that do not add up, on each macro (validateTemplate)', async () => {
    const v = base();
    v.days[0]!.targets = dayTargetsFormValues({
      ...emptyDayTargets(),
      energy: { kind: 'usual_times', factor: 1 },
      protein: { kind: 'pct', pct: 30 },
      carbohydrate: { kind: 'pct', pct: 50 },
      fat: { kind: 'pct', pct: 30 },
    });
    const result = await templateFormResolver()(v, undefined, opts);
    expect(result.errors.days?.[0]?.targets?.protein?.value?.message).toMatch(/add up to 110/);
    expect(liveTemplateIssues(v)['days.0.targets.fat']).toMatch(/add up to 110/);
  });
});

describe('helpers', () => {
  it('maps shared paths to form paths', () => {
    expect(templateFormPath('days.2.targets.protein.pct')).toBe('days.2.targets.protein.value');
    expect(templateFormPath('days.0.offset')).toBe('days.0.offset');
    expect(templateFormPath('days')).toBe('summary');
    expect(templateFormPath('name')).toBe('name');
  });

  it('labels offsets and ranges', () => {
    expect(offsetLabel(-3)).toBe('E-3 (3 days before)');
    expect(offsetLabel(0)).toBe('E-0 (event day)');
    expect(offsetLabel(1)).toBe('E+1 (1 day after)');
    expect(offsetRange(view.days)).toBe('E-3 … E+1');
    expect(offsetRange([])).toBe('—');
  });

  it('picks the next free day for a new one', () => {
    expect(nextOffset([])).toBe(0);
    expect(nextOffset([-3, -2])).toBe(-1);
    expect(nextOffset([2, 3])).toBe(1);
  });

  it('says relative targets as expressions', () => {
    expect(describeTargets(view.days[1]!.targets)).toEqual([
      'Water usual +\u00a01,000\u00a0mL',
      'Sodium 2,300\u00a0mg',
    ]);
  });
});
