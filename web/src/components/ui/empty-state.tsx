import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

interface EmptyStateProps {
  icon?: ReactNode;
  title: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
  /** Heading level inside the page outline. */
  level?: 2 | 3;
}

/** Says why a place is empty and what to do next. */
export function EmptyState({ icon, title, children, action, className, level = 2 }: EmptyStateProps) {
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <div
      className={cn(
        'flex flex-col items-center rounded-lg border border-dashed border-line-strong/60 bg-surface/60 px-6 py-10 text-center',
        className,
      )}
    >
      {icon ? (
        <span className="mb-3 flex size-12 items-center justify-center rounded-pill bg-accent-soft text-2xl text-accent">
          {icon}
        </span>
      ) : null}
      <Heading className="text-lg font-semibold text-ink">{title}</Heading>
      {children ? <div className="mt-2 max-w-prose text-sm text-ink-muted">{children}</div> : null}
      {action ? <div className="mt-5">{action}</div> : null}
    </div>
  );
}
