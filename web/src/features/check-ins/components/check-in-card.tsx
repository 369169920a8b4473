import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
import { cn } from '@/lib/cn';

interface CheckInCardProps {
  id: string;
  title: string;
  icon: ReactNode;
  /** A figure that must stay in sight (the day's fluid total, energy), beside the title. */
  summary?: ReactNode;
  /** A quiet line under the title. */
  subtitle?: ReactNode;
  children: ReactNode;
  className?: string;
}

/** One part of the day (weigh-in, fluids, meals…): a titled card with its own figures. */
export function CheckInCard({ id, title, icon, summary, subtitle, children, className }: CheckInCardProps) {
  const headingId = `${id}-heading`;
  return (
    <Card
      id={id}
      aria-labelledby={headingId}
      padding="compact"
      className={cn('scroll-mt-20 sm:p-5', className)}
    >
      <div className="mb-4 flex items-start justify-between gap-3">
        <div className="flex min-w-0 items-center gap-3">
          <span
            aria-hidden="true"
            className="flex size-10 shrink-0 items-center justify-center rounded-pill bg-accent-soft text-xl text-accent"
          >
            {icon}
          </span>
          <div className="min-w-0">
            <h2 id={headingId} className="text-lg font-semibold text-ink">
              {title}
            </h2>
            {subtitle ? <p className="text-sm text-ink-muted">{subtitle}</p> : null}
          </div>
        </div>
        {summary ? <div className="shrink-0 text-right">{summary}</div> : null}
      </div>
      {children}
    </Card>
  );
}

/** A big figure with a small caption, for card headers. */
export function HeaderFigure({
  value,
  caption,
  label,
}: {
  value: ReactNode;
  caption?: ReactNode;
  label?: string;
}) {
  return (
    <p aria-label={label} className="leading-tight">
      <span className="block text-xl font-bold text-ink tabular-nums">{value}</span>
      {caption ? <span className="block text-xs text-ink-muted">{caption}</span> : null}
    </p>
  );
}

/** "Not logged" inside a card that has nothing for the day. */
export function NotLogged({ children = 'Not logged' }: { children?: ReactNode }) {
  return (
    <p className="flex items-center gap-2 rounded-md border border-dashed border-line-strong/60 bg-paper px-3 py-3 text-sm text-ink-muted">
      <svg viewBox="0 0 8 8" className="size-2.5 shrink-0 text-not-logged" aria-hidden="true">
        <circle
          cx="4"
          cy="4"
          r="3"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.4"
          strokeDasharray="1.6 1.2"
        />
      </svg>
      {children}
    </p>
  );
}
