import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';
import { CautionIcon, CircleCheckIcon, ErrorIcon, InfoIcon } from './icons';

export type AlertTone = 'info' | 'success' | 'error' | 'caution';

const tones: Record<AlertTone, { box: string; icon: ReactNode }> = {
  info: { box: 'border-accent/30 bg-accent-soft text-ink', icon: <InfoIcon className="text-accent" /> },
  success: {
    box: 'border-on-plan/30 bg-on-plan-soft text-ink',
    icon: <CircleCheckIcon className="text-on-plan" />,
  },
  error: {
    box: 'border-off-plan/40 bg-off-plan-soft text-ink',
    icon: <ErrorIcon className="text-off-plan" />,
  },
  caution: {
    box: 'border-caution/40 bg-caution-soft text-ink',
    icon: <CautionIcon className="text-caution" />,
  },
};

interface AlertProps {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
  /** Errors interrupt (role=alert); other tones are announced politely. */
  live?: boolean;
}

export function Alert({ tone = 'info', title, children, action, className, live = true }: AlertProps) {
  const role = live ? (tone === 'error' ? 'alert' : 'status') : undefined;
  return (
    <div
      role={role}
      className={cn('flex gap-3 rounded-md border px-4 py-3 text-sm', tones[tone].box, className)}
    >
      <span className="mt-0.5 shrink-0 text-lg leading-none">{tones[tone].icon}</span>
      <div className="min-w-0 flex-1 space-y-1">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className="text-ink-muted [&_a]:font-semibold">{children}</div> : null}
        {action ? <div className="pt-1">{action}</div> : null}
      </div>
    </div>
  );
}
