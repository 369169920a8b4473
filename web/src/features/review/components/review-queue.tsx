import { EVENT_TYPE_LABELS, GOAL_LABELS, type ReviewQueueItem } from '@driftmark/shared';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { CheckIcon, CircleCheckIcon, RosterIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { formatDaysToEvent, formatNumber } from '@/lib/format';
import { useReviewQueue } from '../api/get-review-queue';
import { useMarkReviewed, type MarkReviewedResponse } from '../api/mark-reviewed';
import { formatTimeSince } from '../utils/time-since';
import { ReviewReason } from './review-reason';
import { formatInstant, viewerClock } from '@/lib/clock';

/** The current time, refreshed every minute so "12 min ago" keeps counting while the page is open. */
function useNow(intervalMs = 60_000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const id = window.setInterval(() => setNow(Date.now()), intervalMs);
    return () => window.clearInterval(id);
  }, [intervalMs]);
  return now;
}

const linkId = (athleteId: string) => `review-${athleteId}-link`;

interface ReviewQueueProps {
  /** Runs after the server has recorded a review (the app refreshes other screens' data here). */
  onReviewed?: (result: MarkReviewedResponse) => void | Promise<void>;
}

/**
 * The coach's review queue: athletes in the server's order (safety first, then missed check-ins,
 * drift and unread replies), each with every reason it gives, and a button that clears the row.
 */
export function ReviewQueue({ onReviewed }: ReviewQueueProps) {
  const queue = useReviewQueue();
  const markReviewed = useMarkReviewed({ onSuccess: onReviewed });
  const [failed, setFailed] = useState<{ name: string; message: string } | null>(null);
  // After a row leaves, focus moves to the next athlete's name (or the summary) instead of the page.
  const focusNext = useRef<{ removed: string; next: string | null } | null>(null);
  const summaryRef = useRef<HTMLParagraphElement>(null);
  const emptyRef = useRef<HTMLDivElement>(null);
  const now = useNow();
  const items = queue.data;

  useEffect(() => {
    const pending = focusNext.current;
    if (!pending || !items || items.some((i) => i.athleteId === pending.removed)) return;
    focusNext.current = null;
    const target = pending.next ? document.getElementById(linkId(pending.next)) : null;
    (target ?? summaryRef.current ?? emptyRef.current)?.focus();
  }, [items]);

  if (queue.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the review queue" className="space-y-3">
        <Skeleton className="h-6 max-w-sm" />
        {[0, 1, 2, 3].map((i) => (
          <Skeleton key={i} className="h-28" />
        ))}
      </div>
    );
  }
  if (queue.isError) {
    return (
      <Alert
        tone="error"
        title="The review queue could not be loaded."
        action={
          <Button variant="secondary" size="sm" onClick={() => void queue.refetch()}>
            Try again
          </Button>
        }
      >
        {queue.error.message}
      </Alert>
    );
  }

  const list = queue.data;
  const safety = list.filter((i) => i.priority === 1).length;

  function onMark(item: ReviewQueueItem, index: number) {
    setFailed(null);
    const next = list[index + 1] ?? list[index - 1] ?? null;
    focusNext.current = { removed: item.athleteId, next: next?.athleteId ?? null };
    markReviewed.mutate(item.athleteId, {
      onError: (error) => setFailed({ name: item.name, message: error.message }),
    });
  }

  return (
    <div className="space-y-4">
      {failed ? (
        <Alert tone="error" title={`${failed.name} could not be marked reviewed.`}>
          {failed.message} The row is back in the queue; try again.
        </Alert>
      ) : null}
      {list.length === 0 ? (
        <div ref={emptyRef} tabIndex={-1} className="outline-none">
          <EmptyState
            icon={<CircleCheckIcon />}
            title="Nobody needs attention right now"
            action={
              <ButtonLink
                to={paths.coachRoster}
                variant="secondary"
                icon={<RosterIcon className="text-lg" />}
              >
                Open the roster
              </ButtonLink>
            }
          >
            Athletes appear here when a safety flag is raised, check-ins are missed, a day drifts from plan or
            an athlete replies to a mark.
          </EmptyState>
        </div>
      ) : (
        <>
          <p
            ref={summaryRef}
            tabIndex={-1}
            aria-live="polite"
            className="text-sm text-ink-muted outline-none focus-visible:outline-2"
          >
            <span className="font-semibold text-ink tabular-nums">{formatNumber(list.length)}</span>{' '}
            {list.length === 1 ? 'athlete needs' : 'athletes need'} attention
            {safety > 0 ? (
              <>
                {' · '}
                <span className="font-semibold text-caution tabular-nums">
                  {formatNumber(safety)} with a safety flag
                </span>
              </>
            ) : null}
            . Most urgent first.
          </p>
          <ol aria-label="Athletes to review" className="space-y-3">
            {list.map((item, index) => (
              <ReviewQueueRow key={item.athleteId} item={item} now={now} onMark={() => onMark(item, index)} />
            ))}
          </ol>
        </>
      )}
    </div>
  );
}

function eventLine(item: ReviewQueueItem): string {
  const parts: string[] = [];
  if (item.eventType && item.eventType !== 'none') {
    parts.push(EVENT_TYPE_LABELS[item.eventType]);
    if (item.daysToEvent !== null) parts.push(formatDaysToEvent(item.daysToEvent));
  } else {
    parts.push('No event');
  }
  if (item.goal) parts.push(GOAL_LABELS[item.goal]);
  return parts.join(' · ');
}

function ReviewQueueRow({ item, now, onMark }: { item: ReviewQueueItem; now: number; onMark: () => void }) {
  const headingId = `review-${item.athleteId}-name`;
  const safety = item.priority === 1;
  return (
    <li
      aria-labelledby={headingId}
      className={cn(
        'grid gap-4 rounded-lg border bg-surface p-4 shadow-card sm:p-5',
        'lg:grid-cols-[minmax(0,15rem)_minmax(0,1fr)_auto] lg:items-start',
        safety ? 'border-caution/50 border-l-4 border-l-caution' : 'border-line',
      )}
    >
      <div className="min-w-0">
        <h2 id={headingId} className="text-lg font-semibold">
          <Link id={linkId(item.athleteId)} to={paths.coachAthlete(item.athleteId)}>
            {item.name}
          </Link>
        </h2>
        <p className="mt-0.5 text-sm text-ink-muted tabular-nums">{eventLine(item)}</p>
        {item.countdownLabel ? (
          <Badge tone="caution" className="mt-2">
            Countdown day {item.countdownLabel}
          </Badge>
        ) : null}
      </div>

      <ul aria-label={`Why ${item.name} is here`} className="space-y-2">
        {item.reasons.map((reason, i) => (
          <ReviewReason key={`${reason.kind}-${i}`} reason={reason} />
        ))}
      </ul>

      <div className="flex flex-wrap items-center justify-between gap-3 border-t border-line pt-3 lg:flex-col lg:items-end lg:border-t-0 lg:pt-0">
        <div className="text-sm lg:text-right">
          <p>
            <span className="text-ink-faint">Oldest item </span>
            <time
              dateTime={item.since}
              title={formatInstant(item.since, viewerClock())}
              className="font-semibold text-ink tabular-nums"
            >
              {formatTimeSince(item.since, now)}
            </time>
          </p>
          <p className="text-xs text-ink-faint">
            {item.lastReviewedAt ? (
              <>
                Last reviewed{' '}
                <time
                  dateTime={item.lastReviewedAt}
                  title={formatInstant(item.lastReviewedAt, viewerClock())}
                >
                  {formatTimeSince(item.lastReviewedAt, now)}
                </time>
              </>
            ) : (
              'Not reviewed before'
            )}
          </p>
        </div>
        <Button variant="secondary" size="sm" icon={<CheckIcon className="text-base" />} onClick={onMark}>
          Mark reviewed<span className="sr-only">: {item.name}</span>
        </Button>
      </div>
    </li>
  );
}
