import {
  DRIFT_STATE_LABELS,
  VOLUME_UNIT_LABELS,
  volumeFromMl,
  type DayTargetsInForce,
  type DayView,
  type DriftEntry,
  type DriftMetric,
  type DriftState,
  type SupplementEntryRequest,
  type VolumeUnit,
} from '@driftmark/shared';
import { useRef, useState, type ReactNode } from 'react';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { TargetIcon } from '@/components/ui/icons';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { DRIFT_STATE_STYLE } from '@/lib/drift-states';
import { formatNumber, formatVolume, NBSP } from '@/lib/format';
import { useCreateSupplement } from '../api/create-supplement';
import { createClientIdKeeper } from '../utils/client-id';
import { clockMinutes, sodiumLogged, supplementSlots, type SupplementSlot } from '../utils/targets';
import { formatClock } from '@/lib/clock';
import { CheckInCard } from './check-in-card';
import { TimingTargets } from './timing-targets';
import type { DayCardProps } from './day-card-props';

/** How a metric's figures read: the number (in the reader's unit) and the unit after it. */
interface Measure {
  figure: (n: number) => string;
  unit: string;
}

const whole = (unit: string): Measure => ({ figure: (n) => formatNumber(n, 0), unit });
const KCAL = whole('kcal');
const GRAMS = whole('g');
const MG = whole('mg');
const STEPS = whole('steps');
const MINUTES = whole('min');

function volumeMeasure(unit: VolumeUnit): Measure {
  return {
    figure: (ml) => formatNumber(volumeFromMl(ml, unit), unit === 'ml' ? 0 : 1),
    unit: VOLUME_UNIT_LABELS[unit],
  };
}

const amount = (m: Measure, n: number) => `${m.figure(n)}${NBSP}${m.unit}`;

const FILLS: Record<DriftState, string> = {
  on_plan: 'bg-on-plan',
  drifting: 'bg-drifting',
  off_plan: 'bg-off-plan',
  not_logged: 'bg-transparent',
  in_progress: 'bg-accent',
};

/** Where the day's targets come from, in words ("Training day · plan version 3"). */
function sourceLine(plan: DayTargetsInForce): string {
  const from =
    plan.source.kind === 'pattern' ? plan.source.dayTypeName : (plan.source.label ?? 'Planned day');
  return `${from} · plan version ${plan.versionNumber}`;
}

/**
 * The day's targets from the plan version in force, with the server's verdict on each (day.drift:
 * energy, macros, water with its cut-off, sodium, steps and cardio), the supplements due by clock
 * time and the coach's note. The athlete ticks a scheduled supplement here. Nothing is graded here:
 * the states, tolerances and on-plan bounds are the server's; "to go" is its target − actual.
 */
export function DayTargetsCard({ athleteId, day, units, canEdit, now }: DayCardProps) {
  const title = day.isToday ? "Today's targets" : 'Targets that day';
  const plan = day.targets;

  if (!plan) {
    return (
      <section
        aria-label={title}
        className="flex items-center gap-3 rounded-lg border border-dashed border-line-strong/60 bg-surface/60 px-4 py-3 text-sm text-ink-muted"
      >
        <TargetIcon className="shrink-0 text-xl text-not-logged" />
        <p>
          {canEdit
            ? day.isToday
              ? "Your coach hasn't set targets yet."
              : 'No targets were set for this day.'
            : 'No plan was in force on this day.'}
        </p>
      </section>
    );
  }

  const t = plan.targets;
  const clock = day.isToday ? now : null;
  const sodium = sodiumLogged(day);
  const basis = t.basis;
  const entry = (metric: DriftMetric) => day.drift.find((e) => e.metric === metric) ?? null;

  const macros = [
    { key: 'protein', label: 'Protein', target: t.proteinG },
    { key: 'carbohydrate', label: 'Carbohydrate', target: t.carbohydrateG },
    { key: 'fat', label: 'Fat', target: t.fatG },
  ] as const;

  const hasAmounts =
    t.energyKcal !== null ||
    macros.some((m) => m.target !== null) ||
    t.waterMl !== null ||
    t.fluidCutoff !== null ||
    t.foodCutoff !== null ||
    t.fluidCap !== null ||
    t.sodiumMg !== null ||
    t.steps !== null ||
    t.cardioMinutes !== null;

  return (
    <CheckInCard id="targets" title={title} icon={<TargetIcon />} subtitle={sourceLine(plan)}>
      {hasAmounts ? (
        <ul aria-label="Targets and progress" className="divide-y divide-line">
          {t.energyKcal !== null ? (
            <ProgressRow
              metric="energy"
              label="Energy"
              measure={KCAL}
              target={t.energyKcal}
              entry={entry('energy')}
              hint={basis.energy}
            />
          ) : null}
          {macros.map((m) =>
            m.target !== null ? (
              <ProgressRow
                key={m.key}
                metric={m.key}
                label={m.label}
                measure={GRAMS}
                target={m.target}
                entry={entry(m.key)}
                hint={basis[m.key]}
              />
            ) : null,
          )}
          {t.waterMl !== null || t.fluidCutoff !== null ? (
            <WaterRows day={day} unit={units.volume} clock={clock} basis={basis.water} />
          ) : null}
          {t.sodiumMg !== null ? (
            <ProgressRow
              metric="sodium"
              label="Sodium"
              measure={MG}
              target={t.sodiumMg}
              entry={entry('sodium')}
              hint={
                sodium.meals === 0
                  ? undefined
                  : sodium.known === 0
                    ? 'No meal carries a sodium figure yet: add it from the label when you log a meal.'
                    : sodium.known < sodium.meals
                      ? `From ${formatNumber(sodium.known)} of ${formatNumber(sodium.meals)} meals; the others carry no sodium figure.`
                      : undefined
              }
            />
          ) : null}
          {t.steps !== null ? (
            <ProgressRow
              metric="steps"
              label="Steps"
              measure={STEPS}
              target={t.steps}
              entry={entry('steps')}
              hint={day.evening?.steps == null ? 'From the evening check-in.' : undefined}
            />
          ) : null}
          {t.cardioMinutes !== null ? (
            <ProgressRow
              metric="cardio"
              label="Cardio"
              measure={MINUTES}
              target={t.cardioMinutes}
              entry={entry('cardio')}
              hint={day.evening?.cardioMinutes == null ? 'From the evening check-in.' : undefined}
            />
          ) : null}
        </ul>
      ) : null}

      <TimingTargets day={day} volumeUnit={units.volume} />

      {t.supplements.some((x) => x.times.length > 0) ? (
        <SupplementsDue athleteId={athleteId} day={day} clock={clock} now={now} canEdit={canEdit} />
      ) : null}

      {t.note ? (
        <figure
          className={cn(
            'rounded-md bg-accent-soft px-4 py-3',
            hasAmounts || t.supplements.length ? 'mt-4' : '',
          )}
        >
          <figcaption className="text-xs font-semibold tracking-wide text-accent-strong uppercase">
            {canEdit ? 'From your coach' : 'Note for the athlete'}
          </figcaption>
          <blockquote className="mt-1 text-sm whitespace-pre-line text-ink">{t.note}</blockquote>
        </figure>
      ) : null}

      {!hasAmounts && t.supplements.length === 0 && !t.note ? (
        <p className="text-sm text-ink-muted">The plan sets no figures for this day.</p>
      ) : null}
    </CheckInCard>
  );
}

/**
 * The server's state in words, with its figures, so it never rests on colour. A day in progress
 * shows what is left (target − actual, "to go") or how far past the target it is, never a verdict.
 */
function statusText(e: DriftEntry, measure: Measure): string {
  const diff = e.diff ?? 0;
  const gap = amount(measure, Math.abs(diff));
  const minimum = e.kind === 'at_least';
  switch (e.state) {
    case 'not_logged':
      return DRIFT_STATE_LABELS.not_logged;
    case 'in_progress':
      if (e.actual === null) return 'Nothing logged yet';
      if (diff < 0) return `${gap} to go`;
      if (diff === 0) return 'At the target so far';
      return minimum ? `Target reached: ${gap} past it` : `${gap} over the target so far`;
    case 'on_plan':
      if (minimum) return diff >= 0 ? 'On plan: reached' : `On plan: ${gap} short`;
      return DRIFT_STATE_LABELS.on_plan;
    case 'drifting':
    case 'off_plan': {
      const label = DRIFT_STATE_LABELS[e.state];
      return minimum ? `${label}: ${gap} short` : `${label}: ${diff > 0 ? 'over' : 'under'} by ${gap}`;
    }
  }
}

/** The on-plan values the server sent, in words ("On plan 1,900–2,100 kcal", "On plan from 9,000 steps"). */
function boundsText(e: DriftEntry, measure: Measure): string | null {
  const { min, max } = e.onPlan;
  if (min !== null && max !== null)
    return max > min ? `On plan ${measure.figure(min)}–${amount(measure, max)}` : null;
  if (min !== null) return `On plan from ${amount(measure, min)}`;
  if (max !== null) return `On plan up to ${amount(measure, max)}`;
  return null;
}

function ProgressRow({
  metric,
  label,
  measure,
  target,
  entry,
  hint,
  children,
}: {
  metric: DriftMetric;
  label: string;
  measure: Measure;
  target: number;
  /** The server's verdict; null for a day that has not begun (no verdict yet). */
  entry: DriftEntry | null;
  /** A quiet line: how a relative target was reached, or what is missing. */
  hint?: string;
  children?: ReactNode;
}) {
  const bounds = entry ? boundsText(entry, measure) : null;
  return (
    <li className="py-3 first:pt-0 last:pb-0" data-metric={metric} data-state={entry?.state ?? 'none'}>
      <p className="flex items-baseline justify-between gap-3">
        <span className="font-semibold text-ink">{label}</span>
        <span className="text-sm tabular-nums">
          <span className="text-base font-bold text-ink">
            {entry?.actual == null ? '—' : amount(measure, entry.actual)}
          </span>
          <span className="text-ink-muted"> of {amount(measure, target)}</span>
        </span>
      </p>
      <ProgressBar entry={entry} target={target} />
      <div className="mt-1.5 flex flex-wrap items-center justify-between gap-x-3 gap-y-1">
        {entry ? (
          <Badge tone={DRIFT_STATE_STYLE[entry.state].tone}>
            <span className="tabular-nums">{statusText(entry, measure)}</span>
          </Badge>
        ) : (
          <Badge tone="neutral">Day not begun</Badge>
        )}
        {bounds ? <span className="text-xs text-ink-faint tabular-nums">{bounds}</span> : null}
      </div>
      {hint ? <p className="mt-1 text-xs text-ink-faint tabular-nums">{hint}</p> : null}
      {children}
    </li>
  );
}

/**
 * Logged amount as a filled bar over the on-plan band (the tinted stretch with its edges) and a
 * tick at the target. Decorative: the row says the same in words and figures.
 */
function ProgressBar({ entry, target }: { entry: DriftEntry | null; target: number }) {
  const actual = entry?.actual ?? null;
  const min = entry?.onPlan.min ?? null;
  const max = entry?.onPlan.max ?? null;
  const scale = Math.max(max ?? target, actual ?? 0, 1) * 1.1;
  const at = (v: number) => `${Math.min(100, Math.max(0, (v / scale) * 100))}%`;
  return (
    <div aria-hidden="true" className="relative mt-2 h-3 rounded-pill bg-sunken">
      {min !== null && max !== null && max > min ? (
        <span
          className="absolute inset-y-0 border-x-2 border-on-plan/80 bg-on-plan/25"
          style={{ left: at(min), width: `calc(${at(max)} - ${at(min)})` }}
        />
      ) : null}
      {entry && actual !== null && actual > 0 ? (
        <span
          className={cn('absolute inset-y-0.5 left-0 rounded-pill', FILLS[entry.state])}
          style={{ width: at(actual) }}
        />
      ) : null}
      <span className="absolute -inset-y-1 w-0.5 -translate-x-1/2 bg-ink" style={{ left: at(target) }} />
    </div>
  );
}

/** The cut-off's badge from the server's status; before the cut-off time today, how long is left. */
function cutoffBadge(
  c: NonNullable<DayView['cutoff']>,
  clock: string | null,
  volume: (ml: number) => string,
) {
  const over = `Over the allowance by ${volume(c.excessMl)}`;
  switch (c.state) {
    case 'in_progress':
      if (c.excessMl > 0) return <Badge tone="caution">{`${over} so far`}</Badge>;
      if (clock && clockMinutes(clock) <= clockMinutes(c.cutoff)) {
        return <Badge tone="neutral">In {untilText(clockMinutes(c.cutoff) - clockMinutes(clock))}</Badge>;
      }
      return (
        <Badge tone={DRIFT_STATE_STYLE.in_progress.tone}>
          {c.allowanceMl > 0 ? 'Within the allowance so far' : 'Nothing after it so far'}
        </Badge>
      );
    case 'off_plan':
    case 'drifting':
      return <Badge tone={DRIFT_STATE_STYLE[c.state].tone}>{over}</Badge>;
    case 'on_plan':
      return <Badge tone="on-plan">{c.allowanceMl > 0 ? 'Within the allowance' : 'Nothing after it'}</Badge>;
    case 'not_logged':
      return <Badge tone="not-logged">{DRIFT_STATE_LABELS.not_logged}</Badge>;
  }
}

function WaterRows({
  day,
  unit,
  clock,
  basis,
}: {
  day: DayView;
  unit: VolumeUnit;
  clock: string | null;
  basis?: string;
}) {
  const t = day.targets!.targets;
  const volume = (ml: number) => formatVolume(ml, unit);
  const cutoff = day.cutoff;
  const cutoffBlock = cutoff ? (
    <div className="mt-3 rounded-md bg-paper px-3 py-2.5" data-metric="cutoff" data-state={cutoff.state}>
      <p className="text-sm font-semibold text-ink tabular-nums">
        No fluids after {formatClock(cutoff.cutoff, { whose: 'athlete', timeZone: day.timeZone })}
        {cutoff.allowanceMl > 0 ? ` beyond ${volume(cutoff.allowanceMl)}` : ''}
      </p>
      <p className="mt-1 flex flex-wrap items-center justify-between gap-x-3 gap-y-1 text-sm text-ink-muted tabular-nums">
        <span>
          Logged after {cutoff.cutoff}:{' '}
          <span className="font-semibold text-ink">{volume(cutoff.afterCutoffMl)}</span>
        </span>
        {cutoffBadge(cutoff, clock, volume)}
      </p>
    </div>
  ) : null;

  if (t.waterMl === null) {
    return (
      <li className="py-3 first:pt-0 last:pb-0">
        <p className="font-semibold text-ink">Water</p>
        {cutoffBlock}
      </li>
    );
  }
  return (
    <ProgressRow
      metric="water"
      label="Water"
      measure={volumeMeasure(unit)}
      target={t.waterMl}
      entry={day.drift.find((e) => e.metric === 'water') ?? null}
      // The basis is written in mL; it only helps a reader who reads mL.
      hint={unit === 'ml' ? basis : undefined}
    >
      {cutoffBlock}
    </ProgressRow>
  );
}

/** "2 h 10 min", "25 min". */
function untilText(mins: number): string {
  const m = Math.max(0, mins);
  const h = Math.floor(m / 60);
  const rest = m % 60;
  if (h === 0) return `${rest}${NBSP}min`;
  return rest === 0 ? `${h}${NBSP}h` : `${h}${NBSP}h ${rest}${NBSP}min`;
}

const SLOT_BADGE: Record<Exclude<SupplementSlot['state'], 'taken'>, { tone: BadgeTone; label: string }> = {
  due: { tone: 'accent', label: 'Due now' },
  late: { tone: 'drifting', label: 'Late' },
  upcoming: { tone: 'neutral', label: 'Later' },
  missed: { tone: 'not-logged', label: 'Not ticked' },
};

function doseText(slot: SupplementSlot): string {
  const { dose, unit } = slot.item;
  if (dose === null) return '';
  return `${formatNumber(dose, 3)}${unit ? `${NBSP}${unit}` : ''}`;
}

function SupplementsDue({
  athleteId,
  day,
  clock,
  now,
  canEdit,
}: {
  athleteId: string;
  day: DayView;
  clock: string | null;
  now: string;
  canEdit: boolean;
}) {
  const slots = supplementSlots(day.targets!.targets.supplements, day.supplements, clock);
  const create = useCreateSupplement(athleteId, day.date);
  const keeper = useRef(createClientIdKeeper()).current;
  const [pending, setPending] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  // An entry names its item, not its time: the first open time of an item is the one a tick fills.
  const firstOpen = new Set<string>();
  const seen = new Set<string>();
  for (const s of slots) {
    if (s.taken || seen.has(s.item.id)) continue;
    seen.add(s.item.id);
    firstOpen.add(s.key);
  }
  const takenCount = slots.filter((s) => s.taken).length;

  async function tick(slot: SupplementSlot) {
    const body: SupplementEntryRequest = {
      clientId: keeper.take(slot.key),
      // Today the tick is the moment it is taken; on an earlier day the planned time stands in.
      time: day.isToday ? now : slot.time,
      name: slot.item.item,
      dose: slot.item.dose,
      doseUnit: slot.item.unit,
      scheduleItemId: slot.item.id,
    };
    setPending(slot.key);
    setError(null);
    try {
      await create.mutateAsync(body);
      keeper.settle(body.clientId);
    } catch (e) {
      setError(isApiError(e) ? e.message : 'That could not be saved. Tap Taken again to retry.');
    } finally {
      setPending(null);
    }
  }

  return (
    <section aria-labelledby="supplements-due-heading" className="mt-4 border-t border-line pt-4">
      <h3
        id="supplements-due-heading"
        className="flex items-baseline justify-between gap-3 font-semibold text-ink"
      >
        Supplements
        <span className="text-sm font-normal text-ink-muted tabular-nums">
          {formatNumber(takenCount)} of {formatNumber(slots.length)} taken
        </span>
      </h3>
      <ul className="mt-2 divide-y divide-line">
        {slots.map((slot) => {
          const what = `${slot.item.item}${doseText(slot) ? ` ${doseText(slot)}` : ''}`;
          return (
            <li key={slot.key} className="flex min-h-touch items-center gap-3 py-2">
              <span className="w-12 shrink-0 text-sm font-semibold text-ink-muted tabular-nums">
                {slot.time}
              </span>
              <span className="min-w-0 flex-1 text-sm">
                <span className="font-semibold text-ink">{slot.item.item}</span>
                {doseText(slot) ? (
                  <span className="text-ink-muted tabular-nums"> {doseText(slot)}</span>
                ) : null}
              </span>
              {slot.taken ? (
                <Badge tone="on-plan">
                  <span className="tabular-nums">Taken {slot.taken.time}</span>
                </Badge>
              ) : canEdit && firstOpen.has(slot.key) ? (
                <>
                  {slot.state !== 'upcoming' ? <SlotBadge slot={slot} /> : null}
                  <Button
                    variant={slot.state === 'due' || slot.state === 'late' ? 'primary' : 'secondary'}
                    loading={pending === slot.key}
                    disabled={pending !== null && pending !== slot.key}
                    aria-label={`Taken: ${what}, planned at ${slot.time}`}
                    onClick={() => void tick(slot)}
                  >
                    Taken
                  </Button>
                </>
              ) : (
                <SlotBadge slot={slot} />
              )}
            </li>
          );
        })}
      </ul>
      {error ? (
        <p role="alert" className="mt-1.5 text-sm font-medium text-off-plan">
          {error}
        </p>
      ) : null}
    </section>
  );
}

function SlotBadge({ slot }: { slot: SupplementSlot }) {
  if (slot.state === 'taken') return null;
  const b = SLOT_BADGE[slot.state];
  return <Badge tone={b.tone}>{b.label}</Badge>;
}
