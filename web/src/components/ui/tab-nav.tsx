import type { ReactNode } from 'react';
import { NavLink } from 'react-router';
import { cn } from '@/lib/cn';

/** Links between the views of one thing (an athlete's days and photos), drawn as tabs. */
export function TabNav({
  label,
  children,
  className,
}: {
  label: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <nav aria-label={label} className={cn('border-b border-line', className)}>
      <ul className="-mb-px flex gap-1 overflow-x-auto">{children}</ul>
    </nav>
  );
}

export function TabNavLink({ to, end, children }: { to: string; end?: boolean; children: ReactNode }) {
  return (
    <li>
      <NavLink
        to={to}
        end={end}
        className={cn(
          'flex min-h-touch items-center border-b-2 border-transparent px-4 text-sm font-semibold whitespace-nowrap text-ink-muted no-underline',
          'hover:text-ink aria-[current=page]:border-accent aria-[current=page]:text-accent-strong',
        )}
      >
        {children}
      </NavLink>
    </li>
  );
}
