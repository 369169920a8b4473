import type { ElementType, HTMLAttributes, ReactNode } from 'react';
import { cn } from '@/lib/cn';

interface CardProps extends HTMLAttributes<HTMLElement> {
  as?: ElementType;
  /** "compact" for cards inside lists; "none" when the content runs to the edges. */
  padding?: 'normal' | 'compact' | 'none';
}

const paddings = { normal: 'p-5 sm:p-6', compact: 'p-4', none: 'overflow-hidden' } as const;

export function Card({ as: As = 'section', padding = 'normal', className, ...props }: CardProps) {
  return (
    <As
      className={cn('rounded-lg border border-line bg-surface shadow-card', paddings[padding], className)}
      {...props}
    />
  );
}

export function CardHeader({
  title,
  eyebrow,
  action,
  id,
  level = 2,
}: {
  title: ReactNode;
  eyebrow?: ReactNode;
  action?: ReactNode;
  id?: string;
  level?: 2 | 3;
}) {
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <div className="mb-4 flex items-start justify-between gap-3">
      <div>
        {eyebrow ? (
          <p className="mb-1 text-xs font-semibold tracking-wide text-ink-faint uppercase">{eyebrow}</p>
        ) : null}
        <Heading id={id} className="text-lg font-semibold text-ink">
          {title}
        </Heading>
      </div>
      {action}
    </div>
  );
}
