import {
  countdownDayLabel,
  DEFAULT_TOLERANCES,
  EVENT_TYPE_LABELS,
  resolveTargets,
  WEEKDAY_LABELS,
  WEEKDAYS,
  type DayTargets,
  type PlanBaseline,
  type PlanVersionView,
  type ResolvedTargets,
} from '@driftmark/shared';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/spinner';
import { formatDate } from '@/lib/format';
import { usePlanVersion } from '../api/get-plan-version';
import * as fig from '../utils/figures';
import { scopeLabel } from '../utils/scope-label';
import { TargetsTable } from './targets-table';
import { formatInstant, viewerClock } from '@/lib/clock';

function resolve(t: DayTargets, b: PlanBaseline): ResolvedTargets | null {
  try {
    return resolveTargets(t, b);
  } catch {
    return null;
  }
}

/** One saved version, read-only: its targets as they resolve with its own baseline, and its acknowledgements. */
export function VersionDetail({ athleteId, versionId }: { athleteId: string; versionId: string }) {
  const version = usePlanVersion(athleteId, versionId);
  if (version.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the version" className="space-y-3">
        <Skeleton className="h-20" />
        <Skeleton className="h-48" />
      </div>
    );
  }
  if (version.isError) {
    return (
      <Alert
        tone="error"
        title={
          version.error.status === 404 ? 'No such version of this plan.' : 'The version could not be loaded.'
        }
        action={
          version.error.status === 404 ? undefined : (
            <Button variant="secondary" onClick={() => void version.refetch()}>
              Try again
            </Button>
          )
        }
      >
        {version.error.message}
      </Alert>
    );
  }
  return <VersionContent version={version.data} />;
}

export function VersionContent({ version: v }: { version: PlanVersionView }) {
  const { content, baseline } = v;
  const tolerancesChanged = (Object.keys(DEFAULT_TOLERANCES) as Array<keyof typeof DEFAULT_TOLERANCES>).some(
    (k) => (content.tolerances[k] ?? DEFAULT_TOLERANCES[k]) !== DEFAULT_TOLERANCES[k],
  );
  return (
    <div className="space-y-5">
      <Card>
        <div className="flex flex-wrap items-start justify-between gap-3">
          <div>
            <h3 className="text-xl font-bold text-ink">
              Version {v.number}{' '}
              <span className="font-normal text-ink-muted">
                · in force from <span className="tabular-nums">{formatDate(v.effectiveFrom)}</span>
              </span>
            </h3>
            <p className="text-sm text-ink-muted">
              Saved by {v.createdBy.name} on{' '}
              <span className="tabular-nums">{formatInstant(v.createdAt, viewerClock())}</span>
            </p>
            <p className="mt-2 text-ink">“{v.reason}”</p>
          </div>
          {v.countdown ? (
            <Badge tone="caution">
              Countdown {v.countdown.templateName} · {EVENT_TYPE_LABELS[v.countdown.eventType]}{' '}
              {formatDate(v.countdown.eventDate, 'short')}
            </Badge>
          ) : null}
        </div>
        {v.changes.length > 0 ? (
          <div className="mt-3">
            <h4 className="text-sm font-semibold text-ink">What changed</h4>
            <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm text-ink-muted">
              {v.changes.map((c, i) => (
                <li key={i}>{c}</li>
              ))}
            </ul>
          </div>
        ) : null}
        <dl className="mt-4 flex flex-wrap gap-x-6 gap-y-1 text-sm">
          <div className="flex gap-1.5">
            <dt className="text-ink-faint">Usual water</dt>
            <dd className="font-medium text-ink tabular-nums">
              {baseline.usualWaterMl !== null ? fig.ml(baseline.usualWaterMl) : 'not known'}
            </dd>
          </div>
          <div className="flex gap-1.5">
            <dt className="text-ink-faint">Usual energy</dt>
            <dd className="font-medium text-ink tabular-nums">
              {baseline.usualEnergyKcal !== null ? fig.kcal(baseline.usualEnergyKcal) : 'not known'}
            </dd>
          </div>
          <div className="flex gap-1.5">
            <dt className="text-ink-faint">{baseline.weightFromIntake ? 'Intake weight' : 'Trend weight'}</dt>
            <dd className="font-medium text-ink tabular-nums">
              {baseline.weightKg !== null ? `${baseline.weightKg.toFixed(1)} kg` : 'not known'}
            </dd>
          </div>
          {baseline.leanMassKg != null ? (
            <div className="flex gap-1.5">
              <dt className="text-ink-faint">Lean mass</dt>
              <dd className="font-medium text-ink tabular-nums">
                {fig.kg(baseline.leanMassKg)}
                {baseline.leanMassDate ? ` (${formatDate(baseline.leanMassDate, 'short')})` : ''}
              </dd>
            </div>
          ) : null}
        </dl>
        <p className="mt-1 text-xs text-ink-faint">
          The athlete&apos;s figures when this version was saved; its targets resolve against them.
        </p>
      </Card>

      <section aria-labelledby={`types-${v.id}`}>
        <h4 id={`types-${v.id}`} className="mb-2 text-base font-semibold text-ink">
          Day types and week pattern
        </h4>
        <TargetsTable
          caption={`Day types of version ${v.number}`}
          leadHeaders={['Day type', 'Weekdays']}
          rows={content.dayTypes.map((t) => ({
            id: t.key,
            lead: [
              t.name,
              WEEKDAYS.filter((d) => content.weekdays[d] === t.key)
                .map((d) => WEEKDAY_LABELS[d])
                .join(', ') || '—',
            ],
            targets: resolve(t.targets, baseline),
          }))}
        />
      </section>

      <section aria-labelledby={`dates-${v.id}`}>
        <h4 id={`dates-${v.id}`} className="mb-2 text-base font-semibold text-ink">
          Dated days
        </h4>
        {content.dates.length === 0 ? (
          <p className="text-sm text-ink-muted">None: every day follows the week pattern.</p>
        ) : (
          <TargetsTable
            caption={`Dated days of version ${v.number}`}
            leadHeaders={['Date', 'Day', 'Label']}
            rows={[...content.dates]
              .sort((a, b) => a.date.localeCompare(b.date))
              .map((d) => ({
                id: d.date,
                lead: [
                  formatDate(d.date),
                  d.countdownOffset !== null ? (
                    <Badge tone="caution">{countdownDayLabel(d.countdownOffset)}</Badge>
                  ) : (
                    '—'
                  ),
                  d.label ?? '—',
                ],
                targets: resolve(d.targets, baseline),
              }))}
          />
        )}
      </section>

      <section aria-labelledby={`tol-${v.id}`}>
        <h4 id={`tol-${v.id}`} className="mb-2 text-base font-semibold text-ink">
          Tolerances{' '}
          {tolerancesChanged ? null : <span className="font-normal text-ink-muted">(defaults)</span>}
        </h4>
        <p className="text-sm text-ink tabular-nums">
          Energy ±{content.tolerances.energyPct} % · Protein ±{content.tolerances.proteinG} g · Carbohydrate ±
          {content.tolerances.carbohydrateG} g · Fat ±{content.tolerances.fatG} g · Water ±
          {content.tolerances.waterPct} % · Sodium ±{content.tolerances.sodiumPct} % · Steps and cardio −
          {content.tolerances.activityPct ?? DEFAULT_TOLERANCES.activityPct} %
        </p>
      </section>

      <section aria-labelledby={`acks-${v.id}`}>
        <h4 id={`acks-${v.id}`} className="mb-2 text-base font-semibold text-ink">
          Acknowledged warnings ({v.acknowledgements.length})
        </h4>
        {v.acknowledgements.length === 0 ? (
          <p className="text-sm text-ink-muted">No guardrail warnings were raised for this version.</p>
        ) : (
          <ul className="space-y-2">
            {v.acknowledgements.map((a) => (
              <li
                key={a.key}
                className="rounded-md border border-caution/40 bg-caution-soft/60 px-3 py-2 text-sm"
              >
                <p className="font-medium text-ink">{a.message}</p>
                <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-xs text-ink-muted">
                  <Badge tone={a.severity === 'strong' ? 'off-plan' : 'caution'}>
                    {a.severity === 'strong' ? 'Strong warning' : 'Warning'}
                  </Badge>
                  <span>{scopeLabel(a, content)}</span>
                  <span>Source: {a.source}</span>
                  <span>
                    Acknowledged by {a.by.name},{' '}
                    <span className="tabular-nums">{formatInstant(a.at, viewerClock())}</span>
                  </span>
                </p>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
