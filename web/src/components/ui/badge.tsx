import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export type BadgeTone =
  'neutral' | 'accent' | 'on-plan' | 'drifting' | 'off-plan' | 'not-logged' | 'in-progress' | 'caution';

const tones: Record<BadgeTone, string> = {
  neutral: 'bg-sunken text-ink-muted',
  accent: 'bg-accent-soft text-accent-strong',
  'on-plan': 'bg-on-plan-soft text-on-plan',
  drifting: 'bg-drifting-soft text-drifting',
  'off-plan': 'bg-off-plan-soft text-off-plan',
  'not-logged': 'bg-not-logged-soft text-not-logged',
  'in-progress': 'bg-surface text-accent-strong ring-1 ring-inset ring-accent/60',
  caution: 'bg-caution-soft text-caution',
};

/*
 * Each tone also has its own glyph, so the state never rests on colour alone:
 * a filled dot (on plan), a half dot (drifting), a square (off plan), a hollow ring (not logged),
 * a clock (the day in progress, "so far"), a triangle (caution).
 */
function Glyph({ tone }: { tone: BadgeTone }) {
  const common = { width: 8, height: 8, viewBox: '0 0 8 8', 'aria-hidden': true } as const;
  switch (tone) {
    case 'on-plan':
      return (
        <svg {...common}>
          <circle cx="4" cy="4" r="3.5" fill="currentColor" />
        </svg>
      );
    case 'drifting':
      return (
        <svg {...common}>
          <circle cx="4" cy="4" r="3" fill="none" stroke="currentColor" strokeWidth="1.2" />
          <path d="M4 1a3 3 0 0 1 0 6z" fill="currentColor" />
        </svg>
      );
    case 'off-plan':
      return (
        <svg {...common}>
          <rect x="0.5" y="0.5" width="7" height="7" rx="1" fill="currentColor" />
        </svg>
      );
    case 'not-logged':
      return (
        <svg {...common}>
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
      );
    case 'in-progress':
      return (
        <svg {...common}>
          <circle cx="4" cy="4" r="3.2" fill="none" stroke="currentColor" strokeWidth="1.2" />
          <path d="M4 2v2.2h1.8" fill="none" stroke="currentColor" strokeWidth="1.1" />
        </svg>
      );
    case 'caution':
      return (
        <svg {...common}>
          <path d="M4 0.5 7.5 7.5h-7z" fill="currentColor" />
        </svg>
      );
    default:
      return null;
  }
}

export function Badge({
  tone = 'neutral',
  children,
  className,
}: {
  tone?: BadgeTone;
  children: ReactNode;
  className?: string;
}) {
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-pill px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap',
        tones[tone],
        className,
      )}
    >
      <Glyph tone={tone} />
      {children}
    </span>
  );
}
