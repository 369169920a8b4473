import type { CountdownMismatch, CountdownPreview, PlanVersionView } from '@driftmark/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { isApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { useMoveCountdown, usePreviewMoveCountdown } from '../api/move-countdown';
import type { LinkedKeys } from '../api/plan-cache';
import { CountdownReview } from './countdown-review';

interface CountdownMismatchNoticeProps {
  athleteId: string;
  /** The server's `countdownMismatch` from the athlete's profile (null: nothing to show). */
  mismatch: CountdownMismatch | null;
  /** The server's `plan` ability on the athlete: moving the countdown writes a version. */
  canResolve: boolean;
  linkedKeys: LinkedKeys;
  className?: string;
}

type Step =
  | { kind: 'idle' }
  | { kind: 'review'; preview: CountdownPreview }
  | { kind: 'moved'; version: PlanVersionView };

/**
 * "The countdown is aimed at <date>, the event is <date>": shown on every coach page of the athlete
 * for as long as the server says they disagree. One click moves the countdown to the event; when
 * the move raises guardrail warnings the review opens so each can be acknowledged first.
 */
export function CountdownMismatchNotice({
  athleteId,
  mismatch,
  canResolve,
  linkedKeys,
  className,
}: CountdownMismatchNoticeProps) {
  const [step, setStep] = useState<Step>({ kind: 'idle' });
  const [error, setError] = useState<string | null>(null);
  const previewMove = usePreviewMoveCountdown(athleteId);
  const move = useMoveCountdown(athleteId, { linkedKeys });

  if (step.kind === 'moved') {
    return (
      <Alert
        tone="success"
        className={className}
        title={`Countdown moved to ${formatDate(step.version.countdown?.eventDate ?? step.version.effectiveFrom)}: version ${step.version.number}, in force from ${formatDate(step.version.effectiveFrom)}.`}
        action={
          <Button variant="secondary" size="sm" onClick={() => setStep({ kind: 'idle' })}>
            Done
          </Button>
        }
      />
    );
  }
  if (!mismatch) return null;
  const to = mismatch.eventDate;

  async function resolve() {
    setError(null);
    try {
      const preview = await previewMove.mutateAsync({ eventDate: to });
      if (preview.warnings.length > 0) {
        setStep({ kind: 'review', preview });
        return;
      }
      setStep({ kind: 'moved', version: await move.mutateAsync({ eventDate: to, acknowledgedKeys: [] }) });
    } catch (e) {
      setError(
        isApiError(e)
          ? Object.values(e.fields).join(' ') || e.message
          : 'The countdown could not be moved. Try again.',
      );
    }
  }

  if (step.kind === 'review') {
    return (
      <Card className={className}>
        <p className="text-sm font-semibold text-accent">Preview · nothing is saved yet</p>
        <h3 className="mb-4 text-xl font-bold text-ink">
          Move the countdown from {formatDate(mismatch.countdownEventDate)} to {formatDate(to)}
        </h3>
        <CountdownReview
          preview={step.preview}
          confirmLabel="Move countdown"
          defaultReason={
            step.preview.content.countdown
              ? `Countdown "${step.preview.content.countdown.templateName}" moved to ${to}`
              : undefined
          }
          pending={move.isPending}
          onCancel={() => setStep({ kind: 'idle' })}
          onConfirm={async ({ acknowledgedKeys, reason }) => {
            const version = await move.mutateAsync({ eventDate: to, acknowledgedKeys, reason });
            setStep({ kind: 'moved', version });
          }}
        />
      </Card>
    );
  }

  return (
    <Alert
      tone="caution"
      className={className}
      title={`The countdown is aimed at ${formatDate(mismatch.countdownEventDate)}, the event is ${formatDate(to)}.`}
      action={
        canResolve ? (
          <Button onClick={() => void resolve()} loading={previewMove.isPending || move.isPending}>
            Move the countdown to {formatDate(to)}
          </Button>
        ) : undefined
      }
    >
      Targets, cautions and countdown days still count back from the old date.
      {canResolve
        ? ' Moving it shifts every countdown day by the same number of days and moves nothing else.'
        : ' A coach of the athlete can move it.'}
      {error ? <span className="mt-1 block font-medium text-off-plan">{error}</span> : null}
    </Alert>
  );
}
