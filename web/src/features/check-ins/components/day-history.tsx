import type { DaySummary, VolumeUnit, WeightUnit } from '@driftmark/shared';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { CameraIcon, ChevronRightIcon, HistoryIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { formatDate, formatEnergy, formatNumber, NBSP } from '@/lib/format';
import { useHistory } from '../api/get-history';
import { withGaps, symptomMarker, type HistoryItem } from '../utils/history';
import { displayVolume, displayWeight } from '../utils/units';

interface DayHistoryProps {
  athleteId: string;
  /** The athlete's today: the newest day of the list. */
  today: string;
  units: { weight: WeightUnit; volume: VolumeUnit };
  /** Where a day opens. */
  dayHref: (date: string) => string;
  /** A phone list of days (athlete) or a table (coach). */
  variant?: 'list' | 'table';
  /** The day the coach is reading, highlighted in the table. */
  selectedDate?: string;
  /** Heading level of the empty state. */
  level?: 2 | 3;
}

/** Logged days, newest first, 60 days at a time. */
export function DayHistory({
  athleteId,
  today,
  units,
  dayHref,
  variant = 'list',
  selectedDate,
  level = 2,
}: DayHistoryProps) {
  const history = useHistory(athleteId, today);

  if (history.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the days" className="space-y-2">
        {[0, 1, 2, 3, 4, 5].map((i) => (
          <Skeleton key={i} className="h-16" />
        ))}
      </div>
    );
  }
  if (history.isError) {
    return (
      <Alert
        tone="error"
        title="The days could not be loaded."
        action={
          <Button variant="secondary" onClick={() => void history.refetch()}>
            Try again
          </Button>
        }
      >
        {history.error.message}
      </Alert>
    );
  }

  const pages = history.data.pages;
  const days = pages.flatMap((p) => p.days);
  const oldest = pages[pages.length - 1]!.from;
  const items = withGaps(days, today);

  const more = history.hasNextPage ? (
    <div className="mt-4 flex flex-col items-center gap-1">
      <Button
        variant="secondary"
        loading={history.isFetchingNextPage}
        onClick={() => void history.fetchNextPage()}
      >
        Show earlier days
      </Button>
      <p className="text-xs text-ink-faint tabular-nums">Showing days since {formatDate(oldest)}</p>
      {history.isFetchNextPageError ? (
        <p role="alert" className="text-sm font-medium text-off-plan">
          Earlier days could not be loaded. Try again.
        </p>
      ) : null}
    </div>
  ) : null;

  if (days.length === 0) {
    return (
      <>
        <EmptyState icon={<HistoryIcon />} title="Nothing logged yet" level={level}>
          No check-ins since {formatDate(oldest)}. Days appear here once something is logged.
        </EmptyState>
        {more}
      </>
    );
  }

  return (
    <>
      {variant === 'table' ? (
        <HistoryTable items={items} units={units} dayHref={dayHref} selectedDate={selectedDate} />
      ) : (
        <HistoryList items={items} units={units} dayHref={dayHref} />
      )}
      {more}
    </>
  );
}

function gapText(item: Extract<HistoryItem, { kind: 'gap' }>): string {
  const range =
    item.days === 1
      ? formatDate(item.from, 'short')
      : `${formatDate(item.from, 'short')} – ${formatDate(item.to, 'short')}`;
  return `${formatNumber(item.days)} ${item.days === 1 ? 'day' : 'days'} not logged (${range})`;
}

function Marker({ day }: { day: DaySummary }) {
  const marker = symptomMarker(day);
  if (marker === 'urgent') return <Badge tone="off-plan">Urgent symptom</Badge>;
  if (marker === 'symptom')
    return (
      <Badge tone="caution">{day.symptomCount === 1 ? 'Symptom' : `${day.symptomCount} symptoms`}</Badge>
    );
  return null;
}

function HistoryList({
  items,
  units,
  dayHref,
}: {
  items: HistoryItem[];
  units: DayHistoryProps['units'];
  dayHref: (date: string) => string;
}) {
  return (
    <ol aria-label="Logged days" className="space-y-2">
      {items.map((item) =>
        item.kind === 'gap' ? (
          <li key={`gap-${item.from}`} className="flex items-center gap-2 px-2 py-1 text-xs text-ink-faint">
            <span aria-hidden="true" className="h-px flex-1 border-t border-dashed border-line-strong/50" />
            <span className="tabular-nums">{gapText(item)}</span>
            <span aria-hidden="true" className="h-px flex-1 border-t border-dashed border-line-strong/50" />
          </li>
        ) : (
          <li key={item.day.date}>
            <Link
              to={dayHref(item.day.date)}
              className={cn(
                'flex items-center gap-3 rounded-lg border bg-surface px-4 py-3 text-ink no-underline shadow-card hover:border-accent hover:text-ink',
                item.day.urgent ? 'border-off-plan' : 'border-line',
              )}
            >
              <div className="min-w-0 flex-1">
                <div className="flex flex-wrap items-center justify-between gap-x-2 gap-y-1">
                  <span className="font-semibold tabular-nums">{formatDate(item.day.date)}</span>
                  <Marker day={item.day} />
                </div>
                <dl className="mt-1.5 grid grid-cols-3 gap-2 text-sm">
                  <Figure label="Weight">
                    {item.day.weightKg === null ? '—' : displayWeight(item.day.weightKg, null, units.weight)}
                  </Figure>
                  <Figure label="Fluids">
                    {item.day.fluidTotalMl > 0
                      ? displayVolume(item.day.fluidTotalMl, null, units.volume)
                      : '—'}
                  </Figure>
                  <Figure label="Energy">
                    {item.day.mealCount > 0 ? formatEnergy(item.day.energyKcal) : '—'}
                  </Figure>
                </dl>
              </div>
              <ChevronRightIcon className="shrink-0 text-xl text-ink-faint" />
            </Link>
          </li>
        ),
      )}
    </ol>
  );
}

function Figure({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col">
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="order-first truncate font-semibold tabular-nums">{children}</dd>
    </div>
  );
}

function HistoryTable({
  items,
  units,
  dayHref,
  selectedDate,
}: {
  items: HistoryItem[];
  units: DayHistoryProps['units'];
  dayHref: (date: string) => string;
  selectedDate?: string;
}) {
  const cell = 'px-3 py-2 text-right whitespace-nowrap tabular-nums';
  return (
    <div className="relative max-h-[34rem] overflow-auto rounded-lg border border-line bg-surface shadow-card">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">
          Recent days, newest first. Days without entries are shown as gaps.
        </caption>
        <thead>
          <tr className="sticky top-0 z-10 border-b border-line bg-sunken text-xs font-semibold tracking-wide text-ink-muted uppercase">
            <th scope="col" className="px-3 py-2.5">
              Date
            </th>
            <th scope="col" className="px-3 py-2.5 text-right">
              Weight
            </th>
            <th scope="col" className="px-3 py-2.5 text-right">
              Fluids
            </th>
            <th scope="col" className="px-3 py-2.5 text-right">
              Energy
            </th>
            <th scope="col" className="px-3 py-2.5 text-right">
              Protein
            </th>
            <th scope="col" className="px-3 py-2.5">
              Notes
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {items.map((item) =>
            item.kind === 'gap' ? (
              <tr key={`gap-${item.from}`} className="bg-paper/60">
                <td colSpan={6} className="px-3 py-1.5 text-xs text-ink-faint tabular-nums">
                  {gapText(item)}
                </td>
              </tr>
            ) : (
              <tr
                key={item.day.date}
                aria-current={selectedDate === item.day.date ? 'date' : undefined}
                className={cn(
                  selectedDate === item.day.date
                    ? 'bg-accent-soft shadow-[inset_3px_0_0_var(--color-accent)]'
                    : item.day.urgent
                      ? 'bg-off-plan-soft/70 hover:bg-off-plan-soft'
                      : 'hover:bg-paper/70',
                )}
              >
                <th scope="row" className="px-3 py-2 font-normal whitespace-nowrap">
                  <Link to={dayHref(item.day.date)} className="font-semibold tabular-nums">
                    {formatDate(item.day.date)}
                  </Link>
                </th>
                <td className={cell}>
                  {item.day.weightKg === null ? (
                    <Dash />
                  ) : (
                    displayWeight(item.day.weightKg, null, units.weight)
                  )}
                </td>
                <td className={cell}>
                  {item.day.fluidTotalMl > 0 ? (
                    displayVolume(item.day.fluidTotalMl, null, units.volume)
                  ) : (
                    <Dash />
                  )}
                </td>
                <td className={cell}>
                  {item.day.mealCount > 0 ? formatEnergy(item.day.energyKcal) : <Dash />}
                </td>
                <td className={cell}>
                  {item.day.mealCount > 0 ? `${formatNumber(item.day.proteinG)}${NBSP}g` : <Dash />}
                </td>
                <td className="px-3 py-2">
                  <span className="flex flex-wrap items-center gap-1.5">
                    <Marker day={item.day} />
                    {item.day.photoCount > 0 ? (
                      <span className="inline-flex items-center gap-1 text-xs text-ink-muted">
                        <CameraIcon aria-hidden="true" />
                        <span className="tabular-nums">{item.day.photoCount}</span>
                        <span className="sr-only">{item.day.photoCount === 1 ? 'photo' : 'photos'}</span>
                      </span>
                    ) : null}
                    {!item.day.hasEvening ? <span className="text-xs text-ink-faint">no evening</span> : null}
                  </span>
                </td>
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}

function Dash() {
  return (
    <span className="text-ink-faint">
      <span aria-hidden="true">—</span>
      <span className="sr-only">not logged</span>
    </span>
  );
}
