import { cn } from '@/lib/cn';

interface SpinnerProps {
  size?: 'sm' | 'md' | 'lg';
  /** Text for screen readers; null when a surrounding element already says what is loading. */
  label?: string | null;
  className?: string;
}

const sizes = { sm: 'size-4', md: 'size-6', lg: 'size-9' } as const;

export function Spinner({ size = 'md', label = 'Loading…', className }: SpinnerProps) {
  return (
    <span className={cn('inline-flex items-center', className)} role={label ? 'status' : undefined}>
      <svg className={cn(sizes[size], 'animate-spin')} viewBox="0 0 24 24" fill="none" aria-hidden="true">
        <circle cx="12" cy="12" r="9" stroke="currentColor" strokeOpacity="0.2" strokeWidth="3" />
        <path d="M21 12a9 9 0 0 0-9-9" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      {label ? <span className="sr-only">{label}</span> : null}
    </span>
  );
}

/** A quiet placeholder block while content loads. */
export function Skeleton({ className }: { className?: string }) {
  return <span aria-hidden="true" className={cn('block animate-pulse rounded-md bg-sunken', className)} />;
}

/** Full-area loading state with words, not just a wheel. */
export function PageLoader({ label = 'Loading…' }: { label?: string }) {
  return (
    <div
      className="flex min-h-[40vh] flex-col items-center justify-center gap-3 text-ink-muted"
      role="status"
    >
      <Spinner size="lg" label={null} className="text-accent" />
      <p className="text-sm">{label}</p>
    </div>
  );
}
