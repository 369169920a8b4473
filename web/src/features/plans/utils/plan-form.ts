import { parseTypedNumber, toTypedText } from '@driftmark/shared';
import {
  createPlanVersionRequest,
  DEFAULT_TOLERANCES,
  WEEKDAYS,
  type CountdownInfo,
  type CreatePlanVersionRequest,
  type GuardrailWarning,
  type PlanContent,
  type Tolerances,
  type Weekday,
} from '@driftmark/shared';
import { set, type FieldErrors, type FieldValues, type Resolver } from 'react-hook-form';
import {
  dayTargetsFormValues,
  liveDayTargets,
  targetsFormPath,
  toDayTargets,
  NOT_A_NUMBER,
  type DayTargetsFormValues,
  type DayWarning,
} from './day-targets-form';

/*
 * The plan editor's form: a PlanContent with each day's targets in their typed form, plus the
 * version's first day and the reason. Field paths follow the request's (content.dayTypes.0…), so
 * schema and server messages land beside their boxes.
 */

export const TOLERANCE_KEYS = Object.keys(DEFAULT_TOLERANCES) as Array<keyof Tolerances>;

export interface DayTypeFormValues {
  key: string;
  name: string;
  targets: DayTargetsFormValues;
}

export interface DatedDayFormValues {
  date: string;
  label: string;
  /** Kept as it came (a countdown day's offset from the event), not edited here. */
  countdownOffset: number | null;
  targets: DayTargetsFormValues;
}

export interface PlanContentFormValues {
  dayTypes: DayTypeFormValues[];
  weekdays: Record<Weekday, string>;
  dates: DatedDayFormValues[];
  tolerances: Record<keyof Tolerances, string>;
  /** Carried through unchanged while a countdown day remains. */
  countdown: CountdownInfo | null;
}

export interface PlanFormValues {
  effectiveFrom: string;
  reason: string;
  content: PlanContentFormValues;
}

export function planContentFormValues(content: PlanContent): PlanContentFormValues {
  return {
    dayTypes: content.dayTypes.map((t) => ({
      key: t.key,
      name: t.name,
      targets: dayTargetsFormValues(t.targets),
    })),
    weekdays: { ...content.weekdays },
    dates: [...content.dates]
      .sort((a, b) => a.date.localeCompare(b.date))
      .map((d) => ({
        date: d.date,
        label: d.label ?? '',
        countdownOffset: d.countdownOffset,
        targets: dayTargetsFormValues(d.targets),
      })),
    tolerances: Object.fromEntries(
      TOLERANCE_KEYS.map((k) => [k, toTypedText(content.tolerances[k] ?? DEFAULT_TOLERANCES[k], 1)]),
    ) as Record<keyof Tolerances, string>,
    countdown: content.countdown,
  };
}

export function planFormValues(content: PlanContent, effectiveFrom: string): PlanFormValues {
  return { effectiveFrom, reason: '', content: planContentFormValues(content) };
}

export interface ContentConversion {
  content: PlanContent;
  /** Form paths ("content.dayTypes.0.targets.energy.value") → "not a number". */
  numberErrors: Record<string, string>;
}

/** The typed content → the PlanContent the schema checks (not-a-number boxes carry NaN). */
export function toPlanContent(v: PlanContentFormValues, lenient = false): ContentConversion {
  const numberErrors: Record<string, string> = {};
  const targets = (prefix: string, t: DayTargetsFormValues) => {
    if (lenient) return liveDayTargets(t);
    const r = toDayTargets(t);
    for (const [path, message] of Object.entries(r.numberErrors)) numberErrors[`${prefix}.${path}`] = message;
    return r.targets;
  };
  const tolerances = Object.fromEntries(
    TOLERANCE_KEYS.map((k) => {
      const n = parseTypedNumber(v.tolerances[k]);
      if (n !== undefined && Number.isNaN(n) && !lenient)
        numberErrors[`content.tolerances.${k}`] = NOT_A_NUMBER;
      return [k, lenient && (n === undefined || Number.isNaN(n)) ? DEFAULT_TOLERANCES[k] : n];
    }),
  ) as Tolerances;
  const dates = v.dates.map((d, i) => ({
    date: d.date,
    label: d.label.trim() === '' ? null : d.label.trim(),
    countdownOffset: d.countdownOffset,
    targets: targets(`content.dates.${i}.targets`, d.targets),
  }));
  return {
    content: {
      dayTypes: v.dayTypes.map((t, i) => ({
        key: t.key,
        name: t.name,
        targets: targets(`content.dayTypes.${i}.targets`, t.targets),
      })),
      weekdays: { ...v.weekdays },
      dates,
      tolerances,
      // A countdown stays attached only while one of its days is left in the plan.
      countdown: v.countdown && dates.some((d) => d.countdownOffset !== null) ? v.countdown : null,
    },
    numberErrors,
  };
}

/** Where a message that fits no box goes (shown in the editor's summary). */
export const PLAN_MESSAGE_FIELD = 'content.summary';

/**
 * A schema or server path (with or without the leading "content.") → the form path of the box that
 * shows it; PLAN_MESSAGE_FIELD when no box fits.
 */
export function planFormPath(path: string): string {
  if (path === 'effectiveFrom' || path === 'reason') return path;
  const rest = path.startsWith('content.') ? path.slice('content.'.length) : path;
  const parts = rest.split('.');
  const [head, index, field, ...tail] = parts;
  if ((head === 'dayTypes' || head === 'dates') && index !== undefined && /^\d+$/.test(index)) {
    if (field === 'targets') {
      return tail.length
        ? `content.${head}.${index}.targets.${targetsFormPath(tail.join('.'))}`
        : PLAN_MESSAGE_FIELD;
    }
    if (head === 'dayTypes') return `content.dayTypes.${index}.${field === 'key' ? 'key' : 'name'}`;
    return `content.dates.${index}.${field === 'label' ? 'label' : 'date'}`;
  }
  if (head === 'weekdays' && index && (WEEKDAYS as readonly string[]).includes(index)) {
    return `content.weekdays.${index}`;
  }
  if (head === 'tolerances' && index && (TOLERANCE_KEYS as string[]).includes(index)) {
    return `content.tolerances.${index}`;
  }
  return PLAN_MESSAGE_FIELD;
}

export function toCreateRequest(v: PlanFormValues): {
  request: Omit<CreatePlanVersionRequest, 'acknowledgedKeys'>;
  numberErrors: Record<string, string>;
} {
  const { content, numberErrors } = toPlanContent(v.content);
  return { request: { effectiveFrom: v.effectiveFrom, reason: v.reason, content }, numberErrors };
}

/**
 * Validates the editor with the shared request schema (acknowledgements come later, in the
 * acknowledgement step) and refuses a first day before the athlete's today.
 */
export function planFormResolver(
  today: string,
  /** How the message names today ("Sat 5 Dec 2026"). */
  showDate: (date: string) => string = (d) => d,
): Resolver<PlanFormValues, unknown, CreatePlanVersionRequest> {
  return (values) => {
    const { request, numberErrors } = toCreateRequest(values);
    const parsed = createPlanVersionRequest.safeParse({ ...request, acknowledgedKeys: [] });
    const flat: Record<string, string> = {};
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const path = planFormPath(issue.path.map(String).join('.'));
        flat[path] ??= issue.message;
      }
    }
    Object.assign(flat, numberErrors);
    if (/^\d{4}-\d{2}-\d{2}$/.test(values.effectiveFrom) && values.effectiveFrom < today) {
      flat.effectiveFrom = `Start today (${showDate(today)}) or later: past days keep the plan they had`;
    }
    if (Object.keys(flat).length === 0 && parsed.success) return { values: parsed.data, errors: {} };
    return { values: {}, errors: nestErrors<PlanFormValues>(flat) };
  };
}

/** Flat path → message into react-hook-form's nested error shape. */
export function nestErrors<V extends FieldValues>(flat: Record<string, string>): FieldErrors<V> {
  const errors = {};
  for (const [path, message] of Object.entries(flat)) set(errors, path, { type: 'validation', message });
  return errors as FieldErrors<V>;
}

/** Short stable key for a new day type from its name ("Peak day" → "peak-day"), unique in `taken`. */
export function dayTypeKey(name: string, taken: readonly string[]): string {
  const base =
    name
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 20) || 'day';
  let key = base;
  for (let n = 2; taken.includes(key); n += 1) key = `${base}-${n}`;
  return key;
}

/* ---------- messages placed on days ---------- */

/** validatePlanContent's messages for one day, keyed relative to its targets ("protein"). */
export function issuesFor(
  issues: Readonly<Record<string, string>>,
  part: 'dayTypes' | 'dates',
  index: number,
): Record<string, string> {
  const prefix = `${part}.${index}.targets.`;
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(issues)) {
    if (path.startsWith(prefix)) out[path.slice(prefix.length)] = message;
  }
  return out;
}

/** The guardrail warnings that belong to a day type or a dated day, with `field` relative to its targets. */
export function warningsFor(
  warnings: readonly GuardrailWarning[],
  part: 'dayTypes' | 'dates',
  index: number,
  scopeKey: string,
): DayWarning[] {
  const prefix = `${part}.${index}.targets.`;
  return warnings
    .filter(
      (w) =>
        w.field?.startsWith(prefix) ||
        (part === 'dayTypes' && w.scope.kind === 'day_type' && w.scope.key === scopeKey) ||
        (part === 'dates' && w.scope.kind === 'date' && w.scope.date === scopeKey),
    )
    .map((w) => ({ ...w, field: w.field?.startsWith(prefix) ? w.field.slice(prefix.length) : null }));
}
