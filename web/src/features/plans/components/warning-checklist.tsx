import { useMemo, useState } from 'react';
import { Badge } from '@/components/ui/badge';
import { cn } from '@/lib/cn';
import type { AckWarning } from '../utils/ack-warnings';

/** Ticks per warning; a tick survives a new list only while its warning is still in it. */
export function useAcknowledgements(warnings: readonly AckWarning[]) {
  const [ticked, setTicked] = useState<ReadonlySet<string>>(new Set());
  const current = useMemo(
    () => new Set([...ticked].filter((k) => warnings.some((w) => w.key === k))),
    [ticked, warnings],
  );
  return {
    ticked: current,
    allTicked: warnings.every((w) => current.has(w.key)),
    keys: warnings.map((w) => w.key),
    set: (key: string, on: boolean) =>
      setTicked((prev) => {
        const next = new Set(prev);
        if (on) next.add(key);
        else next.delete(key);
        return next;
      }),
    /** Untick these (the server said they were not acknowledged). */
    clear: (keys: readonly string[]) =>
      setTicked((prev) => new Set([...prev].filter((k) => !keys.includes(k)))),
  };
}

interface WarningChecklistProps {
  warnings: readonly AckWarning[];
  ticked: ReadonlySet<string>;
  onTick: (key: string, on: boolean) => void;
  /** Distinguishes the boxes when two lists are on one page. */
  idPrefix: string;
  disabled?: boolean;
}

/**
 * Every guardrail warning with its own box: the coach reads and ticks each one before the save
 * goes through. None is pre-ticked and there is no "tick all".
 */
export function WarningChecklist({ warnings, ticked, onTick, idPrefix, disabled }: WarningChecklistProps) {
  if (warnings.length === 0) {
    return <p className="text-sm text-ink-muted">No guardrail warnings.</p>;
  }
  const done = warnings.filter((w) => ticked.has(w.key)).length;
  return (
    <fieldset disabled={disabled}>
      <legend className="mb-2 text-sm font-semibold text-ink">
        Acknowledge each warning{' '}
        <span className="font-normal text-ink-muted tabular-nums">
          ({done} of {warnings.length} ticked)
        </span>
      </legend>
      <ul className="space-y-2">
        {warnings.map((w, i) => {
          const id = `${idPrefix}-ack-${i}`;
          const on = ticked.has(w.key);
          return (
            <li
              key={w.key}
              className={cn(
                'flex items-start gap-3 rounded-md border px-3 py-2.5',
                on
                  ? 'border-line-strong bg-surface'
                  : w.severity === 'strong'
                    ? 'border-off-plan/50 bg-off-plan-soft'
                    : 'border-caution/50 bg-caution-soft',
              )}
            >
              <input
                id={id}
                type="checkbox"
                checked={on}
                onChange={(e) => onTick(w.key, e.target.checked)}
                aria-describedby={`${id}-detail`}
                className="mt-0.5 size-5 shrink-0 accent-accent"
              />
              <div className="min-w-0 flex-1">
                <label htmlFor={id} className="block cursor-pointer text-sm font-medium text-ink">
                  {w.message}
                </label>
                <p
                  id={`${id}-detail`}
                  className="mt-1 flex flex-wrap items-center gap-x-2 gap-y-1 text-xs text-ink-muted"
                >
                  <Badge tone={w.severity === 'strong' ? 'off-plan' : 'caution'}>
                    {w.severity === 'strong' ? 'Strong warning' : 'Warning'}
                  </Badge>
                  {w.where && !w.message.startsWith(w.where) ? <span>{w.where}</span> : null}
                  {w.source ? <span>Source: {w.source}</span> : null}
                </p>
              </div>
            </li>
          );
        })}
      </ul>
    </fieldset>
  );
}
