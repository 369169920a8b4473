import { describe, expect, it } from 'vitest';
import type { DayTargets, PlanBaseline, PlanContent } from '../schemas/plans.js';
import { planContent } from '../schemas/plans.js';
import {
  countdownDayLabel,
  dayEntryFor,
  emptyDayTargets,
  resolveTargets,
  starterPlanContent,
  versionInForce,
  weekdayOf,
} from './resolve.js';

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });
const baseline: PlanBaseline = { usualWaterMl: 3000, usualEnergyKcal: 2400, weightKg: 80, sex: 'male' };
const noBaseline: PlanBaseline = { usualWaterMl: null, usualEnergyKcal: null, weightKg: null, sex: null };

/** The athlete's local calendar date of an instant (what the API passes as `date`). */
function localDateOf(instant: string, timeZone: string): string {
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).format(new Date(instant));
}

describe('weekdayOf and countdownDayLabel', () => {
  it('reads the weekday of a calendar date without a time zone', () => {
    expect(weekdayOf('2026-12-01')).toBe('tue');
    expect(weekdayOf('2026-12-06')).toBe('sun');
    expect(weekdayOf('2024-02-29')).toBe('thu');
  });

  it('labels countdown days E-3, E-0, E+1', () => {
    expect(countdownDayLabel(-3)).toBe('E-3');
    expect(countdownDayLabel(0)).toBe('E-0');
    expect(countdownDayLabel(1)).toBe('E+1');
  });
});

describe('starterPlanContent and dayEntryFor', () => {
  it('the starter is a valid content: Mon–Sat training, Sun rest', () => {
    const c = starterPlanContent();
    expect(planContent.parse(c)).toEqual(c);
    expect(dayEntryFor(c, '2026-12-05')).toMatchObject({ kind: 'pattern', dayType: { key: 'training' } });
    expect(dayEntryFor(c, '2026-12-06')).toMatchObject({ kind: 'pattern', dayType: { key: 'rest' } });
  });

  it('a dated day wins over the weekday pattern', () => {
    const c: PlanContent = {
      ...starterPlanContent(),
      dates: [{ date: '2026-12-06', label: 'Refeed', countdownOffset: null, targets: emptyDayTargets() }],
    };
    expect(dayEntryFor(c, '2026-12-06')).toMatchObject({ kind: 'date', override: { label: 'Refeed' } });
    expect(dayEntryFor(c, '2026-12-13')).toMatchObject({ kind: 'pattern', dayType: { key: 'rest' } });
  });
});

describe('versionInForce', () => {
  const versions = [
    { id: 'v1', number: 1, effectiveFrom: '2026-08-01' },
    { id: 'v2', number: 2, effectiveFrom: '2026-10-10' },
    { id: 'v3', number: 3, effectiveFrom: '2026-10-10' },
    { id: 'v4', number: 4, effectiveFrom: '2026-12-02' },
  ];

  it('none before the first version', () => {
    expect(versionInForce(versions, '2026-07-31')).toBeNull();
    expect(versionInForce([], '2026-07-31')).toBeNull();
  });

  it('the day before, on and after effectiveFrom (semantics of issue 4: greatest effectiveFrom ≤ date)', () => {
    expect(versionInForce(versions, '2026-12-01')?.id).toBe('v3');
    expect(versionInForce(versions, '2026-12-02')?.id).toBe('v4');
    expect(versionInForce(versions, '2026-12-03')?.id).toBe('v4');
    expect(versionInForce(versions, '2026-08-01')?.id).toBe('v1');
  });

  it('two versions from the same day: the highest number wins, whatever the order', () => {
    expect(versionInForce(versions, '2026-10-10')?.id).toBe('v3');
    expect(versionInForce([...versions].reverse(), '2026-10-10')?.id).toBe('v3');
  });

  it('the same instant falls in different versions for athletes in different time zones', () => {
    // 2026-12-01T11:30Z is already 2 Dec in Auckland (UTC+13 in December) but still 1 Dec in Honolulu (UTC−10).
    const instant = '2026-12-01T11:30:00Z';
    expect(localDateOf(instant, 'Pacific/Auckland')).toBe('2026-12-02');
    expect(localDateOf(instant, 'Pacific/Honolulu')).toBe('2026-12-01');
    expect(versionInForce(versions, localDateOf(instant, 'Pacific/Auckland'))?.id).toBe('v4');
    expect(versionInForce(versions, localDateOf(instant, 'Pacific/Honolulu'))?.id).toBe('v3');
  });
});

describe('resolveTargets', () => {
  it('absolute kcal and grams pass through; shares follow from the energy (FAO 2003 FNP 77; Merrill & Watt 1955)', () => {
    const r = resolveTargets(
      day({
        energy: { kind: 'kcal', kcal: 2400 },
        protein: { kind: 'g', g: 180 },
        carbohydrate: { kind: 'g', g: 270 },
        fat: { kind: 'pct', pct: 25 },
      }),
      baseline,
    );
    expect(r.energyKcal).toBe(2400);
    expect(r.proteinG).toBe(180);
    expect(r.fatG).toBeCloseTo(66.6667, 4);
    expect(r.proteinPct).toBeCloseTo(30, 6);
    expect(r.carbohydratePct).toBeCloseTo(45, 6);
    expect(r.fatPct).toBe(25);
    expect(r.basis.fat).toBe('25 % of 2,400 kcal');
  });

  it('usual energy × factor, and shares of it (FAO 2003 FNP 77)', () => {
    const r = resolveTargets(
      day({ energy: { kind: 'usual_times', factor: 0.9 }, carbohydrate: { kind: 'pct', pct: 45 } }),
      baseline,
    );
    expect(r.energyKcal).toBeCloseTo(2160, 6);
    expect(r.carbohydrateG).toBeCloseTo(243, 6);
    expect(r.basis.energy).toBe('usual energy 2,400 kcal × 0.9');
    expect(r.basis.carbohydrate).toBe('45 % of 2,160 kcal');
  });

  it('g per kg uses the baseline weight; shares without an energy target are of the macros’ own energy', () => {
    const r = resolveTargets(
      day({
        protein: { kind: 'g_per_kg', perKg: 2.2 },
        carbohydrate: { kind: 'g', g: 300 },
        fat: { kind: 'g', g: 60 },
      }),
      baseline,
    );
    expect(r.proteinG).toBeCloseTo(176, 6);
    expect(r.basis.protein).toBe('2.2 g/kg × 80 kg');
    // 176·4 + 300·4 + 60·9 = 2444 kcal (Atwater, FAO 2003 FNP 77)
    expect(r.proteinPct).toBeCloseTo((100 * 704) / 2444, 6);
    expect(r.energyKcal).toBeNull();
  });

  it('g per kg of lean mass uses the latest measured lean mass (Helms 2014, JISSN 11:20: 2.3–3.1 g/kg)', () => {
    // REFERENCES.md §4 Helms check: LBM 68 kg → 156.4–210.8 g protein.
    const lean = { ...baseline, leanMassKg: 68, leanMassDate: '2026-11-20' };
    const low = resolveTargets(day({ protein: { kind: 'g_per_kg_lean', perKg: 2.3 } }), lean);
    const high = resolveTargets(day({ protein: { kind: 'g_per_kg_lean', perKg: 3.1 } }), lean);
    expect(low.proteinG).toBeCloseTo(156.4, 6);
    expect(high.proteinG).toBeCloseTo(210.8, 6);
    expect(low.basis.protein).toBe('2.3 g/kg × 68 kg lean mass, measured 2026-11-20');
    // Without a measurement it stays unresolved (validatePlanContent reports it).
    expect(
      resolveTargets(day({ protein: { kind: 'g_per_kg_lean', perKg: 2.5 } }), baseline).proteinG,
    ).toBeNull();
  });

  it('g per kg of body weight says when the weight is the intake’s', () => {
    const r = resolveTargets(day({ protein: { kind: 'g_per_kg', perKg: 2 } }), {
      ...baseline,
      weightFromIntake: true,
    });
    expect(r.basis.protein).toBe('2 g/kg × 80 kg (intake weight, no weigh-in yet)');
  });

  it('water: mL, usual + mL (a water-load day at usual + 1 L — common practice, no source), usual × factor', () => {
    expect(resolveTargets(day({ water: { kind: 'ml', ml: 3500 } }), baseline).waterMl).toBe(3500);
    const load = resolveTargets(day({ water: { kind: 'usual_plus', ml: 1000 } }), baseline);
    expect(load.waterMl).toBe(4000);
    expect(load.basis.water).toBe('usual water 3,000 mL + 1,000 mL');
    const less = resolveTargets(day({ water: { kind: 'usual_plus', ml: -500 } }), baseline);
    expect(less.waterMl).toBe(2500);
    expect(less.basis.water).toBe('usual water 3,000 mL − 500 mL');
    const times = resolveTargets(day({ water: { kind: 'usual_times', factor: 1.5 } }), baseline);
    expect(times.waterMl).toBe(4500);
    expect(times.basis.water).toBe('usual water 3,000 mL × 1.5');
  });

  it('a relative target without its baseline figure resolves to null (validatePlanContent reports it)', () => {
    const r = resolveTargets(
      day({
        energy: { kind: 'usual_times', factor: 1 },
        protein: { kind: 'g_per_kg', perKg: 2 },
        carbohydrate: { kind: 'pct', pct: 50 },
        water: { kind: 'usual_plus', ml: 1000 },
        sodiumMg: 2300,
      }),
      noBaseline,
    );
    expect(r).toMatchObject({
      energyKcal: null,
      proteinG: null,
      carbohydrateG: null,
      carbohydratePct: 50,
      waterMl: null,
      sodiumMg: 2300,
    });
    expect(r.basis).toEqual({});
  });
});
