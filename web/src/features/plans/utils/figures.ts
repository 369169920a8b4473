import { minutesBeforeLabel, type ResolvedTargets, type ScheduleItem } from '@driftmark/shared';
import { formatNumber, NBSP } from '@/lib/format';

/*
 * Plan figures for reading. Coaches read plans in SI (kcal, g, mL, mg), whatever units the
 * athlete logs in, so these do not convert.
 */

export const kcal = (n: number) => `${formatNumber(n, 0)}${NBSP}kcal`;
export const grams = (n: number) => `${formatNumber(n, 0)}${NBSP}g`;
export const pct = (n: number) => `${formatNumber(n, 0)}${NBSP}%`;
export const perKg = (n: number) => `${formatNumber(n, 2)}${NBSP}g/kg`;
export const perKgLean = (n: number) => `${formatNumber(n, 2)}${NBSP}g/kg lean mass`;
export const kg = (n: number) => `${formatNumber(n, 1)}${NBSP}kg`;
export const ml = (n: number) => `${formatNumber(n, 0)}${NBSP}mL`;
export const mg = (n: number) => `${formatNumber(n, 0)}${NBSP}mg`;
export const factor = (n: number) => `×${NBSP}${formatNumber(n, 2)}`;

/** "P 180 · C 250 · F 60 g", or null without any macro target. */
export function macroLine(t: Pick<ResolvedTargets, 'proteinG' | 'carbohydrateG' | 'fatG'>): string | null {
  const parts = [
    t.proteinG !== null ? `P${NBSP}${formatNumber(t.proteinG, 0)}` : null,
    t.carbohydrateG !== null ? `C${NBSP}${formatNumber(t.carbohydrateG, 0)}` : null,
    t.fatG !== null ? `F${NBSP}${formatNumber(t.fatG, 0)}` : null,
  ].filter(Boolean);
  return parts.length ? `${parts.join(' · ')}${NBSP}g` : null;
}

/** "Creatine 5 g at 08:00, 20:00", "Caffeine 200 mg at 3 h before the event" (clock times: the athlete's). */
export function supplementText(s: ScheduleItem): string {
  const dose = s.dose !== null ? ` ${formatNumber(s.dose, 3)}${s.unit ? `${NBSP}${s.unit}` : ''}` : '';
  const times = [
    ...s.times,
    ...(s.minutesBeforeEvent ?? []).map((m) => `${minutesBeforeLabel(m)} the event`),
  ];
  return `${s.item}${dose} at ${times.join(', ')}`;
}

/** "All food before 13:00 (+150 kcal)", "Sips: ≤ 300 mL after 15:00", or null. */
export function timingLines(t: Pick<ResolvedTargets, 'foodCutoff' | 'fluidCap'>): string[] {
  return [
    t.foodCutoff
      ? `All food before ${t.foodCutoff.time}${t.foodCutoff.allowanceKcal > 0 ? ` (+${kcal(t.foodCutoff.allowanceKcal)})` : ''}`
      : null,
    t.fluidCap
      ? `Sips: at most ${ml(t.fluidCap.maxMl)} ${t.fluidCap.after ? `after ${t.fluidCap.after}` : 'all day'}`
      : null,
  ].filter((l): l is string => l !== null);
}
