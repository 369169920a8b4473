import type { ReviewQueueItem, ReviewReasonKind } from '@driftmark/shared';
import type { ReactNode, SVGProps } from 'react';
import { CautionIcon, ClockIcon, CountdownIcon, PulseIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import { formatDate, formatInstantDate } from '@/lib/format';

/** A speech bubble with a return arrow: an athlete answered a mark. Drawn like the icons in ui/icons. */
function ReplyIcon(props: SVGProps<SVGSVGElement>) {
  return (
    <svg
      viewBox="0 0 24 24"
      width="1em"
      height="1em"
      fill="none"
      stroke="currentColor"
      strokeWidth={1.75}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      {...props}
    >
      <path d="M4.5 5.5h15a1 1 0 0 1 1 1v9a1 1 0 0 1-1 1H10l-4.5 3.5v-3.5h-1a1 1 0 0 1-1-1v-9a1 1 0 0 1 1-1z" />
      <path d="M10.5 9 8.5 11l2 2M8.5 11h5.5a2 2 0 0 1 2 2" />
    </svg>
  );
}

/**
 * Each kind of reason has a word and an icon of its own, so it never rests on colour alone. Safety
 * uses the caution tokens (the same as the athlete's safety cautions); missed check-ins the
 * not-logged ones and drift the drifting ones, as in the drift-state language.
 */
export const REASON_KIND_STYLE: Record<
  ReviewReasonKind,
  { label: string; icon: (props: { className?: string }) => ReactNode; tag: string }
> = {
  safety: { label: 'Safety', icon: CautionIcon, tag: 'bg-caution-soft text-caution ring-1 ring-caution/40' },
  missed: { label: 'Missed check-in', icon: ClockIcon, tag: 'bg-not-logged-soft text-not-logged' },
  drift: { label: 'Drift', icon: PulseIcon, tag: 'bg-drifting-soft text-drifting' },
  reply: { label: 'Reply', icon: ReplyIcon, tag: 'bg-accent-soft text-accent-strong' },
  countdown: { label: 'Countdown', icon: CountdownIcon, tag: 'bg-sunken text-ink-muted' },
  over_limit: { label: 'Over the limit', icon: CautionIcon, tag: 'bg-drifting-soft text-drifting' },
};

type Reason = ReviewQueueItem['reasons'][number];

/** The reason's day: a calendar date as sent, or the date of an instant should one arrive. */
function reasonDay(date: string): string {
  return /^\d{4}-\d{2}-\d{2}$/.test(date) ? formatDate(date, 'short') : formatInstantDate(date);
}

/** One reason an athlete is in the queue: kind (icon + word), the server's sentence and its day. */
export function ReviewReason({ reason }: { reason: Reason }) {
  const kind = REASON_KIND_STYLE[reason.kind];
  const Icon = kind.icon;
  return (
    <li className="flex flex-wrap items-start gap-x-2.5 gap-y-1 sm:flex-nowrap">
      <span
        className={cn(
          'inline-flex shrink-0 items-center gap-1.5 rounded-pill px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap',
          kind.tag,
        )}
      >
        <Icon className="text-sm" />
        {kind.label}
        <span className="sr-only">:</span>
      </span>
      <span
        className={cn(
          'min-w-0 pt-px text-sm sm:flex-1',
          reason.kind === 'safety' ? 'font-semibold text-ink' : 'text-ink',
        )}
      >
        {reason.text}
        {reason.date ? (
          <span className="font-normal whitespace-nowrap text-ink-faint tabular-nums">
            {' · '}
            <time dateTime={reason.date}>{reasonDay(reason.date)}</time>
          </span>
        ) : null}
      </span>
    </li>
  );
}
