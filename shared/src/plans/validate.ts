import type {
  DayTargets,
  PlanBaseline,
  PlanContent,
  ResolvedTargets,
  TemplateRequest,
} from '../schemas/plans.js';
import { WEEKDAYS, WEEKDAY_LABELS } from '../schemas/plans.js';
import { ATWATER_KCAL_PER_G, atwaterKcal } from '../nutrition.js';
import { fmt, listWords } from './format.js';
import type { MacroName } from './macros.js';
import { countdownDayLabel, resolveTargets } from './resolve.js';

const MACROS: readonly MacroName[] = ['protein', 'carbohydrate', 'fat'];
const NO_BASELINE: PlanBaseline = { usualWaterMl: null, usualEnergyKcal: null, weightKg: null, sex: null };
/** Shares must add up to 100 % within this many points (issue 4; common practice, no source). */
const SHARE_TOLERANCE_PCT = 1;

/**
 * Refusals beyond the zod shape, as path → message (empty when fine): weekdays naming a missing day
 * type, duplicate day-type keys or dates, a share (%) without an energy target, shares of a day that
 * do not add up to 100 % within 1 point (message names the fields; path on each macro), a split with
 * a blank macro (path on the blank one), grams of some macros that alone exceed the energy target,
 * and — with a baseline — relative targets that need a baseline figure the athlete lacks.
 */
export function validatePlanContent(
  content: PlanContent,
  baseline: PlanBaseline | null,
): Record<string, string> {
  const errors: Record<string, string> = {};
  const add = (path: string, message: string) => {
    errors[path] ??= message;
  };

  const keys = new Set<string>();
  content.dayTypes.forEach((t, i) => {
    if (keys.has(t.key)) add(`dayTypes.${i}.key`, `Another day type already uses the key "${t.key}"`);
    keys.add(t.key);
    dayTargetErrors(t.targets, `dayTypes.${i}.targets`, baseline, add);
    eventTimeErrors(t.targets, `dayTypes.${i}.targets`, false, add);
  });

  for (const day of WEEKDAYS) {
    const key = content.weekdays[day];
    if (!keys.has(key)) {
      add(`weekdays.${day}`, `${WEEKDAY_LABELS[day]} follows day type "${key}", which is not in this plan`);
    }
  }

  const dates = new Set<string>();
  content.dates.forEach((d, i) => {
    if (dates.has(d.date)) add(`dates.${i}.date`, `${d.date} is listed twice`);
    dates.add(d.date);
    dayTargetErrors(d.targets, `dates.${i}.targets`, baseline, add);
    eventTimeErrors(d.targets, `dates.${i}.targets`, d.countdownOffset !== null, add);
  });

  return errors;
}

/** The same rules for a template (no baseline), plus duplicate offsets. */
export function validateTemplate(template: TemplateRequest): Record<string, string> {
  const errors: Record<string, string> = {};
  const add = (path: string, message: string) => {
    errors[path] ??= message;
  };
  const offsets = new Set<number>();
  template.days.forEach((d, i) => {
    if (offsets.has(d.offset)) add(`days.${i}.offset`, `${countdownDayLabel(d.offset)} is listed twice`);
    offsets.add(d.offset);
    dayTargetErrors(d.targets, `days.${i}.targets`, null, add);
  });
  return errors;
}

/**
 * Times before the event belong to countdown days only: a weekday pattern or a plain dated day has
 * no event of its own to count back from.
 */
function eventTimeErrors(
  targets: DayTargets,
  prefix: string,
  countdownDay: boolean,
  add: (path: string, message: string) => void,
): void {
  if (countdownDay) return;
  targets.supplements.forEach((s, i) => {
    if ((s.minutesBeforeEvent?.length ?? 0) > 0) {
      add(
        `${prefix}.supplements.${i}.minutesBeforeEvent`,
        'Times before the event only work on countdown days; use clock times here',
      );
    }
  });
}

/** The per-day rules, on the paths of one DayTargets. Without a baseline, relative figures are not judged. */
function dayTargetErrors(
  targets: DayTargets,
  prefix: string,
  baseline: PlanBaseline | null,
  add: (path: string, message: string) => void,
): void {
  if (baseline) {
    if (targets.energy?.kind === 'usual_times' && baseline.usualEnergyKcal == null) {
      add(`${prefix}.energy`, "The athlete's usual energy intake is not known yet; enter kcal instead");
    }
    if (
      (targets.water?.kind === 'usual_plus' || targets.water?.kind === 'usual_times') &&
      baseline.usualWaterMl == null
    ) {
      add(`${prefix}.water`, "The athlete's usual water intake is not known yet; enter mL instead");
    }
    for (const macro of MACROS) {
      if (targets[macro]?.kind === 'g_per_kg' && baseline.weightKg == null) {
        add(
          `${prefix}.${macro}`,
          'No recent body weight (no weigh-in in the last 60 days); enter grams instead',
        );
      }
    }
    if (targets.protein?.kind === 'g_per_kg_lean' && baseline.leanMassKg == null) {
      add(
        `${prefix}.protein`,
        'No lean mass yet (a body-composition measurement with a trend weight on its day); enter grams or g/kg instead',
      );
    }
  }

  for (const macro of ['carbohydrate', 'fat'] as const) {
    if (targets[macro]?.kind === 'g_per_kg_lean') {
      add(`${prefix}.${macro}`, 'Grams per kg of lean mass is for protein; use grams, a share or g/kg');
    }
  }

  for (const macro of MACROS) {
    if (targets[macro]?.kind === 'pct' && !targets.energy) {
      add(
        `${prefix}.${macro}`,
        'A share (%) needs an energy target for the day; set the energy or use grams',
      );
    }
  }

  const [p, c, f] = [targets.protein, targets.carbohydrate, targets.fat];
  if (!targets.energy) return;
  const set = MACROS.filter((m) => targets[m] != null);
  const blank = MACROS.filter((m) => targets[m] == null);
  if (set.length === 0) return;

  // A split (any macro as a share of energy) needs all three macros: a blank macro is refused on its
  // own field (dayTypes.N.targets.fat …) rather than read as 0 %, so "60 % / 60 % / blank" cannot pass.
  const shares = MACROS.filter((m) => targets[m]?.kind === 'pct');
  if (shares.length > 0 && blank.length > 0) {
    for (const macro of blank) {
      add(
        `${prefix}.${macro}`,
        `A split in % needs all three macros; set ${MACRO_WORDS[macro]} too (%, g or g/kg)`,
      );
    }
    const sum = shares.reduce((a, m) => a + pctOf(targets[m]), 0);
    if (sum > 100 + SHARE_TOLERANCE_PCT + 1e-9) {
      const message = `${capitalise(listWords(shares.map((m) => MACRO_WORDS[m])))} shares already add up to ${fmt(sum, 1)} %; they must add up to 100 % (±1)`;
      for (const macro of shares) add(`${prefix}.${macro}`, message);
    }
    return;
  }

  if (blank.length > 0) {
    // Grams (or g/kg) for some macros, the others blank: those grams alone may not supply more than
    // the day's energy (Atwater general factors, FAO 2003 FNP 77; same 1-point tolerance as a split).
    // Refused here rather than warned in guardrails.ts: like a split that does not add up, it is a
    // plan that cannot be eaten as written (the macros overshoot their own energy target), not a
    // possible plan with a risk the coach may accept; guardrails.ts only warns on risky but coherent days.
    const r = resolveTargets(targets, baseline ?? NO_BASELINE);
    const grams = set.map((m) => gramsOf(r, m));
    if (r.energyKcal == null || r.energyKcal <= 0 || grams.some((g) => g == null)) return;
    const kcal = set.reduce((a, m, i) => a + ATWATER_KCAL_PER_G[m] * grams[i]!, 0);
    const pct = (100 * kcal) / r.energyKcal;
    if (pct > 100 + SHARE_TOLERANCE_PCT + 1e-9) {
      const message =
        `${capitalise(listWords(set.map((m) => MACRO_WORDS[m])))} alone supply ${fmt(kcal)} kcal, ` +
        `${fmt(pct, 1)} % of the ${fmt(r.energyKcal)} kcal energy target; lower them or raise the energy`;
      for (const macro of set) add(`${prefix}.${macro}`, message);
    }
    return;
  }

  let message: string | null = null;
  if (p!.kind === 'pct' && c!.kind === 'pct' && f!.kind === 'pct') {
    // Known without resolving the energy: the shares themselves.
    const sum = p!.pct + c!.pct + f!.pct;
    if (Math.abs(sum - 100) > SHARE_TOLERANCE_PCT + 1e-9) {
      message = `Protein, carbohydrate and fat shares add up to ${fmt(sum, 1)} %; they must add up to 100 % (±1)`;
    }
  } else {
    // Grams (or g/kg) against the energy target, with the Atwater factors (FAO 2003 FNP 77).
    const r = resolveTargets(targets, baseline ?? NO_BASELINE);
    if (
      r.energyKcal != null &&
      r.energyKcal > 0 &&
      r.proteinG != null &&
      r.carbohydrateG != null &&
      r.fatG != null
    ) {
      const kcal = atwaterKcal({ proteinG: r.proteinG, carbohydrateG: r.carbohydrateG, fatG: r.fatG });
      const sum = (100 * kcal) / r.energyKcal;
      if (Math.abs(sum - 100) > SHARE_TOLERANCE_PCT + 1e-9) {
        message =
          `Protein, carbohydrate and fat shares add up to ${fmt(sum, 1)} % ` +
          `(${fmt(kcal)} of ${fmt(r.energyKcal)} kcal); they must add up to 100 % (±1)`;
      }
    }
  }
  if (message) for (const macro of MACROS) add(`${prefix}.${macro}`, message);
}

const MACRO_WORDS: Record<MacroName, string> = {
  protein: 'protein',
  carbohydrate: 'carbohydrate',
  fat: 'fat',
};

function pctOf(t: DayTargets[MacroName]): number {
  return t?.kind === 'pct' ? t.pct : 0;
}

function gramsOf(r: ResolvedTargets, macro: MacroName): number | null {
  if (macro === 'protein') return r.proteinG;
  if (macro === 'carbohydrate') return r.carbohydrateG;
  return r.fatG;
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
