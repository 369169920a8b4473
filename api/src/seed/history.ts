/**
 * Daily check-in history for the demo athletes: pure, deterministic generators. Given an athlete's
 * definition (demo-team.ts) and the seed date in that athlete's time zone, they produce plain
 * objects per local day (weigh-in, fluids, meals, supplements, evening, symptoms) that the seed
 * writes as they are. No clock and no database here: the same inputs give the same days on
 * every machine, and every random draw comes from the athlete's own seed.
 *
 * Each kind of draw has its own stream (keyed by the athlete's seed, a name and the day), so a
 * change to, say, the meal generator leaves every weight unchanged.
 *
 * All numbers are invented; they only have to look like a real athlete's log.
 */
import {
  atwaterKcal,
  KG_PER_LB,
  ML_PER_US_FL_OZ,
  type CYCLE_PHASES,
  type RatingKey,
  type Symptom,
  type VolumeUnit,
  type WeighInTag,
  type WeightUnit,
  inFinalWeek,
  URGENT_SYMPTOMS,
  weekdayNumber,
} from '@driftmark/shared';
import { addDays, daysBetween } from './calendar.js';
import { DEMO_HISTORY_DAYS, type DemoAthleteDefinition, type DemoSituation } from './demo-team.js';
import { createRandom, mulberry32, type Random } from './random.js';

export type CyclePhase = (typeof CYCLE_PHASES)[number];

export interface GeneratedWeighIn {
  /** HH:MM, athlete's local time. */
  time: string;
  /** Stored value: exactly the typed value converted to kg. */
  weightKg: number;
  /** As typed on the scale's display, in the athlete's unit. */
  entered: { value: number; unit: WeightUnit };
  tags: WeighInTag[];
  cyclePhase: CyclePhase | null;
}

export interface GeneratedFluid {
  clientId: string;
  time: string;
  volumeMl: number;
  entered: { value: number; unit: VolumeUnit };
  kind: 'water' | 'coffee_tea' | 'other';
}

export interface GeneratedMeal {
  clientId: string;
  time: string;
  name: string;
  source: 'macros';
  proteinG: number;
  carbohydrateG: number;
  fatG: number;
  fibreG: number | null;
  alcoholG: number | null;
  /** Atwater general factors (shared/nutrition.ts). */
  energyKcal: number;
}

export interface GeneratedSupplement {
  clientId: string;
  time: string;
  name: string;
  dose: number | null;
  doseUnit: string | null;
}

export interface GeneratedEvening {
  steps: number | null;
  /** Hours slept the night before this day. */
  sleepHours: number | null;
  cardioMinutes: number | null;
  trainingDone: boolean | null;
  trainingNote: string | null;
  ratings: Record<RatingKey, number>;
  note: string | null;
}

export interface GeneratedSymptom {
  clientId: string;
  time: string;
  symptoms: Symptom[];
  note: string | null;
  /** Any of URGENT_SYMPTOMS: the seed records a coach flag for it. */
  urgent: boolean;
}

export interface GeneratedDay {
  /** Local date, YYYY-MM-DD. */
  date: string;
  /** Days before the seed date (1 = yesterday). */
  daysBeforeSeed: number;
  /** Nothing logged that day: no entry of any kind exists for it. */
  missed: boolean;
  /** The smooth body-mass curve the weigh-ins scatter around (for tests and photos; not stored). */
  modelKg: number;
  weighIn: GeneratedWeighIn | null;
  fluids: GeneratedFluid[];
  meals: GeneratedMeal[];
  supplements: GeneratedSupplement[];
  evening: GeneratedEvening | null;
  symptoms: GeneratedSymptom[];
}

export interface AthleteHistory {
  key: DemoSituation;
  seedDate: string;
  days: GeneratedDay[];
}

export interface HistoryOptions {
  /** The athlete's local date on the day of seeding; the situation's events are counted from it. */
  seedDate: string;
  /** Last day generated (default: the day before the seed date, so "today" is left to log). */
  endDate?: string;
  /** Number of days generated, ending at endDate (default DEMO_HISTORY_DAYS − 1: the days after intake). */
  days?: number;
}

// ---------------------------------------------------------------------------------------------
// Per-athlete habits (everything here is invented).

interface SupplementHabit {
  name: string;
  dose: number | null;
  doseUnit: string | null;
  /** Taken with breakfast, before training, or at night. */
  with: 'breakfast' | 'training' | 'night';
  adherence: number;
}

interface Habits {
  /** Usual wake time on weekdays, minutes after midnight (weekends a bit later). */
  wakeMin: number;
  weekendLieInMin: number;
  bedMin: number;
  /** Training by weekday, Sunday first; 'rest' means nothing planned. */
  split: readonly [string, string, string, string, string, string, string];
  /** Minutes after midnight the training usually starts. */
  trainingMin: number;
  /** Cardio minutes on a cardio day at the start and at the end of the history. */
  cardio: { from: number; to: number; daysPerWeek: number };
  steps: { from: number; to: number };
  sleepHours: number;
  coffeesPerDay: number;
  mealsUsual: 3 | 4 | 5;
  proteinGPerKg: number;
  fatShare: number;
  supplements: readonly SupplementHabit[];
  /** Logs meals on this share of logged days. */
  mealLogging: number;
  /** Fills in the evening card on this share of logged days. */
  eveningLogging: number;
  /** Chance per day of a salty restaurant or takeaway meal (tagged the next morning). */
  saltyMeal: number;
  poorSleep: number;
  /** Tracks the cycle on the weigh-in (women only; the athlete chooses). */
  tracksCycle: boolean;
  /** Cycle length in days (women) or null. */
  cycleDays: number | null;
  /**
   * The cycle day on the day before the seed date, when the situation depends on it (a steady
   * loss must not end in the water of the late luteal phase); otherwise drawn from the seed.
   */
  cycleDayYesterday?: number;
  /** Trips as [first, last] days before the seed date. */
  trips: readonly (readonly [number, number])[];
  /** Mean length of a run of missed days. */
  missedRunDays: number;
  notes: readonly string[];
}

const CREATINE: SupplementHabit = {
  name: 'Creatine monohydrate',
  dose: 5,
  doseUnit: 'g',
  with: 'breakfast',
  adherence: 0.95,
};
const VITAMIN_D: SupplementHabit = {
  name: 'Vitamin D3',
  dose: 1000,
  doseUnit: 'IU',
  with: 'breakfast',
  adherence: 0.9,
};
const FISH_OIL: SupplementHabit = {
  name: 'Fish oil',
  dose: 2,
  doseUnit: 'capsules',
  with: 'breakfast',
  adherence: 0.85,
};
const MULTIVITAMIN: SupplementHabit = {
  name: 'Multivitamin',
  dose: 1,
  doseUnit: 'tablet',
  with: 'breakfast',
  adherence: 0.85,
};
const MAGNESIUM: SupplementHabit = {
  name: 'Magnesium glycinate',
  dose: 200,
  doseUnit: 'mg',
  with: 'night',
  adherence: 0.8,
};
const CAFFEINE: SupplementHabit = {
  name: 'Caffeine',
  dose: 200,
  doseUnit: 'mg',
  with: 'training',
  adherence: 0.8,
};

const HABITS: Record<DemoSituation, Habits> = {
  final_week: {
    wakeMin: 6 * 60 + 10,
    weekendLieInMin: 40,
    bedMin: 22 * 60 + 45,
    split: ['rest', 'push', 'pull', 'legs', 'rest', 'upper', 'lower'],
    trainingMin: 18 * 60,
    cardio: { from: 20, to: 40, daysPerWeek: 5 },
    steps: { from: 9000, to: 13000 },
    sleepHours: 7.3,
    coffeesPerDay: 2,
    mealsUsual: 5,
    proteinGPerKg: 2.4,
    fatShare: 0.25,
    supplements: [CREATINE, VITAMIN_D, FISH_OIL, CAFFEINE],
    mealLogging: 0.98,
    eveningLogging: 0.95,
    saltyMeal: 0.04,
    poorSleep: 0.06,
    tracksCycle: false,
    cycleDays: null,
    trips: [[61, 59]],
    missedRunDays: 1.3,
    notes: [
      'Posing practice 20 min.',
      'Flat in the gym today.',
      'Good pump, strength holding.',
      'Hungry in the evening, had the extra vegetables.',
      'Long day at work, steps low until the evening walk.',
    ],
  },
  weigh_in: {
    wakeMin: 6 * 60,
    weekendLieInMin: 30,
    bedMin: 22 * 60 + 15,
    split: ['rest', 'judo', 'strength', 'judo', 'judo', 'strength', 'randori'],
    trainingMin: 17 * 60 + 30,
    cardio: { from: 20, to: 25, daysPerWeek: 3 },
    steps: { from: 10000, to: 11000 },
    sleepHours: 7.6,
    coffeesPerDay: 1,
    mealsUsual: 4,
    proteinGPerKg: 2.0,
    fatShare: 0.27,
    supplements: [VITAMIN_D, { ...CREATINE, dose: 3 }, { ...MAGNESIUM, adherence: 0.7 }],
    mealLogging: 0.95,
    eveningLogging: 0.9,
    saltyMeal: 0.05,
    poorSleep: 0.05,
    tracksCycle: false,
    cycleDays: 29,
    trips: [[44, 42]],
    missedRunDays: 1.4,
    notes: [
      'Randori felt sharp.',
      'Tired legs, light technical session.',
      'Grip work after training.',
      'Sensei happy with the throws.',
      'Sore shoulder, iced it.',
    ],
  },
  photo_shoot: {
    wakeMin: 6 * 60 + 40,
    weekendLieInMin: 60,
    bedMin: 23 * 60,
    split: ['rest', 'lower', 'upper', 'rest', 'lower', 'upper', 'full body'],
    trainingMin: 7 * 60 + 30,
    cardio: { from: 20, to: 30, daysPerWeek: 4 },
    steps: { from: 8500, to: 10500 },
    sleepHours: 7.1,
    coffeesPerDay: 2,
    mealsUsual: 4,
    proteinGPerKg: 2.1,
    fatShare: 0.28,
    supplements: [MULTIVITAMIN, FISH_OIL, MAGNESIUM],
    mealLogging: 0.93,
    eveningLogging: 0.9,
    saltyMeal: 0.06,
    poorSleep: 0.08,
    tracksCycle: true,
    cycleDays: 28,
    trips: [[70, 67]],
    missedRunDays: 1.5,
    notes: [
      'Hit a new hip-thrust best.',
      'Busy day of client calls.',
      'Meal prep done for the week.',
      'Felt bloated after lunch.',
      'Hike with friends instead of cardio.',
    ],
  },
  long_diet: {
    wakeMin: 5 * 60 + 45,
    weekendLieInMin: 45,
    bedMin: 22 * 60,
    split: ['rest', 'glutes', 'upper', 'legs', 'shoulders', 'glutes', 'refeed walk'],
    trainingMin: 6 * 60 + 30,
    cardio: { from: 30, to: 45, daysPerWeek: 5 },
    steps: { from: 10000, to: 12500 },
    sleepHours: 7.4,
    coffeesPerDay: 2,
    mealsUsual: 5,
    proteinGPerKg: 2.3,
    fatShare: 0.26,
    supplements: [CREATINE, VITAMIN_D, FISH_OIL, { ...CAFFEINE, dose: 100 }],
    mealLogging: 0.97,
    eveningLogging: 0.93,
    saltyMeal: 0.04,
    poorSleep: 0.06,
    tracksCycle: true,
    cycleDays: 30,
    // Mid-cycle: the last two weeks hold no menstrual water, so the 14-day rate shows the diet.
    cycleDayYesterday: 17,
    trips: [[33, 32]],
    missedRunDays: 1.3,
    notes: [
      'Refeed day tomorrow, looking forward to it.',
      'Posing class: working on the back pose.',
      'Cravings in the afternoon, tea helped.',
      'Strong session, glutes sore.',
      'Cardio done fasted before work.',
    ],
  },
  regain: {
    wakeMin: 6 * 60 + 50,
    weekendLieInMin: 50,
    bedMin: 23 * 60 + 15,
    split: ['rest', 'chest', 'back', 'legs', 'rest', 'shoulders', 'arms'],
    trainingMin: 19 * 60,
    cardio: { from: 30, to: 10, daysPerWeek: 4 },
    steps: { from: 11000, to: 8000 },
    sleepHours: 7.0,
    coffeesPerDay: 2,
    mealsUsual: 4,
    proteinGPerKg: 2.0,
    fatShare: 0.27,
    supplements: [CREATINE, MULTIVITAMIN, VITAMIN_D],
    mealLogging: 0.9,
    eveningLogging: 0.88,
    saltyMeal: 0.06,
    poorSleep: 0.06,
    tracksCycle: false,
    cycleDays: null,
    trips: [[23, 20]],
    missedRunDays: 1.5,
    notes: [
      'Commute was packed, stood the whole way.',
      'Good session, pump came back.',
      'Team dinner after work.',
      'Slept badly, neighbours.',
      'Back to normal training volume.',
    ],
  },
  skips_check_ins: {
    wakeMin: 7 * 60 + 15,
    weekendLieInMin: 75,
    bedMin: 23 * 60 + 30,
    split: ['rest', 'gym', 'rest', 'gym', 'rest', 'gym', 'surf'],
    trainingMin: 17 * 60 + 45,
    cardio: { from: 15, to: 20, daysPerWeek: 2 },
    steps: { from: 7500, to: 8500 },
    sleepHours: 7.0,
    coffeesPerDay: 1,
    mealsUsual: 3,
    proteinGPerKg: 1.7,
    fatShare: 0.3,
    supplements: [{ ...MULTIVITAMIN, adherence: 0.6 }],
    mealLogging: 0.7,
    eveningLogging: 0.65,
    saltyMeal: 0.1,
    poorSleep: 0.08,
    tracksCycle: false,
    cycleDays: 27,
    trips: [[50, 48]],
    missedRunDays: 2.6,
    notes: [
      'Surf was great this morning.',
      'Forgot to log lunch, roughly a poke bowl.',
      'Busy week at work.',
      'Beach walk with the dog.',
    ],
  },
};

// ---------------------------------------------------------------------------------------------
// Deterministic streams and ids.

/** FNV-1a, 32 bits: turns a stream name into a PRNG seed. */
function hash32(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

function stream(seed: number, ...parts: (string | number)[]): Random {
  return createRandom(hash32([seed, ...parts].join(':')));
}

/** A version-4-shaped uuid derived from the seed and a name: the same entry gets the same clientId. */
export function demoUuid(seed: number, ...parts: (string | number)[]): string {
  const next = mulberry32(hash32(['uuid', seed, ...parts].join(':')));
  const bytes = Array.from({ length: 16 }, () => Math.floor(next() * 256));
  bytes[6] = ((bytes[6] ?? 0) & 0x0f) | 0x40;
  bytes[8] = ((bytes[8] ?? 0) & 0x3f) | 0x80;
  const hex = bytes.map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

const URGENT: ReadonlySet<Symptom> = new Set<Symptom>(URGENT_SYMPTOMS);

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));
const round = (x: number, step: number) => Math.round(x / step) * step;
/** Rounds to `digits` decimals without binary tails (79.60000000000001 → 79.6). */
const fixed = (x: number, digits: number) => Number(x.toFixed(digits));

export function clock(minutes: number): string {
  const m = clamp(Math.round(minutes), 0, 23 * 60 + 59);
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

const weekday = weekdayNumber;

// ---------------------------------------------------------------------------------------------
// Body mass.

/**
 * Day-to-day noise of a morning weigh-in. Cheuvront et al. (2004, IJSNEM 14:532–540; see
 * REFERENCES.md §5) found first-morning body mass varies by 0.51 ± 0.20 kg, a coefficient of
 * variation of about 0.66 %, in men whose intake matched their losses. We split that into white
 * day-to-day noise (0.58 % SD) and a slow, autocorrelated wander (0.28 % SD: a few days of
 * water or gut content); together about 0.63 % before the tagged bumps, which add the rest.
 */
const WHITE_CV = 0.0058;
const WANDER_CV = 0.0028;
const WANDER_PHI = 0.85;

/** Share of the planned loss done by fraction `s` of the way through (0 → 1), per situation. */
function lossShape(situation: DemoSituation, s: number): number {
  switch (situation) {
    case 'final_week':
      // Steady dieting with a little water off in the first fortnight.
      return 0.82 * s + 0.18 * ((1 - Math.exp(-s / 0.08)) / (1 - Math.exp(-1 / 0.08)));
    case 'weigh_in':
      // Near maintenance at first, then a deliberate cut toward the class limit.
      return Math.pow(s, 1.8);
    default:
      return s;
  }
}

/** Peak-week water and glycogen offset, kg, `daysToShow` days before a show (not part of the trend). */
function peakWeekOffset(daysToShow: number): number {
  // Carbohydrate is lowered at the start of the final week (glycogen and its water go down) and
  // brought back up over the last three days; fluids stay normal (restriction is never modelled).
  const table: Record<number, number> = {
    7: -0.3,
    6: -0.6,
    5: -0.9,
    4: -1.0,
    3: -0.7,
    2: -0.4,
    1: -0.3,
    0: -0.4,
  };
  return table[daysToShow] ?? 0;
}

/** Regain after a show: quick glycogen and water refill in the first week, then slow gain. */
function regainKg(daysAfterShow: number): number {
  return 2.0 * (1 - Math.exp(-daysAfterShow / 3.5)) + 0.04 * daysAfterShow;
}

/** The smooth curve for an athlete `t` days before the seed date, kg. */
export function modelWeightKg(def: DemoAthleteDefinition, t: number): number {
  const { startWeightKg: start, seedDateWeightKg: end, pastEvent } = def.history;
  const span = DEMO_HISTORY_DAYS - 1;
  if (def.key === 'regain' && pastEvent) {
    const showT = pastEvent.daysBeforeSeed;
    const showKg = end - regainKg(showT);
    if (t <= showT) return showKg + regainKg(showT - t);
    const s = (span - t) / (span - showT);
    return start - (start - showKg) * clamp(s, 0, 1);
  }
  const late = def.history.lateLoss;
  if (late) {
    // A steady loss up to the last `late.days` days, then the faster one that ends at `end`.
    const kneeKg = end + (late.kgPerWeek / 7) * late.days;
    if (t <= late.days) return end + (late.kgPerWeek / 7) * t;
    return start - (start - kneeKg) * clamp((span - t) / (span - late.days), 0, 1);
  }
  const s = clamp((span - t) / span, 0, 1);
  return start - (start - end) * lossShape(def.key, s);
}

/** Days from the day `t` days before the seed to the athlete's show, or null. */
function daysToShow(def: DemoAthleteDefinition, t: number): number | null {
  if (def.event.type === 'show') return def.event.daysFromSeed + t;
  if (def.history.pastEvent) return t - def.history.pastEvent.daysBeforeSeed;
  return null;
}

// ---------------------------------------------------------------------------------------------
// The day's plan, decided for every day (logged or not) so that neighbouring days agree.

interface DayPlan {
  date: string;
  t: number;
  index: number;
  logged: boolean;
  /** Salty or takeaway meal this evening. */
  saltyTonight: boolean;
  /** Refeed or celebration with many carbohydrates today. */
  highCarbToday: boolean;
  poorSleepLastNight: boolean;
  travelling: boolean;
  bowelChange: boolean;
  cycleDay: number | null;
}

/**
 * Which days have anything logged. A two-state chain: missed days come in runs (a weekend away, a
 * busy week), logged days too. Days in `mustLog` are always logged. The chain is drawn again (from
 * the next sub-stream) until the share of logged days is within two points of the athlete's
 * check-in rate, so the realised rate matches the definition, not just its expectation.
 */
function presence(
  def: DemoAthleteDefinition,
  mustLog: readonly boolean[],
  mustMiss: readonly boolean[],
): boolean[] {
  const habits = HABITS[def.key];
  const rate = def.history.checkInRate;
  const backToLogging = 1 / habits.missedRunDays;
  const stopLogging = (backToLogging * (1 - rate)) / rate;
  let best: { days: boolean[]; error: number } | null = null;
  for (let attempt = 0; attempt < 64; attempt++) {
    const r = stream(def.history.seed, 'presence', attempt);
    const days: boolean[] = [];
    let logging = true;
    for (let i = 0; i < mustLog.length; i++) {
      if (i > 0) logging = logging ? !r.chance(stopLogging) : r.chance(backToLogging);
      days.push((logging || (mustLog[i] ?? false)) && !(mustMiss[i] ?? false));
    }
    const error = Math.abs(days.filter(Boolean).length / days.length - rate);
    if (!best || error < best.error) best = { days, error };
    if (error <= 0.02) break;
  }
  return best?.days ?? mustLog.map((_, i) => !(mustMiss[i] ?? false));
}

/** Days the athlete certainly logged. */
function mustLog(def: DemoAthleteDefinition, t: number, index: number): boolean {
  const toShow = daysToShow(def, t);
  // The first morning after intake.
  if (index === 0) return true;
  // The countdown athlete misses nothing in the last weeks before the show, nor the regaining
  // athlete the days around theirs.
  if (def.key === 'final_week' && toShow !== null && toShow <= 18) return true;
  if (def.key === 'regain' && toShow !== null && Math.abs(toShow) <= 3) return true;
  // Scripted moments (demo notes and symptom reports) are days the athlete logged.
  return SCRIPTS[def.key]?.some((s) => s.t === t) ?? false;
}

function planDays(def: DemoAthleteDefinition, dates: string[], seedDate: string): DayPlan[] {
  const habits = HABITS[def.key];
  const ts = dates.map((date) => daysBetween(date, seedDate));
  const logged = presence(
    def,
    ts.map((t, index) => mustLog(def, t, index)),
    ts.map((t) => def.history.missedDaysBeforeSeed?.includes(t) ?? false),
  );
  const drawn = stream(def.history.seed, 'cycle').int(0, 27);
  // The index yesterday would have in `dates` (the last date is yesterday unless endDate says otherwise).
  const yesterdayIndex =
    dates.length - 1 + (dates.length > 0 ? daysBetween(dates[dates.length - 1]!, addDays(seedDate, -1)) : 0);
  const mod = (x: number, n: number) => ((x % n) + n) % n;
  const cycleOffset =
    habits.cycleDays !== null && habits.cycleDayYesterday !== undefined
      ? mod(habits.cycleDayYesterday - 1 - yesterdayIndex, habits.cycleDays)
      : drawn;
  return dates.map((date, index) => {
    const t = daysBetween(date, seedDate);
    const r = stream(def.history.seed, 'plan', t);
    const dow = weekday(date);
    const toShow = daysToShow(def, t);
    // No salty evenings in the last weeks before a show, nor while pushing a late loss: the
    // situation the demo shows there must not hang on how the weekdays fall.
    const inFinalWeeks =
      (toShow !== null && toShow >= 0 && toShow <= 14) || t <= (def.history.lateLoss?.days ?? 0);
    const travelling = habits.trips.some(([first, last]) => t <= first && t >= last);
    const refeed = def.key === 'long_diet' && dow === 6;
    const celebration = def.key === 'regain' && toShow !== null && toShow <= 0 && toShow >= -2;
    return {
      date,
      t,
      index,
      logged: logged[index] ?? true,
      saltyTonight:
        celebration || (!inFinalWeeks && r.chance(habits.saltyMeal * (dow === 5 || dow === 6 ? 2 : 1))),
      highCarbToday: refeed || celebration,
      poorSleepLastNight: r.chance(habits.poorSleep) || (travelling && r.chance(0.4)),
      travelling,
      bowelChange: r.chance(0.02),
      cycleDay: habits.cycleDays === null ? null : ((index + cycleOffset) % habits.cycleDays) + 1,
    };
  });
}

function cyclePhase(day: number): CyclePhase {
  if (day <= 5) return 'menstrual';
  if (day <= 12) return 'follicular';
  if (day <= 15) return 'ovulation';
  return 'luteal';
}

/** Water retained around menstruation, kg: late luteal phase and the first two days. */
function cycleRetentionKg(day: number, length: number): number {
  if (day === 1) return 0.6;
  if (day === 2) return 0.3;
  const fromEnd = length - day;
  return fromEnd < 5 ? 0.15 * (5 - fromEnd) : 0;
}

// ---------------------------------------------------------------------------------------------
// Generators per kind.

function weighIn(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  previous: DayPlan | undefined,
  r: Random,
  wanderKg: number,
): { entry: GeneratedWeighIn; observedKg: number } {
  const habits = HABITS[def.key];
  const model = modelWeightKg(def, plan.t);
  const tags: WeighInTag[] = [];
  let bump = 0;
  if (previous?.saltyTonight) {
    bump += r.float(0.4, 0.9);
    if (r.chance(0.8)) tags.push('salty_meal');
  }
  if (previous?.highCarbToday) {
    bump += r.float(0.3, 0.8);
    if (r.chance(0.75)) tags.push('high_carb_meal');
  }
  if (plan.travelling) {
    bump += r.float(0.2, 0.6);
    tags.push('travel');
  }
  if (plan.poorSleepLastNight) {
    bump += r.float(0.1, 0.35);
    tags.push('poor_sleep');
  }
  if (plan.bowelChange) {
    bump += r.float(-0.4, 0.4);
    tags.push('bowel_change');
  }
  let phase: CyclePhase | null = null;
  if (plan.cycleDay !== null && habits.cycleDays !== null) {
    const retention = cycleRetentionKg(plan.cycleDay, habits.cycleDays);
    bump += retention;
    if (habits.tracksCycle) {
      phase = cyclePhase(plan.cycleDay);
      if (retention >= 0.3) tags.push('cycle_phase');
    }
  }
  const toShow = daysToShow(def, plan.t);
  const peak = toShow === null ? 0 : peakWeekOffset(toShow);
  const observedKg = model + peak + wanderKg + bump + r.normal(0, WHITE_CV * model);

  return { entry: typedWeighIn(def, plan, r, observedKg, tags, phase), observedKg };
}

/** A weigh-in as the athlete types it: the scale's reading in their unit, at their waking time. */
function typedWeighIn(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  r: Random,
  observedKg: number,
  tags: WeighInTag[],
  cyclePhase: CyclePhase | null,
): GeneratedWeighIn {
  const habits = HABITS[def.key];
  const weekend = [0, 6].includes(weekday(plan.date));
  const time = clock(habits.wakeMin + (weekend ? habits.weekendLieInMin : 0) + r.int(3, 25));
  const entered =
    def.weightUnit === 'kg'
      ? { value: fixed(round(observedKg, 0.1), 1), unit: 'kg' as const }
      : { value: fixed(round(observedKg / KG_PER_LB, 0.2), 1), unit: 'lb' as const };
  const weightKg = entered.unit === 'kg' ? entered.value : entered.value * KG_PER_LB;
  return { time, weightKg, entered, tags, cyclePhase };
}

function scriptedWeighIn(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  r: Random,
  observedKg: number,
  tags: WeighInTag[],
): { entry: GeneratedWeighIn; observedKg: number } {
  return { entry: typedWeighIn(def, plan, r, observedKg, tags, null), observedKg };
}

/** Fraction of the usual energy intake eaten on the day `t` days before the seed. */
function energyFactor(def: DemoAthleteDefinition, plan: DayPlan): number {
  const span = DEMO_HISTORY_DAYS - 1;
  const s = clamp((span - plan.t) / span, 0, 1);
  const toShow = daysToShow(def, plan.t);
  switch (def.key) {
    case 'final_week':
      if (toShow !== null && toShow >= 5 && toShow <= 7) return 0.7; // low-carbohydrate days
      return 0.84 - 0.08 * s;
    case 'weigh_in':
      return 0.95 - 0.17 * Math.pow(s, 1.5);
    case 'photo_shoot':
      return 0.84;
    case 'long_diet':
      return plan.highCarbToday ? 1.05 : 0.79;
    case 'regain':
      if (toShow === null) return 1;
      if (toShow > 7) return 0.78;
      if (toShow > 0) return 0.74;
      if (toShow === 0) return 1.45;
      if (toShow >= -2) return 1.35;
      return 1.12 - 0.002 * -toShow;
    case 'skips_check_ins':
      return [0, 6].includes(weekday(plan.date)) ? 1.02 : 0.86;
  }
}

interface MealSlot {
  name: string;
  share: number;
  at: (r: Random, wake: number, habits: Habits, training: boolean) => number;
}

const BREAKFAST: MealSlot = { name: 'Breakfast', share: 0.25, at: (r, wake) => wake + r.int(30, 70) };
const LUNCH: MealSlot = { name: 'Lunch', share: 0.3, at: (r) => r.int(12 * 60, 13 * 60 + 30) };
const SNACK: MealSlot = {
  name: 'Afternoon snack',
  share: 0.12,
  at: (r) => r.int(15 * 60 + 30, 16 * 60 + 40),
};
const PRE_TRAINING: MealSlot = {
  name: 'Pre-training snack',
  share: 0.13,
  at: (r, _wake, h) => h.trainingMin - r.int(60, 90),
};
const DINNER: MealSlot = {
  name: 'Dinner',
  share: 0.32,
  // After an evening session dinner waits until the athlete is home.
  at: (r, _wake, h, training) =>
    training && h.trainingMin >= 18 * 60 ? h.trainingMin + r.int(90, 120) : r.int(19 * 60, 20 * 60 + 40),
};
const LATE_SNACK: MealSlot = {
  name: 'Evening snack',
  share: 0.1,
  at: (r, _wake, h) => Math.min(h.bedMin - r.int(30, 60), 22 * 60 + 50),
};

function mealSlots(count: 3 | 4 | 5, training: boolean, habits: Habits): MealSlot[] {
  const afternoon = training && habits.trainingMin >= 17 * 60 ? PRE_TRAINING : SNACK;
  if (count === 3) return [BREAKFAST, LUNCH, DINNER];
  if (count === 4) return [BREAKFAST, LUNCH, afternoon, DINNER];
  return [BREAKFAST, LUNCH, afternoon, DINNER, LATE_SNACK];
}

function meals(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  r: Random,
  weightKg: number,
  wake: number,
  training: boolean,
): GeneratedMeal[] {
  const habits = HABITS[def.key];
  const toShow = daysToShow(def, plan.t);
  const lowCarb = def.key === 'final_week' && toShow !== null && toShow >= 5 && toShow <= 7;
  const count = clamp(habits.mealsUsual + r.pick([-1, 0, 0, 0, 1]), 3, 5) as 3 | 4 | 5;
  const slots = mealSlots(count, training, habits);
  const energy = def.intake.usualEnergyKcal * energyFactor(def, plan) * r.normal(1, 0.06);
  const proteinG = habits.proteinGPerKg * weightKg * r.normal(1, 0.05);
  const fatG = (energy * (lowCarb ? 0.35 : habits.fatShare)) / 9;
  const carbohydrateG = Math.max(lowCarb ? 50 : 90, (energy - 4 * proteinG - 9 * fatG) / 4);

  const weights = slots.map((slot) => slot.share * r.float(0.8, 1.2));
  // A salty evening is a bigger dinner out.
  const dinnerAt = slots.indexOf(DINNER);
  if (plan.saltyTonight) weights[dinnerAt] = (weights[dinnerAt] ?? 0) * 1.5;
  const total = weights.reduce((a, b) => a + b, 0);
  const drinksAllowed =
    def.key === 'skips_check_ins' || (def.key === 'regain' && toShow !== null && toShow <= 0);
  const drinks = drinksAllowed && plan.saltyTonight && r.chance(0.6);

  const out = slots.map((slot, i) => {
    const share = (weights[i] ?? 0) / total;
    const p = Math.round(proteinG * share);
    const c = Math.round(carbohydrateG * share);
    const f = Math.round(fatG * share);
    const fibre = Math.round(c * r.float(0.08, 0.14));
    const isDinner = slot === DINNER;
    const alcohol = isDinner && drinks ? r.pick([14, 20, 28]) : null;
    let name = slot.name;
    if (isDinner && plan.saltyTonight) {
      name = def.key === 'regain' && toShow === 0 ? 'Celebration dinner' : r.pick(SALTY_DINNERS);
    } else if (plan.highCarbToday && def.key === 'long_diet' && slot === LUNCH) {
      name = 'Refeed lunch';
    }
    const macros = { proteinG: p, carbohydrateG: c, fatG: f, alcoholG: alcohol };
    return {
      clientId: demoUuid(def.history.seed, plan.t, 'meal', i),
      time: clock(slot.at(r, wake, habits, training)),
      name,
      source: 'macros' as const,
      proteinG: p,
      carbohydrateG: c,
      fatG: f,
      fibreG: fibre,
      alcoholG: alcohol,
      energyKcal: atwaterKcal(macros),
    };
  });
  return out.sort((a, b) => a.time.localeCompare(b.time));
}

const SALTY_DINNERS = ['Restaurant dinner', 'Takeaway', 'Dinner out with friends', 'Ramen', 'Pizza night'];

/** Volumes people pour, by unit: mL bottles and glasses, fl oz cups and bottles. */
const WATER_SIZES: Record<VolumeUnit, readonly number[]> = {
  ml: [250, 330, 400, 500, 600, 750, 1000],
  floz: [8, 12, 16, 20, 24, 32],
};
const COFFEE_SIZES: Record<VolumeUnit, readonly number[]> = { ml: [150, 200, 250, 300], floz: [8, 12, 16] };
const OTHER_SIZES: Record<VolumeUnit, readonly number[]> = { ml: [250, 330, 500], floz: [8, 12, 16] };

function toMl(value: number, unit: VolumeUnit): number {
  return unit === 'ml' ? value : value * ML_PER_US_FL_OZ;
}

/** The size (in `unit`) closest to `idealMl`. */
function nearest(sizes: readonly number[], unit: VolumeUnit, idealMl: number): number {
  let best = sizes[0] ?? 250;
  for (const size of sizes) {
    if (Math.abs(toMl(size, unit) - idealMl) < Math.abs(toMl(best, unit) - idealMl)) best = size;
  }
  return best;
}

function fluids(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  r: Random,
  wake: number,
  training: boolean,
): GeneratedFluid[] {
  const habits = HABITS[def.key];
  const unit = def.volumeUnit;
  const target = def.intake.usualWaterMl * r.normal(1, 0.1) * (training ? 1.05 : 0.95);
  const drinks: { kind: GeneratedFluid['kind']; value: number }[] = [];
  const coffees = clamp(habits.coffeesPerDay + r.pick([-1, 0, 0, 1]), 0, 3);
  for (let i = 0; i < coffees; i++) drinks.push({ kind: 'coffee_tea', value: r.pick(COFFEE_SIZES[unit]) });
  if (training && r.chance(0.35)) drinks.push({ kind: 'other', value: r.pick(OTHER_SIZES[unit]) });
  // 3 to 7 entries in all; water makes up the rest of the day's usual volume, in sizes people pour.
  const entries = clamp(r.pick([3, 4, 4, 5, 5, 5, 6, 6, 7]), drinks.length + 2, 7);
  let left = target - drinks.reduce((sum, d) => sum + toMl(d.value, unit), 0);
  for (let waters = entries - drinks.length; waters > 0; waters--) {
    const ideal = Math.max(0, left / waters) * r.float(0.75, 1.25);
    const value = nearest(WATER_SIZES[unit], unit, ideal);
    drinks.push({ kind: 'water', value });
    left -= toMl(value, unit);
  }
  const first = wake + r.int(30, 55);
  const last = Math.min(habits.bedMin - r.int(45, 90), 22 * 60 + 30);
  // Coffee and tea in the first part of the day, the rest in the order drawn.
  const ordered = [
    ...drinks.filter((d) => d.kind === 'coffee_tea'),
    ...shuffle(
      r,
      drinks.filter((d) => d.kind !== 'coffee_tea'),
    ),
  ];
  const slot = (last - first) / ordered.length;
  return ordered.map((drink, i) => ({
    clientId: demoUuid(def.history.seed, plan.t, 'fluid', i),
    time: clock(first + slot * i + r.float(0, slot * 0.8)),
    volumeMl: toMl(drink.value, unit),
    entered: { value: drink.value, unit },
    kind: drink.kind,
  }));
}

function shuffle<T>(r: Random, items: T[]): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = r.int(0, i);
    [out[i], out[j]] = [out[j] as T, out[i] as T];
  }
  return out;
}

function supplements(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  r: Random,
  breakfastTime: string | null,
  wake: number,
  training: boolean,
): GeneratedSupplement[] {
  const habits = HABITS[def.key];
  const breakfast = breakfastTime ? minutesOf(breakfastTime) : wake + 45;
  const out: GeneratedSupplement[] = [];
  habits.supplements.forEach((item, i) => {
    if (item.with === 'training' && !training) return;
    if (!r.chance(item.adherence)) return;
    const at =
      item.with === 'breakfast'
        ? breakfast + r.int(0, 10)
        : item.with === 'training'
          ? habits.trainingMin - r.int(20, 40)
          : habits.bedMin - r.int(20, 60);
    out.push({
      clientId: demoUuid(def.history.seed, plan.t, 'supplement', i),
      time: clock(at),
      name: item.name,
      dose: item.dose,
      doseUnit: item.doseUnit,
    });
  });
  return out.sort((a, b) => a.time.localeCompare(b.time));
}

function minutesOf(time: string): number {
  const [h, m] = time.split(':').map(Number);
  return (h ?? 0) * 60 + (m ?? 0);
}

const rating = (x: number) => clamp(Math.round(x), 1, 5);

function evening(
  def: DemoAthleteDefinition,
  plan: DayPlan,
  r: Random,
  trainingName: string,
  note: string | null,
): GeneratedEvening {
  const habits = HABITS[def.key];
  const span = DEMO_HISTORY_DAYS - 1;
  const s = clamp((span - plan.t) / span, 0, 1);
  const toShow = daysToShow(def, plan.t);
  const finalWeek = inFinalWeek(toShow);
  const afterShow = toShow !== null && toShow < 0;
  const rest = trainingName === 'rest';
  const trainingDone = rest ? null : !r.chance(plan.travelling ? 0.5 : 0.07);
  const cardioDay = r.chance(habits.cardio.daysPerWeek / 7);
  const cardio = cardioDay ? Math.round(habits.cardio.from + (habits.cardio.to - habits.cardio.from) * s) : 0;
  const steps = Math.round(
    (habits.steps.from + (habits.steps.to - habits.steps.from) * s) *
      r.normal(1, 0.15) *
      (plan.travelling ? 0.7 : 1) *
      (cardio > 0 ? 1.08 : 1),
  );
  const sleepHours = plan.poorSleepLastNight
    ? round(r.float(4.5, 5.75), 0.25)
    : round(clamp(r.normal(habits.sleepHours, 0.5), 5.75, 9.5), 0.25);
  // How dieting feels: energy goes down and hunger up as the diet goes on.
  const dieting = def.key !== 'regain' || !afterShow;
  const depth = dieting ? s : 0;
  const ratings: Record<RatingKey, number> = {
    energy: rating(r.normal(4 - 1.0 * depth - (finalWeek ? 0.6 : 0) + (afterShow ? 0.4 : 0), 0.7)),
    hunger: rating(r.normal(2.4 + 1.4 * depth + (finalWeek ? 0.4 : 0) - (afterShow ? 0.6 : 0), 0.7)),
    mood: rating(r.normal(3.7 - 0.4 * depth + (afterShow ? 0.3 : 0), 0.7)),
    sleepQuality: rating(2 + (sleepHours - 5.5) * 1.1 + r.normal(0, 0.5)),
    digestion: rating(r.normal(plan.travelling || plan.saltyTonight ? 3.2 : 4, 0.6)),
    stress: rating(r.normal(2.5 + (finalWeek ? 1.0 : 0) + (plan.travelling ? 0.5 : 0), 0.8)),
  };
  let trainingNote: string | null = rest ? 'rest' : trainingName;
  if (trainingDone === false) trainingNote = plan.travelling ? 'missed: travelling' : 'missed: too tired';
  return {
    steps: clamp(steps, 0, 60000),
    sleepHours,
    cardioMinutes: cardio,
    trainingDone,
    trainingNote,
    ratings,
    note,
  };
}

// ---------------------------------------------------------------------------------------------
// Scripted moments: the few things the demo should show on specific days.

interface Script {
  /** Days before the seed date. */
  t: number;
  symptom?: { time: string; symptoms: Symptom[]; note: string | null };
  note?: string;
  /** That morning's weigh-in sits exactly `offsetKg` off the model curve (no noise, no other bumps). */
  weighIn?: { offsetKg: number; tags: WeighInTag[] };
}

const SCRIPTS: Partial<Record<DemoSituation, readonly Script[]>> = {
  final_week: [
    {
      // The one urgent report in the demo: the coach's flag appears on the roster and day view.
      t: 2,
      symptom: {
        time: '11:40',
        symptoms: ['dizziness'],
        note: 'Light-headed for a minute when I stood up after cardio. Sat down, had water and a banana, it passed.',
      },
      note: 'Told coach about the dizzy spell. Carbohydrates go back up tomorrow as planned.',
    },
    { t: 1, note: 'No dizziness today. Posing practice 30 min, felt steady.' },
    {
      t: 38,
      symptom: { time: '22:10', symptoms: ['muscle_cramps'], note: 'Calf cramp in bed after leg day.' },
    },
  ],
  weigh_in: [
    // A practice run (seed-cuts.ts DEMO_REHEARSAL): the acute part starts at t = 33 on the model
    // curve, two days down to a practice weigh-in at t = 31 about 2 kg (3 %) lighter, then most of
    // it back by the next mornings. The ≥ 2 %/48 h drop raises its safety flag then, as it should.
    { t: 33, weighIn: { offsetKg: 0, tags: [] } },
    { t: 32, weighIn: { offsetKg: -0.9, tags: [] } },
    {
      t: 31,
      weighIn: { offsetKg: -2.0, tags: [] },
      symptom: {
        time: '19:40',
        symptoms: ['headache', 'dark_urine'],
        note: 'Headache after the practice weigh-in, urine very dark until I drank.',
      },
    },
    { t: 30, weighIn: { offsetKg: -0.6, tags: [] } },
    { t: 29, weighIn: { offsetKg: -0.2, tags: [] } },
    { t: 27, symptom: { time: '15:20', symptoms: ['headache'], note: 'Mild headache after a long day.' } },
    { t: 9, note: 'Weight moving as planned, coach says keep the food the same.' },
    // A drop of more than 2 % of body mass in a day (≥ 2 %/48 h raises the safety flag, ACSM 2007):
    // up after a salty dinner, then down after an extra sweat session the coach never planned.
    { t: 3, note: 'Ramen night with the team.' },
    {
      t: 2,
      weighIn: { offsetKg: 0.5, tags: ['salty_meal'] },
      note: 'Extra sweat session in a sauna suit after randori to see where I am.',
    },
    { t: 1, weighIn: { offsetKg: -1.0, tags: [] } },
  ],
  photo_shoot: [
    {
      t: 55,
      symptom: { time: '14:05', symptoms: ['headache'], note: 'Headache in the afternoon, skipped coffee.' },
    },
  ],
  long_diet: [
    {
      t: 64,
      symptom: { time: '05:55', symptoms: ['muscle_cramps'], note: 'Foot cramp during fasted cardio.' },
    },
    { t: 19, symptom: { time: '16:30', symptoms: ['headache'], note: null } },
  ],
  regain: [
    { t: 22, note: 'Travelled to Osaka for the show. Final check-in with coach done.' },
    { t: 21, note: 'Show day: 3rd place in men’s physique! Celebration dinner with the team.' },
    { t: 20, note: 'Ate a lot yesterday. Feeling flat but happy.' },
    { t: 14, note: 'Back to a normal training week. Food feels easy again.' },
  ],
  skips_check_ins: [
    { t: 40, symptom: { time: '13:15', symptoms: ['headache'], note: 'Forgot water this morning.' } },
  ],
};

// ---------------------------------------------------------------------------------------------

/** The generated history of one demo athlete, oldest day first. */
export function generateHistory(def: DemoAthleteDefinition, options: HistoryOptions): AthleteHistory {
  const { seedDate } = options;
  const endDate = options.endDate ?? addDays(seedDate, -1);
  const count = options.days ?? DEMO_HISTORY_DAYS - 1;
  const dates = Array.from({ length: count }, (_, i) => addDays(endDate, i - count + 1));
  const plans = planDays(def, dates, seedDate);
  const habits = HABITS[def.key];
  const scripts = SCRIPTS[def.key] ?? [];

  // The slow wander runs through every day, logged or not, so a missed day changes nothing else.
  const wanderStream = stream(def.history.seed, 'wander');
  let wander = 0;

  const days = plans.map((plan, i): GeneratedDay => {
    const model = modelWeightKg(def, plan.t);
    wander = WANDER_PHI * wander + wanderStream.normal(0, WANDER_CV * model * Math.sqrt(1 - WANDER_PHI ** 2));
    const empty: GeneratedDay = {
      date: plan.date,
      daysBeforeSeed: plan.t,
      missed: true,
      modelKg: fixed(model, 3),
      weighIn: null,
      fluids: [],
      meals: [],
      supplements: [],
      evening: null,
      symptoms: [],
    };
    if (!plan.logged) return empty;

    const r = stream(def.history.seed, 'day', plan.t);
    const script = scripts.find((s) => s.t === plan.t);
    const weekend = [0, 6].includes(weekday(plan.date));
    const wake = habits.wakeMin + (weekend ? habits.weekendLieInMin : 0);
    const trainingName = habits.split[weekday(plan.date)] ?? 'rest';
    const training = trainingName !== 'rest';

    // What gets logged on a logged day: the weigh-in nearly always, the rest by habit.
    const weighed =
      script?.weighIn !== undefined ||
      (def.key === 'skips_check_ins' ? r.chance(0.88) : r.chance(0.97) || i === 0);
    const weighStream = stream(def.history.seed, 'weigh-in', plan.t);
    const { entry, observedKg } = script?.weighIn
      ? scriptedWeighIn(def, plan, weighStream, model + script.weighIn.offsetKg, script.weighIn.tags)
      : weighIn(def, plan, plans[i - 1], weighStream, wander);
    const dayMeals = r.chance(habits.mealLogging)
      ? meals(def, plan, stream(def.history.seed, 'meals', plan.t), observedKg, wake, training)
      : [];
    const dayFluids = r.chance(Math.min(1, habits.mealLogging + 0.03))
      ? fluids(def, plan, stream(def.history.seed, 'fluids', plan.t), wake, training)
      : [];
    const daySupplements = supplements(
      def,
      plan,
      stream(def.history.seed, 'supplements', plan.t),
      dayMeals[0]?.time ?? null,
      wake,
      training,
    );
    const note = script?.note ?? (r.chance(0.08) ? r.pick(habits.notes) : null);
    const eveningLogged = script?.note !== undefined || r.chance(habits.eveningLogging);
    const symptoms: GeneratedSymptom[] = script?.symptom
      ? [
          {
            clientId: demoUuid(def.history.seed, plan.t, 'symptom', 0),
            time: script.symptom.time,
            symptoms: script.symptom.symptoms,
            note: script.symptom.note ?? null,
            urgent: script.symptom.symptoms.some((s) => URGENT.has(s)),
          },
        ]
      : [];
    const day: GeneratedDay = {
      ...empty,
      missed: false,
      weighIn: weighed ? entry : null,
      fluids: dayFluids,
      meals: dayMeals,
      supplements: daySupplements,
      evening: eveningLogged
        ? evening(def, plan, stream(def.history.seed, 'evening', plan.t), trainingName, note)
        : null,
      symptoms,
    };
    // A logged day has at least one entry (a day with a lone forgotten weigh-in keeps its fluids).
    if (!day.weighIn && day.fluids.length === 0 && day.meals.length === 0 && !day.evening) {
      day.fluids = fluids(def, plan, stream(def.history.seed, 'fluids', plan.t), wake, training);
    }
    return day;
  });
  return { key: def.key, seedDate, days };
}
