/**
 * The demo team's countdown templates and each demo athlete's plan history, as pure data: no clock
 * and no database. seed-plans.ts writes them. Every number here is invented; the energy of each
 * version follows what history.ts has the athlete eat in the weeks it was in force (its
 * `energyFactor`, protein per kg and fat share), so the demo's days sit near their targets.
 *
 * Versions are written as a coach would: a first plan the day after intake, then a review every
 * few weeks with a reason. Each stores the athlete's baseline as it was when it was saved (usual
 * water and energy from the intake, the EWMA trend of the last 60 days of weigh-ins) and the
 * guardrail warnings it raised then, acknowledged by its author, exactly as the API would require.
 */
import {
  applyTemplate,
  checkGuardrails,
  DEFAULT_TOLERANCES,
  emptyDayTargets,
  type DayTargets,
  type GuardrailFloors,
  type GuardrailWarning,
  type MacroTarget,
  type PlanBaseline,
  type PlanContent,
  type ScheduleItem,
  type TemplateDay,
  type TemplateRequest,
  type Weekday,
} from '@driftmark/shared';
import { localInstant } from '../lib/local-time.js';
import { trendWeightKg } from '../lib/analysis.js';
import { addDays, localDate } from './calendar.js';
import { DEMO_SEED, type DemoAthleteDefinition } from './demo-team.js';
import { demoUuid, type AthleteHistory } from './history.js';

/** Weigh-ins the baseline trend is taken over, days up to and including the day of saving (as the API). */
export const BASELINE_TREND_DAYS = 60;

// ---------------------------------------------------------------------------------------------
// Templates

export type DemoTemplateKey = 'show' | 'weigh_in' | 'shoot';
export type DemoTemplate = TemplateRequest & { key: DemoTemplateKey };

const day = (t: Partial<DayTargets>): DayTargets => ({ ...emptyDayTargets(), ...t });

/** Energy as the athlete's usual × factor with protein/carbohydrate/fat shares (adding up to 100 %). */
function shares(factor: number, p: number, c: number, f: number): Partial<DayTargets> {
  return {
    energy: { kind: 'usual_times', factor },
    protein: { kind: 'pct', pct: p },
    carbohydrate: { kind: 'pct', pct: c },
    fat: { kind: 'pct', pct: f },
  };
}

function item(
  seed: number,
  scope: string,
  name: string,
  dose: number | null,
  unit: string | null,
  times: string[],
): ScheduleItem {
  return { id: demoUuid(seed, 'schedule', scope, name), item: name, dose, unit, times };
}

const templateCreatine = (key: DemoTemplateKey) =>
  item(DEMO_SEED, `template-${key}`, 'Creatine monohydrate', 5, 'g', ['08:00']);

const usualWater = { kind: 'usual_times', factor: 1 } as const;
const usualPlus = (ml: number) => ({ kind: 'usual_plus', ml }) as const;

function showDays(): TemplateDay[] {
  const creatine = [templateCreatine('show')];
  const low = (note: string): Partial<DayTargets> => ({
    ...shares(0.7, 40, 25, 35),
    water: usualWater,
    sodiumMg: 2300,
    steps: 10000,
    cardioMinutes: 30,
    supplements: creatine,
    note,
  });
  return [
    {
      offset: -7,
      label: 'Lower carbohydrate',
      targets: day(
        low('First of three lower-carbohydrate days. Keep the sessions short; posing practice daily.'),
      ),
    },
    {
      offset: -6,
      label: 'Lower carbohydrate',
      targets: day(low('Lower-carbohydrate day two. Tell your coach at once about any dizziness.')),
    },
    {
      offset: -5,
      label: 'Lower carbohydrate',
      targets: day(low('Last lower-carbohydrate day. Water and sodium stay as usual all week.')),
    },
    {
      offset: -4,
      label: 'Steady',
      targets: day({
        ...shares(0.85, 35, 40, 25),
        water: usualPlus(500),
        sodiumMg: 2300,
        steps: 10000,
        cardioMinutes: 20,
        supplements: creatine,
        note: 'Carbohydrate comes partly back. Easy full-body session.',
      }),
    },
    {
      offset: -3,
      label: 'Carbohydrate up',
      targets: day({
        ...shares(1.15, 25, 60, 15),
        water: usualPlus(500),
        sodiumMg: 2300,
        steps: 8000,
        supplements: creatine,
        note: 'Carbohydrate up with the foods you rehearsed: rice, potatoes, fruit, spread over six meals.',
      }),
    },
    {
      offset: -2,
      label: 'Carbohydrate up',
      targets: day({
        ...shares(1.15, 25, 60, 15),
        water: usualWater,
        sodiumMg: 2300,
        steps: 8000,
        supplements: creatine,
        note: 'Second carbohydrate-up day. Low-fibre foods if your stomach feels full.',
      }),
    },
    {
      offset: -1,
      label: 'Top up',
      targets: day({
        ...shares(1, 25, 55, 20),
        water: usualWater,
        sodiumMg: 2300,
        steps: 6000,
        supplements: creatine,
        note: 'Pack the show bag. Meals as rehearsed; sip water through the day.',
      }),
    },
    {
      offset: 0,
      label: 'Show day',
      targets: day({
        ...shares(0.9, 25, 50, 25),
        water: { kind: 'usual_times', factor: 0.9 },
        sodiumMg: 2300,
        // Food early and only sips late in the day, timed to the show's start (common practice, no source).
        foodCutoff: { time: '15:00', allowanceKcal: 200 },
        fluidCap: { maxMl: 300, after: '15:00' },
        supplements: [
          {
            ...item(DEMO_SEED, 'template-show', 'Rice cakes with honey', 2, 'pieces', []),
            minutesBeforeEvent: [180],
          },
        ],
        note: 'Small, familiar meals every 2–3 hours until 15:00, then a snack if needed and only sips. Tell someone at once if you feel dizzy.',
      }),
    },
    {
      offset: 1,
      label: 'Day after',
      targets: day({
        ...shares(1, 25, 45, 30),
        water: usualWater,
        supplements: creatine,
        note: 'Back to normal meals and water. Eat slowly; no all-day feast.',
      }),
    },
  ];
}

function weighInDays(): TemplateDay[] {
  const creatine = [templateCreatine('weigh_in')];
  return [
    {
      offset: -5,
      label: 'Lower fibre',
      targets: day({
        ...shares(0.9, 30, 45, 25),
        // A water-load day at usual intake + 1 L: common practice, no source.
        water: usualPlus(1000),
        sodiumMg: 2300,
        supplements: creatine,
        note: 'Lower-fibre foods from today: white rice, lean meat, eggs, fruit juice.',
      }),
    },
    {
      offset: -4,
      label: 'Lower fibre',
      targets: day({
        ...shares(0.9, 30, 45, 25),
        water: usualPlus(1000),
        sodiumMg: 2300,
        supplements: creatine,
        note: 'Lower-fibre day two. Technical session only.',
      }),
    },
    {
      offset: -3,
      label: 'Lower fibre',
      targets: day({
        ...shares(0.85, 30, 45, 25),
        water: usualPlus(500),
        sodiumMg: 2300,
        supplements: creatine,
        note: null,
      }),
    },
    {
      offset: -2,
      label: 'Lower residue',
      targets: day({
        ...shares(0.8, 35, 40, 25),
        water: usualWater,
        sodiumMg: 2000,
        supplements: creatine,
        note: 'Small meals, little fibre. Check your weight morning and evening.',
      }),
    },
    {
      offset: -1,
      label: 'Day before weigh-in',
      targets: day({
        ...shares(0.7, 40, 35, 25),
        water: { kind: 'usual_times', factor: 0.6 },
        fluidCutoff: { time: '20:00', allowanceMl: 250 },
        sodiumMg: 1800,
        note: 'Fluids stop at 20:00, with 250 mL for sips after. Only with your physician’s agreement.',
      }),
    },
    {
      offset: 0,
      label: 'Weigh-in and refuel',
      targets: day({
        ...shares(1.2, 20, 60, 20),
        water: { kind: 'usual_times', factor: 1.3 },
        sodiumMg: 3000,
        note: 'After the weigh-in: 500 mL with electrolytes at once, then small carbohydrate-rich meals every 1–2 hours.',
      }),
    },
    {
      offset: 1,
      label: 'Bout day',
      targets: day({
        ...shares(1, 20, 60, 20),
        water: usualWater,
        sodiumMg: 2300,
        supplements: creatine,
        note: 'Familiar food 3–4 hours before the bout; sip water or a sports drink between rounds.',
      }),
    },
  ];
}

function shootDays(): TemplateDay[] {
  return [
    {
      offset: -3,
      label: 'Steady',
      targets: day({ ...shares(0.85, 35, 40, 25), water: usualWater, sodiumMg: 2300, steps: 10000 }),
    },
    {
      offset: -2,
      label: 'Carbohydrate a little up',
      targets: day({
        ...shares(1, 30, 50, 20),
        water: usualWater,
        sodiumMg: 2300,
        steps: 9000,
        note: 'A little more carbohydrate for the next two days; same foods as usual.',
      }),
    },
    {
      offset: -1,
      label: 'Carbohydrate a little up',
      targets: day({
        ...shares(1, 30, 50, 20),
        water: usualWater,
        sodiumMg: 2300,
        steps: 8000,
        note: 'Lay out the outfits and get an early night.',
      }),
    },
    {
      offset: 0,
      label: 'Shoot day',
      targets: day({
        ...shares(0.9, 30, 45, 25),
        water: usualWater,
        sodiumMg: 2300,
        note: 'Small meals between sets; sip water as usual.',
      }),
    },
    {
      offset: 1,
      label: 'Back to plan',
      targets: day({ ...shares(0.85, 35, 40, 25), water: usualWater, sodiumMg: 2300 }),
    },
  ];
}

/** Three countdowns of our own invention; every number is made up and relative to the athlete where natural. */
export const DEMO_TEMPLATES: readonly DemoTemplate[] = [
  {
    key: 'show',
    name: 'Classic show week',
    eventType: 'show',
    description:
      'E-7 to E+1 before a physique show: three lower-carbohydrate days, then carbohydrate back up from ' +
      'E-3, with water and sodium kept steady. Energy is a share of the athlete’s usual intake. ' +
      'Rehearse it in a practice week months before.',
    days: showDays(),
  },
  {
    key: 'weigh_in',
    name: 'Weigh-in, bout next day',
    eventType: 'weigh_in',
    description:
      'Weigh-in on E-0, bout on E+1. Body fat should be off before this week; these days trim gut ' +
      'content with lower-fibre food and end with a short fluid cut-off the evening before the ' +
      'weigh-in, which needs a physician’s supervision. Refuelling starts right after the weigh-in.',
    days: weighInDays(),
  },
  {
    key: 'shoot',
    name: 'Photo shoot, gentle',
    eventType: 'shoot',
    description:
      'A quiet last few days before a photo shoot: no water or sodium changes, a small carbohydrate ' +
      'lift on the two days before, and straight back to plan after.',
    days: shootDays(),
  },
];

// ---------------------------------------------------------------------------------------------
// Plans

/** A stored template as the plans refer to it. */
export interface SeededTemplate {
  id: string;
  name: string;
  days: TemplateDay[];
}

export interface DemoPlanVersion {
  effectiveFrom: string;
  createdAt: Date;
  createdBy: 'owner' | 'assistant';
  reason: string;
  content: PlanContent;
  baseline: PlanBaseline;
  /** The warnings the content raised when it was saved; the author acknowledged each. */
  acknowledgements: GuardrailWarning[];
}

type DayTypeSpec = { key: string; name: string; targets: (weightKg: number) => DayTargets };

interface PatternVersion {
  kind: 'pattern';
  /** Days before the seed date it takes effect (saved the evening before; the first one the same morning). */
  fromT: number;
  reason: string;
  by?: 'owner' | 'assistant';
  dayTypes: DayTypeSpec[];
  weekdays: Record<Weekday, string>;
}

interface CountdownVersion {
  kind: 'countdown';
  /** Days before the seed date the coach applied it (the countdown starts the next day or later). */
  appliedT: number;
  template: DemoTemplateKey;
}

type VersionSpec = PatternVersion | CountdownVersion;

const round5 = (x: number) => Math.round(x / 5) * 5;

/**
 * Energy with protein and fat in grams and carbohydrate making up the rest (to the gram, so the
 * Atwater energy of the grams is within 2 kcal of the energy: FAO 2003 FNP 77).
 */
function grams(kcal: number, proteinG: number, fatShare: number): Partial<DayTargets> {
  const fatG = Math.round((kcal * fatShare) / 9);
  return {
    energy: { kind: 'kcal', kcal },
    protein: { kind: 'g', g: proteinG },
    carbohydrate: { kind: 'g', g: Math.round((kcal - 4 * proteinG - 9 * fatG) / 4) },
    fat: { kind: 'g', g: fatG },
  };
}

/** The same with protein per kg of body weight (resolved with the version's own baseline weight). */
function perKg(kcal: number, gPerKg: number, fatShare: number, weightKg: number): Partial<DayTargets> {
  const fatG = Math.round((kcal * fatShare) / 9);
  const protein: MacroTarget = { kind: 'g_per_kg', perKg: gPerKg };
  return {
    energy: { kind: 'kcal', kcal },
    protein,
    carbohydrate: { kind: 'g', g: Math.round((kcal - 4 * gPerKg * weightKg - 9 * fatG) / 4) },
    fat: { kind: 'g', g: fatG },
  };
}

const WEEK = (map: Partial<Record<Weekday, string>>, otherwise: string): Record<Weekday, string> => ({
  mon: map.mon ?? otherwise,
  tue: map.tue ?? otherwise,
  wed: map.wed ?? otherwise,
  thu: map.thu ?? otherwise,
  fri: map.fri ?? otherwise,
  sat: map.sat ?? otherwise,
  sun: map.sun ?? otherwise,
});

function versionSpecs(def: DemoAthleteDefinition): VersionSpec[] {
  const seed = def.history.seed;
  const s = (name: string, dose: number | null, unit: string | null, times: string[]) =>
    item(seed, 'plan', name, dose, unit, times);
  switch (def.key) {
    case 'final_week': {
      // history.ts: 0.84 → 0.76 of usual 2,600 kcal, protein 2.4 g/kg, fat 25 %; rest on Thu and Sun.
      const daily = [
        s('Creatine monohydrate', 5, 'g', ['07:00']),
        s('Vitamin D3', 1000, 'IU', ['07:00']),
        s('Fish oil', 2, 'capsules', ['07:00']),
      ];
      const caffeine = s('Caffeine', 200, 'mg', ['17:30']);
      const types = (
        training: number,
        rest: number,
        steps: number,
        cardio: number,
        sodium: number | null,
      ) => [
        {
          key: 'training',
          name: 'Training day',
          targets: (w: number) =>
            day({
              ...grams(training, round5(2.4 * w), 0.25),
              water: { kind: 'ml', ml: 3600 },
              sodiumMg: sodium,
              steps,
              cardioMinutes: cardio,
              supplements: [...daily, caffeine],
              note: 'Caffeine 30 minutes before training.',
            }),
        },
        {
          key: 'rest',
          name: 'Rest day',
          targets: (w: number) =>
            day({
              ...grams(rest, round5(2.4 * w), 0.25),
              water: { kind: 'ml', ml: 3300 },
              sodiumMg: sodium,
              steps,
              supplements: daily,
            }),
        },
      ];
      const weekdays = WEEK({ thu: 'rest', sun: 'rest' }, 'training');
      return [
        {
          kind: 'pattern',
          fromT: 119,
          reason: 'First plan after intake: about 0.5 % of body weight a week toward the show',
          dayTypes: types(2250, 2050, 9000, 20, null),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 77,
          reason: 'Week 7 review: loss slowed to about 0.3 % a week, −100 kcal every day; steps to 11,000',
          dayTypes: types(2150, 1950, 11000, 30, null),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 35,
          reason:
            'Week 13 review: rate slowed, −50 kcal on training days and −100 kcal on rest days; sodium steady',
          dayTypes: types(2100, 1850, 12000, 35, 2300),
          weekdays,
        },
        { kind: 'countdown', appliedT: 4, template: 'show' },
      ];
    }
    case 'weigh_in': {
      // history.ts: 0.95 → 0.78 of usual 2,100 kcal, protein 2.0 g/kg, fat 27 %; rest on Sunday.
      const daily = [
        s('Vitamin D3', 1000, 'IU', ['07:00']),
        s('Creatine monohydrate', 3, 'g', ['07:00']),
        s('Magnesium glycinate', 200, 'mg', ['21:30']),
      ];
      const types = (training: number, rest: number, cardio: number | null) => [
        {
          key: 'training',
          name: 'Judo day',
          targets: (w: number) =>
            day({
              ...perKg(training, 2, 0.27, w),
              water: { kind: 'ml', ml: 2900 },
              steps: 10000,
              cardioMinutes: cardio,
              supplements: daily,
            }),
        },
        {
          key: 'rest',
          name: 'Rest day',
          targets: (w: number) =>
            day({
              ...perKg(rest, 2, 0.27, w),
              water: { kind: 'ml', ml: 2700 },
              steps: 8000,
              supplements: daily,
            }),
        },
      ];
      const weekdays = WEEK({ sun: 'rest' }, 'training');
      return [
        {
          kind: 'pattern',
          fromT: 119,
          reason: 'First plan: near maintenance while the judo block is heavy',
          dayTypes: types(2000, 1900, null),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 84,
          reason: 'Start of the cut toward the −63 kg class: −100 kcal, about 0.5 % a week',
          dayTypes: types(1900, 1800, null),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 49,
          reason: 'Week 10 review: −150 kcal and 20 min easy cardio; body fat only, no water cutting',
          dayTypes: types(1750, 1650, 20),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 14,
          reason: 'Weigh-in in under four weeks: −100 kcal to finish the loss with food, not water',
          dayTypes: types(1650, 1550, 20),
          weekdays,
        },
      ];
    }
    case 'photo_shoot': {
      // history.ts: 0.84 of usual 1,900 kcal, protein 2.1 g/kg, fat 28 %; rest on Wednesday and Sunday.
      const daily = [
        s('Multivitamin', 1, 'tablet', ['07:15']),
        s('Fish oil', 2, 'capsules', ['07:15']),
        s('Magnesium glycinate', 200, 'mg', ['22:15']),
      ];
      const weekdays = WEEK({ wed: 'rest', sun: 'rest' }, 'training');
      const inGrams = (steps: number, cardio: number) => [
        {
          key: 'training',
          name: 'Training day',
          targets: (w: number) =>
            day({
              ...grams(1650, round5(2.1 * w), 0.28),
              water: { kind: 'ml', ml: 2500 },
              steps,
              cardioMinutes: cardio,
              supplements: daily,
            }),
        },
        {
          key: 'rest',
          name: 'Rest day',
          targets: (w: number) =>
            day({
              ...grams(1500, round5(2.1 * w), 0.28),
              water: { kind: 'ml', ml: 2300 },
              steps,
              supplements: daily,
            }),
        },
      ];
      const inShares = (steps: number, cardio: number) => [
        {
          key: 'training',
          name: 'Training day',
          targets: () =>
            day({
              energy: { kind: 'kcal', kcal: 1650 },
              protein: { kind: 'pct', pct: 30 },
              carbohydrate: { kind: 'pct', pct: 42 },
              fat: { kind: 'pct', pct: 28 },
              water: { kind: 'ml', ml: 2500 },
              steps,
              cardioMinutes: cardio,
              supplements: daily,
            }),
        },
        {
          key: 'rest',
          name: 'Rest day',
          targets: () =>
            day({
              energy: { kind: 'kcal', kcal: 1500 },
              protein: { kind: 'pct', pct: 30 },
              carbohydrate: { kind: 'pct', pct: 42 },
              fat: { kind: 'pct', pct: 28 },
              water: { kind: 'ml', ml: 2300 },
              steps,
              supplements: daily,
            }),
        },
      ];
      return [
        {
          kind: 'pattern',
          fromT: 119,
          reason: 'First plan: a slow loss of about 0.4 % a week toward the shoot',
          dayTypes: inGrams(8500, 20),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 63,
          reason: 'Week 9 review: on track; targets now as shares of energy, steps to 9,500',
          dayTypes: inShares(9500, 25),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 21,
          by: 'assistant',
          reason: 'Week 15 review: loss slowed a little; cardio 30 min and steps 10,500, food unchanged',
          dayTypes: inShares(10500, 30),
          weekdays,
        },
      ];
    }
    case 'long_diet': {
      // history.ts: 0.79 of usual 2,000 kcal, a Saturday refeed at 1.05; protein 2.3 g/kg, fat 26 %.
      const daily = [
        s('Creatine monohydrate', 5, 'g', ['06:15']),
        s('Vitamin D3', 1000, 'IU', ['06:15']),
        s('Fish oil', 2, 'capsules', ['06:15']),
      ];
      const caffeine = s('Caffeine', 100, 'mg', ['06:00']);
      const types = (diet: number, steps: number, cardio: number) => [
        {
          key: 'diet',
          name: 'Diet day',
          targets: () =>
            day({
              energy: { kind: 'kcal', kcal: diet },
              protein: { kind: 'pct', pct: 40 },
              carbohydrate: { kind: 'pct', pct: 34 },
              fat: { kind: 'pct', pct: 26 },
              water: { kind: 'ml', ml: 3000 },
              steps,
              cardioMinutes: cardio,
              supplements: [...daily, caffeine],
            }),
        },
        {
          key: 'refeed',
          name: 'Refeed day',
          targets: () =>
            day({
              energy: { kind: 'kcal', kcal: 2100 },
              // Below 1.5× the diet day's carbohydrate: a refeed, not a carbohydrate load.
              protein: { kind: 'pct', pct: 32 },
              carbohydrate: { kind: 'pct', pct: 36 },
              fat: { kind: 'pct', pct: 32 },
              water: { kind: 'ml', ml: 3000 },
              steps,
              supplements: daily,
              note: 'Refeed: the extra energy comes from rice, oats and fruit. Long walk instead of cardio.',
            }),
        },
      ];
      const weekdays = WEEK({ sat: 'refeed' }, 'diet');
      return [
        {
          kind: 'pattern',
          fromT: 119,
          reason: 'Contest diet from 20 weeks out: diet days 1,600 kcal with a Saturday refeed',
          dayTypes: types(1600, 10000, 30),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 84,
          reason: 'Week 6 review: on track at about 0.6 % a week; steps to 11,000, cardio 35 min',
          dayTypes: types(1600, 11000, 35),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 42,
          by: 'assistant',
          reason: 'Week 12 review: loss slowed, −50 kcal on diet days, cardio 40 min',
          dayTypes: types(1550, 11000, 40),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 10,
          reason: 'Week 16 review: 16 weeks out and on track; food unchanged, steps to 12,000',
          dayTypes: types(1550, 12000, 40),
          weekdays,
        },
      ];
    }
    case 'regain': {
      // history.ts: 0.78 of usual 2,900 kcal, 0.74 in the final week, about 1.1 after the show
      // (21 days before the seed); protein 2.0 g/kg, fat 27 %; rest on Thu and Sun.
      const daily = [
        s('Creatine monohydrate', 5, 'g', ['07:45']),
        s('Multivitamin', 1, 'tablet', ['07:45']),
        s('Vitamin D3', 1000, 'IU', ['07:45']),
      ];
      const types = (training: number, rest: number, steps: number, cardio: number) => [
        {
          key: 'training',
          name: 'Training day',
          targets: (w: number) =>
            day({
              ...grams(training, round5(2 * w), 0.27),
              water: { kind: 'ml', ml: 3300 },
              steps,
              cardioMinutes: cardio,
              supplements: daily,
            }),
        },
        {
          key: 'rest',
          name: 'Rest day',
          targets: (w: number) =>
            day({
              ...grams(rest, round5(2 * w), 0.27),
              water: { kind: 'ml', ml: 3100 },
              steps,
              supplements: daily,
            }),
        },
      ];
      const weekdays = WEEK({ thu: 'rest', sun: 'rest' }, 'training');
      return [
        {
          kind: 'pattern',
          fromT: 119,
          reason: 'Show prep, 14 weeks out: about 0.4 % of body weight a week',
          dayTypes: types(2350, 2100, 11000, 30),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 28,
          reason: 'Final week before the Kansai Physique Cup: −120 kcal, water and sodium as usual',
          dayTypes: types(2230, 1980, 10000, 25),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 20,
          reason:
            'After the show (3rd place): recovery at about maintenance, about +1,100 kcal, cardio 10 min',
          dayTypes: types(3300, 3100, 9000, 10),
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 7,
          reason:
            'Two weeks after the show: weight back up about 3 kg as expected; −100 kcal for a slow gain',
          dayTypes: types(3200, 3000, 8000, 10),
          weekdays,
        },
      ];
    }
    case 'skips_check_ins': {
      // history.ts: 0.86 of usual 2,200 kcal on weekdays, 1.02 at weekends; protein 1.7 g/kg, fat 30 %.
      const daily = [s('Multivitamin', 1, 'tablet', ['08:30'])];
      const weekdays = WEEK({ sat: 'weekend', sun: 'weekend' }, 'weekday');
      const note = 'Log at least the weigh-in, even on a busy day.';
      return [
        {
          kind: 'pattern',
          fromT: 119,
          reason: 'First plan: lighter weekdays, weekends as they come',
          dayTypes: [
            {
              key: 'weekday',
              name: 'Weekday',
              targets: (w) =>
                day({
                  ...grams(1900, round5(1.7 * w), 0.3),
                  water: { kind: 'ml', ml: 2500 },
                  steps: 7500,
                  supplements: daily,
                  note,
                }),
            },
            {
              key: 'weekend',
              name: 'Weekend',
              targets: (w) =>
                day({
                  ...grams(2250, round5(1.7 * w), 0.3),
                  water: { kind: 'ml', ml: 2500 },
                  steps: 7500,
                  supplements: daily,
                }),
            },
          ],
          weekdays,
        },
        {
          kind: 'pattern',
          fromT: 56,
          reason: 'Week 9 check-in call: protein per kg of body weight (1.7 g/kg), steps to 8,000',
          dayTypes: [
            {
              key: 'weekday',
              name: 'Weekday',
              targets: (w) =>
                day({
                  ...perKg(1900, 1.7, 0.3, w),
                  water: { kind: 'ml', ml: 2500 },
                  steps: 8000,
                  supplements: daily,
                  note,
                }),
            },
            {
              key: 'weekend',
              name: 'Weekend',
              targets: (w) =>
                day({
                  ...perKg(2250, 1.7, 0.3, w),
                  water: { kind: 'ml', ml: 2500 },
                  steps: 8000,
                  supplements: daily,
                }),
            },
          ],
          weekdays,
        },
      ];
    }
  }
}

/** The athlete's figures on `date`, as the API snapshots them at a save. */
export function demoBaseline(
  def: DemoAthleteDefinition,
  history: AthleteHistory,
  date: string,
): PlanBaseline {
  const from = addDays(date, -(BASELINE_TREND_DAYS - 1));
  const weights = history.days.flatMap((d) =>
    d.weighIn && d.date >= from && d.date <= date ? [{ date: d.date, kg: d.weighIn.weightKg }] : [],
  );
  return {
    usualWaterMl: def.intake.usualWaterMl,
    usualEnergyKcal: def.intake.usualEnergyKcal,
    weightKg: trendWeightKg(weights),
    sex: def.intake.sex,
  };
}

/**
 * The plan versions of one demo athlete, oldest first. `now` is the seed instant; `templates`
 * the stored templates (a countdown version refers to its template by id).
 */
export function planDemoVersions(input: {
  def: DemoAthleteDefinition;
  history: AthleteHistory;
  now: Date;
  floors: GuardrailFloors;
  templates: ReadonlyMap<DemoTemplateKey, SeededTemplate>;
}): DemoPlanVersion[] {
  const { def, history, now, floors } = input;
  const tz = def.timeZone;
  const seedDate = localDate(now, tz);
  const event =
    def.event.type === 'none'
      ? null
      : {
          type: def.event.type,
          date: addDays(localDate(now, def.event.timeZone), def.event.daysFromSeed),
          weighInLimitKg: def.event.weighInLimitKg,
        };
  const out: DemoPlanVersion[] = [];

  for (const spec of versionSpecs(def)) {
    let saved: Omit<DemoPlanVersion, 'acknowledgements' | 'baseline'> & { today: string };
    let baseline: PlanBaseline;
    if (spec.kind === 'pattern') {
      const effectiveFrom = addDays(seedDate, -spec.fromT);
      // The first plan is written the morning of the first check-in (after the weigh-in); reviews the
      // evening before they start.
      const first = out.length === 0;
      const today = first ? effectiveFrom : addDays(effectiveFrom, -1);
      baseline = demoBaseline(def, history, today);
      const weightKg = baseline.weightKg ?? def.history.startWeightKg;
      const content: PlanContent = {
        dayTypes: spec.dayTypes.map((t) => ({ key: t.key, name: t.name, targets: t.targets(weightKg) })),
        weekdays: spec.weekdays,
        dates: [],
        tolerances: { ...DEFAULT_TOLERANCES },
        countdown: null,
      };
      saved = {
        today,
        effectiveFrom,
        createdAt: localInstant(today, first ? '10:00' : '19:30', tz),
        createdBy: spec.by ?? 'owner',
        reason: spec.reason,
        content,
      };
    } else {
      const template = input.templates.get(spec.template);
      const previous = out[out.length - 1];
      if (!template || !event || !previous)
        throw new Error(`Demo countdown for ${def.key} needs a template, an event and a plan`);
      const today = addDays(seedDate, -spec.appliedT);
      baseline = demoBaseline(def, history, today);
      const applied = applyTemplate({
        base: previous.content,
        template,
        eventDate: event.date,
        eventType: event.type,
        today,
        baseline,
      });
      saved = {
        today,
        effectiveFrom: applied.effectiveFrom,
        createdAt: localInstant(today, '19:30', tz),
        createdBy: 'owner',
        // The API's default reason for an applied countdown.
        reason: `Countdown "${template.name}" for ${event.date}`,
        content: applied.content,
      };
    }
    const acknowledgements = checkGuardrails(saved.content, {
      baseline,
      floors,
      today: saved.today,
      eventType: saved.content.countdown?.eventType ?? event?.type ?? 'none',
      eventDate: saved.content.countdown?.eventDate ?? event?.date ?? null,
      weighInLimitKg: event?.weighInLimitKg ?? null,
    });
    const { today: _today, ...version } = saved;
    out.push({ ...version, baseline, acknowledgements });
  }
  return out;
}
