import { describe, expect, it } from 'vitest';
import type {
  DayTargets,
  GuardrailContext,
  GuardrailWarning,
  PlanBaseline,
  PlanContent,
  ScheduleItem,
} from '../schemas/plans.js';
import { checkGuardrails, GUARDRAIL_DEFAULTS, unacknowledged } from './guardrails.js';
import { addDays } from './format.js';
import { emptyDayTargets, starterPlanContent } from './resolve.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const baseline: PlanBaseline = { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'female' };
const ctx = (over: Partial<GuardrailContext> = {}, b: Partial<PlanBaseline> = {}): GuardrailContext => ({
  baseline: { ...baseline, ...b },
  floors: GUARDRAIL_DEFAULTS,
  today: '2026-12-01',
  eventType: null,
  eventDate: null,
  weighInLimitKg: null,
  ...over,
});
let n = 0;
const item = (name: string): ScheduleItem => ({
  id: `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`,
  item: name,
  dose: null,
  unit: null,
  times: ['08:00'],
});

/** A plan whose training days (Mon–Sat) and rest day (Sun) carry these targets. */
function plan(training: Partial<DayTargets>, rest: Partial<DayTargets> = training): PlanContent {
  const c = starterPlanContent();
  c.dayTypes[0]!.targets = day(training);
  c.dayTypes[1]!.targets = day(rest);
  return c;
}
/** A plan with one dated day. */
function dated(
  date: string,
  targets: Partial<DayTargets>,
  countdownOffset: number | null = null,
): PlanContent {
  const c = starterPlanContent();
  c.dates = [{ date, label: null, countdownOffset, targets: day(targets) }];
  return c;
}
const codes = (ws: GuardrailWarning[]) => ws.map((w) => w.key);
const only = (ws: GuardrailWarning[], code: string) => ws.filter((w) => w.code === code);

describe('a plan with nothing risky', () => {
  it('raises no warning', () => {
    const c = plan(
      { energy: { kind: 'kcal', kcal: 2100 }, water: { kind: 'ml', ml: 3000 }, sodiumMg: 2300 },
      { energy: { kind: 'kcal', kcal: 2000 } },
    );
    expect(checkGuardrails(c, ctx())).toEqual([]);
  });
});

describe('energy_floor (team floor; defaults 1,200 / 1,500 kcal: common practice, no source)', () => {
  it('female athlete, rest day at 1,100 kcal', () => {
    const ws = checkGuardrails(plan({}, { energy: { kind: 'kcal', kcal: 1100 } }), ctx());
    expect(ws).toEqual([
      {
        key: 'energy_floor:type:rest',
        code: 'energy_floor',
        severity: 'warning',
        scope: { kind: 'day_type', key: 'rest' },
        message:
          'Rest day: energy 1,100 kcal is below the team floor of 1,200 kcal. Eating this little needs a second look; agree it with a registered dietitian or physician.',
        source: expect.stringContaining('common practice, no source'),
        field: 'dayTypes.1.targets.energy',
      },
    ]);
  });

  it('male athlete: the floor is 1,500 kcal', () => {
    const c = plan({ energy: { kind: 'kcal', kcal: 1400 } }, {});
    expect(codes(checkGuardrails(c, ctx({}, { sex: 'male' })))).toEqual(['energy_floor:type:training']);
    expect(checkGuardrails(c, ctx({}, { sex: 'female' }))).toEqual([]);
  });

  it('unknown sex: the women’s floor is used, and the message says so', () => {
    const ws = checkGuardrails(plan({ energy: { kind: 'kcal', kcal: 1150 } }, {}), ctx({}, { sex: null }));
    expect(ws[0]!.message).toContain(
      "below the team floor of 1,200 kcal (the women's floor, as the athlete's sex is not recorded)",
    );
    const above = checkGuardrails(plan({ energy: { kind: 'kcal', kcal: 1300 } }, {}), ctx({}, { sex: null }));
    expect(only(above, 'energy_floor')).toEqual([]);
  });

  it('the team’s own floor, and a relative energy (usual 2,400 × 0.5 = 1,200 kcal)', () => {
    const floors = { ...GUARDRAIL_DEFAULTS, energyKcal: { female: 1400, male: 1700 } };
    const c = plan({ energy: { kind: 'usual_times', factor: 0.5 } }, {});
    expect(codes(checkGuardrails(c, ctx({ floors })))).toContain('energy_floor:type:training');
    expect(only(checkGuardrails(c, ctx()), 'energy_floor')).toEqual([]);
  });
});

describe('water_floor (defaults 1,600 / 2,000 mL: EFSA 2010 AI total water 2.0 / 2.5 L less ≈20 % from food — the 20 % from memory)', () => {
  it('below the floor per sex', () => {
    const c = plan({ water: { kind: 'ml', ml: 1900 } }, {});
    expect(only(checkGuardrails(c, ctx()), 'water_floor')).toEqual([]);
    const ws = only(checkGuardrails(c, ctx({}, { sex: 'male' })), 'water_floor');
    expect(ws[0]).toMatchObject({
      key: 'water_floor:type:training',
      severity: 'warning',
      field: 'dayTypes.0.targets.water',
    });
    expect(ws[0]!.message).toContain('water 1,900 mL is below the team floor of 2,000 mL');
    expect(ws[0]!.source).toContain('EFSA (2010)');
    expect(ws[0]!.source).toContain('from memory');
  });
});

describe('sodium_low (< 1,500 mg: NASEM 2019 adequate intake, doi:10.17226/25353)', () => {
  it('1,499 mg warns, 1,500 mg does not', () => {
    const ws = checkGuardrails(dated('2026-12-03', { sodiumMg: 1499 }), ctx());
    expect(ws).toHaveLength(1);
    expect(ws[0]).toMatchObject({
      key: 'sodium_low:date:2026-12-03',
      scope: { kind: 'date', date: '2026-12-03' },
      field: 'dates.0.targets.sodiumMg',
      severity: 'warning',
    });
    expect(ws[0]!.message).toMatch(
      /^Thu 3 Dec: sodium 1,499 mg is below the adequate intake of 1,500 mg a day\./,
    );
    expect(ws[0]!.message).toContain('registered dietitian');
    expect(ws[0]!.source).toContain('doi:10.17226/25353');
    expect(checkGuardrails(dated('2026-12-03', { sodiumMg: 1500 }), ctx())).toEqual([]);
  });
});

describe('potassium (NASEM 2019; REFERENCES §7 rule 4: warn and suggest a registered dietitian)', () => {
  it('a potassium item in the schedule', () => {
    const ws = checkGuardrails(
      plan({ supplements: [item('Creatine'), item('Potassium citrate')] }, {}),
      ctx(),
    );
    expect(ws).toHaveLength(1);
    expect(ws[0]).toMatchObject({
      key: 'potassium:type:training',
      severity: 'warning',
      field: 'dayTypes.0.targets.supplements.1.item',
    });
    expect(ws[0]!.message).toContain('“Potassium citrate” in the schedule changes potassium intake');
    expect(ws[0]!.message).toContain('registered dietitian');
    expect(ws[0]!.source).toContain('NASEM (2019)');
  });
});

describe('diuretic (strong; REFERENCES §7 rule 3: Sturmi 1995; Mayr 2012; Cheung 2014)', () => {
  const RULE_3 =
    'Diuretics and fluid/electrolyte restriction have caused dangerous potassium disturbances, paralysis, ' +
    'cardiac arrhythmia and death. Use only under supervision of a licensed physician.';

  it.each([
    'Furosemide 40 mg',
    'hydrochlorothiazide',
    'Spironolactone',
    'Bumetanide',
    'Torsemide',
    'Chlorthalidone',
    'Herbal diuretic',
    'Water pills',
    'Dandelion root tea',
    'Uva ursi',
    'Juniper berry',
    'Horsetail extract',
    // The ATC C03 list and herbal water pills of diuretics.ts (its own tests list every name).
    'Aldactone',
    'Diamox',
    'Burinex',
    'Demadex',
    'Zaroxolyn',
    'Furosemid',
    'Taraxacum officinale',
    'Water pill',
  ])('“%s” is flagged', (name) => {
    const ws = checkGuardrails(dated('2026-12-04', { supplements: [item(name)] }, -1), ctx());
    const w = only(ws, 'diuretic')[0];
    expect(w).toMatchObject({ key: 'diuretic:date:2026-12-04', severity: 'strong' });
    expect(w!.message).toBe(`Fri 4 Dec (E-1): “${name}” in the schedule is a diuretic-type item. ${RULE_3}`);
    expect(w!.source).toMatch(/Sturmi & Rutecki 1995.*Mayr.*2012.*Cheung et al\. 2014/);
  });

  it('several items on one day make one warning; ordinary supplements are not flagged', () => {
    const ws = checkGuardrails(
      dated('2026-12-04', { supplements: [item('Creatine'), item('Furosemide'), item('Dandelion')] }),
      ctx(),
    );
    expect(codes(ws)).toEqual(['diuretic:date:2026-12-04']);
    expect(ws[0]!.message).toContain('“Furosemide” and “Dandelion” in the schedule are diuretic-type items');
    expect(ws[0]!.field).toBe('dates.0.targets.supplements.1.item');
  });
});

describe('fluid_restriction (strong; a cut-off, or water below half of usual — threshold common practice, no source)', () => {
  it('a fluid cut-off', () => {
    const ws = checkGuardrails(
      dated('2026-12-05', { fluidCutoff: { time: '18:00', allowanceMl: 250 } }),
      ctx(),
    );
    expect(ws[0]).toMatchObject({
      key: 'fluid_restriction:date:2026-12-05',
      severity: 'strong',
      field: 'dates.0.targets.fluidCutoff',
    });
    expect(ws[0]!.message).toMatch(
      /^Sat 5 Dec: fluids stop at 18:00 with 250 mL allowed after\. Diuretics and/,
    );
    expect(ws[0]!.source).toContain('common practice, no source');
  });

  it('water below half of usual (1,400 of 3,000 mL), merged with a cut-off on the same day', () => {
    const ws = checkGuardrails(
      dated('2026-12-05', {
        water: { kind: 'usual_times', factor: 0.4 },
        fluidCutoff: { time: '16:00', allowanceMl: 0 },
      }),
      ctx(),
    );
    const w = only(ws, 'fluid_restriction');
    expect(w).toHaveLength(1);
    expect(w[0]!.message).toContain(
      'fluids stop at 16:00 with 0 mL allowed after, and water 1,200 mL is less than half of the usual 3,000 mL',
    );
    // 1,200 mL is below the women's floor of 1,600 mL too: a separate warning.
    expect(codes(ws)).toEqual(['water_floor:date:2026-12-05', 'fluid_restriction:date:2026-12-05']);
  });

  it('water at 1,600 of 3,000 mL is not a restriction', () => {
    expect(checkGuardrails(dated('2026-12-05', { water: { kind: 'ml', ml: 1600 } }), ctx())).toEqual([]);
  });
});

describe('carb_load (≥ 8 g/kg or ≥ 1.5× the median pattern day: common practice, no source; de Moraes 2019; Helms 2014)', () => {
  it('8 g/kg of an 80 kg athlete (640 g) is a load; 7.9 g/kg alone is not', () => {
    const ws = checkGuardrails(
      dated('2026-12-10', { carbohydrate: { kind: 'g_per_kg', perKg: 8 } }, -2),
      ctx(),
    );
    expect(ws).toHaveLength(1);
    expect(ws[0]).toMatchObject({ key: 'carb_load:date:2026-12-10', severity: 'warning' });
    expect(ws[0]!.message).toContain('carbohydrate 640 g (8.0 g/kg) is a carbohydrate load');
    expect(ws[0]!.message).toContain('Rehearse it on a practice day first (Helms 2014)');
    expect(ws[0]!.message).toContain('7 of 15 bodybuilders had diarrhoea in one study (de Moraes 2019)');
    expect(ws[0]!.source).toMatch(/de Moraes et al\. 2019.*Helms.*2014/);
    expect(checkGuardrails(dated('2026-12-10', { carbohydrate: { kind: 'g', g: 632 } }), ctx())).toEqual([]);
  });

  it('1.5× the median pattern carbohydrate (300 g) is a load even below 8 g/kg', () => {
    const c = plan({ carbohydrate: { kind: 'g', g: 300 } }, { carbohydrate: { kind: 'g', g: 200 } });
    c.dates = [
      {
        date: '2026-12-10',
        label: null,
        countdownOffset: null,
        targets: day({ carbohydrate: { kind: 'g', g: 450 } }),
      },
    ];
    const ws = checkGuardrails(c, ctx());
    expect(codes(ws)).toEqual(['carb_load:date:2026-12-10']);
    expect(ws[0]!.message).toContain('carbohydrate 450 g (5.6 g/kg, 1.5× the usual 300 g)');
    c.dates[0]!.targets.carbohydrate = { kind: 'g', g: 440 };
    expect(checkGuardrails(c, ctx())).toEqual([]);
  });
});

describe('loss_rate (> 1 %/wk, Helms 2014) and loss_rate_strong (> 1.4 %/wk, Garthe 2011); 7,700 kcal/kg common practice, no source', () => {
  // 80 kg, usual 2,400 kcal: 1 %/wk = 0.8 kg = 6,160 kcal/wk = 880 kcal/d; 1.4 %/wk = 1,232 kcal/d.
  it('1,500 kcal every day: 900 kcal/d → 0.82 kg/wk → 1.0 % a week → warning', () => {
    const ws = checkGuardrails(plan({ energy: { kind: 'kcal', kcal: 1500 } }), ctx());
    expect(ws).toEqual([
      {
        key: 'loss_rate:plan',
        code: 'loss_rate',
        severity: 'warning',
        scope: { kind: 'plan' },
        message:
          'The weekly pattern averages 1,500 kcal a day, 900 kcal below the usual 2,400 kcal: about 0.82 kg a week, ' +
          '1.0 % of body weight (80.0 kg) a week. Losing about 0.5–1 % of body weight a week is advised to keep muscle (Helms 2014).',
        source: expect.stringContaining('Helms, Aragon & Fitschen 2014'),
        field: null,
      },
    ]);
  });

  it('1,100 kcal every day: 1,300 kcal/d → 1.5 % a week → only the strong warning', () => {
    const ws = checkGuardrails(plan({ energy: { kind: 'kcal', kcal: 1100 } }), ctx({}, { sex: 'female' }));
    const rate = ws.filter((w) => w.scope.kind === 'plan');
    expect(rate.map((w) => [w.key, w.severity])).toEqual([['loss_rate_strong:plan', 'strong']]);
    expect(rate[0]!.message).toContain('1.5 % of body weight (80.0 kg) a week');
    expect(rate[0]!.message).toContain('(Garthe 2011)');
    expect(rate[0]!.source).toContain('Garthe et al. 2011');
  });

  it('the mean over the 7 weekdays: six days at 1,700 and a Sunday at 2,400 → 1,800 kcal, 0.7 % → none', () => {
    const c = plan({ energy: { kind: 'kcal', kcal: 1700 } }, { energy: { kind: 'kcal', kcal: 2400 } });
    expect(checkGuardrails(c, ctx())).toEqual([]);
    // 600 kcal/d = 0.55 kg a week: 1.1 % a week for a 50 kg athlete.
    expect(codes(checkGuardrails(c, ctx({}, { weightKg: 50 })))).toEqual(['loss_rate:plan']);
  });

  it('a day without an energy target plans no deficit; a day of macros in grams counts their Atwater energy', () => {
    // Mon–Sat 1,500 kcal, Sunday no target (counts at 2,400): mean 1,629 kcal → 0.70 kg, 0.9 % → none.
    expect(checkGuardrails(plan({ energy: { kind: 'kcal', kcal: 1500 } }, {}), ctx())).toEqual([]);
    // Mon–Sat 100 P / 150 C / 50 F = 1,450 kcal (FAO 2003 FNP 77), Sunday 1,450 kcal → 950 kcal/d → 1.1 %.
    const grams = {
      protein: { kind: 'g', g: 100 },
      carbohydrate: { kind: 'g', g: 150 },
      fat: { kind: 'g', g: 50 },
    } as const;
    const ws = checkGuardrails(plan(grams, { energy: { kind: 'kcal', kcal: 1450 } }), ctx());
    expect(ws.map((w) => w.key)).toEqual(['loss_rate:plan']);
    expect(ws[0]!.message).toContain('averages 1,450 kcal a day');
  });

  // Any 7 consecutive planned days count, not only the weekly pattern (issue 11 item 6).
  const datedRun = (from: string, days: number, targets: Partial<DayTargets>, lastOffset?: number) => {
    const c = starterPlanContent();
    c.dates = Array.from({ length: days }, (_, i) => ({
      date: addDays(from, i),
      label: null,
      countdownOffset: lastOffset === undefined ? null : lastOffset - (days - 1 - i),
      targets: day(targets),
    }));
    return c;
  };

  it('60 dated days at 1,600 kcal (usual 2,600, pattern without targets): 1,000 kcal/d → 0.91 kg → 1.1 % a week', () => {
    const ws = checkGuardrails(
      datedRun('2026-12-01', 60, { energy: { kind: 'kcal', kcal: 1600 } }),
      ctx({}, { usualEnergyKcal: 2600 }),
    );
    expect(ws.map((w) => [w.key, w.severity])).toEqual([['loss_rate:plan', 'warning']]);
    expect(ws[0]!.message).toBe(
      'The 7 planned days from Tue 1 Dec to Mon 7 Dec average 1,600 kcal a day, 1,000 kcal below the usual ' +
        '2,600 kcal: about 0.91 kg a week, 1.1 % of body weight (80.0 kg) a week. ' +
        'Losing about 0.5–1 % of body weight a week is advised to keep muscle (Helms 2014).',
    );
  });

  it('a countdown E-6…E-0 at 0.5 × usual (1,200 of 2,400 kcal), 58 kg: 1.09 kg → 1.9 % a week → strong', () => {
    const c = datedRun('2026-12-03', 7, { energy: { kind: 'usual_times', factor: 0.5 } }, 0);
    expect(c.dates.map((d) => d.countdownOffset)).toEqual([-6, -5, -4, -3, -2, -1, 0]);
    const ws = checkGuardrails(c, ctx({}, { weightKg: 58 }));
    expect(ws.map((w) => [w.key, w.severity])).toEqual([['loss_rate_strong:plan', 'strong']]);
    expect(ws[0]!.message).toContain(
      'The 7 planned days from Thu 3 Dec to Wed 9 Dec average 1,200 kcal a day, 1,200 kcal below the usual ' +
        '2,400 kcal: about 1.09 kg a week, 1.9 % of body weight (58.0 kg) a week',
    );
    expect(ws[0]!.source).toContain('Garthe et al. 2011');
  });

  it('dated days mix with the pattern days around them; the fastest week is reported', () => {
    // Three dated days at 1,000 kcal among pattern days at 2,400: (3·1,000 + 4·2,400)/7 = 1,800 kcal,
    // 600 kcal/d → 0.55 kg a week: 0.7 % at 80 kg (none), 1.1 % at 50 kg (warning).
    const c = datedRun('2026-12-10', 3, { energy: { kind: 'kcal', kcal: 1000 } });
    c.dayTypes[0]!.targets = day({ energy: { kind: 'kcal', kcal: 2400 } });
    c.dayTypes[1]!.targets = day({ energy: { kind: 'kcal', kcal: 2400 } });
    const rates = (weightKg: number) =>
      checkGuardrails(c, ctx({}, { weightKg })).filter((w) => w.scope.kind === 'plan');
    expect(rates(80)).toEqual([]);
    const ws = rates(50);
    expect(ws.map((w) => w.key)).toEqual(['loss_rate:plan']);
    // The earliest run of 7 holding all three (10–12 Dec) starts on 6 Dec.
    expect(ws[0]!.message).toContain(
      'The 7 planned days from Sun 6 Dec to Sat 12 Dec average 1,800 kcal a day',
    );
  });

  it('dated days before today are not counted', () => {
    const c = datedRun('2026-11-20', 10, { energy: { kind: 'kcal', kcal: 1000 } });
    expect(checkGuardrails(c, ctx({ today: '2026-12-01' }))).toEqual([]);
    // The same days from today on: 1,400 kcal/d below usual → 1.27 kg, 1.6 % a week.
    expect(codes(checkGuardrails(c, ctx({ today: '2026-11-20' })))).toContain('loss_rate_strong:plan');
  });

  it('needs the usual energy and a weight', () => {
    const c = plan({ energy: { kind: 'kcal', kcal: 1500 } });
    expect(checkGuardrails(c, ctx({}, { usualEnergyKcal: null }))).toEqual([]);
    expect(checkGuardrails(c, ctx({}, { weightKg: null }))).toEqual([]);
  });
});

describe('make_weight_rate (weigh-in limit; > 1 %/wk Helms 2014, > 1.4 %/wk Garthe 2011; Reale 2017 on recovery)', () => {
  const weighIn = (limit: number, eventDate: string, weightKg: number) =>
    ctx({ eventType: 'weigh_in', eventDate, weighInLimitKg: limit }, { weightKg });

  it('68.4 → 66.0 kg in 4 days: 6.1 % a week → strong', () => {
    const ws = checkGuardrails(starterPlanContent(), weighIn(66, '2026-12-05', 68.4));
    expect(ws).toHaveLength(1);
    expect(ws[0]).toMatchObject({
      key: 'make_weight_rate:plan',
      severity: 'strong',
      scope: { kind: 'plan' },
    });
    expect(ws[0]!.message).toBe(
      'Reaching the weigh-in limit of 66.0 kg by Sat 5 Dec (4 days) from 68.4 kg means losing 2.4 kg, ' +
        '6.1 % of body weight a week, faster than the 1 % a week advised and above the 1.4 % a week at which ' +
        'lean mass suffered. The time between weigh-in and competition limits how much of a fast loss can be won back (Reale 2017).',
    );
    expect(ws[0]!.source).toContain('Reale, Slater & Burke 2017');
  });

  it('70 → 66.6 kg in 4 weeks: 1.2 % a week → warning; 70 → 69 kg in 8 weeks → none', () => {
    const ws = checkGuardrails(starterPlanContent(), weighIn(66.6, '2026-12-29', 70));
    expect(ws.map((w) => [w.code, w.severity])).toEqual([['make_weight_rate', 'warning']]);
    expect(ws[0]!.message).toContain('1.2 % of body weight a week');
    expect(checkGuardrails(starterPlanContent(), weighIn(69, '2027-01-26', 70))).toEqual([]);
  });

  it('not for other events, nor when already at the limit', () => {
    const c = starterPlanContent();
    expect(
      checkGuardrails(
        c,
        ctx({ eventType: 'show', eventDate: '2026-12-05', weighInLimitKg: 66 }, { weightKg: 68.4 }),
      ),
    ).toEqual([]);
    expect(checkGuardrails(c, weighIn(66, '2026-12-05', 65.8))).toEqual([]);
  });
});

describe('scopes and keys', () => {
  it('dated days before today are not checked (past days keep their plan); today and later are', () => {
    const c = starterPlanContent();
    c.dates = [
      { date: '2026-11-30', label: null, countdownOffset: null, targets: day({ sodiumMg: 500 }) },
      { date: '2026-12-01', label: null, countdownOffset: null, targets: day({ sodiumMg: 500 }) },
    ];
    expect(codes(checkGuardrails(c, ctx()))).toEqual(['sodium_low:date:2026-12-01']);
  });

  it('keys are unique within a content, one per code and scope', () => {
    const c = plan(
      {
        sodiumMg: 1000,
        fluidCutoff: { time: '20:00', allowanceMl: 100 },
        supplements: [item('Lasix'), item('Potassium')],
      },
      { sodiumMg: 1000, energy: { kind: 'kcal', kcal: 1000 } },
    );
    c.dates = [{ date: '2026-12-02', label: null, countdownOffset: null, targets: day({ sodiumMg: 1000 }) }];
    const keys = codes(checkGuardrails(c, ctx()));
    expect(new Set(keys).size).toBe(keys.length);
    expect(keys).toEqual([
      'sodium_low:type:training',
      'potassium:type:training',
      'diuretic:type:training',
      'fluid_restriction:type:training',
      'energy_floor:type:rest',
      'sodium_low:type:rest',
      'sodium_low:date:2026-12-02',
    ]);
  });
});

describe('unacknowledged', () => {
  it('lists the warnings whose key was not acknowledged', () => {
    const ws = checkGuardrails(plan({ sodiumMg: 1000 }, { sodiumMg: 900 }), ctx());
    expect(unacknowledged(ws, ['sodium_low:type:training']).map((w) => w.key)).toEqual([
      'sodium_low:type:rest',
    ]);
    expect(
      unacknowledged(
        ws,
        ws.map((w) => w.key),
      ),
    ).toEqual([]);
  });
});
