import { describe, expect, it } from 'vitest';
import type { DayTargets, PlanBaseline, PlanContent } from '../schemas/plans.js';
import { applyTemplate, moveCountdown } from './countdown.js';
import { describeChanges } from './diff.js';
import { emptyDayTargets, starterPlanContent } from './resolve.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const baseline: PlanBaseline = { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'male' };

function base(): PlanContent {
  const c = starterPlanContent();
  c.dayTypes[0]!.targets = day({
    energy: { kind: 'kcal', kcal: 2400 },
    protein: { kind: 'g', g: 180 },
    water: { kind: 'ml', ml: 3000 },
  });
  c.dayTypes[1]!.targets = day({ energy: { kind: 'kcal', kcal: 2200 } });
  return c;
}

describe('describeChanges', () => {
  it('the first version', () => {
    expect(describeChanges(null, base())).toEqual(['First version']);
  });

  it('no change', () => {
    expect(describeChanges(base(), base())).toEqual(['No changes to the targets']);
  });

  it('per metric, in plain words', () => {
    const next = base();
    next.dayTypes[1]!.targets.energy = { kind: 'kcal', kcal: 2000 };
    next.dayTypes[0]!.targets.protein = { kind: 'g_per_kg', perKg: 2.2 };
    next.dayTypes[0]!.targets.water = { kind: 'usual_plus', ml: 500 };
    next.dayTypes[0]!.targets.sodiumMg = 2300;
    next.dayTypes[0]!.targets.note = 'Eat the rice after training';
    next.dayTypes[0]!.targets.supplements = [
      { id: '00000000-0000-4000-8000-000000000001', item: 'Creatine', dose: 5, unit: 'g', times: ['08:00'] },
    ];
    expect(describeChanges(base(), next)).toEqual([
      'Training day: protein 180 g → 2.2 g/kg',
      'Training day: water 3,000 mL → usual + 500 mL',
      'Training day: sodium none → 2,300 mg',
      'Training day: supplement “Creatine” added (5 g at 08:00)',
      'Training day: note added',
      'Rest day: energy 2,200 → 2,000 kcal',
    ]);
  });

  it('day types added, removed and renamed; the weekly pattern', () => {
    const next = base();
    next.dayTypes[1]!.name = 'Off day';
    next.dayTypes.push({ key: 'refeed', name: 'Refeed day', targets: emptyDayTargets() });
    next.weekdays.sat = 'refeed';
    next.weekdays.wed = 'rest';
    expect(describeChanges(base(), next)).toEqual([
      'Day type "Rest day" renamed "Off day"',
      'Day type "Refeed day" added',
      'Weekly pattern: Wed Training day → Off day, Sat Training day → Refeed day',
    ]);
    const fewer = base();
    fewer.dayTypes = [fewer.dayTypes[0]!];
    fewer.weekdays.sun = 'training';
    expect(describeChanges(base(), fewer)).toEqual([
      'Day type "Rest day" removed',
      'Weekly pattern: Sun Rest day → Training day',
    ]);
  });

  it('dated days added, removed, changed; tolerances', () => {
    const prev = base();
    prev.dates = [
      {
        date: '2026-12-06',
        label: 'Refeed',
        countdownOffset: null,
        targets: day({ energy: { kind: 'kcal', kcal: 3000 } }),
      },
      { date: '2026-12-13', label: null, countdownOffset: null, targets: emptyDayTargets() },
    ];
    const next = base();
    next.dates = [
      {
        date: '2026-12-06',
        label: 'Refeed',
        countdownOffset: null,
        targets: day({ energy: { kind: 'kcal', kcal: 2800 } }),
      },
      { date: '2026-12-20', label: 'Holiday', countdownOffset: null, targets: emptyDayTargets() },
    ];
    next.tolerances = { ...next.tolerances, energyPct: 3 };
    expect(describeChanges(prev, next)).toEqual([
      'Sun 6 Dec (Refeed): energy 3,000 → 2,800 kcal',
      'Sun 20 Dec (Holiday) added',
      'Sun 13 Dec removed',
      'Tolerances: energy ±5 → ±3 %',
    ]);
  });

  it('the steps and cardio tolerance: a version saved without it reads as the 10 % default', () => {
    const prev = base();
    const { activityPct: _dropped, ...older } = prev.tolerances;
    prev.tolerances = older;
    const same = base();
    expect(describeChanges(prev, same)).toEqual(['No changes to the targets']);
    const next = base();
    next.tolerances = { ...next.tolerances, activityPct: 20 };
    expect(describeChanges(prev, next)).toEqual(['Tolerances: steps and cardio −10 → −20 %']);
  });

  it('dated days that were past when the version was saved are not reported as removed', () => {
    const prev = base();
    prev.dates = [
      { date: '2026-11-29', label: 'Low', countdownOffset: null, targets: emptyDayTargets() },
      { date: '2026-12-03', label: 'Up', countdownOffset: null, targets: emptyDayTargets() },
    ];
    const next = base();
    expect(describeChanges(prev, next, { effectiveFrom: '2026-12-02' })).toEqual(['Thu 3 Dec (Up) removed']);
  });

  it('countdown applied, then moved: its days summarised', () => {
    const template = {
      id: '8c1b9f2e-6d2a-4b7e-9a55-0c0f3b1d2e11',
      name: 'Show week',
      days: [
        { offset: -2, label: 'Load', targets: day({ carbohydrate: { kind: 'g_per_kg', perKg: 7 } }) },
        { offset: 0, label: 'Show', targets: emptyDayTargets() },
      ],
    };
    const applied = applyTemplate({
      base: base(),
      template,
      eventDate: '2026-12-12',
      eventType: 'show',
      today: '2026-12-01',
      baseline,
    });
    expect(describeChanges(base(), applied.content)).toEqual([
      'Countdown "Show week" applied for the event on Sat 12 Dec 2026',
      'Countdown days set: Thu 10 Dec (E-2) to Sat 12 Dec (E-0), 2 days',
    ]);
    const moved = moveCountdown({
      content: applied.content,
      eventDate: '2026-12-19',
      today: '2026-12-01',
      baseline,
    });
    expect(describeChanges(applied.content, moved.content)).toEqual([
      'Countdown moved from Sat 12 Dec 2026 to Sat 19 Dec 2026',
      'Countdown days removed: Thu 10 Dec (E-2) to Sat 12 Dec (E-0), 2 days',
      'Countdown days set: Thu 17 Dec (E-2) to Sat 19 Dec (E-0), 2 days',
    ]);
    // The coach edits one countdown day afterwards: named with its label.
    const edited: PlanContent = JSON.parse(JSON.stringify(moved.content));
    edited.dates[0]!.targets.water = { kind: 'usual_plus', ml: 1000 };
    expect(describeChanges(moved.content, edited)).toEqual([
      'Thu 17 Dec (E-2 · Load): water none → usual + 1,000 mL',
    ]);
    const removed = { ...edited, countdown: null, dates: [] };
    expect(describeChanges(edited, removed)).toEqual([
      'Countdown "Show week" removed',
      'Countdown days removed: Thu 17 Dec (E-2) to Sat 19 Dec (E-0), 2 days',
    ]);
  });
});
