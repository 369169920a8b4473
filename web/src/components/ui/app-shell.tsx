import type { ReactNode } from 'react';
import { Link, NavLink, useLocation } from 'react-router';
import { APP_NAME } from '@/config/app';
import { cn } from '@/lib/cn';

/** The Driftmark mark: a drifting line that ends in a pinned dot, beside the word. */
export function BrandMark({ className, to = '/' }: { className?: string; to?: string }) {
  return (
    <Link
      to={to}
      className={cn(
        'inline-flex min-h-touch items-center gap-2 text-ink no-underline hover:text-ink',
        className,
      )}
    >
      <svg viewBox="0 0 32 32" className="size-7 shrink-0" aria-hidden="true">
        <rect width="32" height="32" rx="7" fill="var(--color-accent)" />
        <path
          d="M6 21.5c3.2 0 4.4-7 7.6-7s4.2 4.6 7 4.6c1.6 0 2.6-1 3.4-2.3"
          fill="none"
          stroke="var(--color-paper)"
          strokeWidth="2.6"
          strokeLinecap="round"
        />
        <circle cx="25" cy="11" r="2.6" fill="var(--color-mark)" />
      </svg>
      <span className="text-lg font-bold tracking-tight">{APP_NAME}</span>
    </Link>
  );
}

export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only z-50 rounded-md bg-accent px-4 py-2 font-semibold text-on-accent focus:not-sr-only focus:fixed focus:top-3 focus:left-3"
    >
      Skip to content
    </a>
  );
}

/* ---------- Coach: desktop, side bar ---------- */

interface SidebarShellProps {
  /** Shown under the brand: whose workspace this is. */
  teamName: ReactNode;
  nav: ReactNode;
  footer: ReactNode;
  children: ReactNode;
}

export function SidebarShell({ teamName, nav, footer, children }: SidebarShellProps) {
  return (
    <div className="min-h-dvh md:grid md:grid-cols-[var(--spacing-sidebar)_minmax(0,1fr)]">
      <SkipLink />
      <aside className="border-b border-line bg-sunken md:border-r md:border-b-0">
        <div className="flex flex-col md:sticky md:top-0 md:h-dvh">
          <div className="px-5 pt-5 pb-4">
            <BrandMark />
            <p className="mt-3 text-xs font-semibold tracking-wide text-ink-faint uppercase">Team</p>
            <p className="text-sm font-semibold text-ink">{teamName}</p>
          </div>
          <div className="flex-1 px-3">{nav}</div>
          <div className="border-t border-line px-3 py-4">{footer}</div>
        </div>
      </aside>
      <main id="main" tabIndex={-1} className="min-w-0 px-5 py-6 outline-none md:px-10 md:py-9">
        <div className="mx-auto max-w-6xl">{children}</div>
      </main>
    </div>
  );
}

export function SidebarNav({ label, children }: { label: string; children: ReactNode }) {
  return (
    <nav aria-label={label}>
      <ul className="flex gap-1 overflow-x-auto md:flex-col md:overflow-visible">{children}</ul>
    </nav>
  );
}

export function SidebarNavLink({
  to,
  icon,
  children,
  end,
}: {
  to: string;
  icon: ReactNode;
  children: ReactNode;
  end?: boolean;
}) {
  return (
    <li>
      <NavLink
        to={to}
        end={end}
        className={cn(
          'relative flex min-h-10 items-center gap-3 rounded-md px-3 text-sm font-semibold whitespace-nowrap text-ink-muted no-underline',
          'hover:bg-surface hover:text-ink',
          'aria-[current=page]:bg-surface aria-[current=page]:text-accent-strong aria-[current=page]:shadow-card',
          'before:absolute before:top-2 before:bottom-2 before:left-0 before:w-[3px] before:rounded-pill before:bg-transparent',
          'aria-[current=page]:before:bg-accent',
        )}
      >
        <span className="text-lg">{icon}</span>
        {children}
      </NavLink>
    </li>
  );
}

/* ---------- Athlete: phone first, bottom bar ---------- */

interface BottomBarShellProps {
  header: ReactNode;
  nav: ReactNode;
  children: ReactNode;
}

export function BottomBarShell({ header, nav, children }: BottomBarShellProps) {
  return (
    <div className="min-h-dvh pb-[calc(var(--spacing-bottom-bar)+env(safe-area-inset-bottom))]">
      <SkipLink />
      <header className="sticky top-0 z-10 border-b border-line bg-paper/95 backdrop-blur-sm">
        <div className="mx-auto flex max-w-xl items-center justify-between gap-3 px-4 py-1.5">{header}</div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto max-w-xl px-4 pt-5 pb-8 outline-none">
        {children}
      </main>
      {nav}
    </div>
  );
}

export function BottomBar({ label, children }: { label: string; children: ReactNode }) {
  return (
    <nav
      aria-label={label}
      className="fixed inset-x-0 bottom-0 z-20 border-t border-line bg-surface pb-[env(safe-area-inset-bottom)] shadow-bar"
    >
      <ul className="mx-auto grid max-w-xl auto-cols-fr grid-flow-col">{children}</ul>
    </nav>
  );
}

export function BottomBarLink({
  to,
  icon,
  children,
  end,
  alsoActiveOn,
}: {
  to: string;
  icon: ReactNode;
  children: ReactNode;
  end?: boolean;
  /** A path prefix that also belongs to this tab (a day opened from History). */
  alsoActiveOn?: string;
}) {
  const { pathname } = useLocation();
  const className = cn(
    'relative flex h-bottom-bar flex-col items-center justify-center gap-0.5 text-xs font-semibold text-ink-muted no-underline',
    'hover:text-ink aria-[current=page]:text-accent-strong',
    'before:absolute before:top-0 before:left-1/2 before:h-[3px] before:w-10 before:-translate-x-1/2 before:rounded-pill',
    'aria-[current=page]:before:bg-accent',
  );
  const content = (
    <>
      <span className="text-2xl">{icon}</span>
      {children}
    </>
  );
  return (
    <li>
      {alsoActiveOn && pathname.startsWith(alsoActiveOn) ? (
        <Link to={to} aria-current="page" className={className}>
          {content}
        </Link>
      ) : (
        <NavLink to={to} end={end} className={className}>
          {content}
        </NavLink>
      )}
    </li>
  );
}

/* ---------- Signed out: one centred column ---------- */

export function CenteredShell({ children, footer }: { children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <SkipLink />
      <header className="mx-auto w-full max-w-md px-5 pt-8 sm:pt-14">
        <BrandMark />
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-md flex-1 px-5 py-6 outline-none">
        {children}
      </main>
      {footer ? (
        <footer className="mx-auto w-full max-w-md px-5 pb-8 text-sm text-ink-faint">{footer}</footer>
      ) : null}
    </div>
  );
}

/* ---------- Signed out on a wide screen: the form beside a quiet picture of the work ---------- */

export function SplitShell({
  children,
  footer,
  aside,
}: {
  children: ReactNode;
  footer?: ReactNode;
  aside: ReactNode;
}) {
  return (
    <div className="min-h-dvh lg:grid lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="flex min-h-dvh flex-col">
        <SkipLink />
        <header className="mx-auto w-full max-w-md px-5 pt-8 sm:pt-14">
          <BrandMark />
        </header>
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-md flex-1 px-5 py-6 outline-none">
          {children}
        </main>
        {footer ? (
          <footer className="mx-auto w-full max-w-md px-5 pb-8 text-sm text-ink-faint">{footer}</footer>
        ) : null}
      </div>
      <div className="hidden border-l border-line bg-sunken lg:block">{aside}</div>
    </div>
  );
}
