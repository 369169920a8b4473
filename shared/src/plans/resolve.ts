import { DEFAULT_TOLERANCES } from '../schemas/plans.js';
import type {
  DateOverride,
  DayType,
  PlanBaseline,
  PlanContent,
  DayTargets,
  ResolvedTargets,
  Weekday,
} from '../schemas/plans.js';
import { atwaterKcal } from '../nutrition.js';
import { eventTimedItems, type EventClock } from './event-time.js';
import { fmt, weekdayIndex } from './format.js';
import { gramsFromShare, shareFromGrams, type MacroName } from './macros.js';

/** Weekday of a YYYY-MM-DD calendar date (no time zone involved). */
export function weekdayOf(date: string): Weekday {
  return weekdayIndex(date);
}

/** "E-3", "E-0", "E+1". */
export function countdownDayLabel(offset: number): string {
  if (offset > 0) return `E+${offset}`;
  return `E-${Math.abs(offset)}`;
}

/** Which part of a content sets `date`'s targets: a dated day wins over the weekday pattern. */
export type DayEntry = { kind: 'date'; override: DateOverride } | { kind: 'pattern'; dayType: DayType };
export function dayEntryFor(content: PlanContent, date: string): DayEntry {
  const override = content.dates.find((d) => d.date === date);
  if (override) return { kind: 'date', override };
  const key = content.weekdays[weekdayOf(date)];
  // validatePlanContent refuses a weekday naming a missing type; the first type is a safe fallback.
  const dayType = content.dayTypes.find((t) => t.key === key) ?? content.dayTypes[0];
  if (!dayType) throw new Error('A plan content needs at least one day type');
  return { kind: 'pattern', dayType };
}

/**
 * The version in force on `date` (the athlete's date): the greatest `effectiveFrom` ≤ date; among
 * versions with the same `effectiveFrom`, the highest `number`. Null before the first.
 */
export function versionInForce<V extends { effectiveFrom: string; number: number }>(
  versions: readonly V[],
  date: string,
): V | null {
  let best: V | null = null;
  for (const v of versions) {
    // YYYY-MM-DD strings compare in calendar order.
    if (v.effectiveFrom > date) continue;
    if (
      !best ||
      v.effectiveFrom > best.effectiveFrom ||
      (v.effectiveFrom === best.effectiveFrom && v.number > best.number)
    ) {
      best = v;
    }
  }
  return best;
}

const MACROS: readonly MacroName[] = ['protein', 'carbohydrate', 'fat'];

/**
 * Concrete numbers for one day's targets, resolved against the baseline; `basis` explains relative
 * ones. With `clock` (the event's wall clock and the athlete's zone), supplement times set before
 * the event are placed on the athlete's clock; without it they stay unplaced (`at: null`).
 */
export function resolveTargets(
  targets: DayTargets,
  baseline: PlanBaseline,
  clock?: { event: EventClock | null; athleteTimeZone: string },
): ResolvedTargets {
  const basis: Record<string, string> = {};

  let energyKcal: number | null = null;
  if (targets.energy?.kind === 'kcal') {
    energyKcal = targets.energy.kcal;
  } else if (targets.energy?.kind === 'usual_times' && baseline.usualEnergyKcal != null) {
    energyKcal = baseline.usualEnergyKcal * targets.energy.factor;
    basis.energy = `usual energy ${fmt(baseline.usualEnergyKcal)} kcal × ${fmt(targets.energy.factor, 2)}`;
  }

  const grams: Record<MacroName, number | null> = { protein: null, carbohydrate: null, fat: null };
  for (const macro of MACROS) {
    const t = targets[macro];
    if (!t) continue;
    if (t.kind === 'g') {
      grams[macro] = t.g;
    } else if (t.kind === 'pct') {
      if (energyKcal != null) {
        grams[macro] = gramsFromShare(energyKcal, t.pct, macro);
        basis[macro] = `${fmt(t.pct, 1)} % of ${fmt(energyKcal)} kcal`;
      }
    } else if (t.kind === 'g_per_kg_lean') {
      if (baseline.leanMassKg != null) {
        grams[macro] = t.perKg * baseline.leanMassKg;
        const when = baseline.leanMassDate ? `, measured ${baseline.leanMassDate}` : '';
        basis[macro] = `${fmt(t.perKg, 2)} g/kg × ${fmt(baseline.leanMassKg, 1)} kg lean mass${when}`;
      }
    } else if (baseline.weightKg != null) {
      grams[macro] = t.perKg * baseline.weightKg;
      const source = baseline.weightFromIntake ? ' (intake weight, no weigh-in yet)' : '';
      basis[macro] = `${fmt(t.perKg, 2)} g/kg × ${fmt(baseline.weightKg, 1)} kg${source}`;
    }
  }

  // Shares of the energy target; without one, of the macros' own Atwater energy.
  const pct: Record<MacroName, number | null> = { protein: null, carbohydrate: null, fat: null };
  const allGrams = MACROS.every((m) => grams[m] != null);
  const shareBase =
    energyKcal ??
    (allGrams
      ? atwaterKcal({
          proteinG: grams.protein ?? 0,
          carbohydrateG: grams.carbohydrate ?? 0,
          fatG: grams.fat ?? 0,
        })
      : null);
  for (const macro of MACROS) {
    const t = targets[macro];
    const g = grams[macro];
    if (t?.kind === 'pct') pct[macro] = t.pct;
    else if (g != null && shareBase != null && shareBase > 0)
      pct[macro] = shareFromGrams(g, macro, shareBase);
  }

  let waterMl: number | null = null;
  const w = targets.water;
  if (w?.kind === 'ml') {
    waterMl = w.ml;
  } else if (w && baseline.usualWaterMl != null) {
    const usual = baseline.usualWaterMl;
    if (w.kind === 'usual_plus') {
      waterMl = Math.max(0, usual + w.ml);
      basis.water = `usual water ${fmt(usual)} mL ${w.ml < 0 ? '−' : '+'} ${fmt(Math.abs(w.ml))} mL`;
    } else {
      waterMl = usual * w.factor;
      basis.water = `usual water ${fmt(usual)} mL × ${fmt(w.factor, 2)}`;
    }
  }

  return {
    energyKcal,
    proteinG: grams.protein,
    carbohydrateG: grams.carbohydrate,
    fatG: grams.fat,
    proteinPct: pct.protein,
    carbohydratePct: pct.carbohydrate,
    fatPct: pct.fat,
    waterMl,
    sodiumMg: targets.sodiumMg,
    fluidCutoff: targets.fluidCutoff,
    foodCutoff: targets.foodCutoff ?? null,
    fluidCap: targets.fluidCap ?? null,
    steps: targets.steps,
    cardioMinutes: targets.cardioMinutes,
    supplements: targets.supplements,
    eventTimed: eventTimedItems(targets.supplements, clock?.event ?? null, clock?.athleteTimeZone ?? null),
    note: targets.note,
    meals: targets.meals ?? [],
    basis,
  };
}

/** An empty day (no targets). */
export function emptyDayTargets(): DayTargets {
  return {
    energy: null,
    protein: null,
    carbohydrate: null,
    fat: null,
    water: null,
    sodiumMg: null,
    fluidCutoff: null,
    foodCutoff: null,
    fluidCap: null,
    steps: null,
    cardioMinutes: null,
    supplements: [],
    note: null,
  };
}

/** A starting content: one "Training day" and one "Rest day" type, Mon–Sat training, Sun rest, no targets, default tolerances. */
export function starterPlanContent(): PlanContent {
  return {
    dayTypes: [
      { key: 'training', name: 'Training day', targets: emptyDayTargets() },
      { key: 'rest', name: 'Rest day', targets: emptyDayTargets() },
    ],
    weekdays: {
      mon: 'training',
      tue: 'training',
      wed: 'training',
      thu: 'training',
      fri: 'training',
      sat: 'training',
      sun: 'rest',
    },
    dates: [],
    tolerances: { ...DEFAULT_TOLERANCES },
    countdown: null,
  };
}
