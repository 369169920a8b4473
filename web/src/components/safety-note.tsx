import { SAFETY_NOTE } from '@driftmark/shared';
import { cn } from '@/lib/cn';
import { ShieldIcon } from './ui/icons';

/** The standing note: estimates only, not medical advice. Shown on athlete and coach screens. */
export function SafetyNote({ className }: { className?: string }) {
  return (
    <aside
      aria-label="Safety note"
      className={cn(
        'flex gap-3 rounded-md border border-caution/35 bg-caution-soft/70 px-4 py-3 text-sm',
        className,
      )}
    >
      <ShieldIcon className="mt-0.5 shrink-0 text-lg text-caution" />
      <p className="text-ink-muted">{SAFETY_NOTE}</p>
    </aside>
  );
}
