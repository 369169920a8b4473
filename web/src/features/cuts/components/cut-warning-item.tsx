import type { CutWarningView } from '@driftmark/shared';
import { cn } from '@/lib/cn';

/** How each of the server's severities reads: what the coach must do for it. */
export const CUT_SEVERITY_LABELS: Record<CutWarningView['severity'], string> = {
  warning: 'Warning',
  strong: 'Strong warning: needs acknowledgement',
  severe: 'Severe: needs a second acknowledgement',
};

/** One cut-plan warning as the server sent it: its severity, words, source and, if severe, the stop signs. */
export function CutWarningText({
  warning,
}: {
  warning: Pick<CutWarningView, 'severity' | 'message' | 'source' | 'stopSigns'>;
}) {
  return (
    <span className="block min-w-0 space-y-1 break-words">
      {/* A badge's look, but free to wrap on a phone: the labels are longer than a badge's word. */}
      <span
        className={cn(
          'inline-block rounded-md px-2.5 py-0.5 text-xs font-semibold',
          warning.severity === 'warning' ? 'bg-caution-soft text-caution' : 'bg-off-plan-soft text-off-plan',
        )}
      >
        {CUT_SEVERITY_LABELS[warning.severity]}
      </span>
      <span className="block text-sm text-ink">{warning.message}</span>
      {warning.source ? <span className="block text-xs text-ink-muted">Source: {warning.source}</span> : null}
      {warning.stopSigns ? (
        <span className="block rounded-md border border-off-plan/50 bg-off-plan-soft px-2 py-1 text-sm font-semibold text-off-plan">
          The athlete is shown: {warning.stopSigns}
        </span>
      ) : null}
    </span>
  );
}
