import {
  inReaderUnits,
  RATING_KEYS,
  sumNutrients,
  type DaySummary,
  type DayView,
  type Reader,
} from '@driftmark/shared';
import type { AthleteFlag } from '../entities/athlete-flag.entity.js';
import type { EveningLog } from '../entities/evening-log.entity.js';
import type { FluidEntry } from '../entities/fluid-entry.entity.js';
import type { MealEntry } from '../entities/meal-entry.entity.js';
import type { MealEntryItem } from '../entities/meal-entry-item.entity.js';
import type { SupplementEntry } from '../entities/supplement-entry.entity.js';
import type { SymptomReport } from '../entities/symptom-report.entity.js';
import type { WeighIn } from '../entities/weigh-in.entity.js';

type Of<K extends keyof DayView> = DayView[K];

export function presentWeighIn(w: WeighIn): NonNullable<Of<'weighIn'>> {
  return {
    weightKg: w.weightKg,
    entered: { value: w.enteredValue, unit: w.enteredUnit },
    time: w.localTime,
    tags: w.tags,
    cyclePhase: w.cyclePhase,
    updatedAt: w.updatedAt.toISOString(),
  };
}

export function presentFluid(f: FluidEntry): Of<'fluids'>[number] {
  return {
    id: f.id,
    clientId: f.clientId,
    time: f.localTime,
    volumeMl: f.volumeMl,
    entered: { value: f.enteredValue, unit: f.enteredUnit },
    kind: f.kind,
    sodiumMg: f.sodiumMg,
  };
}

export function presentMeal(m: MealEntry): Of<'meals'>[number] {
  return {
    id: m.id,
    clientId: m.clientId,
    time: m.localTime,
    name: m.name,
    source: m.source,
    items: (m.items ?? []).map(presentMealItem),
    proteinG: m.proteinG,
    carbohydrateG: m.carbohydrateG,
    fatG: m.fatG,
    fibreG: m.fibreG,
    alcoholG: m.alcoholG,
    sodiumMg: m.sodiumMg,
    energyKcal: m.energyKcal,
    plannedMealId: m.plannedMealId ?? null,
  };
}

export function presentMealItem(i: MealEntryItem): Of<'meals'>[number]['items'][number] {
  return {
    foodId: i.foodId,
    foodName: i.foodName,
    quantityG: i.quantityG,
    portion:
      i.portionCount !== null && i.portionUnit !== null && i.portionLabel !== null && i.portionG !== null
        ? { count: i.portionCount, unit: i.portionUnit, label: i.portionLabel, grams: i.portionG }
        : null,
    proteinG: i.proteinG,
    carbohydrateG: i.carbohydrateG,
    fatG: i.fatG,
    fibreG: i.fibreG,
    alcoholG: i.alcoholG,
    sodiumMg: i.sodiumMg,
    energyKcal: i.energyKcal,
  };
}

export function presentSupplement(s: SupplementEntry): Of<'supplements'>[number] {
  return {
    id: s.id,
    clientId: s.clientId,
    time: s.localTime,
    name: s.name,
    dose: s.dose,
    doseUnit: s.doseUnit,
    scheduleItemId: s.scheduleItemId,
  };
}

export function presentEvening(e: EveningLog): NonNullable<Of<'evening'>> {
  return {
    steps: e.steps,
    sleepHours: e.sleepHours,
    cardioMinutes: e.cardioMinutes,
    trainingDone: e.trainingDone,
    trainingNote: e.trainingNote,
    // Every rating key, null when not given, so the web can render the row as it is.
    ratings: Object.fromEntries(RATING_KEYS.map((k) => [k, e.ratings[k] ?? null])),
    note: e.note,
  };
}

export function presentSymptom(s: SymptomReport): Of<'symptoms'>[number] {
  return {
    id: s.id,
    clientId: s.clientId,
    time: s.localTime,
    symptoms: s.symptoms,
    note: s.note,
    urgent: s.urgent,
  };
}

/** A stored flag, its text in the reader's units. */
export function presentFlag(f: AthleteFlag, reader: Reader): Of<'flags'>[number] {
  return {
    id: f.id,
    kind: f.kind,
    message: inReaderUnits(f.message, reader.units),
    createdAt: f.createdAt.toISOString(),
  };
}

export interface DayParts {
  athleteId: string;
  date: string;
  timeZone: string;
  isToday: boolean;
  weighIn: WeighIn | null;
  fluids: FluidEntry[];
  meals: MealEntry[];
  supplements: SupplementEntry[];
  evening: EveningLog | null;
  symptoms: SymptomReport[];
  flags: AthleteFlag[];
  photos: DayView['photos'];
  /** Who reads it: stored texts (flags) come out in their units. */
  reader: Reader;
  /** The plan's part, worked out by the day service. */
  plan: Pick<DayView, 'targets' | 'countdown' | 'cautions'>;
  /** Drift against the targets and the cut-off breach, worked out by the day service. */
  judged: Pick<DayView, 'drift' | 'cutoff' | 'breach' | 'timingBreaches'>;
  /** The meal plan with what was logged of it, worked out by the day service. */
  mealPlan: DayView['mealPlan'];
}

/** Everything logged on one day, with the fluid and meal totals. */
export function presentDay(p: DayParts): DayView {
  return {
    athleteId: p.athleteId,
    date: p.date,
    timeZone: p.timeZone,
    isToday: p.isToday,
    weighIn: p.weighIn ? presentWeighIn(p.weighIn) : null,
    fluids: p.fluids.map(presentFluid),
    fluidTotalMl: p.fluids.reduce((sum, f) => sum + f.volumeMl, 0),
    meals: p.meals.map(presentMeal),
    totals: sumNutrients(p.meals, p.fluids),
    supplements: p.supplements.map(presentSupplement),
    evening: p.evening ? presentEvening(p.evening) : null,
    symptoms: p.symptoms.map(presentSymptom),
    flags: p.flags.map((f) => presentFlag(f, p.reader)),
    photos: p.photos,
    targets: p.plan.targets,
    countdown: p.plan.countdown,
    cautions: p.plan.cautions,
    drift: p.judged.drift,
    cutoff: p.judged.cutoff,
    breach: p.judged.breach,
    timingBreaches: p.judged.timingBreaches,
    mealPlan: p.mealPlan,
  };
}

export function emptyDaySummary(date: string): DaySummary {
  return {
    date,
    weightKg: null,
    fluidTotalMl: 0,
    energyKcal: 0,
    proteinG: 0,
    mealCount: 0,
    hasEvening: false,
    symptomCount: 0,
    urgent: false,
    photoCount: 0,
  };
}
