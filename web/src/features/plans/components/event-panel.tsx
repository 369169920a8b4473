import { EVENT_TYPE_LABELS, inFinalWeek, type CountdownMismatch, type EVENT_TYPES } from '@driftmark/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { controlClasses, FieldErrorText } from '@/components/ui/field';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { daysBetween, formatDate, formatDaysToEvent } from '@/lib/format';
import type { LinkedKeys } from '../api/plan-cache';
import { useUpdateEvent } from '../api/update-event';
import { isIsoDate } from '../utils/dates';
import { CountdownMismatchNotice } from './countdown-mismatch-notice';

/** Days at or under which the final-week countdown applies. */

interface EventPanelProps {
  athleteId: string;
  event: {
    type: (typeof EVENT_TYPES)[number] | null;
    name: string | null;
    date: string | null;
  };
  today: string;
  /** The server's word that the plan's countdown aims at another day (from the athlete's profile). */
  mismatch: CountdownMismatch | null;
  /** The server's `update` ability on the athlete. */
  canChange: boolean;
  /** The server's `edit` ability on the plan (moving the countdown writes a version). */
  canEditPlan: boolean;
  linkedKeys: LinkedKeys;
}

type Step = { kind: 'idle' } | { kind: 'editing' } | { kind: 'saved'; date: string };

/**
 * The athlete's event on the plan page: what and when, days to go, and the date change. While the
 * plan's countdown counts back from another day the notice says so, after a reload too, and offers
 * the move (with a preview and an acknowledgement of each warning when the move raises any).
 */
export function EventPanel({
  athleteId,
  event,
  today,
  mismatch,
  canChange,
  canEditPlan,
  linkedKeys,
}: EventPanelProps) {
  const id = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const [step, setStep] = useState<Step>({ kind: 'idle' });
  const [date, setDate] = useState(event.date ?? '');
  const [error, setError] = useState<string | null>(null);
  const update = useUpdateEvent(athleteId, { linkedKeys });

  const hasEvent = event.type !== null && event.type !== 'none' && event.date !== null;
  const days = hasEvent && event.date ? daysBetween(today, event.date) : null;

  async function saveDate() {
    setError(null);
    if (!isIsoDate(date)) {
      setError('Event date: enter a date');
      return;
    }
    try {
      await update.mutateAsync({ eventDate: date });
      setStep({ kind: 'saved', date });
    } catch (e) {
      setError(
        isApiError(e)
          ? (e.fields.eventDate ?? (Object.values(e.fields).join(' ') || e.message))
          : 'The date could not be saved. Try again.',
      );
    }
  }

  return (
    <div className="space-y-4">
      <Card padding="compact" className="flex flex-wrap items-center gap-x-6 gap-y-3">
        <div className="min-w-0 flex-1 basis-64">
          <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">Event</p>
          {hasEvent && event.type && event.date ? (
            <p className="text-lg font-semibold text-ink">
              {event.name || EVENT_TYPE_LABELS[event.type]}
              <span className="font-normal text-ink-muted">
                {' · '}
                {EVENT_TYPE_LABELS[event.type]} on{' '}
                <span className="tabular-nums">{formatDate(event.date)}</span>
              </span>
            </p>
          ) : (
            <p className="text-lg font-semibold text-ink">No event on the calendar</p>
          )}
        </div>
        {days !== null ? (
          <p className="flex items-center gap-2">
            <span className="text-2xl font-bold text-accent-strong tabular-nums">
              {formatDaysToEvent(days)}
            </span>
            {inFinalWeek(days) ? <Badge tone="caution">Final week</Badge> : null}
          </p>
        ) : null}
        {canChange && hasEvent && step.kind !== 'editing' ? (
          <Button
            variant="secondary"
            size="sm"
            onClick={() => {
              setDate(event.date ?? '');
              setError(null);
              setStep({ kind: 'editing' });
            }}
          >
            Change event date
          </Button>
        ) : null}
      </Card>

      {step.kind === 'editing' ? (
        <Card padding="compact">
          <form
            noValidate
            onSubmit={(e) => {
              e.preventDefault();
              void saveDate();
            }}
            className="flex flex-wrap items-end gap-3"
          >
            <div>
              <label htmlFor={`${id}-date`} className="mb-1.5 block font-semibold text-ink">
                New event date
              </label>
              <input
                id={`${id}-date`}
                type="date"
                value={date}
                onChange={(e) => setDate(e.target.value)}
                aria-invalid={error ? true : undefined}
                aria-describedby={error ? `${id}-date-error` : undefined}
                className={cn(
                  controlClasses,
                  'w-48 tabular-nums',
                  error ? 'border-off-plan' : 'border-line-strong',
                )}
              />
            </div>
            <Button type="submit" loading={update.isPending}>
              Save the date
            </Button>
            <Button variant="ghost" onClick={() => setStep({ kind: 'idle' })} disabled={update.isPending}>
              Cancel
            </Button>
            <div className="w-full">
              <FieldErrorText id={`${id}-date-error`} error={error ? { message: error } : undefined} />
            </div>
          </form>
        </Card>
      ) : null}

      {step.kind === 'saved' ? (
        <Alert
          tone="success"
          title={`Event date changed to ${formatDate(step.date)}.`}
          action={
            <Button variant="secondary" size="sm" onClick={() => setStep({ kind: 'idle' })}>
              Done
            </Button>
          }
        />
      ) : null}

      <CountdownMismatchNotice
        athleteId={athleteId}
        mismatch={mismatch}
        canResolve={canEditPlan}
        linkedKeys={linkedKeys}
      />
    </div>
  );
}
