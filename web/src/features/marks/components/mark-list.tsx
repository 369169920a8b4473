import {
  createReplyRequest,
  MARK_LIMITS,
  MARK_METRIC_LABELS,
  updateMarkRequest,
  type CreateReplyRequest,
  type MarkView,
  type UpdateMarkRequest,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useCallback, useEffect, useId, useMemo, useRef, useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button, type ButtonSize } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Form, SubmitButton } from '@/components/ui/form';
import { CheckIcon, ClockIcon, PencilIcon, TargetIcon, TrashIcon } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/spinner';
import { TextArea } from '@/components/ui/text-area';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { firstName, formatNumber, todayIn } from '@/lib/format';
import { useDeleteMark } from '../api/delete-mark';
import type { MarkRange } from '../api/keys';
import { useMarks } from '../api/list-marks';
import type { LinkedKeys } from '../api/mark-cache';
import { useMarkRead } from '../api/mark-read';
import { useReplyToMark } from '../api/reply-to-mark';
import { useUpdateMark } from '../api/update-mark';
import {
  describeMark,
  formatMarkRange,
  formatMarkTime,
  isEdited,
  markRangeDays,
  readReceipt,
  sortNewestFirst,
  visibleReplies,
  type MarkPerspective,
} from '../utils/marks';
import { MarkMetricBadge, NewMarker } from './mark-badges';
import { useReadOnView } from './use-read-on-view';
import { viewerClock, zonePlace } from '@/lib/clock';

export interface MarkListProps {
  athleteId: string;
  /** Only marks overlapping these dates (both optional); every mark of the athlete when left out. */
  range?: MarkRange;
  /** "coach" for staff on the athlete page, "athlete" on the athlete's own Trends screen. */
  perspective: MarkPerspective;
  /** The signed-in user: their marks get Edit and Delete, their replies read "You". */
  viewerUserId: string;
  /**
   * Whether the viewer may reply (the athlete themself, or staff who can read the athlete); the
   * list's `abilities.reply` from the server when left out.
   */
  canReply?: boolean;
  /** The athlete's display name, for staff ("Seen by Maya"). */
  athleteName?: string;
  /** The viewer's time zone for times; the browser's when left out. */
  timeZone?: string;
  /** The mark the chart has in focus: drawn highlighted and scrolled into view. */
  selectedMarkId?: string | null;
  /** Adds "Show on chart" to each mark (pressed again: null, let go). */
  onSelectMark?: (markId: string | null) => void;
  /** The number of a mark's pin on the chart, shown beside it so list and chart can be matched. */
  pinNumberOf?: (markId: string) => number | undefined;
  /** Keys from other features to refresh after a write or a read (the trend, the review queue). */
  linkedKeys?: LinkedKeys;
  /** Said under "No marks yet". */
  emptyMessage?: ReactNode;
  /** Accessible name of the list. */
  label?: string;
  /** Level of each mark's heading inside the page outline. */
  headingLevel?: 2 | 3 | 4;
  className?: string;
}

/** The key a read is sent under: a thread that gained a reply since is read again. */
function readToken(mark: MarkView): string {
  const last = mark.replies.at(-1)?.createdAt ?? mark.updatedAt;
  return `${mark.id}@${last}`;
}

/**
 * An athlete's marks, newest first, each with its thread and a reply form. A mark that holds
 * something new for the viewer is marked read on the server once it is on screen; its "New" stays
 * until the list is left, so it is not gone before it has been noticed.
 */
export function MarkList({
  athleteId,
  range,
  perspective,
  viewerUserId,
  canReply,
  athleteName,
  timeZone,
  selectedMarkId = null,
  onSelectMark,
  pinNumberOf,
  linkedKeys,
  emptyMessage,
  label = 'Marks',
  headingLevel = 3,
  className,
}: MarkListProps) {
  const query = useMarks(athleteId, range);
  const [now] = useState(() => new Date());
  const zone = timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
  const referenceYear = Number(todayIn(zone, now).slice(0, 4));
  const marks = useMemo(() => sortNewestFirst(query.data?.data ?? []), [query.data]);

  const sent = useRef(new Set<string>());
  const [seenNow, setSeenNow] = useState<ReadonlySet<string>>(() => new Set());
  const { mutate: sendRead } = useMarkRead(athleteId, { linkedKeys });
  const markSeen = useCallback(
    (mark: MarkView) => {
      const token = readToken(mark);
      if (sent.current.has(token)) return;
      sent.current.add(token);
      setSeenNow((prev) => new Set(prev).add(mark.id));
      sendRead(mark.id, { onError: () => sent.current.delete(token) });
    },
    [sendRead],
  );

  if (query.isPending) {
    return (
      <p className={cn('flex items-center gap-2 py-6 text-sm text-ink-muted', className)} role="status">
        <Spinner size="sm" label={null} className="text-accent" />
        Loading marks…
      </p>
    );
  }
  if (query.isError) {
    return (
      <Alert
        tone="error"
        title="The marks could not be loaded."
        className={className}
        action={
          <Button variant="secondary" size="sm" onClick={() => void query.refetch()}>
            Try again
          </Button>
        }
      >
        {query.error.message}
      </Alert>
    );
  }
  if (marks.length === 0) {
    return (
      <EmptyState title="No marks yet" level={headingLevel === 4 ? 3 : headingLevel} className={className}>
        {emptyMessage ??
          (perspective === 'athlete'
            ? 'When your coach pins a note to one of your charts, it shows here and you can reply.'
            : 'Click a day or drag across a chart to pin a note for the athlete.')}
      </EmptyState>
    );
  }

  return (
    <ul aria-label={label} className={cn('space-y-3', className)}>
      {marks.map((mark) => (
        <MarkItem
          key={mark.id}
          mark={mark}
          athleteId={athleteId}
          perspective={perspective}
          viewerUserId={viewerUserId}
          canReply={canReply ?? query.data.abilities.reply === true}
          athleteName={athleteName}
          timeZone={zone}
          pinNumber={pinNumberOf?.(mark.id)}
          now={now}
          referenceYear={referenceYear}
          selected={mark.id === selectedMarkId}
          onSelectMark={onSelectMark}
          isNew={mark.unread || seenNow.has(mark.id)}
          onSeen={markSeen}
          linkedKeys={linkedKeys}
          headingLevel={headingLevel}
        />
      ))}
    </ul>
  );
}

interface MarkItemProps {
  mark: MarkView;
  athleteId: string;
  perspective: MarkPerspective;
  viewerUserId: string;
  canReply: boolean;
  athleteName?: string;
  timeZone: string;
  now: Date;
  referenceYear: number;
  selected: boolean;
  onSelectMark?: (markId: string | null) => void;
  pinNumber?: number;
  isNew: boolean;
  onSeen: (mark: MarkView) => void;
  linkedKeys?: LinkedKeys;
  headingLevel: 2 | 3 | 4;
}

function MarkItem({
  mark,
  athleteId,
  perspective,
  viewerUserId,
  canReply,
  athleteName,
  timeZone,
  now,
  referenceYear,
  selected,
  onSelectMark,
  pinNumber,
  isNew,
  onSeen,
  linkedKeys,
  headingLevel,
}: MarkItemProps) {
  const ref = useRef<HTMLElement>(null);
  const titleId = useId();
  const [mode, setMode] = useState<'view' | 'edit' | 'reply'>('view');
  const [expanded, setExpanded] = useState(false);
  // Athletes hold the phone in one hand: full-size targets. Staff lists are denser.
  const size: ButtonSize = perspective === 'athlete' ? 'md' : 'sm';
  const isAuthor = mark.author.id === viewerUserId;
  const Heading = `h${headingLevel}` as const;

  const seen = useCallback(() => onSeen(mark), [onSeen, mark]);
  useReadOnView(ref, mark.unread, seen);
  // Opening the thread is reading it, wherever it sits on screen.
  useEffect(() => {
    if (mode !== 'view' && mark.unread) seen();
  }, [mode, mark.unread, seen]);

  useEffect(() => {
    if (selected) ref.current?.scrollIntoView({ block: 'nearest' });
  }, [selected]);

  const days = markRangeDays(mark.fromDate, mark.toDate);
  const thread = visibleReplies(mark.replies, expanded);
  // Marks are read on the viewer's clock (or the one the page names), with its place.
  const when = (iso: string) =>
    `${formatMarkTime(iso, now, timeZone)} ${zonePlace(timeZone ?? viewerClock().timeZone)} time`;
  const nameOf = (person: MarkView['author']) => (person.id === viewerUserId ? 'You' : person.name);

  return (
    <li>
      <article
        ref={ref}
        aria-labelledby={titleId}
        aria-current={selected ? 'true' : undefined}
        data-mark-id={mark.id}
        className={cn(
          'scroll-mt-4 rounded-lg border bg-surface p-4 shadow-card',
          selected ? 'border-accent ring-2 ring-accent' : 'border-line',
        )}
      >
        <div className="flex flex-wrap items-center gap-x-2 gap-y-1.5">
          {pinNumber !== undefined ? <PinNumber value={pinNumber} /> : null}
          <span aria-hidden="true">
            <MarkMetricBadge metric={mark.metric} />
          </span>
          <Heading id={titleId} className="text-base font-semibold text-ink tabular-nums">
            <span className="sr-only">{MARK_METRIC_LABELS[mark.metric]} mark, </span>
            {formatMarkRange(mark.fromDate, mark.toDate, referenceYear)}
          </Heading>
          {days > 1 ? (
            <span className="text-sm text-ink-faint tabular-nums">{formatNumber(days)} days</span>
          ) : null}
          {selected ? (
            <span className="inline-flex items-center gap-1 text-xs font-semibold text-accent-strong">
              <TargetIcon aria-hidden="true" />
              On the chart
            </span>
          ) : null}
          {isNew ? <NewMarker className="ml-auto" /> : null}
        </div>

        {mode === 'edit' ? (
          <EditNoteForm
            athleteId={athleteId}
            mark={mark}
            linkedKeys={linkedKeys}
            size={size}
            onDone={() => setMode('view')}
          />
        ) : (
          <p className="mt-2 break-words whitespace-pre-wrap text-ink">{mark.note}</p>
        )}

        <p className="mt-2 text-sm text-ink-muted">
          <span className="font-semibold text-ink">{nameOf(mark.author)}</span>
          {perspective === 'athlete' && !isAuthor ? staffRoleNote(mark.author) : null}
          {' · '}
          <time dateTime={mark.createdAt} className="tabular-nums">
            {when(mark.createdAt)}
          </time>
          {isEdited(mark) ? ' · edited' : null}
        </p>

        <ReadReceiptLine mark={mark} perspective={perspective} athleteName={athleteName} when={when} />

        {mark.replies.length > 0 ? (
          <div className="mt-3">
            {thread.hidden > 0 ? (
              <Button variant="ghost" size="sm" className="-ml-3 mb-1" onClick={() => setExpanded(true)}>
                Show {formatNumber(thread.hidden)} earlier {thread.hidden === 1 ? 'reply' : 'replies'}
              </Button>
            ) : null}
            <ol aria-label="Replies" className="space-y-2.5 border-l-2 border-line pl-3">
              {thread.shown.map((reply) => (
                <li key={reply.id} className="text-sm">
                  <p className="text-ink-muted">
                    <span className="font-semibold text-ink">{nameOf(reply.author)}</span>
                    {perspective === 'athlete' && reply.author.id !== viewerUserId
                      ? staffRoleNote(reply.author)
                      : null}
                    {' · '}
                    <time dateTime={reply.createdAt} className="tabular-nums">
                      {when(reply.createdAt)}
                    </time>
                  </p>
                  <p className="mt-0.5 break-words whitespace-pre-wrap text-ink">{reply.body}</p>
                </li>
              ))}
            </ol>
          </div>
        ) : null}

        {mode === 'reply' ? (
          <ReplyForm
            athleteId={athleteId}
            mark={mark}
            linkedKeys={linkedKeys}
            size={size}
            label={`Reply to ${describeMark(mark, referenceYear)}`}
            onDone={() => setMode('view')}
          />
        ) : null}

        {mode === 'view' ? (
          <MarkActions
            mark={mark}
            size={size}
            canReply={canReply}
            isAuthor={isAuthor}
            selected={selected}
            onSelectMark={onSelectMark}
            athleteId={athleteId}
            linkedKeys={linkedKeys}
            onReply={() => setMode('reply')}
            onEdit={() => setMode('edit')}
          />
        ) : null}
      </article>
    </li>
  );
}

/** The chart pin's number, drawn like the pin: "Pin 3" for screen readers. */
function PinNumber({ value }: { value: number }) {
  return (
    <span className="inline-flex size-6 shrink-0 items-center justify-center rounded-pill border border-ink bg-mark text-xs font-bold text-ink tabular-nums">
      <span className="sr-only">Pin </span>
      {formatNumber(value)}
    </span>
  );
}

/** For the athlete, who wrote a reply from the team: " (coach)", " (assistant)". */
function staffRoleNote(person: MarkView['author']): string | null {
  if (person.role === 'athlete') return null;
  return person.role === 'assistant' ? ' (assistant)' : ' (coach)';
}

/** "Seen by Maya · Today 09:14" for staff, "Seen by your coach · …" for the athlete; words and a glyph. */
function ReadReceiptLine({
  mark,
  perspective,
  athleteName,
  when,
}: {
  mark: MarkView;
  perspective: MarkPerspective;
  athleteName?: string;
  when: (iso: string) => string;
}) {
  const receipt = readReceipt(mark, perspective);
  if (!receipt) return null;
  const who = perspective === 'athlete' ? 'your coach' : athleteName ? firstName(athleteName) : 'the athlete';
  return (
    <p className="mt-1 flex items-center gap-1.5 text-sm text-ink-muted">
      {receipt.seen ? (
        <>
          <CheckIcon className="shrink-0 text-on-plan" />
          <span>
            Seen by {who} ·{' '}
            <time dateTime={receipt.at} className="tabular-nums">
              {when(receipt.at)}
            </time>
          </span>
        </>
      ) : (
        <>
          <ClockIcon className="shrink-0 text-ink-faint" />
          <span>{perspective === 'athlete' ? 'Not seen by your coach yet' : `Not seen by ${who} yet`}</span>
        </>
      )}
    </p>
  );
}

function MarkActions({
  mark,
  size,
  canReply,
  isAuthor,
  selected,
  onSelectMark,
  athleteId,
  linkedKeys,
  onReply,
  onEdit,
}: {
  mark: MarkView;
  size: ButtonSize;
  canReply: boolean;
  isAuthor: boolean;
  selected: boolean;
  onSelectMark?: (markId: string | null) => void;
  athleteId: string;
  linkedKeys?: LinkedKeys;
  onReply: () => void;
  onEdit: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const remove = useDeleteMark(athleteId, {
    linkedKeys,
    // The chart lets go of a mark that is gone.
    onSuccess: () => {
      if (selected) onSelectMark?.(null);
    },
  });

  if (confirming) {
    return (
      <div className="mt-3 space-y-2">
        <div className="flex flex-wrap items-center gap-2 rounded-md bg-off-plan-soft px-3 py-2">
          <p className="flex-1 text-sm font-medium text-ink">
            Delete this mark{mark.replies.length > 0 ? ' and its replies' : ''}?
          </p>
          <Button
            variant="danger"
            size={size}
            loading={remove.isPending}
            onClick={() => {
              setError(null);
              remove.mutate(mark.id, {
                onError: (e) => {
                  setError(isApiError(e) ? e.message : 'The mark could not be deleted. Try again.');
                  setConfirming(false);
                },
              });
            }}
          >
            Delete
          </Button>
          <Button
            variant="ghost"
            size={size}
            disabled={remove.isPending}
            onClick={() => setConfirming(false)}
          >
            Keep
          </Button>
        </div>
      </div>
    );
  }

  return (
    <div className="mt-3">
      <div className="flex flex-wrap gap-2">
        {canReply ? (
          <Button
            variant="secondary"
            size={size}
            className={size === 'md' ? 'flex-1' : undefined}
            onClick={onReply}
          >
            Reply
          </Button>
        ) : null}
        {onSelectMark ? (
          <Button
            variant="ghost"
            size={size}
            aria-pressed={selected}
            onClick={() => onSelectMark(selected ? null : mark.id)}
          >
            Show on chart
          </Button>
        ) : null}
        {isAuthor ? (
          <>
            <Button variant="ghost" size={size} icon={<PencilIcon />} onClick={onEdit}>
              Edit note
            </Button>
            <Button
              variant="ghost"
              size={size}
              icon={<TrashIcon />}
              className="text-off-plan hover:bg-off-plan-soft hover:text-off-plan"
              onClick={() => setConfirming(true)}
            >
              Delete mark
            </Button>
          </>
        ) : null}
      </div>
      {error ? (
        <p role="alert" className="mt-2 text-sm font-medium text-off-plan">
          {error}
        </p>
      ) : null}
    </div>
  );
}

function ReplyForm({
  athleteId,
  mark,
  linkedKeys,
  size,
  label,
  onDone,
}: {
  athleteId: string;
  mark: MarkView;
  linkedKeys?: LinkedKeys;
  size: ButtonSize;
  label: string;
  onDone: () => void;
}) {
  const form = useForm<CreateReplyRequest>({
    resolver: zodResolver(createReplyRequest),
    defaultValues: { body: '' },
  });
  const reply = useReplyToMark(athleteId, { linkedKeys });
  const { setFocus } = form;
  useEffect(() => setFocus('body'), [setFocus]);

  return (
    <Form
      form={form}
      aria-label={label}
      onSubmit={async (body) => {
        await reply.mutateAsync({ markId: mark.id, body });
        form.reset({ body: '' });
        onDone();
      }}
      className="mt-3 space-y-3 border-t border-line pt-3"
    >
      <TextArea name="body" label="Your reply" rows={3} required maxLength={MARK_LIMITS.reply.max} />
      <div className="flex flex-wrap gap-2">
        <SubmitButton size={size} pendingLabel="Sending…" className={size === 'md' ? 'flex-1' : undefined}>
          Send reply
        </SubmitButton>
        <Button variant="ghost" size={size} onClick={onDone}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}

function EditNoteForm({
  athleteId,
  mark,
  linkedKeys,
  size,
  onDone,
}: {
  athleteId: string;
  mark: MarkView;
  linkedKeys?: LinkedKeys;
  size: ButtonSize;
  onDone: () => void;
}) {
  const form = useForm<UpdateMarkRequest>({
    resolver: zodResolver(updateMarkRequest),
    defaultValues: { note: mark.note },
  });
  const update = useUpdateMark(athleteId, { linkedKeys });
  const { setFocus } = form;
  useEffect(() => setFocus('note'), [setFocus]);

  return (
    <Form
      form={form}
      aria-label="Edit mark"
      onSubmit={async (body) => {
        await update.mutateAsync({ markId: mark.id, body });
        onDone();
      }}
      className="mt-3 space-y-3"
    >
      <TextArea name="note" label="Note" rows={4} required maxLength={MARK_LIMITS.note.max} />
      <div className="flex flex-wrap gap-2">
        <SubmitButton size={size} pendingLabel="Saving…">
          Save note
        </SubmitButton>
        <Button variant="ghost" size={size} onClick={onDone}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
