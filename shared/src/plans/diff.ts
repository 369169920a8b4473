import type {
  DateOverride,
  DayTargets,
  EnergyTarget,
  MacroTarget,
  PlanContent,
  ScheduleItem,
  Tolerances,
  WaterTarget,
} from '../schemas/plans.js';
import { DEFAULT_TOLERANCES, WEEKDAYS, WEEKDAY_LABELS } from '../schemas/plans.js';
import { minutesBeforeLabel } from './event-time.js';
import { fmt, fmtDate } from './format.js';
import { countdownDayLabel } from './resolve.js';

/** A figure as written: its value and unit ("2,200", "kcal"); the unit is empty for relative forms. */
type Figure = [value: string, unit: string];

/**
 * What changed between two versions, in plain words ("Rest day: energy 2200 → 2000 kcal"). With
 * `effectiveFrom`, dated days before it that the new version no longer carries are not reported as
 * removed: they were past when it was saved and keep the plan they had.
 */
export function describeChanges(
  previous: PlanContent | null,
  next: PlanContent,
  options: { effectiveFrom?: string } = {},
): string[] {
  if (!previous) return ['First version'];
  const out: string[] = [];

  // Countdown first: it explains the dated days that follow.
  const pc = previous.countdown;
  const nc = next.countdown;
  const countdownChanged = pc?.eventDate !== nc?.eventDate || pc?.templateName !== nc?.templateName;
  if (nc && (!pc || pc.templateId !== nc.templateId || pc.templateName !== nc.templateName)) {
    out.push(`Countdown "${nc.templateName}" applied for the event on ${longDate(nc.eventDate)}`);
  } else if (nc && pc && pc.eventDate !== nc.eventDate) {
    out.push(`Countdown moved from ${longDate(pc.eventDate)} to ${longDate(nc.eventDate)}`);
  } else if (pc && !nc) {
    out.push(`Countdown "${pc.templateName}" removed`);
  }

  // Day types, matched by key.
  const prevTypes = new Map(previous.dayTypes.map((t) => [t.key, t]));
  const nextTypes = new Map(next.dayTypes.map((t) => [t.key, t]));
  for (const t of next.dayTypes) {
    const before = prevTypes.get(t.key);
    if (!before) {
      out.push(`Day type "${t.name}" added`);
      continue;
    }
    if (before.name !== t.name) out.push(`Day type "${before.name}" renamed "${t.name}"`);
    out.push(...targetChanges(before.targets, t.targets).map((c) => `${t.name}: ${c}`));
  }
  for (const t of previous.dayTypes) {
    if (!nextTypes.has(t.key)) out.push(`Day type "${t.name}" removed`);
  }

  // Weekly pattern.
  const typeName = (content: PlanContent, key: string) =>
    content.dayTypes.find((t) => t.key === key)?.name ?? key;
  const moves = WEEKDAYS.filter((d) => previous.weekdays[d] !== next.weekdays[d]).map(
    (d) =>
      `${WEEKDAY_LABELS[d]} ${typeName(previous, previous.weekdays[d])} → ${typeName(next, next.weekdays[d])}`,
  );
  if (moves.length > 0) out.push(`Weekly pattern: ${moves.join(', ')}`);

  // Dated days, matched by date; countdown days come and go together when the countdown changed.
  const prevDates = new Map(previous.dates.map((d) => [d.date, d]));
  const nextDates = new Map(next.dates.map((d) => [d.date, d]));
  const addedCountdown: DateOverride[] = [];
  const removedCountdown: DateOverride[] = [];
  for (const d of next.dates) {
    const before = prevDates.get(d.date);
    if (!before) {
      if (countdownChanged && d.countdownOffset != null) addedCountdown.push(d);
      else out.push(`${dayName(d)} added`);
      continue;
    }
    const name = dayName(d);
    if ((before.label ?? '') !== (d.label ?? '')) {
      out.push(`${name}: label "${before.label ?? ''}" → "${d.label ?? ''}"`);
    }
    if (before.countdownOffset !== d.countdownOffset) {
      out.push(`${name}: ${d.countdownOffset == null ? 'no longer a countdown day' : 'now a countdown day'}`);
    }
    out.push(...targetChanges(before.targets, d.targets).map((c) => `${name}: ${c}`));
  }
  for (const d of previous.dates) {
    if (nextDates.has(d.date)) continue;
    if (options.effectiveFrom && d.date < options.effectiveFrom) continue;
    if (countdownChanged && d.countdownOffset != null) removedCountdown.push(d);
    else out.push(`${dayName(d)} removed`);
  }
  if (removedCountdown.length > 0) out.push(`Countdown days removed: ${span(removedCountdown)}`);
  if (addedCountdown.length > 0) out.push(`Countdown days set: ${span(addedCountdown)}`);

  const tol = toleranceChanges(previous.tolerances, next.tolerances);
  if (tol.length > 0) out.push(`Tolerances: ${tol.join(', ')}`);

  return out.length > 0 ? out : ['No changes to the targets'];
}

function longDate(date: string): string {
  return `${fmtDate(date)} ${date.slice(0, 4)}`;
}

function dayName(d: DateOverride): string {
  const parts = [d.countdownOffset != null ? countdownDayLabel(d.countdownOffset) : null, d.label].filter(
    (p): p is string => !!p,
  );
  return parts.length > 0 ? `${fmtDate(d.date)} (${parts.join(' · ')})` : fmtDate(d.date);
}

/** "Sat 28 Nov (E-7) to Sun 6 Dec (E+1), 9 days". */
function span(days: readonly DateOverride[]): string {
  const sorted = [...days].sort((a, b) => (a.date < b.date ? -1 : 1));
  const label = (d: DateOverride) =>
    d.countdownOffset != null
      ? `${fmtDate(d.date)} (${countdownDayLabel(d.countdownOffset)})`
      : fmtDate(d.date);
  const first = sorted[0]!;
  const last = sorted[sorted.length - 1]!;
  if (sorted.length === 1) return label(first);
  return `${label(first)} to ${label(last)}, ${sorted.length} days`;
}

function energyFigure(e: EnergyTarget | null): Figure | null {
  if (!e) return null;
  return e.kind === 'kcal' ? [fmt(e.kcal), 'kcal'] : [`usual × ${fmt(e.factor, 2)}`, ''];
}

function macroFigure(m: MacroTarget | null): Figure | null {
  if (!m) return null;
  if (m.kind === 'g') return [fmt(m.g, 1), 'g'];
  if (m.kind === 'pct') return [fmt(m.pct, 1), '%'];
  if (m.kind === 'g_per_kg_lean') return [fmt(m.perKg, 2), 'g/kg lean mass'];
  return [fmt(m.perKg, 2), 'g/kg'];
}

function waterFigure(w: WaterTarget | null): Figure | null {
  if (!w) return null;
  if (w.kind === 'ml') return [fmt(w.ml), 'mL'];
  if (w.kind === 'usual_plus') return [`usual ${w.ml < 0 ? '−' : '+'} ${fmt(Math.abs(w.ml))}`, 'mL'];
  return [`usual × ${fmt(w.factor, 2)}`, ''];
}

function numberFigure(n: number | null, unit: string): Figure | null {
  return n == null ? null : [fmt(n, 1), unit];
}

function change(what: string, a: Figure | null, b: Figure | null): string | null {
  const text = (f: Figure | null) => (f ? (f[1] ? `${f[0]} ${f[1]}` : f[0]) : 'none');
  if (text(a) === text(b)) return null;
  const plain = (f: Figure) => /^[\d,.]+$/.test(f[0]);
  if (a && b && a[1] && a[1] === b[1] && plain(a) && plain(b)) return `${what} ${a[0]} → ${b[0]} ${a[1]}`;
  return `${what} ${text(a)} → ${text(b)}`;
}

function targetChanges(a: DayTargets, b: DayTargets): string[] {
  const cutoff = (t: DayTargets): Figure | null =>
    t.fluidCutoff ? [`${t.fluidCutoff.time} with ${fmt(t.fluidCutoff.allowanceMl)} mL after`, ''] : null;
  const foodCutoff = (t: DayTargets): Figure | null =>
    t.foodCutoff ? [`${t.foodCutoff.time} with ${fmt(t.foodCutoff.allowanceKcal)} kcal after`, ''] : null;
  const cap = (t: DayTargets): Figure | null =>
    t.fluidCap
      ? [`${fmt(t.fluidCap.maxMl)} mL ${t.fluidCap.after ? `after ${t.fluidCap.after}` : 'all day'}`, '']
      : null;
  const lines = [
    change('energy', energyFigure(a.energy), energyFigure(b.energy)),
    change('protein', macroFigure(a.protein), macroFigure(b.protein)),
    change('carbohydrate', macroFigure(a.carbohydrate), macroFigure(b.carbohydrate)),
    change('fat', macroFigure(a.fat), macroFigure(b.fat)),
    change('water', waterFigure(a.water), waterFigure(b.water)),
    change('sodium', numberFigure(a.sodiumMg, 'mg'), numberFigure(b.sodiumMg, 'mg')),
    change('fluid cut-off', cutoff(a), cutoff(b)),
    change('food cut-off', foodCutoff(a), foodCutoff(b)),
    change('fluid cap', cap(a), cap(b)),
    change('steps', numberFigure(a.steps, 'steps'), numberFigure(b.steps, 'steps')),
    change('cardio', numberFigure(a.cardioMinutes, 'min'), numberFigure(b.cardioMinutes, 'min')),
  ].filter((l): l is string => l !== null);
  lines.push(...supplementChanges(a.supplements, b.supplements));
  if ((a.note ?? '') !== (b.note ?? '')) {
    lines.push(!a.note ? 'note added' : !b.note ? 'note removed' : 'note changed');
  }
  return lines;
}

function dose(s: ScheduleItem): string {
  const amount = s.dose != null ? `${fmt(s.dose, 2)}${s.unit ? ` ${s.unit}` : ''} ` : '';
  const times = [
    ...s.times,
    ...(s.minutesBeforeEvent ?? []).map((m) => `${minutesBeforeLabel(m)} the event`),
  ];
  return `${amount}at ${times.join(', ')}`;
}

function supplementChanges(a: readonly ScheduleItem[], b: readonly ScheduleItem[]): string[] {
  const before = new Map(a.map((s) => [s.id, s]));
  const after = new Map(b.map((s) => [s.id, s]));
  const lines: string[] = [];
  for (const s of b) {
    const old = before.get(s.id);
    if (!old) lines.push(`supplement “${s.item}” added (${dose(s)})`);
    else if (old.item !== s.item) lines.push(`supplement “${old.item}” → “${s.item}” (${dose(s)})`);
    else if (dose(old) !== dose(s)) lines.push(`supplement “${s.item}” ${dose(old)} → ${dose(s)}`);
  }
  for (const s of a) if (!after.has(s.id)) lines.push(`supplement “${s.item}” removed`);
  return lines;
}

function toleranceChanges(a: Tolerances, b: Tolerances): string[] {
  // [key, what, unit, sign]: steps and cardio are minimums, so their tolerance only reaches below.
  const rows: [keyof Tolerances, string, string, string][] = [
    ['energyPct', 'energy', '%', '±'],
    ['proteinG', 'protein', 'g', '±'],
    ['carbohydrateG', 'carbohydrate', 'g', '±'],
    ['fatG', 'fat', 'g', '±'],
    ['waterPct', 'water', '%', '±'],
    ['sodiumPct', 'sodium', '%', '±'],
    ['activityPct', 'steps and cardio', '%', '−'],
  ];
  // A version saved before a tolerance existed reads as its default.
  const at = (t: Tolerances, k: keyof Tolerances) => t[k] ?? DEFAULT_TOLERANCES[k];
  return rows
    .filter(([k]) => at(a, k) !== at(b, k))
    .map(
      ([k, what, unit, sign]) => `${what} ${sign}${fmt(at(a, k), 1)} → ${sign}${fmt(at(b, k), 1)} ${unit}`,
    );
}
