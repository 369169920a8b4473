import {
  type CountdownPreview,
  EVENT_TYPE_LABELS,
  type EVENT_TYPES,
  inFinalWeek,
  type PlanVersionView,
} from '@driftmark/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { controlClasses, FieldErrorText } from '@/components/ui/field';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { daysBetween, formatDate, formatDaysToEvent } from '@/lib/format';
import { useMoveCountdown, usePreviewMoveCountdown } from '../api/move-countdown';
import type { LinkedKeys } from '../api/plan-cache';
import { useUpdateEvent, type UpdateEventResult } from '../api/update-event';
import { isIsoDate } from '../utils/dates';
import { CountdownReview } from './countdown-review';

/** Days at or under which the final-week countdown applies. */

interface EventPanelProps {
  athleteId: string;
  event: {
    type: (typeof EVENT_TYPES)[number] | null;
    name: string | null;
    date: string | null;
  };
  today: string;
  /** The server's `update` ability on the athlete. */
  canChange: boolean;
  /** The server's `edit` ability on the plan (moving the countdown writes a version). */
  canEditPlan: boolean;
  linkedKeys: LinkedKeys;
}

type Step =
  | { kind: 'idle' }
  | { kind: 'editing' }
  | { kind: 'offer'; offer: NonNullable<UpdateEventResult['countdownOffer']> }
  | { kind: 'move'; offer: NonNullable<UpdateEventResult['countdownOffer']>; preview: CountdownPreview }
  | { kind: 'moved'; version: PlanVersionView }
  | { kind: 'saved'; date: string };

/**
 * The athlete's event on the plan page: what and when, days to go, and the date change. When the
 * plan carries a countdown for the old date, the answer offers to move it, with a preview and an
 * acknowledgement of each warning like any other save.
 */
export function EventPanel({ athleteId, event, today, canChange, canEditPlan, linkedKeys }: EventPanelProps) {
  const id = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const [step, setStep] = useState<Step>({ kind: 'idle' });
  const [date, setDate] = useState(event.date ?? '');
  const [error, setError] = useState<string | null>(null);
  const update = useUpdateEvent(athleteId, { linkedKeys });
  const previewMove = usePreviewMoveCountdown(athleteId);
  const move = useMoveCountdown(athleteId, { linkedKeys });

  const hasEvent = event.type !== null && event.type !== 'none' && event.date !== null;
  const days = hasEvent && event.date ? daysBetween(today, event.date) : null;

  async function saveDate() {
    setError(null);
    if (!isIsoDate(date)) {
      setError('Event date: enter a date');
      return;
    }
    try {
      const result = await update.mutateAsync({ eventDate: date });
      setStep(
        result.countdownOffer ? { kind: 'offer', offer: result.countdownOffer } : { kind: 'saved', date },
      );
    } catch (e) {
      setError(
        isApiError(e)
          ? (e.fields.eventDate ?? (Object.values(e.fields).join(' ') || e.message))
          : 'The date could not be saved. Try again.',
      );
    }
  }

  async function offerMove(offer: NonNullable<UpdateEventResult['countdownOffer']>) {
    setError(null);
    try {
      const preview = await previewMove.mutateAsync({ eventDate: offer.toEventDate });
      setStep({ kind: 'move', offer, preview });
    } catch (e) {
      setError(
        isApiError(e)
          ? Object.values(e.fields).join(' ') || e.message
          : 'The move could not be previewed. Try again.',
      );
    }
  }

  return (
    <div className="space-y-4">
      <Card padding="compact" className="flex flex-wrap items-center gap-x-6 gap-y-3">
        <div className="min-w-0 flex-1">
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
        <Alert tone="success" title={`Event date changed to ${formatDate(step.date)}.`}>
          The plan had no countdown for another date, so nothing else changed.
        </Alert>
      ) : null}

      {step.kind === 'offer' ? (
        <Alert
          tone="info"
          title={`Event date changed to ${formatDate(step.offer.toEventDate)}.`}
          action={
            canEditPlan ? (
              <div className="flex flex-wrap gap-2">
                <Button onClick={() => void offerMove(step.offer)} loading={previewMove.isPending}>
                  Move the countdown to {formatDate(step.offer.toEventDate)}
                </Button>
                <Button variant="secondary" onClick={() => setStep({ kind: 'idle' })}>
                  Keep the countdown where it is
                </Button>
              </div>
            ) : undefined
          }
        >
          The plan&apos;s countdown still counts back from {formatDate(step.offer.fromEventDate)}.
          {canEditPlan
            ? ' Moving it shifts every countdown day by the same number of days; you see a preview first.'
            : ''}
          {error ? <span className="mt-1 block font-medium text-off-plan">{error}</span> : null}
        </Alert>
      ) : null}

      {step.kind === 'move' ? (
        <Card>
          <p className="text-sm font-semibold text-accent">Preview · nothing is saved yet</p>
          <h3 className="mb-4 text-xl font-bold text-ink">
            Move the countdown from {formatDate(step.offer.fromEventDate)} to{' '}
            {formatDate(step.offer.toEventDate)}
          </h3>
          <CountdownReview
            preview={step.preview}
            confirmLabel="Move countdown"
            defaultReason={
              step.preview.content.countdown
                ? `Countdown "${step.preview.content.countdown.templateName}" moved to ${step.offer.toEventDate}`
                : undefined
            }
            pending={move.isPending}
            onCancel={() => setStep({ kind: 'offer', offer: step.offer })}
            onConfirm={async ({ acknowledgedKeys, reason }) => {
              const version = await move.mutateAsync({
                eventDate: step.offer.toEventDate,
                acknowledgedKeys,
                reason,
              });
              setStep({ kind: 'moved', version });
            }}
          />
        </Card>
      ) : null}

      {step.kind === 'moved' ? (
        <Alert
          tone="success"
          title={`Countdown moved: version ${step.version.number}, in force from ${formatDate(step.version.effectiveFrom)}.`}
          action={
            <Button variant="secondary" size="sm" onClick={() => setStep({ kind: 'idle' })}>
              Done
            </Button>
          }
        />
      ) : null}
    </div>
  );
}
