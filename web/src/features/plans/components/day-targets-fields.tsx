import { toTypedText } from '@driftmark/shared';
import {
  ATWATER_KCAL_PER_G,
  DEFAULT_TOLERANCES,
  PLAN_LIMITS,
  resolveTargets,
  type PlanBaseline,
  type ResolvedTargets,
  type Tolerances,
} from '@driftmark/shared';
import { useMemo, type ReactNode } from 'react';
import { useFieldArray, useFormContext, useWatch, type Control, type FieldValues } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { controlClasses, FieldErrorText, useFieldError, useFieldIds } from '@/components/ui/field';
import { CautionIcon, ErrorIcon, PlusIcon, TrashIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import {
  emptyDayTargetsFormValues,
  liveDayTargets,
  MACROS,
  newSupplementRow,
  NO_BASELINE,
  type DayTargetsFormValues,
  type DayWarning,
  type Macro,
} from '../utils/day-targets-form';
import * as fig from '../utils/figures';
import { MealPlanFields } from './meal-plan-fields';

export interface DayTargetsFieldsProps<V extends FieldValues, TContext = unknown, TTransformed = V> {
  /**
   * Where this day's `DayTargetsFormValues` sit in the form, e.g. "content.dayTypes.0.targets" or
   * "days.2.targets". Build the values with `dayTargetsFormValues()` / `emptyDayTargetsFormValues()`
   * and read them back with `toDayTargets()` (utils/day-targets-form.ts).
   */
  name: string;
  /** The form's control (any context and transformed type). */
  control: Control<V, TContext, TTransformed>;
  /**
   * The athlete's figures, for live conversions of relative targets (× usual, g/kg). Leave it out
   * in a template: relative targets are then shown as formulas.
   */
  baseline?: PlanBaseline | null;
  /** Refusals for this day (validatePlanContent / validateTemplate), path relative to the targets ("protein") → message. */
  issues?: Readonly<Record<string, string>>;
  /** Guardrail warnings for this day, shown beside the metric they concern. */
  warnings?: readonly DayWarning[];
  /** Read-only. */
  disabled?: boolean;
  /** Names the group for assistive technology ("Targets for Training day"). */
  label: string;
  /** A countdown day (or template day): supplements may be timed before the event. */
  eventTimes?: boolean;
  /** The plan's tolerances, for judging the meal plan (the defaults in a template). */
  tolerances?: Tolerances;
}

const ENERGY_KINDS = [
  { value: 'none', label: 'No target' },
  { value: 'kcal', label: 'kcal' },
  { value: 'usual_times', label: '× usual energy' },
] as const;
const MACRO_KINDS = [
  { value: 'none', label: 'No target' },
  { value: 'g', label: 'grams' },
  { value: 'pct', label: '% of energy' },
  { value: 'g_per_kg', label: 'g per kg' },
] as const;
/** Protein may also be set per kg of lean mass (Helms 2014: 2.3–3.1 g/kg lean mass); the server refuses it on the others. */
const PROTEIN_KINDS = [...MACRO_KINDS, { value: 'g_per_kg_lean', label: 'g per kg lean mass' }] as const;
const WATER_KINDS = [
  { value: 'none', label: 'No target' },
  { value: 'ml', label: 'mL' },
  { value: 'usual_plus', label: 'usual ± mL' },
  { value: 'usual_times', label: '× usual water' },
] as const;
const SUFFIX: Record<string, string> = {
  kcal: 'kcal',
  usual_times: '×',
  g: 'g',
  pct: '%',
  g_per_kg: 'g/kg',
  // The box is narrow: the unit says g/kg, the box's label says of what.
  g_per_kg_lean: 'g/kg',
  ml: 'mL',
  usual_plus: '± mL',
};
const MACRO_LABEL: Record<Macro, string> = { protein: 'Protein', carbohydrate: 'Carbohydrate', fat: 'Fat' };
const DOSE_UNITS = ['g', 'mg', 'mcg', 'IU', 'mL', 'capsule', 'tablet', 'scoop'];

function safeResolve(
  targets: ReturnType<typeof liveDayTargets>,
  baseline: PlanBaseline,
): ResolvedTargets | null {
  try {
    return resolveTargets(targets, baseline);
  } catch {
    return null;
  }
}

/**
 * The one form section for a day's targets (plan day types, dated days, template days): energy,
 * the three macros in any of their forms with the other forms shown live, water, sodium, the
 * fluid cut-off, steps, cardio, the supplement schedule and a note. Must sit inside <Form>.
 */
export function DayTargetsFields<V extends FieldValues, TContext = unknown, TTransformed = V>({
  name,
  control,
  baseline,
  issues = {},
  warnings = [],
  disabled = false,
  label,
  eventTimes = false,
  tolerances,
}: DayTargetsFieldsProps<V, TContext, TTransformed>) {
  const c = control as unknown as Control<FieldValues>;
  const { register, setValue } = useFormContext();
  const watched = useWatch({ control: c, name }) as DayTargetsFormValues | undefined;
  const values = watched ?? emptyDayTargetsFormValues();
  const base = baseline ?? NO_BASELINE;
  const live = useMemo(() => liveDayTargets(values), [values]);
  const resolved = useMemo(() => safeResolve(live, base), [live, base]);
  const hasBaseline = Boolean(baseline);

  const warningsFor = (head: string) => warnings.filter((w) => w.field?.split('.')[0] === head);
  const heads = new Set([
    'energy',
    'protein',
    'carbohydrate',
    'fat',
    'water',
    'sodiumMg',
    'fluidCutoff',
    'foodCutoff',
    'fluidCap',
    'steps',
    'cardioMinutes',
    'supplements',
    'note',
    'meals',
  ]);
  const dayWide = warnings.filter((w) => !w.field || !heads.has(w.field.split('.')[0] ?? ''));

  // The share rule names all three macros with one message: show it once, on the share line.
  const macroIssues = MACROS.map((m) => issues[m]);
  const shareIssue =
    macroIssues[0] && macroIssues.every((m) => m === macroIssues[0]) ? macroIssues[0] : undefined;

  /** On a change of kind, carry the figure over in its new form when it can be worked out. */
  function convertOnKindChange(metric: 'energy' | 'water' | Macro, kind: string): string {
    if (!resolved || kind === 'none') return '';
    if (metric === 'energy') {
      const e = resolved.energyKcal;
      if (e === null) return '';
      if (kind === 'kcal') return toTypedText(e, 0);
      return base.usualEnergyKcal ? toTypedText(e / base.usualEnergyKcal, 2) : '';
    }
    if (metric === 'water') {
      const w = resolved.waterMl;
      if (w === null) return '';
      if (kind === 'ml') return toTypedText(w, 0);
      if (!base.usualWaterMl) return '';
      return kind === 'usual_plus'
        ? toTypedText(w - base.usualWaterMl, 0)
        : toTypedText(w / base.usualWaterMl, 2);
    }
    const g = resolved[`${metric}G`];
    const p = resolved[`${metric}Pct`];
    if (kind === 'g') return toTypedText(g, 0);
    if (kind === 'pct') return toTypedText(p, 0);
    if (kind === 'g_per_kg_lean')
      return g !== null && base.leanMassKg ? toTypedText(g / base.leanMassKg, 2) : '';
    return g !== null && base.weightKg ? toTypedText(g / base.weightKg, 2) : '';
  }

  const kindSelect = (
    metric: 'energy' | 'water' | Macro,
    metricLabel: string,
    options: readonly { value: string; label: string }[],
  ) => (
    <select
      aria-label={`${metricLabel}: set as`}
      className={cn(controlClasses, 'border-line-strong py-1.5 text-sm')}
      {...register(`${name}.${metric}.kind`, {
        onChange: (e: { target: { value: string } }) =>
          setValue(`${name}.${metric}.value`, convertOnKindChange(metric, e.target.value), {
            shouldDirty: true,
          }),
      })}
    >
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </select>
  );

  return (
    <fieldset disabled={disabled} aria-label={label} className="min-w-0 space-y-1">
      {dayWide.length > 0 ? <WarningLines warnings={dayWide} className="mb-3" /> : null}

      <MetricRow
        label="Energy"
        control={kindSelect('energy', 'Energy', ENERGY_KINDS)}
        input={
          values.energy.kind === 'none' ? null : (
            <NumberBox
              name={`${name}.energy.value`}
              label={values.energy.kind === 'kcal' ? 'Energy, kcal' : 'Energy, times usual'}
              suffix={SUFFIX[values.energy.kind]}
            />
          )
        }
        live={energyLive(values.energy.kind, resolved, base, hasBaseline)}
        issue={issues.energy}
        warnings={warningsFor('energy')}
      />

      {MACROS.map((m) => (
        <MetricRow
          key={m}
          label={MACRO_LABEL[m]}
          control={kindSelect(m, MACRO_LABEL[m], m === 'protein' ? PROTEIN_KINDS : MACRO_KINDS)}
          input={
            values[m].kind === 'none' ? null : (
              <NumberBox
                name={`${name}.${m}.value`}
                label={`${MACRO_LABEL[m]}, ${values[m].kind === 'g_per_kg_lean' ? 'g/kg lean mass' : SUFFIX[values[m].kind]}`}
                suffix={SUFFIX[values[m].kind]}
              />
            )
          }
          live={macroLive(m, values[m].kind, resolved, base, hasBaseline)}
          issue={shareIssue ? undefined : issues[m]}
          warnings={warningsFor(m)}
        />
      ))}
      <ShareTotal values={values} resolved={resolved} issue={shareIssue} />

      <MetricRow
        label="Water"
        control={kindSelect('water', 'Water', WATER_KINDS)}
        input={
          values.water.kind === 'none' ? null : (
            <NumberBox
              name={`${name}.water.value`}
              label={
                values.water.kind === 'ml'
                  ? 'Water, mL'
                  : values.water.kind === 'usual_plus'
                    ? 'Water, mL more (or − less) than usual'
                    : 'Water, times usual'
              }
              suffix={SUFFIX[values.water.kind]}
            />
          )
        }
        live={waterLive(values.water.kind, resolved, base, hasBaseline)}
        issue={issues.water}
        warnings={warningsFor('water')}
      />

      <MetricRow
        label="Sodium"
        input={<NumberBox name={`${name}.sodiumMg`} label="Sodium, mg" suffix="mg" />}
        live={values.sodiumMg.trim() === '' ? 'No target' : null}
        issue={issues.sodiumMg}
        warnings={warningsFor('sodiumMg')}
      />

      <MetricRow
        label="Fluid cut-off"
        control={
          <label className="flex min-h-10 items-center gap-2 text-sm text-ink">
            <input type="checkbox" className="size-5 accent-accent" {...register(`${name}.fluidCutoff.on`)} />
            No fluids after…
          </label>
        }
        input={
          values.fluidCutoff.on ? (
            <div className="grid grid-cols-2 gap-2">
              <TimeBox name={`${name}.fluidCutoff.time`} label="Cut-off time" />
              <NumberBox
                name={`${name}.fluidCutoff.allowanceMl`}
                label="Allowance after the cut-off, mL"
                suffix="mL"
              />
            </div>
          ) : null
        }
        live={values.fluidCutoff.on ? 'Allowance: sips after the cut-off (0 for none).' : null}
        issue={issues.fluidCutoff}
        warnings={warningsFor('fluidCutoff')}
        wideInput
      />

      <MetricRow
        label="Fluid cap"
        control={
          <label className="flex min-h-10 items-center gap-2 text-sm text-ink">
            <input type="checkbox" className="size-5 accent-accent" {...register(`${name}.fluidCap.on`)} />
            Only sips…
          </label>
        }
        input={
          values.fluidCap?.on ? (
            <div className="grid grid-cols-2 gap-2">
              <NumberBox name={`${name}.fluidCap.maxMl`} label="At most, mL" suffix="mL" />
              <TimeBox name={`${name}.fluidCap.after`} label="After (empty: the whole day)" />
            </div>
          ) : null
        }
        live={
          values.fluidCap?.on
            ? values.fluidCap.after
              ? `At most this much after ${values.fluidCap.after} (athlete's clock).`
              : 'At most this much over the whole day; set a time to cap only the hours after it.'
            : null
        }
        issue={issues.fluidCap}
        warnings={warningsFor('fluidCap')}
        wideInput
      />

      <MetricRow
        label="Food cut-off"
        control={
          <label className="flex min-h-10 items-center gap-2 text-sm text-ink">
            <input type="checkbox" className="size-5 accent-accent" {...register(`${name}.foodCutoff.on`)} />
            All food before…
          </label>
        }
        input={
          values.foodCutoff?.on ? (
            <div className="grid grid-cols-2 gap-2">
              <TimeBox name={`${name}.foodCutoff.time`} label="Food cut-off time" />
              <NumberBox
                name={`${name}.foodCutoff.allowanceKcal`}
                label="Allowance after the cut-off, kcal"
                suffix="kcal"
              />
            </div>
          ) : null
        }
        live={
          values.foodCutoff?.on ? "Allowance: a snack after the cut-off (0 for none), athlete's clock." : null
        }
        issue={issues.foodCutoff}
        warnings={warningsFor('foodCutoff')}
        wideInput
      />

      <MetricRow
        label="Steps"
        input={<NumberBox name={`${name}.steps`} label="Steps" suffix="steps" />}
        issue={issues.steps}
        warnings={warningsFor('steps')}
      />
      <MetricRow
        label="Cardio"
        input={<NumberBox name={`${name}.cardioMinutes`} label="Cardio, minutes" suffix="min" />}
        issue={issues.cardioMinutes}
        warnings={warningsFor('cardioMinutes')}
      />

      <SupplementRows name={name} control={c} disabled={disabled} issues={issues} eventTimes={eventTimes} />
      {warningsFor('supplements').length > 0 ? <WarningLines warnings={warningsFor('supplements')} /> : null}

      <NoteBox name={`${name}.note`} />

      <MealPlanFields
        name={name}
        meals={live.meals ?? []}
        resolved={resolved}
        tolerances={tolerances ?? DEFAULT_TOLERANCES}
      />
    </fieldset>
  );
}

/* ---------- live figures ---------- */

function energyLive(
  kind: string,
  r: ResolvedTargets | null,
  b: PlanBaseline,
  hasBaseline: boolean,
): ReactNode {
  if (kind === 'none' || !r) return kind === 'none' ? 'No target' : null;
  if (kind === 'usual_times') {
    if (!hasBaseline) return "of the athlete's usual energy";
    if (b.usualEnergyKcal === null) return 'Usual energy not known yet';
    return r.energyKcal !== null
      ? `= ${fig.kcal(r.energyKcal)} (usual ${fig.kcal(b.usualEnergyKcal)})`
      : null;
  }
  if (hasBaseline && b.usualEnergyKcal && r.energyKcal !== null) {
    return `= ${fig.factor(r.energyKcal / b.usualEnergyKcal)} usual (${fig.kcal(b.usualEnergyKcal)})`;
  }
  return null;
}

function macroLive(
  m: Macro,
  kind: string,
  r: ResolvedTargets | null,
  b: PlanBaseline,
  hasBaseline: boolean,
): ReactNode {
  if (kind === 'none') return 'No target';
  if (!r) return null;
  const g = r[`${m}G`];
  const p = r[`${m}Pct`];
  const perKg = g !== null && b.weightKg ? g / b.weightKg : null;
  const parts: string[] = [];
  if (kind !== 'g' && g !== null) parts.push(fig.grams(g));
  if (kind !== 'pct' && p !== null) parts.push(fig.pct(p));
  // Which lean mass the grams follow (its date is in the version's basis).
  if (kind === 'g_per_kg_lean' && g !== null && b.leanMassKg != null)
    parts.push(`lean ${fig.kg(b.leanMassKg)}`);
  if (kind !== 'g_per_kg' && perKg !== null) parts.push(fig.perKg(perKg));
  if (parts.length) return `= ${parts.join(' · ')}`;
  if (kind === 'g_per_kg') return hasBaseline ? 'No recent body weight' : "× the athlete's weight";
  if (kind === 'g_per_kg_lean')
    return hasBaseline ? 'No lean mass yet: enter skinfolds on the Body tab' : "× the athlete's lean mass";
  if (kind === 'pct') return 'Needs an energy target';
  return null;
}

function waterLive(
  kind: string,
  r: ResolvedTargets | null,
  b: PlanBaseline,
  hasBaseline: boolean,
): ReactNode {
  if (kind === 'none') return 'No target';
  if (!r) return null;
  if (kind === 'ml') {
    if (!hasBaseline || !b.usualWaterMl || r.waterMl === null) return null;
    const delta = r.waterMl - b.usualWaterMl;
    return `= usual ${delta < 0 ? '−' : '+'} ${fig.ml(Math.abs(delta))} (usual ${fig.ml(b.usualWaterMl)})`;
  }
  if (!hasBaseline)
    return kind === 'usual_plus' ? "on top of the athlete's usual water" : "of the athlete's usual water";
  if (b.usualWaterMl === null) return 'Usual water not known yet';
  return r.waterMl !== null ? `= ${fig.ml(r.waterMl)} (usual ${fig.ml(b.usualWaterMl)})` : null;
}

/**
 * The set macros' share of the energy (Atwater general factors, 4/4/9 kcal per g; FAO 2003 FNP 77),
 * shown as a figure only: whether it is acceptable is validatePlanContent's / validateTemplate's call,
 * which arrives as `issue` (the same code the server runs).
 */
function ShareTotal({
  values,
  resolved,
  issue,
}: {
  values: DayTargetsFormValues;
  resolved: ResolvedTargets | null;
  issue: string | undefined;
}) {
  const set = MACROS.filter((m) => values[m].kind !== 'none');
  if (set.length === 0 && !issue) return null;
  let total: number | null = null;
  let detail: string | null = null;
  const grams = set.map((m) => (resolved ? resolved[`${m}G`] : null));
  if (
    resolved &&
    resolved.energyKcal !== null &&
    resolved.energyKcal > 0 &&
    set.length > 0 &&
    grams.every((g): g is number => g !== null)
  ) {
    const kcal = set.reduce((a, m, i) => a + ATWATER_KCAL_PER_G[m] * grams[i]!, 0);
    total = (100 * kcal) / resolved.energyKcal;
    if (!set.every((m) => values[m].kind === 'pct')) {
      detail = `${fig.kcal(kcal)} of ${fig.kcal(resolved.energyKcal)}`;
    }
  }
  const bad = Boolean(issue);
  return (
    <div
      className={cn(
        'ml-0 rounded-md px-3 py-2 text-sm tabular-nums sm:ml-[9.75rem]',
        bad ? 'bg-off-plan-soft text-ink' : 'bg-sunken/60 text-ink-muted',
      )}
      aria-live="polite"
    >
      {total !== null ? (
        <p className="flex flex-wrap items-center gap-x-2">
          {bad ? <ErrorIcon aria-hidden="true" className="text-off-plan" /> : null}
          <span>
            {set.map((m) => MACRO_LABEL[m]).join(' + ')} ={' '}
            <span className="font-semibold text-ink">{fig.pct(total)}</span> of the energy
            {detail ? ` (${detail})` : ''}
          </span>
        </p>
      ) : (
        <p>Shares are worked out once the energy and the macros are set.</p>
      )}
      {bad ? <p className="mt-0.5 font-medium text-off-plan">{issue}</p> : null}
    </div>
  );
}

/* ---------- rows and boxes ---------- */

function MetricRow({
  label,
  control,
  input,
  live,
  issue,
  warnings,
  wideInput,
}: {
  label: string;
  control?: ReactNode;
  input?: ReactNode;
  live?: ReactNode;
  issue?: string;
  warnings: readonly DayWarning[];
  wideInput?: boolean;
}) {
  return (
    <div className="border-b border-line/70 py-2 last:border-b-0">
      <div
        className={cn(
          'grid items-start gap-x-3 gap-y-1.5',
          wideInput
            ? 'grid-cols-1 sm:grid-cols-[9rem_11rem_minmax(0,1fr)]'
            : 'grid-cols-[minmax(0,1fr)_minmax(0,1fr)] sm:grid-cols-[9rem_11rem_10rem_minmax(0,1fr)]',
        )}
      >
        <p className="col-span-full pt-2 text-sm font-semibold text-ink sm:col-span-1">{label}</p>
        <div className={cn(!control && 'hidden sm:block')}>{control}</div>
        <div className="min-w-0">{input}</div>
        {live ? (
          <p
            className={cn(
              'col-span-full text-sm text-ink-muted tabular-nums sm:col-span-1 sm:pt-2.5',
              wideInput && 'sm:col-start-3',
            )}
          >
            {live}
          </p>
        ) : null}
      </div>
      {issue ? (
        <p className="mt-1 flex items-start gap-1.5 text-sm font-medium text-off-plan sm:ml-[9.75rem]">
          <ErrorIcon aria-hidden="true" className="mt-0.5 shrink-0" />
          <span>{issue}</span>
        </p>
      ) : null}
      {warnings.length > 0 ? <WarningLines warnings={warnings} className="mt-1.5 sm:ml-[9.75rem]" /> : null}
    </div>
  );
}

/** Guardrail messages beside the fields: what was flagged and its source. */
export function WarningLines({
  warnings,
  className,
}: {
  warnings: readonly DayWarning[];
  className?: string;
}) {
  return (
    <ul className={cn('space-y-1', className)}>
      {warnings.map((w) => (
        <li
          key={w.key}
          className={cn(
            'flex items-start gap-2 rounded-md border px-3 py-1.5 text-sm',
            w.severity === 'strong'
              ? 'border-off-plan/40 bg-off-plan-soft'
              : 'border-caution/40 bg-caution-soft',
          )}
        >
          <CautionIcon
            aria-hidden="true"
            className={cn('mt-0.5 shrink-0', w.severity === 'strong' ? 'text-off-plan' : 'text-caution')}
          />
          <span className="min-w-0">
            <span className="sr-only">{w.severity === 'strong' ? 'Strong warning: ' : 'Warning: '}</span>
            <span className="text-ink">{w.message}</span>{' '}
            <span className="text-xs text-ink-muted">({w.source})</span>
          </span>
        </li>
      ))}
    </ul>
  );
}

function NumberBox({ name, label, suffix }: { name: string; label: string; suffix?: string }) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div>
      <div className="relative">
        <input
          id={ids.inputId}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          aria-label={label}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? ids.errorId : undefined}
          className={cn(
            controlClasses,
            'py-1.5 text-right tabular-nums',
            suffix ? (suffix.length > 3 ? 'pr-14' : 'pr-11') : undefined,
            error ? 'border-off-plan' : 'border-line-strong',
          )}
          {...register(name)}
        />
        {suffix ? (
          <span
            aria-hidden="true"
            className="pointer-events-none absolute inset-y-0 right-2.5 flex items-center text-xs font-medium text-ink-faint"
          >
            {suffix}
          </span>
        ) : null}
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
    </div>
  );
}

function TimeBox({ name, label }: { name: string; label: string }) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div>
      <input
        id={ids.inputId}
        type="time"
        aria-label={label}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? ids.errorId : undefined}
        className={cn(
          controlClasses,
          'py-1.5 tabular-nums',
          error ? 'border-off-plan' : 'border-line-strong',
        )}
        {...register(name)}
      />
      <FieldErrorText id={ids.errorId} error={error} />
    </div>
  );
}

function TextBox({
  name,
  label,
  placeholder,
  list,
  className,
}: {
  name: string;
  label: string;
  placeholder?: string;
  list?: string;
  className?: string;
}) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div className={className}>
      <input
        id={ids.inputId}
        type="text"
        autoComplete="off"
        aria-label={label}
        placeholder={placeholder}
        list={list}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? ids.errorId : undefined}
        className={cn(controlClasses, 'py-1.5 text-sm', error ? 'border-off-plan' : 'border-line-strong')}
        {...register(name)}
      />
      <FieldErrorText id={ids.errorId} error={error} />
    </div>
  );
}

function NoteBox({ name }: { name: string }) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div className="pt-3">
      <label htmlFor={ids.inputId} className="mb-1 block text-sm font-semibold text-ink">
        Note for the athlete
      </label>
      <textarea
        id={ids.inputId}
        rows={2}
        maxLength={PLAN_LIMITS.note}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? ids.errorId : undefined}
        className={cn(controlClasses, 'resize-y text-sm', error ? 'border-off-plan' : 'border-line-strong')}
        {...register(name)}
      />
      <FieldErrorText id={ids.errorId} error={error} />
    </div>
  );
}

/* ---------- supplement schedule ---------- */

function SupplementRows({
  name,
  control,
  disabled,
  issues,
  eventTimes,
}: {
  name: string;
  control: Control<FieldValues>;
  disabled: boolean;
  issues: Readonly<Record<string, string>>;
  eventTimes: boolean;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: `${name}.supplements` });
  const listId = `${useFieldIds(name).inputId}-units`;
  return (
    <div className="pt-3">
      <div className="mb-1.5 flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-sm font-semibold text-ink" id={`${listId}-heading`}>
          Supplement schedule
        </p>
        <p className="text-xs text-ink-faint">
          Times as HH:MM, separated by commas (athlete&apos;s clock)
          {eventTimes ? '; or hours before the event (event’s clock, shown on the athlete’s)' : ''}.
        </p>
      </div>
      <datalist id={listId}>
        {DOSE_UNITS.map((u) => (
          <option key={u} value={u} />
        ))}
      </datalist>
      {fields.length > 0 ? (
        <ul aria-labelledby={`${listId}-heading`} className="space-y-2">
          {fields.map((f, i) => (
            <li
              key={f.id}
              className={cn(
                'grid grid-cols-2 items-start gap-2 rounded-md bg-paper p-2',
                eventTimes
                  ? 'sm:grid-cols-[minmax(0,2fr)_5.5rem_6rem_minmax(0,1.4fr)_minmax(0,1.2fr)_auto]'
                  : 'sm:grid-cols-[minmax(0,2fr)_5.5rem_6rem_minmax(0,1.6fr)_auto]',
              )}
            >
              <TextBox
                name={`${name}.supplements.${i}.item`}
                label={`Supplement ${i + 1}: item`}
                placeholder="Item, e.g. Creatine"
                className="col-span-2 sm:col-span-1"
              />
              <NumberBox name={`${name}.supplements.${i}.dose`} label={`Supplement ${i + 1}: dose`} />
              <TextBox
                name={`${name}.supplements.${i}.unit`}
                label={`Supplement ${i + 1}: unit`}
                placeholder="unit"
                list={listId}
              />
              <TextBox
                name={`${name}.supplements.${i}.times`}
                label={`Supplement ${i + 1}: times`}
                placeholder="08:00, 20:00"
              />
              {eventTimes ? (
                <TextBox
                  name={`${name}.supplements.${i}.beforeEventHours`}
                  label={`Supplement ${i + 1}: hours before the event`}
                  placeholder="h before event, e.g. 3"
                />
              ) : null}
              <Button
                variant="ghost"
                size="sm"
                className="min-h-10 text-off-plan hover:bg-off-plan-soft hover:text-off-plan"
                icon={<TrashIcon />}
                onClick={() => remove(i)}
                disabled={disabled}
                aria-label={`Remove supplement ${i + 1}`}
              >
                <span className="sm:sr-only">Remove</span>
              </Button>
              {issues[`supplements.${i}`] ? (
                <p className="col-span-full text-sm font-medium text-off-plan">
                  {issues[`supplements.${i}`]}
                </p>
              ) : null}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ink-faint">No supplements on this day.</p>
      )}
      {!disabled && fields.length < PLAN_LIMITS.supplementsPerDay ? (
        <Button
          variant="secondary"
          size="sm"
          className="mt-2"
          icon={<PlusIcon />}
          onClick={() => append(newSupplementRow())}
        >
          Add a supplement
        </Button>
      ) : null}
      {issues.supplements ? (
        <p className="mt-1 text-sm font-medium text-off-plan">{issues.supplements}</p>
      ) : null}
    </div>
  );
}
