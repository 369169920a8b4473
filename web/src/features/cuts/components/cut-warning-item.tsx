import type { CutWarningView } from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';

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
    <span className="block space-y-1">
      <Badge tone={warning.severity === 'warning' ? 'caution' : 'off-plan'}>
        {CUT_SEVERITY_LABELS[warning.severity]}
      </Badge>
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
