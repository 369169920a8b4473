import {
  countdownDayLabel,
  DEFAULT_TOLERANCES,
  PLAN_LIMITS,
  resolveTargets,
  starterPlanContent,
  weekdayOf,
  WEEKDAY_LABELS,
  WEEKDAYS,
  type CreatePlanVersionRequest,
  type PlanContent,
  type PlanVersionView,
  type PlanView,
  type Tolerances,
} from '@driftmark/shared';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import {
  useFieldArray,
  useForm,
  useFormState,
  useWatch,
  type Path,
  type UseFormReturn,
} from 'react-hook-form';
import { useBlocker } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { controlClasses, useFieldError } from '@/components/ui/field';
import { Form } from '@/components/ui/form';
import { ChevronDownIcon, PlusIcon, TrashIcon } from '@/components/ui/icons';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import { useCheckPlan } from '../api/check-plan';
import { useCreatePlanVersion } from '../api/create-plan-version';
import type { LinkedKeys } from '../api/plan-cache';
import { addDays } from '../utils/dates';
import {
  liveDayTargets,
  emptyDayTargetsFormValues,
  type DayTargetsFormValues,
} from '../utils/day-targets-form';
import * as fig from '../utils/figures';
import { checkDraft, useLivePlanChecks, type PlanChecks } from '../utils/live-checks';
import {
  dayTypeKey,
  issuesFor,
  planFormPath,
  planFormResolver,
  planFormValues,
  PLAN_MESSAGE_FIELD,
  TOLERANCE_KEYS,
  warningsFor,
  toPlanContent,
  type PlanContentFormValues,
  type PlanFormValues,
} from '../utils/plan-form';
import { toAckWarnings, unacknowledgedFromError, type AckWarning } from '../utils/ack-warnings';
import { scopeLabel } from '../utils/scope-label';
import { DayTargetsFields } from './day-targets-fields';
import { useAcknowledgements, WarningChecklist } from './warning-checklist';

type PlanForm = UseFormReturn<PlanFormValues, unknown, CreatePlanVersionRequest>;

const TOLERANCE_FIELDS: Record<keyof Tolerances, { label: string; suffix: string }> = {
  energyPct: { label: 'Energy', suffix: '± %' },
  proteinG: { label: 'Protein', suffix: '± g' },
  carbohydrateG: { label: 'Carbohydrate', suffix: '± g' },
  fatG: { label: 'Fat', suffix: '± g' },
  waterPct: { label: 'Water', suffix: '± %' },
  sodiumPct: { label: 'Sodium', suffix: '± %' },
  activityPct: { label: 'Steps and cardio', suffix: '− %' },
};

interface PlanEditorProps {
  athleteId: string;
  plan: PlanView;
  /** Queries of other features a save makes stale (the athlete's days). */
  linkedKeys: LinkedKeys;
  onSaved: (version: PlanVersionView) => void;
}

interface PendingSave {
  request: CreatePlanVersionRequest;
  warnings: AckWarning[];
}

/**
 * The coach's editor for a new plan version, starting from the newest version (or a starter):
 * day types with their targets, the weekday pattern, dated days, tolerances, the first day and a
 * reason. Refusals and guardrail warnings show live beside the fields; Save first asks for every
 * warning to be acknowledged.
 */
export function PlanEditor({ athleteId, plan, linkedKeys, onSaved }: PlanEditorProps) {
  const base: PlanContent = plan.latest?.content ?? starterPlanContent();
  const defaults = useMemo(() => planFormValues(base, plan.today), [base, plan.today]);
  const form: PlanForm = useForm<PlanFormValues, unknown, CreatePlanVersionRequest>({
    defaultValues: defaults,
    resolver: planFormResolver(plan.today, formatDate),
    reValidateMode: 'onChange',
  });
  const live = useLivePlanChecks(form.control, plan.baseline, plan.guardrailContext);
  // Right after a refused Save, show what the Save saw until the live check runs again.
  const [submitted, setSubmittedState] = useState<{ checks: PlanChecks; live: PlanChecks } | null>(null);
  const checks = submitted && submitted.live === live ? submitted.checks : live;
  const setSubmitted = (c: PlanChecks) => setSubmittedState({ checks: c, live });

  const [open, setOpen] = useState<ReadonlySet<string>>(() => new Set(['dayTypes.0']));
  const toggle = (id: string, on: boolean) =>
    setOpen((prev) => {
      const next = new Set(prev);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
  const openFor = (paths: string[]) =>
    setOpen((prev) => {
      const next = new Set(prev);
      for (const p of paths) {
        const m = /^(?:content\.)?(dayTypes|dates)\.(\d+)/.exec(p);
        if (m) next.add(`${m[1]}.${m[2]}`);
      }
      return next;
    });

  const check = useCheckPlan(athleteId);
  const [pending, setPending] = useState<PendingSave | null>(null);
  const content = useWatch({ control: form.control, name: 'content' }) as PlanContentFormValues;
  // The tolerances as typed so far (defaults for a box not yet a number), for judging meal plans.
  const liveTolerances = toPlanContent(content, true).content.tolerances;
  const { isDirty, errors } = useFormState({ control: form.control });
  const errorsIn = (part: 'dayTypes' | 'dates', i: number) => Boolean(errors.content?.[part]?.[i]);
  useUnsavedChangesGuard(isDirty);

  const where = (content_: PlanContent) => (w: Parameters<typeof scopeLabel>[0]) => scopeLabel(w, content_);

  function showFieldErrors(fields: Record<string, string>) {
    let first = true;
    const leftOver: string[] = [];
    for (const [path, message] of Object.entries(fields)) {
      const target = planFormPath(path);
      if (target === PLAN_MESSAGE_FIELD) {
        leftOver.push(message);
        continue;
      }
      form.setError(target as Path<PlanFormValues>, { type: 'server', message }, { shouldFocus: first });
      first = false;
    }
    openFor(Object.keys(fields));
    const count = Object.keys(fields).length;
    form.setError('root.server', {
      type: 'server',
      message:
        leftOver.join(' ') ||
        `${count === 1 ? 'One problem needs' : `${count} problems need`} fixing before this version can be saved; each is marked beside its field.`,
    });
  }

  async function review(request: CreatePlanVersionRequest) {
    const fresh = checkDraft(request.content, plan.baseline, plan.guardrailContext);
    if (Object.keys(fresh.issues).length > 0) {
      setSubmitted(fresh);
      openFor(Object.keys(fresh.issues));
      const count = Object.keys(fresh.issues).length;
      form.setError('root.server', {
        type: 'server',
        message: `${count === 1 ? 'One problem needs' : `${count} problems need`} fixing before saving; see the messages in red below and in the checks.`,
      });
      return;
    }
    let warnings = fresh.warnings;
    try {
      const result = await check.mutateAsync({
        effectiveFrom: request.effectiveFrom,
        content: request.content,
      });
      if (Object.keys(result.errors).length > 0) {
        showFieldErrors(result.errors);
        return;
      }
      warnings = result.warnings;
    } catch (error) {
      // A refusal comes back to the form; anything else leaves the local check in charge (the save is checked again).
      if (isApiError(error) && error.status === 400) throw error;
    }
    setPending({ request, warnings: toAckWarnings(warnings, where(request.content)) });
  }

  const dayTypes = useFieldArray({ control: form.control, name: 'content.dayTypes' });
  const dates = useFieldArray({ control: form.control, name: 'content.dates' });
  const dayTypeOptions = content.dayTypes.map((t) => ({ value: t.key, label: t.name || t.key }));
  const effectiveFrom = useWatch({ control: form.control, name: 'effectiveFrom' });
  const laterVersion =
    plan.latest && effectiveFrom && plan.latest.effectiveFrom > effectiveFrom ? plan.latest : null;

  function removeDayType(index: number) {
    const key = content.dayTypes[index]?.key;
    const fallback = content.dayTypes.find((_, i) => i !== index)?.key;
    if (!key || !fallback) return;
    for (const d of WEEKDAYS) {
      if (content.weekdays[d] === key)
        form.setValue(`content.weekdays.${d}`, fallback, { shouldDirty: true });
    }
    dayTypes.remove(index);
  }

  function addDayType(name: string) {
    const clean = name.trim() || 'New day type';
    const key = dayTypeKey(
      clean,
      content.dayTypes.map((t) => t.key),
    );
    dayTypes.append({ key, name: clean, targets: emptyDayTargetsFormValues() });
    toggle(`dayTypes.${content.dayTypes.length}`, true);
  }

  function addDatedDay(date: string) {
    const typeKey = content.weekdays[weekdayOf(date)];
    const from = content.dayTypes.find((t) => t.key === typeKey)?.targets;
    const targets: DayTargetsFormValues = from ? structuredClone(from) : emptyDayTargetsFormValues();
    const at = content.dates.findIndex((d) => d.date > date);
    const index = at === -1 ? content.dates.length : at;
    dates.insert(index, { date, label: '', countdownOffset: null, targets });
    setOpen((prev) => new Set([...prev, `dates.${index}`]));
  }

  return (
    <>
      <Form
        form={form}
        onSubmit={review}
        mapServerField={(p) => {
          const f = planFormPath(p);
          return f === PLAN_MESSAGE_FIELD ? null : f;
        }}
        aria-label="New plan version"
      >
        <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_20rem]">
          <div className="min-w-0 space-y-6">
            <Card>
              <SectionHeading
                title="Day types"
                description="Each kind of day and its targets. The week pattern below says which weekday follows which."
              />
              <div className="space-y-3">
                {dayTypes.fields.map((f, i) => (
                  <Disclosure
                    key={f.id}
                    open={open.has(`dayTypes.${i}`) || errorsIn('dayTypes', i)}
                    onToggle={(on) => toggle(`dayTypes.${i}`, on)}
                    title={content.dayTypes[i]?.name || 'Unnamed day type'}
                    meta={
                      <span className="text-ink-muted">
                        {usedOn(content, content.dayTypes[i]?.key ?? '') || 'No weekday follows it'}
                      </span>
                    }
                    figures={<LiveFigures targets={content.dayTypes[i]?.targets} baseline={plan.baseline} />}
                    flagged={hasFlags(checks, 'dayTypes', i, content.dayTypes[i]?.key ?? '')}
                  >
                    <div className="mb-3 flex flex-wrap items-end gap-3">
                      <TextField
                        name={`content.dayTypes.${i}.name`}
                        label="Name"
                        className="min-w-48 flex-1"
                        maxLength={40}
                      />
                      <p className="pb-3 text-xs text-ink-faint">
                        Key <code className="font-mono">{content.dayTypes[i]?.key}</code>
                      </p>
                      {content.dayTypes.length > 1 ? (
                        <Button
                          variant="ghost"
                          className="text-off-plan hover:bg-off-plan-soft hover:text-off-plan"
                          icon={<TrashIcon />}
                          onClick={() => removeDayType(i)}
                        >
                          Remove day type
                        </Button>
                      ) : null}
                    </div>
                    <KeyError name={`content.dayTypes.${i}.key`} issue={checks.issues[`dayTypes.${i}.key`]} />
                    <DayTargetsFields
                      name={`content.dayTypes.${i}.targets`}
                      control={form.control}
                      baseline={plan.baseline}
                      issues={issuesFor(checks.issues, 'dayTypes', i)}
                      warnings={warningsFor(checks.warnings, 'dayTypes', i, content.dayTypes[i]?.key ?? '')}
                      label={`Targets for ${content.dayTypes[i]?.name || 'this day type'}`}
                      tolerances={liveTolerances}
                    />
                  </Disclosure>
                ))}
              </div>
              {dayTypes.fields.length < PLAN_LIMITS.dayTypes ? <AddDayType onAdd={addDayType} /> : null}
            </Card>

            <Card>
              <SectionHeading title="Week pattern" description="Which day type each weekday follows." />
              <div className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-7">
                {WEEKDAYS.map((d) => (
                  <div key={d}>
                    <Select
                      name={`content.weekdays.${d}`}
                      label={WEEKDAY_LABELS[d]}
                      options={dayTypeOptions}
                    />
                    {checks.issues[`weekdays.${d}`] ? (
                      <p className="mt-1 text-sm font-medium text-off-plan">
                        {checks.issues[`weekdays.${d}`]}
                      </p>
                    ) : null}
                  </div>
                ))}
              </div>
            </Card>

            <Card>
              <SectionHeading
                title="Dated days"
                description="A dated day overrides the week pattern on that date. Countdown days (E-3 …) come from a template and can be edited here."
              />
              {dates.fields.length === 0 ? (
                <p className="mb-3 text-sm text-ink-muted">
                  No dated days: every day follows the week pattern.
                </p>
              ) : (
                <div className="mb-3 space-y-3">
                  {dates.fields.map((f, i) => {
                    const d = content.dates[i];
                    if (!d) return null;
                    const past = d.date < plan.today;
                    return (
                      <Disclosure
                        key={f.id}
                        open={open.has(`dates.${i}`) || errorsIn('dates', i)}
                        onToggle={(on) => toggle(`dates.${i}`, on)}
                        title={
                          <span className="tabular-nums">
                            {/^\d{4}-\d{2}-\d{2}$/.test(d.date) ? formatDate(d.date) : 'New dated day'}
                            {d.label ? (
                              <span className="font-normal text-ink-muted"> · {d.label}</span>
                            ) : null}
                          </span>
                        }
                        meta={
                          <span className="flex flex-wrap gap-1.5">
                            {d.countdownOffset !== null ? (
                              <Badge tone="caution">{countdownDayLabel(d.countdownOffset)}</Badge>
                            ) : null}
                            {past ? <Badge tone="not-logged">Past: not changed</Badge> : null}
                          </span>
                        }
                        figures={<LiveFigures targets={d.targets} baseline={plan.baseline} />}
                        flagged={hasFlags(checks, 'dates', i, d.date)}
                        muted={past}
                      >
                        {past ? (
                          <p className="mb-3 text-sm text-ink-muted">
                            This day has passed; it keeps the plan it had, whatever this version says.
                          </p>
                        ) : null}
                        <div className="mb-3 flex flex-wrap items-end gap-3">
                          <TextField
                            name={`content.dates.${i}.date`}
                            label="Date"
                            type="date"
                            className="w-44"
                          />
                          <TextField
                            name={`content.dates.${i}.label`}
                            label="Label"
                            placeholder="e.g. Water load"
                            className="min-w-48 flex-1"
                            maxLength={60}
                          />
                          <Button
                            variant="ghost"
                            className="text-off-plan hover:bg-off-plan-soft hover:text-off-plan"
                            icon={<TrashIcon />}
                            onClick={() => dates.remove(i)}
                          >
                            Remove dated day
                          </Button>
                        </div>
                        {checks.issues[`dates.${i}.date`] ? (
                          <p className="mb-2 text-sm font-medium text-off-plan">
                            {checks.issues[`dates.${i}.date`]}
                          </p>
                        ) : null}
                        <DayTargetsFields
                          name={`content.dates.${i}.targets`}
                          control={form.control}
                          baseline={plan.baseline}
                          issues={issuesFor(checks.issues, 'dates', i)}
                          warnings={warningsFor(checks.warnings, 'dates', i, d.date)}
                          label={`Targets for ${d.date}`}
                          eventTimes={d.countdownOffset !== null}
                          tolerances={liveTolerances}
                        />
                      </Disclosure>
                    );
                  })}
                </div>
              )}
              {dates.fields.length < PLAN_LIMITS.dateOverrides ? (
                <AddDatedDay
                  today={plan.today}
                  taken={content.dates.map((d) => d.date)}
                  onAdd={addDatedDay}
                />
              ) : null}
            </Card>

            <Card>
              <SectionHeading
                title="Tolerances"
                description="How far a logged day may be from a target and still count as on plan. Steps and cardio are minimums: any amount over is on plan, and this much short still is."
              />
              <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
                {TOLERANCE_KEYS.map((k) => (
                  <TextField
                    key={k}
                    name={`content.tolerances.${k}`}
                    label={TOLERANCE_FIELDS[k].label}
                    suffix={TOLERANCE_FIELDS[k].suffix}
                    inputMode="decimal"
                    inputClassName="tabular-nums"
                    hint={`Default ${DEFAULT_TOLERANCES[k]} ${TOLERANCE_FIELDS[k].suffix.replace(/^[±−] /, '')}`}
                  />
                ))}
              </div>
            </Card>
          </div>

          <aside className="xl:sticky xl:top-6 xl:self-start">
            <Card className="space-y-4">
              <h3 className="text-lg font-semibold text-ink">Save as a new version</h3>
              <TextField
                name="effectiveFrom"
                label="In force from"
                type="date"
                min={plan.today}
                required
                hint={`The athlete's today is ${formatDate(plan.today)}. Past days keep the plan they had.`}
              />
              {laterVersion ? (
                <Alert tone="info" live={false}>
                  Version {laterVersion.number} starts on {formatDate(laterVersion.effectiveFrom)} and takes
                  over from that day.
                </Alert>
              ) : null}
              <TextField
                name="reason"
                label="Reason"
                required
                placeholder="e.g. Lower carbs on rest days"
                maxLength={300}
              />
              <ChecksSummary checks={checks} content={content} />
              <div className="flex flex-wrap gap-2">
                <Button type="submit" loading={form.formState.isSubmitting} className="flex-1">
                  Review and save
                </Button>
                <Button variant="secondary" disabled={!isDirty} onClick={() => form.reset(defaults)}>
                  Discard changes
                </Button>
              </div>
            </Card>
          </aside>
        </div>
      </Form>

      {pending ? (
        <SaveReview
          athleteId={athleteId}
          pending={pending}
          linkedKeys={linkedKeys}
          onClose={() => setPending(null)}
          onRefused={(error) => {
            setPending(null);
            if (isApiError(error)) showFieldErrors(error.fields);
          }}
          onSaved={(version) => {
            setPending(null);
            form.reset(planFormValues(version.content, plan.today));
            onSaved(version);
          }}
        />
      ) : null}
    </>
  );
}

/* ---------- pieces ---------- */

function SectionHeading({ title, description }: { title: string; description: string }) {
  return (
    <div className="mb-4">
      <h3 className="text-lg font-semibold text-ink">{title}</h3>
      <p className="text-sm text-ink-muted">{description}</p>
    </div>
  );
}

function usedOn(content: PlanContentFormValues, key: string): string {
  return WEEKDAYS.filter((d) => content.weekdays[d] === key)
    .map((d) => WEEKDAY_LABELS[d])
    .join(', ');
}

function hasFlags(checks: PlanChecks, part: 'dayTypes' | 'dates', index: number, scopeKey: string) {
  const issues = Object.keys(checks.issues).some((p) => p.startsWith(`${part}.${index}.`));
  const warnings = warningsFor(checks.warnings, part, index, scopeKey);
  return {
    issues,
    warnings: warnings.length,
    strong: warnings.some((w) => w.severity === 'strong'),
  };
}

function Disclosure({
  open,
  onToggle,
  title,
  meta,
  figures,
  flagged,
  muted,
  children,
}: {
  open: boolean;
  onToggle: (open: boolean) => void;
  title: ReactNode;
  meta?: ReactNode;
  figures?: ReactNode;
  flagged: { issues: boolean; warnings: number; strong: boolean };
  muted?: boolean;
  children: ReactNode;
}) {
  return (
    <details
      open={open}
      onToggle={(e) => {
        const now = (e.currentTarget as HTMLDetailsElement).open;
        if (now !== open) onToggle(now);
      }}
      className={cn(
        'group rounded-md border',
        flagged.issues ? 'border-off-plan/60' : 'border-line',
        muted ? 'bg-paper/60' : 'bg-surface',
      )}
    >
      <summary className="flex min-h-touch cursor-pointer list-none flex-wrap items-center gap-x-3 gap-y-1 px-3 py-2 [&::-webkit-details-marker]:hidden">
        <ChevronDownIcon
          aria-hidden="true"
          className="shrink-0 text-ink-muted transition-transform group-open:rotate-180"
        />
        <span className="font-semibold text-ink">{title}</span>
        <span className="text-sm">{meta}</span>
        <span className="ml-auto flex flex-wrap items-center gap-2">
          {figures}
          {flagged.issues ? <Badge tone="off-plan">Needs fixing</Badge> : null}
          {flagged.warnings > 0 ? (
            <Badge tone={flagged.strong ? 'off-plan' : 'caution'}>
              {flagged.warnings} {flagged.warnings === 1 ? 'warning' : 'warnings'}
            </Badge>
          ) : null}
        </span>
      </summary>
      <div className="border-t border-line px-3 pt-3 pb-4">{children}</div>
    </details>
  );
}

function LiveFigures({
  targets,
  baseline,
}: {
  targets: DayTargetsFormValues | undefined;
  baseline: PlanView['baseline'];
}) {
  if (!targets) return null;
  let text: string[];
  try {
    const r = resolveTargets(liveDayTargets(targets), baseline);
    text = [
      r.energyKcal !== null ? fig.kcal(r.energyKcal) : null,
      fig.macroLine(r),
      r.waterMl !== null ? fig.ml(r.waterMl) : null,
    ].filter((x): x is string => Boolean(x));
  } catch {
    text = [];
  }
  if (text.length === 0) return <span className="text-xs text-ink-faint">No targets yet</span>;
  return <span className="text-sm text-ink-muted tabular-nums">{text.join(' · ')}</span>;
}

function KeyError({ name, issue }: { name: string; issue?: string }) {
  const error = useFieldError(name);
  const message = error?.message ?? issue;
  if (!message) return null;
  return <p className="mb-2 text-sm font-medium text-off-plan">{message}</p>;
}

function AddDayType({ onAdd }: { onAdd: (name: string) => void }) {
  const [name, setName] = useState('');
  return (
    <div className="mt-4 flex flex-wrap items-end gap-2">
      <div className="min-w-48 flex-1">
        <label htmlFor="new-day-type" className="mb-1.5 block text-sm font-semibold text-ink">
          New day type
        </label>
        <input
          id="new-day-type"
          value={name}
          maxLength={40}
          placeholder="e.g. Refeed day"
          onChange={(e) => setName(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              onAdd(name);
              setName('');
            }
          }}
          className={cn(controlClasses, 'border-line-strong')}
        />
      </div>
      <Button
        variant="secondary"
        icon={<PlusIcon />}
        onClick={() => {
          onAdd(name);
          setName('');
        }}
      >
        Add day type
      </Button>
    </div>
  );
}

function AddDatedDay({
  today,
  taken,
  onAdd,
}: {
  today: string;
  taken: readonly string[];
  onAdd: (date: string) => void;
}) {
  const firstFree = () => {
    let d = today;
    while (taken.includes(d)) d = addDays(d, 1);
    return d;
  };
  const [date, setDate] = useState(firstFree);
  const clash = taken.includes(date);
  const valid = /^\d{4}-\d{2}-\d{2}$/.test(date);
  return (
    <div className="flex flex-wrap items-end gap-2">
      <div>
        <label htmlFor="new-dated-day" className="mb-1.5 block text-sm font-semibold text-ink">
          Add a dated day
        </label>
        <input
          id="new-dated-day"
          type="date"
          value={date}
          min={today}
          aria-describedby="new-dated-day-hint"
          onChange={(e) => setDate(e.target.value)}
          className={cn(controlClasses, 'w-44 border-line-strong tabular-nums')}
        />
      </div>
      <Button
        variant="secondary"
        icon={<PlusIcon />}
        disabled={!valid || clash || date < today}
        onClick={() => {
          onAdd(date);
          setDate(addDays(date, 1));
        }}
      >
        Add dated day
      </Button>
      <p id="new-dated-day-hint" className="w-full text-sm text-ink-faint">
        {clash ? 'That date already has its own targets.' : "It starts as a copy of that weekday's day type."}
      </p>
    </div>
  );
}

function ChecksSummary({ checks, content }: { checks: PlanChecks; content: PlanContentFormValues }) {
  const issues = Object.entries(checks.issues);
  const plainContent = { dayTypes: content.dayTypes.map((t) => ({ key: t.key, name: t.name })) } as Pick<
    PlanContent,
    'dayTypes'
  >;
  const summaryError = useFieldError(PLAN_MESSAGE_FIELD);
  return (
    <div aria-live="polite" className="space-y-3">
      <h4 className="text-sm font-semibold text-ink">Checks</h4>
      {summaryError?.message ? (
        <p className="text-sm font-medium text-off-plan">{summaryError.message}</p>
      ) : null}
      {issues.length === 0 && checks.warnings.length === 0 ? (
        <p className="text-sm text-on-plan">No refusals and no guardrail warnings so far.</p>
      ) : null}
      {issues.length > 0 ? (
        <div>
          <p className="text-sm font-medium text-off-plan">
            {issues.length === 1 ? '1 problem blocks saving' : `${issues.length} problems block saving`}
          </p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm text-ink">
            {dedupe(issues.map(([path, message]) => `${placeLabel(path, content)}: ${message}`)).map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {checks.warnings.length > 0 ? (
        <div>
          <p className="text-sm font-medium text-caution">
            {checks.warnings.length === 1
              ? '1 guardrail warning to acknowledge'
              : `${checks.warnings.length} guardrail warnings to acknowledge`}
          </p>
          <ul className="mt-1 space-y-1.5 text-sm">
            {checks.warnings.map((w) => (
              <li
                key={w.key}
                className={cn(
                  'border-l-2 pl-2',
                  w.severity === 'strong' ? 'border-off-plan' : 'border-caution',
                )}
              >
                {w.severity === 'strong' ? (
                  <span className="font-semibold text-off-plan">Strong: </span>
                ) : null}
                {w.scope.kind !== 'plan' ? null : (
                  <span className="font-medium text-ink">{scopeLabel(w, plainContent)}: </span>
                )}
                <span className="text-ink">{w.message}</span>{' '}
                <span className="text-xs text-ink-muted">({w.source})</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}

function dedupe(items: string[]): string[] {
  return [...new Set(items)];
}

function placeLabel(path: string, content: PlanContentFormValues): string {
  const m = /^(dayTypes|dates|weekdays)\.([^.]+)/.exec(path);
  if (!m) return 'Plan';
  if (m[1] === 'weekdays') return 'Week pattern';
  const i = Number(m[2]);
  if (m[1] === 'dayTypes') return content.dayTypes[i]?.name || 'Day type';
  const date = content.dates[i]?.date;
  return date && /^\d{4}-\d{2}-\d{2}$/.test(date) ? formatDate(date) : 'Dated day';
}

/* ---------- acknowledgement step ---------- */

function SaveReview({
  athleteId,
  pending,
  linkedKeys,
  onClose,
  onRefused,
  onSaved,
}: {
  athleteId: string;
  pending: PendingSave;
  linkedKeys: LinkedKeys;
  onClose: () => void;
  onRefused: (error: unknown) => void;
  onSaved: (version: PlanVersionView) => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const [list, setList] = useState<AckWarning[]>(pending.warnings);
  const acks = useAcknowledgements(list);
  const [message, setMessage] = useState<string | null>(null);
  const create = useCreatePlanVersion(athleteId, { linkedKeys, onSuccess: onSaved });

  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);

  async function save() {
    setMessage(null);
    try {
      await create.mutateAsync({ ...pending.request, acknowledgedKeys: [...acks.ticked] });
    } catch (error) {
      const again = unacknowledgedFromError(error, list, (w) => scopeLabel(w, pending.request.content));
      if (again) {
        setList(again);
        acks.clear(Object.keys(isApiError(error) ? error.fields : {}));
        setMessage('The server found warnings that are not acknowledged yet. Read and tick each one again.');
        return;
      }
      if (isApiError(error) && error.status === 400) {
        onRefused(error);
        return;
      }
      setMessage(isApiError(error) ? error.message : 'The version could not be saved. Try again.');
    }
  }

  const { request } = pending;
  return (
    <dialog
      ref={ref}
      aria-labelledby="save-review-title"
      onCancel={(e) => {
        e.preventDefault();
        if (!create.isPending) onClose();
      }}
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(44rem,calc(100vw-2rem))] overflow-y-auto rounded-lg border border-line bg-surface p-0 text-ink shadow-card backdrop:bg-ink/50"
    >
      <div className="space-y-4 p-5 sm:p-6">
        <div>
          <h2 id="save-review-title" className="text-xl font-bold text-ink">
            {list.length === 0
              ? 'Save this version'
              : `Acknowledge ${list.length === 1 ? 'the warning' : `all ${list.length} warnings`} to save`}
          </h2>
          <p className="mt-1 text-sm text-ink-muted">
            In force from{' '}
            <span className="font-semibold text-ink tabular-nums">{formatDate(request.effectiveFrom)}</span>
            {' · '}
            Reason: <span className="text-ink">{request.reason}</span>
          </p>
        </div>
        {list.length > 0 ? (
          <p className="text-sm text-ink">
            Each acknowledgement is stored with your name and the time, and the athlete sees a caution on the
            days it concerns.
          </p>
        ) : null}
        {message ? (
          <Alert tone="error" title="Not saved">
            {message}
          </Alert>
        ) : null}
        <WarningChecklist
          warnings={list}
          ticked={acks.ticked}
          onTick={acks.set}
          idPrefix="save"
          disabled={create.isPending}
        />
        <div className="flex flex-wrap justify-end gap-2 border-t border-line pt-4">
          <Button variant="secondary" onClick={onClose} disabled={create.isPending}>
            Back to editing
          </Button>
          <Button onClick={() => void save()} disabled={!acks.allTicked} loading={create.isPending}>
            {list.length > 0 ? 'Acknowledge and save' : 'Save version'}
          </Button>
        </div>
        {!acks.allTicked ? (
          <p className="text-right text-xs text-ink-muted">Tick every warning to enable saving.</p>
        ) : null}
      </div>
    </dialog>
  );
}

/* ---------- leaving with unsaved changes ---------- */

function useUnsavedChangesGuard(active: boolean) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => active && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (window.confirm('The plan editor has unsaved changes. Leave without saving?')) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
}
