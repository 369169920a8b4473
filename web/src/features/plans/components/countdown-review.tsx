import { type CountdownPreview } from '@driftmark/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import * as fig from '../utils/figures';
import { toAckWarnings, unacknowledgedFromError, type AckWarning } from '../utils/ack-warnings';
import { scopeLabel } from '../utils/scope-label';
import { TargetsTable } from './targets-table';
import { useAcknowledgements, WarningChecklist } from './warning-checklist';

interface CountdownReviewProps {
  preview: CountdownPreview;
  /** Names the change in the headings ("Apply countdown", "Move the countdown"). */
  confirmLabel: string;
  /** The reason the server writes when none is typed, when known. */
  defaultReason?: string;
  /** Saves with the ticked keys; throws the ApiError of a refusal. */
  onConfirm: (input: { acknowledgedKeys: string[]; reason: string | undefined }) => Promise<unknown>;
  onCancel: () => void;
  pending: boolean;
}

/**
 * A countdown before it is saved: the concrete dated targets (this athlete's baseline), the days
 * already past that stay as they were, every guardrail warning with its own tick, and the button
 * that stays disabled until each is ticked.
 */
export function CountdownReview({
  preview,
  confirmLabel,
  defaultReason,
  onConfirm,
  onCancel,
  pending,
}: CountdownReviewProps) {
  const id = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const [list, setList] = useState<AckWarning[]>(() =>
    toAckWarnings(preview.warnings, (w) => scopeLabel(w, preview.content)),
  );
  const acks = useAcknowledgements(list);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const past = preview.days.filter((d) => d.past).length;
  const reasonText = reason.trim();
  const reasonTooShort = reasonText.length > 0 && reasonText.length < 3;

  async function confirm() {
    setError(null);
    try {
      await onConfirm({ acknowledgedKeys: [...acks.ticked], reason: reasonText || undefined });
    } catch (e) {
      const again = unacknowledgedFromError(e, list, (w) => scopeLabel(w, preview.content));
      if (again) {
        setList(again);
        acks.clear(Object.keys(isApiError(e) ? e.fields : {}));
        setError('The server found warnings that are not acknowledged yet. Read and tick each one again.');
        return;
      }
      if (isApiError(e) && Object.keys(e.fields).length > 0) {
        setError(Object.values(e.fields).join(' '));
        return;
      }
      setError(isApiError(e) ? e.message : 'That could not be saved. Try again.');
    }
  }

  const { baseline } = preview;
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
        <p>
          <span className="text-ink-faint">Event day (E-0) </span>
          <span className="font-semibold text-ink tabular-nums">{formatDate(preview.eventDate)}</span>
        </p>
        <p>
          <span className="text-ink-faint">New version in force from </span>
          <span className="font-semibold text-ink tabular-nums">{formatDate(preview.effectiveFrom)}</span>
        </p>
        <p className="tabular-nums">
          <span className="text-ink-faint">Baseline </span>
          <span className="text-ink">
            usual water {baseline.usualWaterMl !== null ? fig.ml(baseline.usualWaterMl) : 'not known'} · usual
            energy {baseline.usualEnergyKcal !== null ? fig.kcal(baseline.usualEnergyKcal) : 'not known'} ·
            trend weight {baseline.weightKg !== null ? `${baseline.weightKg.toFixed(1)} kg` : 'not known'}
          </span>
        </p>
      </div>

      <TargetsTable
        caption={`Countdown days for the event on ${formatDate(preview.eventDate)}`}
        leadHeaders={['Date', 'Day', 'Label']}
        rows={preview.days.map((d) => ({
          id: d.date,
          lead: [
            formatDate(d.date),
            <span className="font-semibold tabular-nums">{d.dayLabel}</span>,
            d.label ?? '—',
          ],
          targets: d.targets,
          muted: d.past,
          mutedNote: 'already past, not changed',
        }))}
      />
      {past > 0 ? (
        <p className="text-sm text-ink-muted">
          {past === 1 ? 'One day is' : `${past} days are`} already past: past days keep the plan they had.
        </p>
      ) : null}

      <section aria-labelledby={`${id}-warnings`} className="space-y-3">
        <h3 id={`${id}-warnings`} className="text-lg font-semibold text-ink">
          Guardrail warnings <span className="font-normal text-ink-muted tabular-nums">({list.length})</span>
        </h3>
        {list.length > 0 ? (
          <p className="text-sm text-ink">
            Read each one. Your acknowledgement is stored with your name and the time, and the athlete sees a
            caution on each countdown day.
          </p>
        ) : null}
        <WarningChecklist
          warnings={list}
          ticked={acks.ticked}
          onTick={acks.set}
          idPrefix={id}
          disabled={pending}
        />
      </section>

      <div className="max-w-xl">
        <label htmlFor={`${id}-reason`} className="mb-1.5 block font-semibold text-ink">
          Reason <span className="text-xs font-medium text-ink-faint">optional</span>
        </label>
        <input
          id={`${id}-reason`}
          value={reason}
          maxLength={300}
          placeholder={defaultReason ?? 'e.g. Event moved by the federation'}
          aria-invalid={reasonTooShort || undefined}
          aria-describedby={`${id}-reason-hint`}
          onChange={(e) => setReason(e.target.value)}
          className={cn(controlClasses, reasonTooShort ? 'border-off-plan' : 'border-line-strong')}
        />
        <p
          id={`${id}-reason-hint`}
          className={cn('mt-1.5 text-sm', reasonTooShort ? 'text-off-plan' : 'text-ink-faint')}
        >
          {reasonTooShort
            ? 'Reason: at least 3 characters, or leave it empty.'
            : defaultReason
              ? `Left empty: “${defaultReason}”.`
              : 'Left empty, the history names the countdown and its new date.'}
        </p>
      </div>

      {error ? (
        <Alert tone="error" title="Not saved">
          {error}
        </Alert>
      ) : null}

      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => void confirm()} disabled={!acks.allTicked || reasonTooShort} loading={pending}>
          {list.length > 0 ? `Acknowledge and ${confirmLabel.toLowerCase()}` : confirmLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Back
        </Button>
        {!acks.allTicked ? (
          <p className="text-sm text-ink-muted">Tick every warning to enable “{confirmLabel}”.</p>
        ) : null}
      </div>
    </div>
  );
}
