import {
  countdownDayLabel,
  dayEntryFor,
  resolveTargets,
  versionInForce,
  weekdayOf,
  WEEKDAY_LABELS,
  WEEKDAYS,
  type PlanBaseline,
  type PlanVersionView,
  type PlanView,
  type ResolvedTargets,
} from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import { addDays } from '../utils/dates';
import * as fig from '../utils/figures';

function resolved(
  targets: Parameters<typeof resolveTargets>[0],
  baseline: PlanBaseline,
): ResolvedTargets | null {
  try {
    return resolveTargets(targets, baseline);
  } catch {
    return null;
  }
}

/** Energy, macros and water of a day, one per line, for narrow columns. */
export function KeyFigures({ r, className }: { r: ResolvedTargets | null; className?: string }) {
  if (!r) return null;
  const macros = fig.macroLine(r);
  const lines = [
    r.energyKcal !== null ? fig.kcal(r.energyKcal) : null,
    macros,
    r.waterMl !== null ? fig.ml(r.waterMl) : null,
    r.sodiumMg !== null ? `Na ${fig.mg(r.sodiumMg)}` : null,
    r.fluidCutoff ? `Cut-off ${r.fluidCutoff.time}` : null,
    ...fig.timingLines(r),
  ].filter(Boolean);
  if (lines.length === 0) return <p className={cn('text-xs text-ink-faint', className)}>No targets</p>;
  return (
    <ul className={cn('space-y-0.5 text-xs text-ink-muted tabular-nums', className)}>
      {lines.map((l, i) => (
        <li
          key={i}
          className={i === 0 && r.energyKcal !== null ? 'text-sm font-semibold text-ink' : undefined}
        >
          {l}
        </li>
      ))}
    </ul>
  );
}

/**
 * The version in force today as a week (Mon–Sun: day type and key figures) and the next 14 days
 * as a strip, where dated days and countdown days (E-3 …) show up.
 */
export function WeekView({ plan }: { plan: PlanView }) {
  const current = plan.current;
  const versions = [plan.current, plan.latest].filter((v): v is PlanVersionView => v !== null);
  const today = plan.today;
  const todayWeekday = weekdayOf(today);

  return (
    <div className="space-y-5">
      {current ? (
        <div>
          <h3 className="mb-2 text-sm font-semibold text-ink">
            Week pattern of version {current.number}{' '}
            <span className="font-normal text-ink-muted">(in force today)</span>
          </h3>
          <ol
            className="grid grid-cols-2 gap-2 sm:grid-cols-4 lg:grid-cols-7"
            aria-label="Week pattern, Monday to Sunday"
          >
            {WEEKDAYS.map((day) => {
              const type = current.content.dayTypes.find((t) => t.key === current.content.weekdays[day]);
              return (
                <li
                  key={day}
                  className={cn(
                    'rounded-md border bg-surface p-2.5',
                    day === todayWeekday ? 'border-accent ring-1 ring-accent' : 'border-line',
                  )}
                >
                  <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">
                    {WEEKDAY_LABELS[day]}
                    {day === todayWeekday ? <span className="sr-only"> (today&apos;s weekday)</span> : null}
                  </p>
                  <p className="mb-1 text-sm font-semibold text-accent-strong">{type?.name ?? '—'}</p>
                  <KeyFigures r={type ? resolved(type.targets, current.baseline) : null} />
                </li>
              );
            })}
          </ol>
        </div>
      ) : (
        <p className="text-sm text-ink-muted">No version is in force today.</p>
      )}

      <div>
        <h3 className="mb-2 text-sm font-semibold text-ink">Next 14 days</h3>
        <ol className="grid grid-cols-2 gap-1.5 sm:grid-cols-4 lg:grid-cols-7" aria-label="The next 14 days">
          {Array.from({ length: 14 }, (_, i) => addDays(today, i)).map((date) => {
            const v = versionInForce(versions, date);
            let name = 'No plan';
            let label: string | null = null;
            let offset: number | null = null;
            let r: ResolvedTargets | null = null;
            if (v) {
              try {
                const entry = dayEntryFor(v.content, date);
                if (entry.kind === 'date') {
                  name = entry.override.label ?? 'Dated day';
                  label = entry.override.label;
                  offset = entry.override.countdownOffset;
                  r = resolved(entry.override.targets, v.baseline);
                } else {
                  name = entry.dayType.name;
                  r = resolved(entry.dayType.targets, v.baseline);
                }
              } catch {
                name = 'No plan';
              }
            }
            return (
              <li
                key={date}
                className={cn(
                  'min-w-0 rounded-md border p-2',
                  offset !== null ? 'border-caution/50 bg-caution-soft/60' : 'border-line bg-surface',
                  date === today && 'ring-1 ring-accent',
                )}
              >
                <p className="text-xs font-semibold text-ink-muted tabular-nums">
                  {date === today ? 'Today' : formatDate(date, 'short').replace(/ \d{4}$/, '')}
                  <span className="sr-only">, {formatDate(date)}</span>
                </p>
                <p className="text-xs text-ink-faint">{WEEKDAY_LABELS[weekdayOf(date)]}</p>
                {offset !== null ? (
                  <Badge tone="caution" className="my-1">
                    {countdownDayLabel(offset)}
                  </Badge>
                ) : null}
                <p className="truncate text-sm font-semibold text-ink" title={label ?? name}>
                  {name}
                </p>
                {v && plan.current && v.id !== plan.current.id ? (
                  <p className="text-xs text-ink-faint">v{v.number}</p>
                ) : null}
                {r?.energyKcal != null ? (
                  <p className="text-xs text-ink-muted tabular-nums">{fig.kcal(r.energyKcal)}</p>
                ) : null}
                {r?.waterMl != null ? (
                  <p className="text-xs text-ink-muted tabular-nums">{fig.ml(r.waterMl)}</p>
                ) : null}
              </li>
            );
          })}
        </ol>
      </div>
    </div>
  );
}
