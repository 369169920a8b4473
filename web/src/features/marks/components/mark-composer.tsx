import {
  createMarkRequest,
  MARK_LIMITS,
  MARK_METRIC_LABELS,
  MARK_METRICS,
  type CreateMarkRequest,
  type MarkMetric,
  type MarkView,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { TextArea } from '@/components/ui/text-area';
import { TextField } from '@/components/ui/text-field';
import { cn } from '@/lib/cn';
import { formatNumber } from '@/lib/format';
import { useCreateMark } from '../api/create-mark';
import type { LinkedKeys } from '../api/mark-cache';
import { formatMarkRange, markRangeDays } from '../utils/marks';

const METRIC_OPTIONS = MARK_METRICS.map((m) => ({ value: m, label: MARK_METRIC_LABELS[m] }));
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export interface MarkComposerProps {
  athleteId: string;
  /** The first day, prefilled (the day clicked, or where a drag on the chart began). */
  fromDate: string;
  /** The last day (where the drag ended); the first day when left out. */
  toDate?: string;
  /** The chart the mark starts on; the viewer can pick another. */
  metric?: MarkMetric;
  /** Bounds for the date pickers (the chart's range, the athlete's today). The server has the last word. */
  minDate?: string;
  maxDate?: string;
  /** Keys from other features to refresh after saving (the athlete's trend, the review queue). */
  linkedKeys?: LinkedKeys;
  onSaved?: (mark: MarkView) => void;
  onCancel?: () => void;
  /** Put the cursor in the note when the composer opens (after a click on the chart). */
  autoFocusNote?: boolean;
  className?: string;
}

/**
 * The coach pins a note to a chart's day or range. The dates come in from the chart and stay
 * editable; when the chart's selection changes while the composer is open, the dates follow it.
 */
export function MarkComposer({
  athleteId,
  fromDate,
  toDate,
  metric = 'weight',
  minDate,
  maxDate,
  linkedKeys,
  onSaved,
  onCancel,
  autoFocusNote = false,
  className,
}: MarkComposerProps) {
  const lastDay = toDate ?? fromDate;
  const form = useForm<CreateMarkRequest>({
    resolver: zodResolver(createMarkRequest),
    defaultValues: { metric, fromDate, toDate: lastDay, note: '' },
  });
  const create = useCreateMark(athleteId, { linkedKeys });

  // A new selection on the chart replaces the dates (and chart); the note the coach typed stays.
  const { setValue, setFocus } = form;
  useEffect(() => {
    setValue('fromDate', fromDate, { shouldValidate: false });
    setValue('toDate', lastDay, { shouldValidate: false });
  }, [fromDate, lastDay, setValue]);
  useEffect(() => {
    setValue('metric', metric, { shouldValidate: false });
  }, [metric, setValue]);
  useEffect(() => {
    if (autoFocusNote) setFocus('note');
  }, [autoFocusNote, setFocus]);

  return (
    <Form
      form={form}
      aria-label="Pin a mark"
      onSubmit={async (body) => {
        const mark = await create.mutateAsync(body);
        form.reset({ metric: body.metric, fromDate: body.fromDate, toDate: body.toDate, note: '' });
        onSaved?.(mark);
      }}
      className={cn('space-y-4', className)}
    >
      <div className="grid gap-4 sm:grid-cols-3">
        <Select name="metric" label="Chart" options={METRIC_OPTIONS} required />
        <TextField
          name="fromDate"
          label="From"
          type="date"
          min={minDate}
          max={maxDate}
          required
          inputClassName="tabular-nums"
        />
        <TextField
          name="toDate"
          label="To"
          type="date"
          min={minDate}
          max={maxDate}
          required
          inputClassName="tabular-nums"
        />
      </div>
      <RangeSummary />
      <TextArea
        name="note"
        label="Note"
        rows={4}
        required
        maxLength={MARK_LIMITS.note.max}
        hint="The athlete sees it on their Trends screen and can reply."
      />
      <div className="flex flex-wrap gap-2">
        <SubmitButton pendingLabel="Pinning…" className="max-sm:flex-1">
          Pin mark
        </SubmitButton>
        {onCancel ? (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </Form>
  );
}

/** What the dates cover, in words, so a range dragged on the chart can be checked before saving. */
function RangeSummary() {
  const [from, to] = useWatch<CreateMarkRequest, ['fromDate', 'toDate']>({ name: ['fromDate', 'toDate'] });
  if (!ISO_DATE.test(from ?? '') || !ISO_DATE.test(to ?? '') || to < from) return null;
  let text: string;
  try {
    text = formatMarkRange(from, to);
  } catch {
    return null;
  }
  const days = markRangeDays(from, to);
  return (
    <p className="text-sm text-ink-muted" aria-live="polite">
      Covers <span className="font-semibold text-ink tabular-nums">{text}</span>
      {days > 1 ? <span className="tabular-nums"> ({formatNumber(days)} days)</span> : null}
    </p>
  );
}

export interface MarkComposerDialogProps extends Omit<MarkComposerProps, 'onCancel' | 'className'> {
  open: boolean;
  /** Esc, Cancel, or after saving. */
  onClose: () => void;
}

/** The composer in a modal dialog (focus kept inside, Esc closes), opened from a chart. */
export function MarkComposerDialog({ open, ...props }: MarkComposerDialogProps) {
  if (!open) return null;
  return <ComposerDialog {...props} />;
}

function ComposerDialog({ onClose, onSaved, ...props }: Omit<MarkComposerDialogProps, 'open'>) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(40rem,calc(100vw-2rem))] overflow-y-auto rounded-lg border border-line bg-surface p-0 text-ink shadow-card backdrop:bg-ink/50"
    >
      <div className="space-y-4 p-5 sm:p-6">
        <h2 id={titleId} className="text-xl font-bold text-ink">
          Pin a mark
        </h2>
        <MarkComposer
          {...props}
          autoFocusNote={props.autoFocusNote ?? true}
          onCancel={onClose}
          onSaved={(mark) => {
            onSaved?.(mark);
            onClose();
          }}
        />
      </div>
    </dialog>
  );
}
