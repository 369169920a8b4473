import { describe, expect, it } from 'vitest';
import type { DayTargets, PlanBaseline, PlanContent, TemplateRequest } from '../schemas/plans.js';
import { emptyDayTargets, starterPlanContent } from './resolve.js';
import { validatePlanContent, validateTemplate } from './validate.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const baseline: PlanBaseline = { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'female' };
const noBaseline: PlanBaseline = { usualWaterMl: null, usualEnergyKcal: null, weightKg: null, sex: null };

function withTraining(targets: DayTargets): PlanContent {
  const c = starterPlanContent();
  c.dayTypes[0]!.targets = targets;
  return c;
}

const SHARES_95 = 'Protein, carbohydrate and fat shares add up to 95 %; they must add up to 100 % (±1)';

describe('validatePlanContent: structure', () => {
  it('the starter content is fine', () => {
    expect(validatePlanContent(starterPlanContent(), baseline)).toEqual({});
  });

  it('a weekday pointing to a missing day type', () => {
    const c = starterPlanContent();
    c.weekdays.wed = 'refeed';
    expect(validatePlanContent(c, baseline)).toEqual({
      'weekdays.wed': 'Wed follows day type "refeed", which is not in this plan',
    });
  });

  it('duplicate day-type keys and duplicate dates', () => {
    const c = starterPlanContent();
    c.dayTypes.push({ key: 'rest', name: 'Second rest', targets: emptyDayTargets() });
    c.dates = [
      { date: '2026-12-04', label: null, countdownOffset: null, targets: emptyDayTargets() },
      { date: '2026-12-04', label: null, countdownOffset: null, targets: emptyDayTargets() },
    ];
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.2.key': 'Another day type already uses the key "rest"',
      'dates.1.date': '2026-12-04 is listed twice',
    });
  });
});

describe('validatePlanContent: shares (Atwater factors, FAO 2003 FNP 77; Merrill & Watt 1955)', () => {
  it('a share without an energy target', () => {
    const errors = validatePlanContent(withTraining(day({ protein: { kind: 'pct', pct: 30 } })), baseline);
    expect(errors).toEqual({
      'dayTypes.0.targets.protein':
        'A share (%) needs an energy target for the day; set the energy or use grams',
    });
  });

  it('30/45/25 of 2400 kcal is fine; 30/40/25 = 95 % is refused on each macro with the fields named', () => {
    const ok = day({
      energy: { kind: 'kcal', kcal: 2400 },
      protein: { kind: 'pct', pct: 30 },
      carbohydrate: { kind: 'pct', pct: 45 },
      fat: { kind: 'pct', pct: 25 },
    });
    expect(validatePlanContent(withTraining(ok), baseline)).toEqual({});
    const bad = { ...ok, carbohydrate: { kind: 'pct' as const, pct: 40 } };
    expect(validatePlanContent(withTraining(bad), baseline)).toEqual({
      'dayTypes.0.targets.protein': SHARES_95,
      'dayTypes.0.targets.carbohydrate': SHARES_95,
      'dayTypes.0.targets.fat': SHARES_95,
    });
  });

  it('within 1 point passes (99.5 %, 101 %); 101.5 % does not', () => {
    const shares = (p: number, c: number, f: number) =>
      withTraining(
        day({
          energy: { kind: 'usual_times', factor: 1 },
          protein: { kind: 'pct', pct: p },
          carbohydrate: { kind: 'pct', pct: c },
          fat: { kind: 'pct', pct: f },
        }),
      );
    expect(validatePlanContent(shares(30, 44.5, 25), baseline)).toEqual({});
    expect(validatePlanContent(shares(30, 46, 25), baseline)).toEqual({});
    expect(Object.keys(validatePlanContent(shares(30, 46.5, 25), baseline))).toHaveLength(3);
  });

  it('grams against the energy target count the same way: 180/270/66.6667 g of 2400 kcal pass (Check 1)', () => {
    const c = withTraining(
      day({
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'g', g: 180 },
        carbohydrate: { kind: 'g', g: 270 },
        fat: { kind: 'g', g: 66.6667 },
      }),
    );
    expect(validatePlanContent(c, baseline)).toEqual({});
  });

  it('150/250/70 g = 2230 kcal against 2400 kcal (92.9 %) is refused (Check 2 without the alcohol)', () => {
    const c = withTraining(
      day({
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'g', g: 150 },
        carbohydrate: { kind: 'g', g: 250 },
        fat: { kind: 'g', g: 70 },
      }),
    );
    const message =
      'Protein, carbohydrate and fat shares add up to 92.9 % (2,230 of 2,400 kcal); they must add up to 100 % (±1)';
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.0.targets.protein': message,
      'dayTypes.0.targets.carbohydrate': message,
      'dayTypes.0.targets.fat': message,
    });
  });

  it('g per kg resolves with the baseline weight: 2 g/kg × 80 kg = 160 g with 40 % C and 30 % F of 2400 kcal (~100 %)', () => {
    const c = withTraining(
      day({
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'g_per_kg', perKg: 2 },
        carbohydrate: { kind: 'pct', pct: 43 },
        fat: { kind: 'pct', pct: 30 },
      }),
    );
    // 160 g·4 = 640 kcal = 26.7 % → 99.7 %
    expect(validatePlanContent(c, baseline)).toEqual({});
    const bad = {
      ...c,
      dayTypes: c.dayTypes.map((t, i) =>
        i === 0 ? { ...t, targets: { ...t.targets, fat: { kind: 'pct' as const, pct: 25 } } } : t,
      ),
    };
    expect(validatePlanContent(bad, baseline)['dayTypes.0.targets.fat']).toMatch(/add up to 94\.7 %/);
  });

  // A blank macro (issue 11 item 5): a split needs all three; grams alone may not exceed the energy.
  it('a split with a blank macro is refused on the blank field: 60 % P + 60 % C + blank fat', () => {
    const c = withTraining(
      day({
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'pct', pct: 60 },
        carbohydrate: { kind: 'pct', pct: 60 },
      }),
    );
    const over = 'Protein and carbohydrate shares already add up to 120 %; they must add up to 100 % (±1)';
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.0.targets.protein': over,
      'dayTypes.0.targets.carbohydrate': over,
      'dayTypes.0.targets.fat': 'A split in % needs all three macros; set fat too (%, g or g/kg)',
    });
  });

  it('a split with a blank macro is refused even when the shares set add up (30 % P + 70 % C)', () => {
    const c = withTraining(
      day({
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'pct', pct: 30 },
        carbohydrate: { kind: 'pct', pct: 70 },
      }),
    );
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.0.targets.fat': 'A split in % needs all three macros; set fat too (%, g or g/kg)',
    });
  });

  it('grams of some macros, others blank: 200 g P + 400 g C = 2,400 kcal is 160 % of 1,500 kcal → refused', () => {
    // Atwater general factors, FAO 2003 FNP 77: 4·200 + 4·400 = 2,400 kcal.
    const c = withTraining(
      day({
        energy: { kind: 'kcal', kcal: 1500 },
        protein: { kind: 'g', g: 200 },
        carbohydrate: { kind: 'g', g: 400 },
      }),
    );
    const message =
      'Protein and carbohydrate alone supply 2,400 kcal, 160 % of the 1,500 kcal energy target; lower them or raise the energy';
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.0.targets.protein': message,
      'dayTypes.0.targets.carbohydrate': message,
    });
  });

  it('grams of some macros within the energy pass: 2 g/kg × 80 kg = 160 g P (640 kcal) of 2,400 kcal; 101 % passes, 102 % not', () => {
    const protein = (perKg: number, kcal: number) =>
      withTraining(day({ energy: { kind: 'kcal', kcal }, protein: { kind: 'g_per_kg', perKg } }));
    expect(validatePlanContent(protein(2, 2400), baseline)).toEqual({});
    // 150 g P + 100 g fat = 600 + 900 = 1,500 kcal against 1,485 (101.0 %) and 1,470 kcal (102.0 %).
    const pf = (kcal: number) =>
      withTraining(
        day({ energy: { kind: 'kcal', kcal }, protein: { kind: 'g', g: 150 }, fat: { kind: 'g', g: 100 } }),
      );
    expect(validatePlanContent(pf(1500 / 1.01), baseline)).toEqual({});
    expect(Object.keys(validatePlanContent(pf(1470), baseline))).toEqual([
      'dayTypes.0.targets.protein',
      'dayTypes.0.targets.fat',
    ]);
  });

  it('dated days are checked on their own paths', () => {
    const c = starterPlanContent();
    c.dates = [
      {
        date: '2026-12-04',
        label: null,
        countdownOffset: -1,
        targets: day({
          energy: { kind: 'kcal', kcal: 2000 },
          protein: { kind: 'pct', pct: 30 },
          carbohydrate: { kind: 'pct', pct: 40 },
          fat: { kind: 'pct', pct: 25 },
        }),
      },
    ];
    expect(Object.keys(validatePlanContent(c, baseline))).toEqual([
      'dates.0.targets.protein',
      'dates.0.targets.carbohydrate',
      'dates.0.targets.fat',
    ]);
  });
});

describe('validatePlanContent: baseline figures', () => {
  it('relative targets the athlete has no figure for are refused on their field', () => {
    const c = withTraining(
      day({
        energy: { kind: 'usual_times', factor: 0.9 },
        protein: { kind: 'g_per_kg', perKg: 2 },
        water: { kind: 'usual_plus', ml: 500 },
      }),
    );
    expect(validatePlanContent(c, noBaseline)).toEqual({
      'dayTypes.0.targets.energy': "The athlete's usual energy intake is not known yet; enter kcal instead",
      'dayTypes.0.targets.water': "The athlete's usual water intake is not known yet; enter mL instead",
      'dayTypes.0.targets.protein':
        'No recent body weight (no weigh-in in the last 60 days); enter grams instead',
    });
    expect(validatePlanContent(c, baseline)).toEqual({});
    // Without a baseline at all (a draft not tied to an athlete) relative figures are not judged.
    expect(validatePlanContent(c, null)).toEqual({});
  });
});

describe('validatePlanContent: protein per kg of lean mass', () => {
  it('needs a measured lean mass, and is for protein only', () => {
    const c = withTraining(
      day({
        protein: { kind: 'g_per_kg_lean', perKg: 2.5 },
        fat: { kind: 'g_per_kg_lean', perKg: 1 },
      }),
    );
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.0.targets.protein':
        'No lean mass yet (a body-composition measurement with a trend weight on its day); enter grams or g/kg instead',
      'dayTypes.0.targets.fat': 'Grams per kg of lean mass is for protein; use grams, a share or g/kg',
    });
    expect(validatePlanContent(c, { ...baseline, leanMassKg: 60 })).toEqual({
      'dayTypes.0.targets.fat': 'Grams per kg of lean mass is for protein; use grams, a share or g/kg',
    });
  });
});

describe('validateTemplate', () => {
  const template = (days: TemplateRequest['days']): TemplateRequest => ({
    name: 'Show week',
    eventType: 'show',
    description: null,
    days,
  });

  it('duplicate offsets', () => {
    const t = template([
      { offset: -3, label: null, targets: emptyDayTargets() },
      { offset: -3, label: null, targets: emptyDayTargets() },
    ]);
    expect(validateTemplate(t)).toEqual({ 'days.1.offset': 'E-3 is listed twice' });
  });

  it('a split with a blank macro is refused in a template too (no baseline needed)', () => {
    const t = template([
      {
        offset: -1,
        label: null,
        targets: day({
          energy: { kind: 'usual_times', factor: 1 },
          protein: { kind: 'pct', pct: 60 },
          fat: { kind: 'pct', pct: 40 },
        }),
      },
    ]);
    expect(validateTemplate(t)).toEqual({
      'days.0.targets.carbohydrate':
        'A split in % needs all three macros; set carbohydrate too (%, g or g/kg)',
    });
  });

  it('shares that do not add up (known without a baseline), and a share without energy', () => {
    const t = template([
      {
        offset: -2,
        label: 'Load',
        targets: day({
          energy: { kind: 'usual_times', factor: 1.2 },
          protein: { kind: 'pct', pct: 20 },
          carbohydrate: { kind: 'pct', pct: 60 },
          fat: { kind: 'pct', pct: 15 },
        }),
      },
      { offset: -1, label: null, targets: day({ fat: { kind: 'pct', pct: 20 } }) },
    ]);
    expect(validateTemplate(t)).toEqual({
      'days.0.targets.protein': SHARES_95,
      'days.0.targets.carbohydrate': SHARES_95,
      'days.0.targets.fat': SHARES_95,
      'days.1.targets.fat': 'A share (%) needs an energy target for the day; set the energy or use grams',
    });
  });

  it('relative figures (usual × factor, g per kg) are fine in a template: they resolve per athlete', () => {
    const t = template([
      {
        offset: -1,
        label: null,
        targets: day({
          energy: { kind: 'usual_times', factor: 1.1 },
          protein: { kind: 'g_per_kg', perKg: 2.2 },
          carbohydrate: { kind: 'g_per_kg', perKg: 6 },
          fat: { kind: 'g', g: 50 },
          water: { kind: 'usual_plus', ml: 1000 },
        }),
      },
    ]);
    expect(validateTemplate(t)).toEqual({});
  });
});

describe('validatePlanContent: times before the event', () => {
  const caffeine = {
    id: '00000000-0000-4000-8000-0000000000c1',
    item: 'Caffeine',
    dose: 200,
    unit: 'mg',
    times: [],
    minutesBeforeEvent: [180],
  };

  it('are refused on a day type of the weekly pattern and a plain dated day, naming the field', () => {
    const c = withTraining(day({ supplements: [caffeine] }));
    c.dates = [
      { date: '2026-12-04', label: null, countdownOffset: null, targets: day({ supplements: [caffeine] }) },
    ];
    expect(validatePlanContent(c, baseline)).toEqual({
      'dayTypes.0.targets.supplements.0.minutesBeforeEvent':
        'Times before the event only work on countdown days; use clock times here',
      'dates.0.targets.supplements.0.minutesBeforeEvent':
        'Times before the event only work on countdown days; use clock times here',
    });
  });

  it('are fine on a countdown day and in a template', () => {
    const c = starterPlanContent();
    c.dates = [
      { date: '2026-12-05', label: 'Show', countdownOffset: 0, targets: day({ supplements: [caffeine] }) },
    ];
    expect(validatePlanContent(c, baseline)).toEqual({});
    const template: TemplateRequest = {
      name: 'T',
      eventType: 'show',
      description: null,
      days: [{ offset: 0, label: null, targets: day({ supplements: [caffeine] }) }],
    };
    expect(validateTemplate(template)).toEqual({});
  });
});
