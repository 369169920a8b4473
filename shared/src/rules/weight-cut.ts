import { addDays, daysBetween } from '../calendar.js';
import { STOP_SIGNS_TEXT } from '../consents.js';
import { zonedInstant } from '../plans/event-time.js';
import { LOSS_RATE_STRONG_PCT_PER_WEEK, LOSS_RATE_WARNING_PCT_PER_WEEK } from '../plans/guardrails.js';

/*
 * Making weight for a weigh-in: the cut plan's figures. Pure rules both sides read; the server
 * computes them each day and the web renders its answer. Loss is a positive number throughout
 * (kg lost, % of body mass lost); no figure here is a "safe" amount, and the screens say so.
 */

/** How the chronic part runs from the start weight to the planned pre-acute weight. */
export const CUT_PATHS = ['linear', 'rate'] as const;
export type CutPath = (typeof CUT_PATHS)[number];

/** Whether the weigh-in is the day before the competition or the same day. */
export const WEIGH_IN_TIMINGS = ['day_before', 'same_day'] as const;
export type WeighInTiming = (typeof WEIGH_IN_TIMINGS)[number];

/**
 * Team default for the acute share above which a plan carries a strong warning, % of body mass.
 * Barley OR, Iredale F, Chapman DW, Hopper A, Abbiss CR (2018) "Repeat effort performance is
 * reduced 24 hours after acute dehydration in mixed martial arts athletes", J Strength Cond Res
 * 32:2555–2561: repeat-effort performance was still reduced 24 h after about 5 % rapid loss.
 * (Named in the issue; not in REFERENCES.md: the authors and pages are from memory, unconfirmed.)
 */
export const ACUTE_SHARE_DEFAULT_PCT = 5;
/**
 * Above this acute share the plan needs a second acknowledgement and the athlete sees the
 * stop-and-seek-care signs. The 7 % itself is common practice, no source. Burke LM, Slater GJ,
 * Matthews JJ, Langan-Evans C, Horswill CA (2021) "ACSM Expert Consensus Statement on Weight Loss
 * in Weight-Category Sports", Curr Sports Med Rep 20:199–217, recommends against rapid and
 * unhealthy weight-loss methods but gives no numeric limit; no numeric safe % was confirmed
 * (REFERENCES §7).
 */
export const ACUTE_SHARE_SEVERE_PCT = 7;
/**
 * Fluid to drink after the weigh-in per kg lost at the scale, L. Sawka et al. 2007, ACSM position
 * stand "Exercise and fluid replacement", MSSE 39:377–390 (about 1.5 L per kg lost, with sodium;
 * the figure from memory, unconfirmed); the issue also names the German Nutrition Society's 2020
 * working-group position on fluid replacement, not read.
 */
export const RECOVERY_FLUID_L_PER_KG_LOST = 1.5;
/**
 * Sodium in the recovery fluid, mg per litre: the low end of the 20–30 mmol/L the ACSM position
 * stand names for drinks (Sawka et al. 2007, MSSE 39:377–390; the range from memory, unconfirmed),
 * at 22.99 mg per mmol (sodium's standard atomic weight, IUPAC): 20 × 22.99 = 459.8 mg/L.
 */
export const RECOVERY_SODIUM_MG_PER_L = 20 * 22.99;
/**
 * Carbohydrate after the weigh-in, g per kg of body mass: 1.0–1.2 g/kg an hour for the first 4 h
 * (speedy refuelling), then the daily 5–10 g/kg pro rata for the rest of the window. Burke LM,
 * Hawley JA, Wong SH, Jeukendrup AE (2011) "Carbohydrates for training and competition", J Sports
 * Sci 29 Suppl 1:S17–S27 (figures from memory, unconfirmed); Reale, Slater & Burke 2017 (Eur J
 * Sport Sci 17:727–740) on the window; joining the two bands is common practice, no source.
 */
export const RECOVERY_CARB = {
  firstHours: 4,
  perHourGPerKg: { min: 1.0, max: 1.2 },
  perDayGPerKg: { min: 5, max: 10 },
} as const;
/** What the severe line means, as the team settings and the plan builder say it. */
export const ACUTE_SHARE_SEVERE_MEANING =
  `Above ${ACUTE_SHARE_SEVERE_PCT} % of body mass a cut plan needs a second acknowledgement, with a ` +
  'physician involved, and the athlete is shown the signs to stop and seek care. Losses this large ' +
  'are often spoken of as intravenous-rehydration territory; no numeric safe limit is published.';
/** The last drink slot starts at least this long before competition: common practice, no source. */
export const RECOVERY_LAST_DRINK_MINUTES_BEFORE = 60;

export const CUT_SOURCES = {
  chronicRate:
    'Helms, Aragon & Fitschen 2014, JISSN 11:20 (1 %/week); Garthe et al. 2011, IJSNEM 21:97–104 (1.4 %/week)',
  acuteShare:
    'Barley et al. 2018, J Strength Cond Res: repeat-effort performance still reduced 24 h after about 5 % rapid loss ' +
    '(from memory, unconfirmed); Burke et al. 2021, ACSM Expert Consensus Statement on Weight Loss in ' +
    'Weight-Category Sports, Curr Sports Med Rep 20:199–217, recommends against rapid and unhealthy loss ' +
    'methods and gives no numeric limit: no numeric safe % confirmed',
  acuteShareSevere:
    'The 7 % second acknowledgement is common practice, no source; Burke et al. 2021 (ACSM Expert ' +
    'Consensus Statement, Curr Sports Med Rep 20:199–217) recommends against rapid and unhealthy loss ' +
    'methods and confirms no numeric limit',
  recovery:
    'Sawka et al. 2007, ACSM position stand, MSSE 39:377–390 (about 1.5 L per kg lost, with sodium at ' +
    '20 mmol/L, the low end of its 20–30 mmol/L; both from memory, unconfirmed); ' +
    'Reale, Slater & Burke 2017, Eur J Sport Sci 17:727–740 (the recovery window); carbohydrate bands ' +
    'from Burke et al. 2011, J Sports Sci 29:S17–S27 (from memory)',
} as const;

/** The cut plan's shape: the chronic part's start and planned end, the acute days, the limit. */
export interface CutPlanShape {
  /** First day of the chronic part, YYYY-MM-DD. */
  startDate: string;
  /** Weight on the start day, kg. */
  startKg: number;
  /** Weight planned at the end of the chronic part (the start of the acute days), kg. */
  preAcuteKg: number;
  /** Days of acute loss before the weigh-in (0: none); the chronic part ends that many days before it. */
  acuteDays: number;
  /** Weigh-in date, YYYY-MM-DD (the event's calendar). */
  weighInDate: string;
  /** The class limit, kg. */
  limitKg: number;
  path: CutPath;
}

/** The day the chronic part ends and the acute days start. */
export function preAcuteDate(plan: Pick<CutPlanShape, 'weighInDate' | 'acuteDays'>): string {
  return addDays(plan.weighInDate, -plan.acuteDays);
}

export type CutStage = 'before' | 'chronic' | 'acute' | 'after';

/**
 * The weight needed on `date` to stay on the cut plan's chronic path, kg: the start weight before
 * the start, the path in between, the pre-acute weight from the end of the chronic part to the
 * weigh-in (the acute loss is the plan's separate last-days part). Linear: equal kg each day.
 * Rate: the same share of body mass each day, startKg·(preAcuteKg/startKg)^(t/T).
 */
export function cutPathKg(plan: CutPlanShape, date: string): { stage: CutStage; kg: number } {
  const end = preAcuteDate(plan);
  if (date > plan.weighInDate) return { stage: 'after', kg: plan.preAcuteKg };
  if (date >= end) return { stage: 'acute', kg: plan.preAcuteKg };
  if (date < plan.startDate) return { stage: 'before', kg: plan.startKg };
  const total = daysBetween(plan.startDate, end);
  const t = daysBetween(plan.startDate, date) / total;
  const kg =
    plan.path === 'linear'
      ? plan.startKg + (plan.preAcuteKg - plan.startKg) * t
      : plan.startKg * (plan.preAcuteKg / plan.startKg) ** t;
  return { stage: 'chronic', kg };
}

export type CutSeverity = 'none' | 'warning' | 'strong' | 'severe';

/** The chronic part's weekly loss against the guardrails (1 %/week warning, 1.4 %/week strong). */
export interface ChronicRate {
  /** kg a week (over the whole chronic part, on average). */
  kgPerWeek: number;
  /** The fastest week's loss, % of the weight at that week's start. */
  pctPerWeek: number;
  severity: Exclude<CutSeverity, 'severe'>;
}

/**
 * The chronic part's rate. Linear loses the same kg each week, so its fastest week in % is the
 * last (the lightest body): kgPerWeek / (preAcuteKg + kgPerWeek). Rate-based loses the same share
 * each week: 1 − (preAcuteKg/startKg)^(7/days). A chronic part shorter than a week is scaled to a
 * week. Thresholds are the plan guardrails' (Helms 2014; Garthe 2011), read from one place.
 */
export function chronicRate(plan: CutPlanShape): ChronicRate | null {
  const days = daysBetween(plan.startDate, preAcuteDate(plan));
  if (days <= 0) return null;
  const lossKg = plan.startKg - plan.preAcuteKg;
  const kgPerWeek = (lossKg * 7) / days;
  const pctPerWeek =
    plan.path === 'linear'
      ? (kgPerWeek / (plan.preAcuteKg + Math.min(kgPerWeek, lossKg))) * 100
      : (1 - (plan.preAcuteKg / plan.startKg) ** (7 / days)) * 100;
  return { kgPerWeek, pctPerWeek, severity: rateSeverity(pctPerWeek) };
}

/** A weekly loss (%/week, loss positive) against the guardrails' 1 and 1.4 %/week. */
export function rateSeverity(pctPerWeek: number): ChronicRate['severity'] {
  if (pctPerWeek > LOSS_RATE_STRONG_PCT_PER_WEEK) return 'strong';
  if (pctPerWeek > LOSS_RATE_WARNING_PCT_PER_WEEK) return 'warning';
  return 'none';
}

/** The acute part: what the last days must take off, and its guardrail. */
export interface AcuteShare {
  kg: number;
  /** % of the pre-acute body mass. */
  pct: number;
  /** strong above the team threshold (acknowledge once); severe above 7 % (acknowledge twice). */
  severity: 'none' | 'strong' | 'severe';
}

/**
 * The acute share from the pre-acute weight down to the limit, kg and % of the pre-acute mass.
 * Above the team's threshold (default 5 %, Barley 2018) → strong; above 7 % → severe (common
 * practice, no source); at or under the threshold → none. A plan already at the limit needs none.
 */
export function acuteShare(
  preAcuteKg: number,
  limitKg: number,
  thresholdPct: number = ACUTE_SHARE_DEFAULT_PCT,
): AcuteShare {
  const kg = Math.max(0, preAcuteKg - limitKg);
  const pct = (kg / preAcuteKg) * 100;
  const eps = 1e-9;
  const severity =
    pct > ACUTE_SHARE_SEVERE_PCT + eps ? 'severe' : pct > thresholdPct + eps ? 'strong' : 'none';
  return { kg, pct, severity };
}

/** How many acknowledgements a severity needs (severe: the strong one and a second). */
export function acknowledgementsNeeded(
  severity: AcuteShare['severity'],
): ('acute_share' | 'acute_share_severe')[] {
  if (severity === 'severe') return ['acute_share', 'acute_share_severe'];
  if (severity === 'strong') return ['acute_share'];
  return [];
}

/** The projection at the weigh-in read against the limit. */
export interface LimitGap {
  /** Projected weight at the weigh-in minus the limit, kg; positive = over. */
  overKg: number;
  /** overKg as % of the limit. */
  overPct: number;
  over: boolean;
  /** The whole 80 % range lies above the limit. */
  rangeOver: boolean;
  /** Whole days from today to the weigh-in. */
  daysLeft: number;
  /**
   * The extra loss a week needed from today to land on the limit, % of today's weight: overKg
   * spread over the weeks left; null when not over or no days are left.
   */
  extraPctPerWeek: number | null;
}

/**
 * "Projected 0.6 kg over, needs 0.9 %/week more": the server's projection (api/src/lib/analysis.ts
 * projectTo) at the weigh-in against the limit. `currentKg` is today's trend weight.
 */
export function limitGap(input: {
  projection: { kg: number; lowKg: number };
  limitKg: number;
  currentKg: number;
  today: string;
  weighInDate: string;
}): LimitGap {
  const overKg = input.projection.kg - input.limitKg;
  const over = overKg > 0;
  const daysLeft = daysBetween(input.today, input.weighInDate);
  const extraPctPerWeek = over && daysLeft > 0 ? (overKg / (daysLeft / 7) / input.currentKg) * 100 : null;
  return {
    overKg,
    overPct: (overKg / input.limitKg) * 100,
    over,
    rangeOver: input.projection.lowKg > input.limitKg,
    daysLeft,
    extraPctPerWeek,
  };
}

/** A weigh-in and the competition after it, each on the venue's clock. */
export interface WeighInWindow {
  weighInDate: string;
  /** HH:MM. */
  weighInTime: string;
  timing: WeighInTiming;
  /** HH:MM on the competition day (the weigh-in day, or the day after it). */
  competitionTime: string;
  /** IANA zone of the venue. */
  timeZone: string;
}

/** The competition's date: the weigh-in day, or the day after for a day-before weigh-in. */
export function competitionDate(w: Pick<WeighInWindow, 'weighInDate' | 'timing'>): string {
  return w.timing === 'day_before' ? addDays(w.weighInDate, 1) : w.weighInDate;
}

/**
 * Hours from the weigh-in to the competition, both read on the venue's clock (a daylight-saving
 * change between them counts as the clocks say: the real elapsed hours).
 */
export function recoveryWindowHours(w: WeighInWindow): number {
  const from = zonedInstant(w.weighInDate, w.weighInTime, w.timeZone);
  const to = zonedInstant(competitionDate(w), w.competitionTime, w.timeZone);
  return (to - from) / 3_600_000;
}

/** Recovery targets for the window after the weigh-in. */
export interface RecoveryTargets {
  fluidL: number;
  carbohydrateG: { min: number; max: number };
  /** g per kg of body mass over the whole window. */
  carbohydrateGPerKg: { min: number; max: number };
  /** Drink slots, evenly spread from the weigh-in to an hour before competition. */
  slots: { minutesAfterWeighIn: number; fluidL: number; carbohydrateG: { min: number; max: number } }[];
}

/**
 * Targets from the kg lost at the scale (usual or pre-acute weight minus the weigh-in weight),
 * the body mass at the weigh-in and the window in hours. Slots fall on every whole hour from the
 * weigh-in until an hour before competition (at least one), each with an equal share of the fluid
 * and the carbohydrate of its own hour (the last slot takes the rest of the window): common
 * practice, no source.
 */
export function recoveryTargets(input: {
  kgLost: number;
  bodyKg: number;
  windowHours: number;
}): RecoveryTargets {
  const lost = Math.max(0, input.kgLost);
  const h = Math.max(0, input.windowHours);
  const fluidL = lost * RECOVERY_FLUID_L_PER_KG_LOST;
  const perKg = { min: carbGPerKg(0, h, 'min'), max: carbGPerKg(0, h, 'max') };
  const carbohydrateG = { min: perKg.min * input.bodyKg, max: perKg.max * input.bodyKg };
  const drinkingMinutes = h * 60 - RECOVERY_LAST_DRINK_MINUTES_BEFORE;
  const count = Math.max(1, Math.floor(drinkingMinutes / 60) + 1);
  // Each slot takes the carbohydrate of its own hour; the last takes the rest of the window.
  const slots = Array.from({ length: count }, (_, i) => {
    const to = i === count - 1 ? h : i + 1;
    return {
      minutesAfterWeighIn: i * 60,
      fluidL: fluidL / count,
      carbohydrateG: {
        min: carbGPerKg(i, to, 'min') * input.bodyKg,
        max: carbGPerKg(i, to, 'max') * input.bodyKg,
      },
    };
  });
  return { fluidL, carbohydrateG, carbohydrateGPerKg: perKg, slots };
}

/** The two items of a recovery slot: a drink (fluid entry) and carbohydrate (a meal). */
export const RECOVERY_ITEM_KINDS = ['fluid', 'carbohydrate'] as const;
export type RecoveryItemKind = (typeof RECOVERY_ITEM_KINDS)[number];

/**
 * What ticking a slot's items logs: the slot's fluid rounded to 10 mL with its sodium
 * (RECOVERY_SODIUM_MG_PER_L, whole mg), and the lower end of its carbohydrate band rounded to a
 * whole gram (the target's floor met, the athlete may eat more and log it as any meal). Rounding
 * and taking the floor: common practice, no source.
 */
export function recoveryItemAmounts(
  slot: Pick<RecoveryTargets['slots'][number], 'fluidL' | 'carbohydrateG'>,
): {
  volumeMl: number;
  sodiumMg: number;
  carbohydrateG: number;
} {
  const volumeMl = Math.round((slot.fluidL * 1000) / 10) * 10;
  return {
    volumeMl,
    sodiumMg: Math.round((volumeMl / 1000) * RECOVERY_SODIUM_MG_PER_L),
    carbohydrateG: Math.round(slot.carbohydrateG.min),
  };
}

/** g/kg of carbohydrate from hour `a` to hour `b` after the weigh-in (RECOVERY_CARB). */
function carbGPerKg(a: number, b: number, end: 'min' | 'max'): number {
  if (b <= a) return 0;
  const cut = RECOVERY_CARB.firstHours;
  const early = Math.max(0, Math.min(b, cut) - a);
  const late = Math.max(0, b - Math.max(a, cut));
  return RECOVERY_CARB.perHourGPerKg[end] * early + (RECOVERY_CARB.perDayGPerKg[end] * late) / 24;
}

/** The words every making-weight screen carries: the evidence, no safe number, the deferral. */
export const CUT_CAUTION =
  'These figures are estimates from published studies, not a safe amount: no published limit for ' +
  'acute weight loss was confirmed. The commission’s rules decide the weigh-in; agree any acute loss ' +
  'with a physician.';

/**
 * A cut-plan warning with its words and source; every one needs the coach's acknowledgement.
 * Severity: `warning` (the chronic rate above 1 %/week), `strong` (acknowledged once: the chronic
 * rate above 1.4 %/week, the acute share above the team threshold), `severe` (the second
 * acknowledgement above ACUTE_SHARE_SEVERE_PCT, which carries the stop-and-seek-care signs).
 */
export interface CutWarning {
  key: 'chronic_rate' | 'acute_share' | 'acute_share_severe';
  severity: 'warning' | 'strong' | 'severe';
  message: string;
  source: string;
  /** The signs to stop and seek care, shown with a severe warning; null otherwise. */
  stopSigns: string | null;
}

const fixed = (n: number, digits: number) => n.toFixed(digits);

/** The warnings of a plan's figures, in the order they are shown. */
export function cutWarnings(
  chronic: ChronicRate | null,
  acute: AcuteShare,
  thresholdPct: number,
): CutWarning[] {
  const out: CutWarning[] = [];
  if (chronic && chronic.severity !== 'none') {
    out.push({
      key: 'chronic_rate',
      severity: chronic.severity === 'strong' ? 'strong' : 'warning',
      message:
        `The chronic part loses ${fixed(chronic.kgPerWeek, 2)} kg a week, up to ${fixed(chronic.pctPerWeek, 1)} % ` +
        `of body weight a week: faster than the 1 % a week advised` +
        (chronic.severity === 'strong' ? ' and above the 1.4 % a week at which lean mass suffered.' : '.'),
      source: CUT_SOURCES.chronicRate,
      stopSigns: null,
    });
  }
  if (acute.severity !== 'none') {
    out.push({
      key: 'acute_share',
      severity: 'strong',
      message:
        `The last days must take off ${fixed(acute.kg, 1)} kg, ${fixed(acute.pct, 1)} % of body mass, above the ` +
        `team's ${fixed(thresholdPct, 1)} %: repeat-effort performance was still reduced 24 h after about 5 % ` +
        'rapid loss.',
      source: CUT_SOURCES.acuteShare,
      stopSigns: null,
    });
  }
  if (acute.severity === 'severe') {
    out.push({
      key: 'acute_share_severe',
      severity: 'severe',
      message:
        `An acute loss above ${ACUTE_SHARE_SEVERE_PCT} % of body mass (${fixed(acute.pct, 1)} % here) needs a ` +
        'physician involved; the athlete is shown the signs to stop and seek care.',
      source: CUT_SOURCES.acuteShareSevere,
      stopSigns: STOP_SIGNS_TEXT,
    });
  }
  return out;
}

/** "Projected 0.6 kg over the 63.0 kg limit in 10 days; needs 0.7 %/week more". */
export function limitGapSummary(gap: LimitGap, limitKg: number): string {
  const days = `${gap.daysLeft} ${gap.daysLeft === 1 ? 'day' : 'days'}`;
  if (!gap.over)
    return `Projected ${fixed(Math.abs(gap.overKg), 1)} kg under the ${fixed(limitKg, 1)} kg limit in ${days}`;
  const extra = gap.extraPctPerWeek === null ? '' : `; needs ${fixed(gap.extraPctPerWeek, 1)} %/week more`;
  return `Projected ${fixed(gap.overKg, 1)} kg over the ${fixed(limitKg, 1)} kg limit in ${days}${extra}`;
}

/**
 * Mornings after a rehearsal's weigh-in whose weight is read as regain: the next morning and the
 * one after (a day-before weigh-in's competition morning, and one more). Common practice, no source.
 */
export const REHEARSAL_REGAIN_MORNINGS = 2;

/**
 * Body mass lost from `fromKg` to `toKg`, % of `fromKg` ((pre − post) / pre × 100, the body-mass
 * change of Sawka et al. 2007, ACSM position stand, MSSE 39:377–390; REFERENCES §5: 80 kg → 1.60 kg
 * is 2 %). Negative when mass was gained.
 */
export function lossPct(fromKg: number, toKg: number): number {
  return ((fromKg - toKg) / fromKg) * 100;
}

/** Where a day falls in a rehearsal. */
export type RehearsalStage = 'start' | 'acute' | 'weigh_in' | 'after';

export interface RehearsalDayFigures {
  date: string;
  stage: RehearsalStage;
  /** That day's scale weight, kg; null when the athlete did not weigh in. */
  kg: number | null;
  /** Lost since the day before's weigh-in, kg (negative: gained); null without both weigh-ins. */
  lostKg: number | null;
  /** lostKg as % of the day before's weight. */
  lostPct: number | null;
}

export interface RehearsalFigures {
  days: RehearsalDayFigures[];
  /**
   * From the morning the acute days start to the weigh-in: kg and % of the start weight; null
   * without a weigh-in on both days.
   */
  achieved: { fromKg: number; toKg: number; kg: number; pct: number } | null;
  /**
   * Each morning after the weigh-in with a weigh-in: kg back on since the weigh-in, % of the
   * weigh-in weight, and the share of the rehearsal's loss it makes up (null without `achieved`).
   */
  regained: { date: string; kg: number; pct: number; shareOfLossPct: number | null }[];
}

/**
 * A practice run's record from the athlete's scale weights (one a day): the day the acute part
 * starts (its weight is the starting point), each acute day, the practice weigh-in, and the
 * REHEARSAL_REGAIN_MORNINGS after it. Each day's loss is against the calendar day before; a day
 * without a weigh-in leaves its own and the next day's loss empty rather than spanning the gap.
 */
export function rehearsalFigures(input: {
  preAcuteDate: string;
  weighInDate: string;
  weighIns: readonly { date: string; kg: number }[];
}): RehearsalFigures {
  const kgOn = new Map(input.weighIns.map((w) => [w.date, w.kg]));
  const last = addDays(input.weighInDate, REHEARSAL_REGAIN_MORNINGS);
  const days: RehearsalDayFigures[] = [];
  for (let date = input.preAcuteDate; date <= last; date = addDays(date, 1)) {
    const stage: RehearsalStage =
      date === input.preAcuteDate
        ? 'start'
        : date < input.weighInDate
          ? 'acute'
          : date === input.weighInDate
            ? 'weigh_in'
            : 'after';
    const kg = kgOn.get(date) ?? null;
    const before = kgOn.get(addDays(date, -1)) ?? null;
    const paired = stage !== 'start' && stage !== 'after' && kg !== null && before !== null;
    days.push({
      date,
      stage,
      kg,
      lostKg: paired ? before - kg : null,
      lostPct: paired ? lossPct(before, kg) : null,
    });
  }
  const fromKg = kgOn.get(input.preAcuteDate) ?? null;
  const toKg = kgOn.get(input.weighInDate) ?? null;
  const achieved =
    fromKg !== null && toKg !== null && input.preAcuteDate < input.weighInDate
      ? { fromKg, toKg, kg: fromKg - toKg, pct: lossPct(fromKg, toKg) }
      : null;
  const regained =
    toKg === null
      ? []
      : days
          .filter((d) => d.stage === 'after' && d.kg !== null)
          .map((d) => {
            const kg = d.kg! - toKg;
            return {
              date: d.date,
              kg,
              pct: (kg / toKg) * 100,
              shareOfLossPct: achieved && achieved.kg > 0 ? (kg / achieved.kg) * 100 : null,
            };
          });
  return { days, achieved, regained };
}
