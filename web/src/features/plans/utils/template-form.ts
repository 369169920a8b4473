import {
  countdownDayLabel,
  emptyDayTargets,
  EVENT_TYPES,
  PLAN_LIMITS,
  templateRequest,
  validateTemplate,
  type DayTargets,
  type TemplateDay,
  type TemplateRequest,
  type TemplateView,
} from '@driftmark/shared';
import { set, type FieldErrors, type Resolver } from 'react-hook-form';
// Relative on purpose: these helpers are unit-tested without the web app's path alias.
import { formatNumber, NBSP } from '../../../lib/format';
import {
  dayTargetsFormValues,
  liveDayTargets,
  targetsFormPath,
  toDayTargets,
  type DayTargetsFormValues,
} from './day-targets-form';

const kcal = (n: number) => `${formatNumber(n, 0)}${NBSP}kcal`;
const grams = (n: number) => `${formatNumber(n, 0)}${NBSP}g`;
const pct = (n: number) => `${formatNumber(n, 0)}${NBSP}%`;
const perKg = (n: number) => `${formatNumber(n, 2)}${NBSP}g/kg`;
const perKgLean = (n: number) => `${formatNumber(n, 2)}${NBSP}g/kg lean mass`;
const ml = (n: number) => `${formatNumber(n, 0)}${NBSP}mL`;
const mg = (n: number) => `${formatNumber(n, 0)}${NBSP}mg`;
const factor = (n: number) => `×${NBSP}${formatNumber(n, 2)}`;

/*
 * The countdown template editor's form: days as the coach types them (the offset as the select's
 * text, targets through the shared DayTargets form section) and the conversions to the request the
 * shared schema and validateTemplate check.
 */

export type TemplateEventType = Exclude<(typeof EVENT_TYPES)[number], 'none'>;
/** A template is written for an event; "no event" is not offered. */
export const TEMPLATE_EVENT_TYPES = EVENT_TYPES.filter((t): t is TemplateEventType => t !== 'none');

export interface TemplateDayFormValues {
  /** The offset from the event day as the select holds it ("-3"). */
  offset: string;
  label: string;
  targets: DayTargetsFormValues;
}

export interface TemplateFormValues {
  name: string;
  eventType: TemplateEventType | '';
  description: string;
  days: TemplateDayFormValues[];
}

/** Where a message that fits no box goes (shown above the days). */
export const TEMPLATE_MESSAGE_FIELD = 'summary';

/** E-14 … E+3, earliest first. */
export const OFFSET_OPTIONS = Array.from(
  { length: PLAN_LIMITS.offset.max - PLAN_LIMITS.offset.min + 1 },
  (_, i) => {
    const offset = PLAN_LIMITS.offset.min + i;
    return { value: String(offset), label: offsetLabel(offset) };
  },
);

/** "E-3 (3 days before)", "E-0 (event day)", "E+1 (day after)". */
export function offsetLabel(offset: number): string {
  const tag = countdownDayLabel(offset);
  if (offset === 0) return `${tag} (event day)`;
  const n = Math.abs(offset);
  const days = `${n} ${n === 1 ? 'day' : 'days'}`;
  return offset < 0 ? `${tag} (${days} before)` : `${tag} (${days} after)`;
}

export function templateDayFormValues(
  day: Pick<TemplateDay, 'offset' | 'label' | 'targets'>,
): TemplateDayFormValues {
  return { offset: String(day.offset), label: day.label ?? '', targets: dayTargetsFormValues(day.targets) };
}

/** A saved template in the form, days in countdown order; a new one starts with an empty E-0. */
export function templateFormValues(view: TemplateView | null): TemplateFormValues {
  if (!view) {
    return {
      name: '',
      eventType: '',
      description: '',
      days: [templateDayFormValues({ offset: 0, label: null, targets: emptyDayTargets() })],
    };
  }
  return {
    name: view.name,
    eventType: view.eventType === 'none' ? '' : view.eventType,
    description: view.description ?? '',
    days: [...view.days].sort((a, b) => a.offset - b.offset).map(templateDayFormValues),
  };
}

/** The offset a new day gets: the day after the latest one, or the day before the earliest at the end of the range. */
export function nextOffset(taken: readonly number[]): number {
  const { min, max } = PLAN_LIMITS.offset;
  if (taken.length === 0) return 0;
  const latest = Math.max(...taken);
  for (let o = latest + 1; o <= max; o += 1) if (!taken.includes(o)) return o;
  for (let o = Math.min(...taken) - 1; o >= min; o -= 1) if (!taken.includes(o)) return o;
  return latest;
}

function readOffset(text: string): number {
  return text.trim() === '' ? Number.NaN : Number(text);
}

/** The form → the request body, with the boxes that hold no number ("days.0.targets.energy.value"). */
export function toTemplateRequest(
  v: TemplateFormValues,
  lenient = false,
): { request: TemplateRequest; numberErrors: Record<string, string> } {
  const numberErrors: Record<string, string> = {};
  const days = (v.days ?? []).map((d, i) => {
    let targets: DayTargets;
    if (lenient) {
      targets = liveDayTargets(d.targets);
    } else {
      const converted = toDayTargets(d.targets);
      for (const [path, message] of Object.entries(converted.numberErrors)) {
        numberErrors[`days.${i}.targets.${path}`] = message;
      }
      targets = converted.targets;
    }
    const label = d.label.trim();
    return { offset: readOffset(d.offset), label: label === '' ? null : label, targets };
  });
  const description = v.description.trim();
  return {
    request: {
      name: v.name,
      eventType: (v.eventType || undefined) as TemplateRequest['eventType'],
      description: description === '' ? null : description,
      days,
    },
    numberErrors,
  };
}

/** A schema or server path → the form path of the box that shows it; TEMPLATE_MESSAGE_FIELD when none fits. */
export function templateFormPath(path: string): string {
  const [head, index, field, ...tail] = path.split('.');
  if (head === 'name' || head === 'eventType' || head === 'description') return head;
  if (head === 'days' && index !== undefined && /^\d+$/.test(index)) {
    if (field === 'targets' && tail.length) return `days.${index}.targets.${targetsFormPath(tail.join('.'))}`;
    if (field === 'offset' || field === 'label') return `days.${index}.${field}`;
  }
  return TEMPLATE_MESSAGE_FIELD;
}

/**
 * The live refusals of a draft (validateTemplate on whatever is usable so far), path → message, in
 * the shared paths ("days.1.targets.protein"). Empty while the draft cannot be read yet.
 */
export function liveTemplateIssues(v: TemplateFormValues): Record<string, string> {
  try {
    const { request } = toTemplateRequest(v, true);
    return validateTemplate(request);
  } catch {
    return {};
  }
}

/** One day's refusals, keyed relative to its targets ("protein"), for the DayTargets section. */
export function dayIssues(issues: Readonly<Record<string, string>>, index: number): Record<string, string> {
  const prefix = `days.${index}.targets.`;
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(issues)) {
    if (path.startsWith(prefix)) out[path.slice(prefix.length)] = message;
  }
  return out;
}

/** Validates with the shared request schema and validateTemplate; messages land beside their boxes. */
export function templateFormResolver(): Resolver<TemplateFormValues, unknown, TemplateRequest> {
  return (values) => {
    const { request, numberErrors } = toTemplateRequest(values);
    const parsed = templateRequest.safeParse(request);
    const flat: Record<string, string> = {};
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        flat[templateFormPath(issue.path.map(String).join('.'))] ??= issue.message;
      }
    } else {
      for (const [path, message] of Object.entries(validateTemplate(parsed.data))) {
        flat[templateFormPath(path)] ??= message;
      }
    }
    Object.assign(flat, numberErrors);
    if (Object.keys(flat).length === 0 && parsed.success) return { values: parsed.data, errors: {} };
    const errors = {};
    for (const [path, message] of Object.entries(flat)) set(errors, path, { type: 'validation', message });
    return { values: {}, errors: errors as FieldErrors<TemplateFormValues> };
  };
}

/** "E-7 … E+1", "E-0" for one day, "—" for none. */
export function offsetRange(days: readonly Pick<TemplateDay, 'offset'>[]): string {
  if (days.length === 0) return '—';
  const offsets = days.map((d) => d.offset);
  const lo = Math.min(...offsets);
  const hi = Math.max(...offsets);
  return lo === hi ? countdownDayLabel(lo) : `${countdownDayLabel(lo)} … ${countdownDayLabel(hi)}`;
}

const signed = (n: number, unit: string) =>
  `${n < 0 ? '−' : '+'}${NBSP}${formatNumber(Math.abs(n), 0)}${NBSP}${unit}`;

/**
 * A day's targets in words, relative ones as expressions (a template has no athlete yet):
 * "Energy usual × 0.9", "Water usual + 1,000 mL", "Carbohydrate 8 g/kg".
 */
export function describeTargets(t: DayTargets): string[] {
  const out: string[] = [];
  if (t.energy)
    out.push(`Energy ${t.energy.kind === 'kcal' ? kcal(t.energy.kcal) : `usual ${factor(t.energy.factor)}`}`);
  for (const [key, label] of [
    ['protein', 'Protein'],
    ['carbohydrate', 'Carbohydrate'],
    ['fat', 'Fat'],
  ] as const) {
    const m = t[key];
    if (!m) continue;
    out.push(
      `${label} ${m.kind === 'g' ? grams(m.g) : m.kind === 'pct' ? `${pct(m.pct)} of energy` : m.kind === 'g_per_kg_lean' ? perKgLean(m.perKg) : perKg(m.perKg)}`,
    );
  }
  if (t.water) {
    out.push(
      `Water ${
        t.water.kind === 'ml'
          ? ml(t.water.ml)
          : t.water.kind === 'usual_plus'
            ? `usual ${signed(t.water.ml, 'mL')}`
            : `usual ${factor(t.water.factor)}`
      }`,
    );
  }
  if (t.sodiumMg !== null) out.push(`Sodium ${mg(t.sodiumMg)}`);
  if (t.fluidCutoff) {
    out.push(
      `No fluids after ${t.fluidCutoff.time}${t.fluidCutoff.allowanceMl > 0 ? ` beyond ${ml(t.fluidCutoff.allowanceMl)}` : ''}`,
    );
  }
  if (t.foodCutoff) {
    out.push(
      `All food before ${t.foodCutoff.time}${t.foodCutoff.allowanceKcal > 0 ? ` (+${formatNumber(t.foodCutoff.allowanceKcal, 0)}${NBSP}kcal)` : ''}`,
    );
  }
  if (t.fluidCap) {
    out.push(
      `Sips: at most ${ml(t.fluidCap.maxMl)} ${t.fluidCap.after ? `after ${t.fluidCap.after}` : 'all day'}`,
    );
  }
  if (t.steps !== null) out.push(`${formatNumber(t.steps, 0)}${NBSP}steps`);
  if (t.cardioMinutes !== null) out.push(`Cardio ${formatNumber(t.cardioMinutes, 0)}${NBSP}min`);
  if (t.supplements.length > 0) {
    out.push(`${t.supplements.length} ${t.supplements.length === 1 ? 'supplement' : 'supplements'}`);
  }
  return out;
}
