/**
 * The demo team as data: who is in it, their intake answers and the situation each athlete is
 * in. seed-demo.ts writes it; history generators (check-ins, plans, photos) read the same
 * definitions, so every demo number traces back to here and to each person's PRNG seed.
 * Everyone and everything here is invented.
 */
import type {
  EVENT_TYPES,
  GOALS,
  SEXES,
  StaffRole,
  VolumeUnit,
  WeighInTiming,
  WeightUnit,
} from '@driftmark/shared';

export const DEMO_PASSWORD = 'driftmark-demo';
export const DEMO_TEAM_NAME = 'Northline Physique';
/** Seed of the team-level PRNG; each athlete has its own below. */
export const DEMO_SEED = 20_261_201;
/** Days of generated history before the seed date (about four months). */
export const DEMO_HISTORY_DAYS = 120;

export type DemoSituation =
  'final_week' | 'weigh_in' | 'photo_shoot' | 'long_diet' | 'regain' | 'skips_check_ins';

export interface DemoStaffDefinition {
  email: string;
  name: string;
  role: StaffRole;
  timeZone: string;
  weightUnit: WeightUnit;
  volumeUnit: VolumeUnit;
}

export interface DemoAthleteDefinition {
  /** Stable key for generators and tests. */
  key: DemoSituation;
  email: string;
  name: string;
  /** One line for the README and the coach's mental picture. */
  situation: string;
  timeZone: string;
  weightUnit: WeightUnit;
  volumeUnit: VolumeUnit;
  /** Shared with the assistant coach. */
  sharedWithAssistant: boolean;
  intake: {
    sex: (typeof SEXES)[number];
    birthDate: string;
    heightCm: number;
    usualWaterMl: number;
    usualEnergyKcal: number;
    goal: (typeof GOALS)[number];
    photoConsent: boolean;
  };
  /** The coming event; dates are relative to the seed date in `eventTimeZone`. */
  event:
    | { type: 'none' }
    | {
        type: Exclude<(typeof EVENT_TYPES)[number], 'none'>;
        name: string;
        daysFromSeed: number;
        time: string;
        timeZone: string;
        division: string | null;
        weighInLimitKg: number | null;
        /** A weigh-in's record beyond its limit (timing, competition time, usual weight, classes). */
        weighIn?: {
          timing: WeighInTiming;
          competitionTime: string;
          usualWeightKg: number;
          classBelowKg: number | null;
          classAboveKg: number | null;
        };
      };
  /** Division or class without a coming event (kept on the profile). */
  division?: string;
  /** Inputs for the history generators. */
  history: {
    seed: number;
    /** Morning weight when the history starts, kg. */
    startWeightKg: number;
    /** Where the trend should be on the seed date, kg. */
    seedDateWeightKg: number;
    /** Share of days with a check-in. */
    checkInRate: number;
    /** A show that ended before the seed date (regain phase). */
    pastEvent?: { name: string; division: string; daysBeforeSeed: number };
    /**
     * A faster loss over the last `days` days before the seed date, kg a week: the model reaches
     * seedDateWeightKg on the seed date at this rate, and the earlier history leads up to it.
     */
    lateLoss?: { days: number; kgPerWeek: number };
    /** Days before the seed date with nothing logged, whatever the check-in rate draws (1 = yesterday). */
    missedDaysBeforeSeed?: readonly number[];
  };
}

export const DEMO_STAFF: readonly DemoStaffDefinition[] = [
  {
    email: 'coach@driftmark.test',
    name: 'Mara Lindqvist',
    role: 'owner',
    timeZone: 'Europe/Lisbon',
    weightUnit: 'kg',
    volumeUnit: 'ml',
  },
  {
    email: 'assistant@driftmark.test',
    name: 'Kwame Asante',
    role: 'assistant',
    timeZone: 'Europe/London',
    weightUnit: 'kg',
    volumeUnit: 'ml',
  },
];

export const DEMO_OWNER_EMAIL = 'coach@driftmark.test';
export const DEMO_ASSISTANT_EMAIL = 'assistant@driftmark.test';

export const DEMO_ATHLETES: readonly DemoAthleteDefinition[] = [
  {
    key: 'final_week',
    email: 'athlete@driftmark.test',
    name: 'Mateo Castellanos',
    situation: 'Final-week countdown: classic physique show in 4 days',
    timeZone: 'Europe/Madrid',
    weightUnit: 'kg',
    volumeUnit: 'ml',
    sharedWithAssistant: false,
    intake: {
      sex: 'male',
      birthDate: '1995-06-14',
      heightCm: 176,
      usualWaterMl: 3500,
      usualEnergyKcal: 2600,
      goal: 'lose',
      photoConsent: true,
    },
    event: {
      type: 'show',
      name: 'Coastal Classic Championships',
      daysFromSeed: 4,
      time: '09:00',
      timeZone: 'Europe/Madrid',
      division: 'Classic physique',
      weighInLimitKg: null,
    },
    history: { seed: 101, startWeightKg: 86.4, seedDateWeightKg: 79.6, checkInRate: 0.97 },
  },
  {
    key: 'weigh_in',
    email: 'aroha.tane@driftmark.test',
    name: 'Aroha Tane',
    situation: 'Making weight: judo weigh-in for the women’s −63 kg class in 10 days',
    timeZone: 'Pacific/Auckland',
    weightUnit: 'kg',
    volumeUnit: 'ml',
    sharedWithAssistant: false,
    intake: {
      sex: 'female',
      birthDate: '1999-02-03',
      heightCm: 165,
      usualWaterMl: 2800,
      usualEnergyKcal: 2100,
      goal: 'lose',
      photoConsent: true,
    },
    event: {
      type: 'weigh_in',
      name: 'Harbour City Judo Open — weigh-in',
      daysFromSeed: 10,
      time: '18:00',
      timeZone: 'Pacific/Auckland',
      division: 'Women’s −63 kg',
      weighInLimitKg: 63,
      weighIn: {
        timing: 'day_before',
        competitionTime: '09:30',
        usualWeightKg: 67.5,
        classBelowKg: 57,
        classAboveKg: 70,
      },
    },
    history: { seed: 202, startWeightKg: 67.2, seedDateWeightKg: 65.2, checkInRate: 0.93 },
  },
  {
    key: 'photo_shoot',
    email: 'priya.raman@driftmark.test',
    name: 'Priya Raman',
    situation: 'Preparing a fitness photo shoot in 5 weeks',
    timeZone: 'America/Los_Angeles',
    weightUnit: 'lb',
    volumeUnit: 'floz',
    sharedWithAssistant: true,
    intake: {
      sex: 'female',
      birthDate: '1992-09-21',
      heightCm: 162,
      usualWaterMl: 2400,
      usualEnergyKcal: 1900,
      goal: 'lose',
      photoConsent: true,
    },
    event: {
      type: 'shoot',
      name: 'Fitness portfolio shoot',
      daysFromSeed: 35,
      time: '10:00',
      timeZone: 'America/Los_Angeles',
      division: null,
      weighInLimitKg: null,
    },
    history: {
      seed: 303,
      startWeightKg: 63.4,
      seedDateWeightKg: 58.9,
      checkInRate: 0.9,
      // Pushing too hard for the shoot: about 1.8 % of body weight a week over the last three weeks.
      lateLoss: { days: 21, kgPerWeek: 1.05 },
    },
  },
  {
    key: 'long_diet',
    email: 'hannah.kowalski@driftmark.test',
    name: 'Hannah Kowalski',
    situation: 'Long diet: bikini show 16 weeks out',
    timeZone: 'America/Chicago',
    weightUnit: 'lb',
    volumeUnit: 'floz',
    sharedWithAssistant: true,
    intake: {
      sex: 'female',
      birthDate: '1997-04-08',
      heightCm: 168,
      usualWaterMl: 3000,
      usualEnergyKcal: 2000,
      goal: 'lose',
      photoConsent: true,
    },
    event: {
      type: 'show',
      name: 'Lakeshore Spring Open',
      daysFromSeed: 112,
      time: '09:00',
      timeZone: 'America/Chicago',
      division: 'Bikini',
      weighInLimitKg: null,
    },
    history: { seed: 404, startWeightKg: 75.6, seedDateWeightKg: 68.2, checkInRate: 0.92 },
  },
  {
    key: 'regain',
    email: 'kenji.watanabe@driftmark.test',
    name: 'Kenji Watanabe',
    situation: 'Regaining after a men’s physique show 3 weeks ago; no event planned',
    timeZone: 'Asia/Tokyo',
    weightUnit: 'kg',
    volumeUnit: 'ml',
    sharedWithAssistant: false,
    intake: {
      sex: 'male',
      birthDate: '1990-11-30',
      heightCm: 172,
      usualWaterMl: 3200,
      usualEnergyKcal: 2900,
      goal: 'gain',
      photoConsent: true,
    },
    event: { type: 'none' },
    division: 'Men’s physique',
    history: {
      seed: 505,
      startWeightKg: 78.9,
      seedDateWeightKg: 75.4,
      checkInRate: 0.88,
      pastEvent: { name: 'Kansai Physique Cup', division: 'Men’s physique', daysBeforeSeed: 21 },
    },
  },
  {
    key: 'skips_check_ins',
    email: 'leilani.akana@driftmark.test',
    name: 'Leilani Akana',
    situation: 'Steady fat loss with no event; often skips check-ins',
    timeZone: 'Pacific/Honolulu',
    weightUnit: 'lb',
    volumeUnit: 'ml',
    sharedWithAssistant: false,
    intake: {
      sex: 'female',
      birthDate: '1994-07-17',
      heightCm: 170,
      usualWaterMl: 2500,
      usualEnergyKcal: 2200,
      goal: 'lose',
      photoConsent: true,
    },
    event: { type: 'none' },
    history: {
      seed: 606,
      startWeightKg: 79.4,
      seedDateWeightKg: 76.8,
      checkInRate: 0.45,
      // The last two days are always missed: the coach sees the missed check-ins in the queue.
      missedDaysBeforeSeed: [1, 2],
    },
  },
];
