import type {
  DayTargets,
  GuardrailCode,
  GuardrailContext,
  GuardrailFloors,
  GuardrailScope,
  GuardrailWarning,
  PlanBaseline,
  PlanContent,
  ResolvedTargets,
} from '../schemas/plans.js';
import { WEEKDAYS } from '../schemas/plans.js';
import { atwaterKcal } from '../nutrition.js';
import { isDiureticItem } from './diuretics.js';
import { addDays, daysBetween, fmt, fmtDate, fmtFixed, listWords } from './format.js';
import { countdownDayLabel, resolveTargets, weekdayOf } from './resolve.js';

/**
 * Team defaults for the floors.
 * - Energy 1,200 kcal (women) / 1,500 kcal (men): common practice, no source.
 * - Water 1,600 / 2,000 mL a day to drink: EFSA NDA Panel (2010) adequate intake of *total* water,
 *   2.0 L women / 2.5 L men (EFSA Journal 8(3):1459), less the ≈20 % of total water that comes from
 *   food — that 20 % share is from memory, unconfirmed.
 */
export const GUARDRAIL_DEFAULTS: GuardrailFloors = {
  energyKcal: { female: 1200, male: 1500 },
  waterMl: { female: 1600, male: 2000 },
};

/** NASEM (2019) adequate intake of sodium, ages 14+, mg/d; doi:10.17226/25353. */
export const SODIUM_AI_MG = 1500;
/** Helms 2014 (JISSN 11:20): lose about 0.5–1 % of body weight a week; faster → warning. */
export const LOSS_RATE_WARNING_PCT_PER_WEEK = 1;
/** Garthe 2011 (IJSNEM 21:97): 1.4 %/wk kept less lean mass than 0.7 %/wk → strong warning above. */
export const LOSS_RATE_STRONG_PCT_PER_WEEK = 1.4;
/** kcal per kg of body weight lost: common practice, no source (a rule of thumb, not physiology). */
export const KCAL_PER_KG_LOST = 7700;
/** Carbohydrate load thresholds: common practice, no source. */
export const CARB_LOAD_G_PER_KG = 8;
export const CARB_LOAD_FACTOR_OF_MEDIAN = 1.5;
/** Water below this share of the athlete's usual intake counts as a fluid restriction: common practice, no source. */
export const FLUID_RESTRICTION_SHARE_OF_USUAL = 0.5;

/** REFERENCES §7 rule 3, from Sturmi 1995, Mayr 2012 and Cheung 2014. */
const DIURETIC_HARM_TEXT =
  'Diuretics and fluid/electrolyte restriction have caused dangerous potassium disturbances, paralysis, ' +
  'cardiac arrhythmia and death. Use only under supervision of a licensed physician.';
const DIURETIC_CASES =
  'Sturmi & Rutecki 1995, Phys Sportsmed 23:49–53; Mayr, Domanovits & Laggner 2012, Am J Emerg Med ' +
  '30:1324.e5–e8; Cheung et al. 2014, Case Rep Endocrinol 2014:483835';
const NASEM_2019 = 'NASEM (2019) Dietary Reference Intakes for Sodium and Potassium, doi:10.17226/25353';
const HELMS_2014 = 'Helms, Aragon & Fitschen 2014, JISSN 11:20';
const GARTHE_2011 = 'Garthe et al. 2011, IJSNEM 21:97–104';

const SOURCES: Record<GuardrailCode, string> = {
  energy_floor: 'Team floor; the defaults (1,200 kcal women, 1,500 kcal men) are common practice, no source',
  water_floor:
    'Team floor; the defaults (1,600 mL women, 2,000 mL men) are the EFSA (2010) adequate intake of total ' +
    'water, 2.0 / 2.5 L a day (EFSA Journal 8(3):1459), less about 20 % that comes from food (the 20 % ' +
    'from memory); Sawka et al. 2007 (ACSM), MSSE 39:377–390',
  sodium_low: `${NASEM_2019}, adequate intake 1,500 mg a day; Escalante et al. 2021, BMC Sports Sci Med Rehabil 13:68`,
  potassium: `${NASEM_2019}; Sturmi & Rutecki 1995, Phys Sportsmed 23:49–53`,
  diuretic: DIURETIC_CASES,
  fluid_restriction: `${DIURETIC_CASES}; less than half the usual water counts as a restriction: common practice, no source`,
  carb_load:
    'de Moraes et al. 2019, J Sports Sci Med 18:772–779; Helms, Aragon & Fitschen 2014, JISSN 11:20; ' +
    'thresholds (8 g/kg, 1.5× the usual day) common practice, no source',
  loss_rate: `${HELMS_2014}; 7,700 kcal per kg lost: common practice, no source`,
  loss_rate_strong: `${GARTHE_2011}; ${HELMS_2014}; 7,700 kcal per kg lost: common practice, no source`,
  make_weight_rate: `${HELMS_2014}; ${GARTHE_2011}; Reale, Slater & Burke 2017, Eur J Sport Sci 17:727–740`,
};

const ADVICE: Record<GuardrailCode, string> = {
  energy_floor: 'Eating this little needs a second look; agree it with a registered dietitian or physician.',
  water_floor:
    'Drinking this little risks dehydration; a water deficit above 2 % of body weight impairs performance (ACSM 2007).',
  sodium_low:
    'Agree any sodium change with a registered dietitian (NASEM 2019 adequate intake); sodium changes that were never rehearsed are best avoided before an event.',
  potassium:
    'Potassium that runs too high or too low can disturb the heart rhythm; agree it with a registered dietitian or physician (NASEM 2019).',
  diuretic: DIURETIC_HARM_TEXT,
  fluid_restriction: DIURETIC_HARM_TEXT,
  carb_load:
    'Rehearse it on a practice day first (Helms 2014): large loads often upset digestion, and 7 of 15 bodybuilders had diarrhoea in one study (de Moraes 2019).',
  loss_rate: 'Losing about 0.5–1 % of body weight a week is advised to keep muscle (Helms 2014).',
  loss_rate_strong:
    'In elite athletes, losing about 1.4 % a week cost lean mass where 0.7 % a week gained some (Garthe 2011); aim for 0.5–1 % a week (Helms 2014).',
  make_weight_rate:
    'The time between weigh-in and competition limits how much of a fast loss can be won back (Reale 2017).',
};

const POTASSIUM_PATTERN = /\b(potassium|kcl|salt substitute)\b|\bK\+/i;
const isPotassiumItem = (item: string): boolean => POTASSIUM_PATTERN.test(item);

/** `${code}:${scopeKey}` with scopeKey `plan` | `type:<key>` | `date:<YYYY-MM-DD>`. */
export function guardrailKey(code: GuardrailCode, scope: GuardrailScope): string {
  if (scope.kind === 'plan') return `${code}:plan`;
  if (scope.kind === 'day_type') return `${code}:type:${scope.key}`;
  return `${code}:date:${scope.date}`;
}

interface Hit {
  code: GuardrailCode;
  severity: GuardrailWarning['severity'];
  scope: GuardrailScope;
  /** "Rest day", "Fri 4 Dec (E-1)"; null for plan-wide. */
  label: string | null;
  /** A fragment with the figures ("energy 1,100 kcal is below the team floor of 1,200 kcal"). */
  fact: string;
  field: string | null;
}

interface Entry {
  scope: GuardrailScope;
  label: string;
  prefix: string;
  targets: DayTargets;
  resolved: ResolvedTargets;
}

/** Every guardrail warning for a content (each day type, each dated day, and plan-wide rates). */
export function checkGuardrails(content: PlanContent, ctx: GuardrailContext): GuardrailWarning[] {
  const { baseline, floors } = ctx;
  const entries: Entry[] = [
    ...content.dayTypes.map((t, i) => ({
      scope: { kind: 'day_type', key: t.key } as const,
      label: t.name,
      prefix: `dayTypes.${i}.targets`,
      targets: t.targets,
      resolved: resolveTargets(t.targets, baseline),
    })),
    ...content.dates.flatMap((d, i) =>
      // Past days keep the plan they had: only today and later are judged.
      d.date < ctx.today
        ? []
        : [
            {
              scope: { kind: 'date', date: d.date } as const,
              label:
                fmtDate(d.date) +
                (d.countdownOffset != null ? ` (${countdownDayLabel(d.countdownOffset)})` : ''),
              prefix: `dates.${i}.targets`,
              targets: d.targets,
              resolved: resolveTargets(d.targets, baseline),
            },
          ],
    ),
  ];

  const typeByKey = new Map(content.dayTypes.map((t) => [t.key, t]));
  const patternDays = WEEKDAYS.map((d) => typeByKey.get(content.weekdays[d]))
    .filter((t) => t !== undefined)
    .map((t) => resolveTargets(t.targets, baseline));
  const patternCarbs = patternDays.map((r) => r.carbohydrateG).filter((g): g is number => g != null);
  const medianCarbs = median(patternCarbs);

  const sexKnown = baseline.sex != null;
  const sex = baseline.sex ?? 'female';
  const sexNote = sexKnown ? '' : " (the women's floor, as the athlete's sex is not recorded)";
  const hits: Hit[] = [];

  for (const e of entries) {
    const r = e.resolved;
    const hit = (code: GuardrailCode, severity: Hit['severity'], fact: string, field: string | null) =>
      hits.push({ code, severity, scope: e.scope, label: e.label, fact, field });

    // Energy floor: team setting per sex (defaults common practice, no source).
    const energyFloor = floors.energyKcal[sex];
    if (r.energyKcal != null && r.energyKcal < energyFloor) {
      hit(
        'energy_floor',
        'warning',
        `energy ${fmt(r.energyKcal)} kcal is below the team floor of ${fmt(energyFloor)} kcal${sexNote}`,
        `${e.prefix}.energy`,
      );
    }

    // Water floor: team setting per sex (defaults from EFSA 2010 less food water).
    const waterFloor = floors.waterMl[sex];
    if (r.waterMl != null && r.waterMl < waterFloor) {
      hit(
        'water_floor',
        'warning',
        `water ${fmt(r.waterMl)} mL is below the team floor of ${fmt(waterFloor)} mL${sexNote}`,
        `${e.prefix}.water`,
      );
    }

    // Sodium below the NASEM 2019 adequate intake.
    if (r.sodiumMg != null && r.sodiumMg < SODIUM_AI_MG) {
      hit(
        'sodium_low',
        'warning',
        `sodium ${fmt(r.sodiumMg)} mg is below the adequate intake of ${fmt(SODIUM_AI_MG)} mg a day`,
        `${e.prefix}.sodiumMg`,
      );
    }

    // Potassium in the schedule: NASEM 2019; REFERENCES §7 rule 4.
    const potassium = matchingItems(e.targets, isPotassiumItem);
    if (potassium.length > 0) {
      hit(
        'potassium',
        'warning',
        `${quoted(potassium)} in the schedule ${potassium.length > 1 ? 'change' : 'changes'} potassium intake`,
        `${e.prefix}.supplements.${potassium[0]!.index}.item`,
      );
    }

    // Diuretic-type items (the ATC C03 list and herbal water pills, diuretics.ts): Sturmi 1995;
    // Mayr 2012; Cheung 2014 (REFERENCES §7 rule 3).
    const diuretics = matchingItems(e.targets, isDiureticItem);
    if (diuretics.length > 0) {
      hit(
        'diuretic',
        'strong',
        `${quoted(diuretics)} in the schedule ${diuretics.length > 1 ? 'are diuretic-type items' : 'is a diuretic-type item'}`,
        `${e.prefix}.supplements.${diuretics[0]!.index}.item`,
      );
    }

    // Fluid restriction: a cut-off, or water below half of usual (threshold common practice, no source).
    const restriction: string[] = [];
    if (r.fluidCutoff) {
      restriction.push(
        `fluids stop at ${r.fluidCutoff.time} with ${fmt(r.fluidCutoff.allowanceMl)} mL allowed after`,
      );
    }
    const cap = e.targets.fluidCap;
    if (cap) {
      restriction.push(
        `fluids capped at ${fmt(cap.maxMl)} mL ${cap.after ? `after ${cap.after}` : 'for the whole day'}`,
      );
    }
    const usualWater = baseline.usualWaterMl;
    if (
      r.waterMl != null &&
      usualWater != null &&
      r.waterMl < usualWater * FLUID_RESTRICTION_SHARE_OF_USUAL
    ) {
      restriction.push(`water ${fmt(r.waterMl)} mL is less than half of the usual ${fmt(usualWater)} mL`);
    }
    if (restriction.length > 0) {
      hit(
        'fluid_restriction',
        'strong',
        restriction.join(', and '),
        r.fluidCutoff ? `${e.prefix}.fluidCutoff` : cap ? `${e.prefix}.fluidCap` : `${e.prefix}.water`,
      );
    }

    // Carbohydrate load: ≥ 8 g/kg or ≥ 1.5× the median pattern day (common practice, no source).
    const carbs = r.carbohydrateG;
    if (carbs != null && carbs > 0) {
      const perKg = baseline.weightKg != null && baseline.weightKg > 0 ? carbs / baseline.weightKg : null;
      const ofMedian = medianCarbs != null && medianCarbs > 0 ? carbs / medianCarbs : null;
      const byWeight = perKg != null && perKg >= CARB_LOAD_G_PER_KG;
      const byPattern = ofMedian != null && ofMedian >= CARB_LOAD_FACTOR_OF_MEDIAN;
      if (byWeight || byPattern) {
        const figures = [
          perKg != null ? `${fmtFixed(perKg, 1)} g/kg` : null,
          ofMedian != null ? `${fmtFixed(ofMedian, 1)}× the usual ${fmt(medianCarbs ?? 0)} g` : null,
        ].filter((s) => s !== null);
        hit(
          'carb_load',
          'warning',
          `carbohydrate ${fmt(carbs)} g (${figures.join(', ')}) is a carbohydrate load`,
          `${e.prefix}.carbohydrate`,
        );
      }
    }
  }

  // Energy-implied rate of loss over any 7 consecutive planned days from today — the weekly pattern,
  // dated days and countdown days alike: Helms 2014 (> 1 %/wk), Garthe 2011 (> 1.4 %/wk). The
  // fastest week is reported. A day's planned energy is its energy target, else the Atwater energy
  // of its three macros; a day with neither plans no deficit and counts at the usual energy (the
  // athlete's maintenance as the baseline has it).
  const usualEnergy = baseline.usualEnergyKcal;
  const weight = baseline.weightKg;
  if (usualEnergy != null && weight != null && weight > 0) {
    const week = fastestPlannedWeek(content, entries, ctx.today, usualEnergy, baseline);
    const deficit = usualEnergy - week.meanKcal;
    const kgPerWeek = (deficit * 7) / KCAL_PER_KG_LOST;
    const pctPerWeek = (kgPerWeek / weight) * 100;
    if (pctPerWeek > LOSS_RATE_WARNING_PCT_PER_WEEK) {
      const strong = pctPerWeek > LOSS_RATE_STRONG_PCT_PER_WEEK;
      const span =
        week.from === null
          ? 'The weekly pattern averages'
          : `The 7 planned days from ${fmtDate(week.from)} to ${fmtDate(addDays(week.from, 6))} average`;
      hits.push({
        code: strong ? 'loss_rate_strong' : 'loss_rate',
        severity: strong ? 'strong' : 'warning',
        scope: { kind: 'plan' },
        label: null,
        fact:
          `${span} ${fmt(week.meanKcal)} kcal a day, ${fmt(deficit)} kcal below the usual ` +
          `${fmt(usualEnergy)} kcal: about ${fmtFixed(kgPerWeek, 2)} kg a week, ` +
          `${fmtFixed(pctPerWeek, 1)} % of body weight (${fmtFixed(weight, 1)} kg) a week`,
        field: null,
      });
    }
  }

  // Making weight for a weigh-in: the same weekly-rate thresholds; Reale 2017 on the recovery window.
  if (
    ctx.eventType === 'weigh_in' &&
    ctx.eventDate != null &&
    ctx.weighInLimitKg != null &&
    weight != null &&
    weight > ctx.weighInLimitKg
  ) {
    const days = daysBetween(ctx.today, ctx.eventDate);
    if (days >= 1) {
      const toLose = weight - ctx.weighInLimitKg;
      const pctPerWeek = (toLose / (days / 7) / weight) * 100;
      if (pctPerWeek > LOSS_RATE_WARNING_PCT_PER_WEEK) {
        hits.push({
          code: 'make_weight_rate',
          severity: pctPerWeek > LOSS_RATE_STRONG_PCT_PER_WEEK ? 'strong' : 'warning',
          scope: { kind: 'plan' },
          label: null,
          fact:
            `Reaching the weigh-in limit of ${fmtFixed(ctx.weighInLimitKg, 1)} kg by ${fmtDate(ctx.eventDate)} ` +
            `(${days} ${days === 1 ? 'day' : 'days'}) from ${fmtFixed(weight, 1)} kg means losing ${fmtFixed(toLose, 1)} kg, ` +
            `${fmtFixed(pctPerWeek, 1)} % of body weight a week, faster than the 1 % a week advised` +
            (pctPerWeek > LOSS_RATE_STRONG_PCT_PER_WEEK
              ? ' and above the 1.4 % a week at which lean mass suffered'
              : ''),
          field: null,
        });
      }
    }
  }

  return merge(hits);
}

/** The warnings whose key is not in `acknowledgedKeys`. */
export function unacknowledged(
  warnings: readonly GuardrailWarning[],
  acknowledgedKeys: readonly string[],
): GuardrailWarning[] {
  const keys = new Set(acknowledgedKeys);
  return warnings.filter((w) => !keys.has(w.key));
}

/** One warning per code and scope: facts joined, the strongest severity, the first field. */
function merge(hits: readonly Hit[]): GuardrailWarning[] {
  const byKey = new Map<string, Hit[]>();
  for (const h of hits) {
    const key = guardrailKey(h.code, h.scope);
    byKey.set(key, [...(byKey.get(key) ?? []), h]);
  }
  return [...byKey.entries()].map(([key, group]) => {
    const first = group[0]!;
    const facts = group.map((h) => h.fact).join('; ');
    const sentence = first.label ? `${first.label}: ${facts}.` : `${capitalise(facts)}.`;
    return {
      key,
      code: first.code,
      severity: group.some((h) => h.severity === 'strong') ? 'strong' : 'warning',
      scope: first.scope,
      message: `${sentence} ${ADVICE[first.code]}`,
      source: SOURCES[first.code],
      field: first.field,
    };
  });
}

function matchingItems(
  targets: DayTargets,
  matches: (item: string) => boolean,
): { item: string; index: number }[] {
  return targets.supplements.flatMap((s, index) => (matches(s.item) ? [{ item: s.item, index }] : []));
}

function quoted(items: readonly { item: string }[]): string {
  return listWords(items.map((i) => `“${i.item}”`));
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function plannedEnergy(r: ResolvedTargets): number | null {
  if (r.energyKcal != null) return r.energyKcal;
  if (r.proteinG == null || r.carbohydrateG == null || r.fatG == null) return null;
  return atwaterKcal({ proteinG: r.proteinG, carbohydrateG: r.carbohydrateG, fatG: r.fatG });
}

/**
 * The 7 consecutive planned days with the lowest mean planned energy: the weekly pattern (`from`
 * null; any 7 consecutive pattern days are one whole pattern week) or a run of 7 calendar days from
 * today on that holds at least one dated day (`from` its first day; the pattern fills the days between).
 * Ties keep the pattern, then the earliest run.
 */
function fastestPlannedWeek(
  content: PlanContent,
  entries: readonly Entry[],
  today: string,
  usualEnergy: number,
  baseline: PlanBaseline,
): { from: string | null; meanKcal: number } {
  const typeByKey = new Map(content.dayTypes.map((t) => [t.key, t]));
  const patternKcal = new Map(
    WEEKDAYS.map((d) => {
      const t = typeByKey.get(content.weekdays[d]);
      return [d, (t ? plannedEnergy(resolveTargets(t.targets, baseline)) : null) ?? usualEnergy] as const;
    }),
  );
  const datedKcal = new Map(
    entries.flatMap((e) =>
      e.scope.kind === 'date' ? [[e.scope.date, plannedEnergy(e.resolved) ?? usualEnergy] as const] : [],
    ),
  );
  const kcalOn = (date: string) => datedKcal.get(date) ?? patternKcal.get(weekdayOf(date))!;

  let best = { from: null as string | null, meanKcal: mean([...patternKcal.values()]) };
  const dated = [...datedKcal.keys()].sort();
  if (dated.length === 0) return best;
  // Every run that holds a dated day starts at most 6 days before one, and not before today.
  const sixBefore = addDays(dated[0]!, -6);
  const first = sixBefore > today ? sixBefore : today;
  const last = dated[dated.length - 1]!;
  for (let from = first; from <= last; from = addDays(from, 1)) {
    const days = Array.from({ length: 7 }, (_, i) => addDays(from, i));
    if (!days.some((d) => datedKcal.has(d))) continue;
    const meanKcal = mean(days.map(kcalOn));
    if (meanKcal < best.meanKcal - 1e-9) best = { from, meanKcal };
  }
  return best;
}

function mean(values: readonly number[]): number {
  return values.reduce((a, v) => a + v, 0) / values.length;
}

function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}
