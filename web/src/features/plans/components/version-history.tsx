import { EVENT_TYPE_LABELS, type PlanView } from '@driftmark/shared';
import { Link } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { EmptyState } from '@/components/ui/empty-state';
import { HistoryIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import { formatInstant, viewerClock } from '@/lib/clock';

interface VersionHistoryProps {
  plan: PlanView;
  /** Link to one version's read-only view. */
  versionHref: (versionId: string) => string;
  selectedId?: string;
}

/** Every version, newest first: when it starts, who saved it and why, and what changed. */
export function VersionHistory({ plan, versionHref, selectedId }: VersionHistoryProps) {
  if (plan.versions.length === 0) {
    return (
      <EmptyState icon={<HistoryIcon />} title="No versions yet" level={3}>
        The first saved plan or applied countdown becomes version 1.
      </EmptyState>
    );
  }
  return (
    <ol className="space-y-3" aria-label="Plan versions, newest first">
      {plan.versions.map((v) => {
        const inForce = plan.current?.id === v.id;
        const upcoming = v.effectiveFrom > plan.today;
        return (
          <li key={v.id}>
            <article
              aria-labelledby={`version-${v.id}`}
              className={cn(
                'rounded-lg border bg-surface p-4 shadow-card',
                selectedId === v.id ? 'border-accent ring-1 ring-accent' : 'border-line',
              )}
            >
              <div className="flex flex-wrap items-start justify-between gap-2">
                <div className="min-w-0">
                  <h3 id={`version-${v.id}`} className="text-base font-semibold text-ink">
                    <Link to={versionHref(v.id)} className="no-underline hover:underline">
                      Version {v.number}
                    </Link>
                    <span className="font-normal text-ink-muted">
                      {' '}
                      · from <span className="tabular-nums">{formatDate(v.effectiveFrom)}</span>
                    </span>
                  </h3>
                  <p className="text-sm text-ink-muted">
                    {v.createdBy.name} ·{' '}
                    <span className="tabular-nums">{formatInstant(v.createdAt, viewerClock())}</span>
                  </p>
                </div>
                <div className="flex flex-wrap gap-1.5">
                  {inForce ? <Badge tone="on-plan">In force today</Badge> : null}
                  {upcoming ? (
                    <Badge tone="accent">Starts {formatDate(v.effectiveFrom, 'short')}</Badge>
                  ) : null}
                  {v.countdown ? (
                    <Badge tone="caution">
                      Countdown: {v.countdown.templateName} · {EVENT_TYPE_LABELS[v.countdown.eventType]}{' '}
                      {formatDate(v.countdown.eventDate, 'short')}
                    </Badge>
                  ) : null}
                  {v.acknowledgementCount > 0 ? (
                    <Badge tone="neutral">
                      {v.acknowledgementCount} {v.acknowledgementCount === 1 ? 'warning' : 'warnings'}{' '}
                      acknowledged
                    </Badge>
                  ) : null}
                </div>
              </div>
              <p className="mt-2 text-sm text-ink">
                <span className="sr-only">Reason: </span>“{v.reason}”
              </p>
              {v.changes.length > 0 ? (
                <ul className="mt-2 list-disc space-y-0.5 pl-5 text-sm text-ink-muted">
                  {v.changes.map((c, i) => (
                    <li key={i}>{c}</li>
                  ))}
                </ul>
              ) : null}
              <Link
                to={versionHref(v.id)}
                className="mt-2 inline-flex min-h-9 items-center text-sm font-semibold"
              >
                View version {v.number}
              </Link>
            </article>
          </li>
        );
      })}
    </ol>
  );
}
