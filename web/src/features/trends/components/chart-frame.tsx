import type { ReactNode } from 'react';
import { useId } from 'react';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { PlusIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import type { ChartMark } from '../utils/chart-data';

interface ChartFrameProps {
  title: string;
  /** A short line under the title (units, what is drawn). */
  subtitle?: ReactNode;
  level?: 2 | 3;
  /** Shown when the chart takes pins: opens the composer for the newest day (keyboard path). */
  onPinButton?: () => void;
  legend?: ReactNode;
  marks?: ChartMark[];
  onMarkClick?: (markId: string) => void;
  selectedMarkId?: string | null;
  /** Below the legend (cut-off breaches in words). */
  footer?: ReactNode;
  children: ReactNode;
  className?: string;
}

export function markDates(fromDate: string, toDate: string): string {
  return fromDate === toDate
    ? formatDate(fromDate, 'short')
    : `${formatDate(fromDate, 'short')} – ${formatDate(toDate, 'short')}`;
}

function excerpt(text: string, max = 90): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  return flat.length > max ? `${flat.slice(0, max - 1)}…` : flat;
}

/**
 * A chart as a figure: its title names it (the accessible name), a hint says how to pin, the legend
 * and the chart's marks follow in words so nothing rests on the drawing alone.
 */
export function ChartFrame({
  title,
  subtitle,
  level = 3,
  onPinButton,
  legend,
  marks = [],
  onMarkClick,
  selectedMarkId = null,
  footer,
  children,
  className,
}: ChartFrameProps) {
  const titleId = useId();
  const hintId = useId();
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <figure
      aria-labelledby={titleId}
      aria-describedby={onPinButton ? hintId : undefined}
      className={cn(
        'min-w-0 rounded-lg border border-line bg-surface p-4 shadow-card print:break-inside-avoid print:border-line-strong print:shadow-none',
        className,
      )}
    >
      <div className="mb-2 flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <Heading id={titleId} className="text-base font-semibold text-ink">
            {title}
          </Heading>
          {subtitle ? <p className="text-xs text-ink-muted">{subtitle}</p> : null}
        </div>
        {onPinButton ? (
          <Button
            variant="ghost"
            size="sm"
            icon={<PlusIcon />}
            onClick={onPinButton}
            className="print:hidden"
          >
            Pin a mark
          </Button>
        ) : null}
      </div>
      {onPinButton ? (
        <p id={hintId} className="sr-only">
          Click a day or drag across days on the chart to pin a mark, or use the Pin a mark button.
        </p>
      ) : null}
      {children}
      {legend ? (
        <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-muted">
          {legend}
        </figcaption>
      ) : null}
      {footer}
      {marks.length > 0 ? (
        <ol
          aria-label={`Marks on the ${title.toLowerCase()} chart`}
          className="mt-3 space-y-1 border-t border-line pt-2"
        >
          {marks.map(({ mark, number }) => {
            const body = (
              <>
                <MarkNumber n={number} />
                <span className="shrink-0 font-semibold text-ink tabular-nums">
                  {markDates(mark.fromDate, mark.toDate)}
                </span>
                <span className="min-w-0 flex-1 truncate text-ink-muted">{excerpt(mark.note)}</span>
                {mark.unread ? <Badge tone="accent">New</Badge> : null}
              </>
            );
            return (
              <li key={mark.id}>
                {onMarkClick ? (
                  <button
                    type="button"
                    onClick={() => onMarkClick(mark.id)}
                    aria-pressed={mark.id === selectedMarkId}
                    className={cn(
                      'flex min-h-touch w-full items-center gap-2 rounded-md px-1 text-left text-sm hover:bg-sunken sm:min-h-9',
                      mark.id === selectedMarkId && 'bg-accent-soft',
                    )}
                  >
                    {body}
                  </button>
                ) : (
                  <div className="flex min-h-9 items-center gap-2 px-1 text-sm">{body}</div>
                )}
              </li>
            );
          })}
        </ol>
      ) : null}
    </figure>
  );
}

/** A mark's number in the list, matching its pin on the chart. */
export function MarkNumber({ n }: { n: number }) {
  return (
    <span className="flex size-6 shrink-0 items-center justify-center rounded-pill border border-ink bg-mark text-xs font-bold text-ink tabular-nums">
      <span className="sr-only">Mark </span>
      {n}
    </span>
  );
}

/** One legend entry: a small drawing and its words. */
export function LegendItem({ swatch, children }: { swatch: ReactNode; children: ReactNode }) {
  return (
    <span className="inline-flex items-center gap-1.5">
      <svg width="18" height="12" viewBox="0 0 18 12" aria-hidden="true" className="shrink-0">
        {swatch}
      </svg>
      {children}
    </span>
  );
}
