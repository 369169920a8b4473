import { EVENT_TYPE_LABELS, GOAL_LABELS, type RosterRow } from '@driftmark/shared';
import { Link } from 'react-router';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import { formatDate, formatNumber } from '@/lib/format';

const STATUS: Record<RosterRow['status'], { label: string; tone: BadgeTone }> = {
  intake_pending: { label: 'Intake pending', tone: 'not-logged' },
  active: { label: 'Active', tone: 'accent' },
  ended: { label: 'Ended', tone: 'neutral' },
};

/** Days at or under which the final-week countdown applies. */
export const FINAL_WEEK_DAYS = 7;

function DaysToEvent({ days }: { days: number | null }) {
  if (days === null) return <span className="text-ink-faint">—</span>;
  const label = days === 0 ? 'Event day' : days < 0 ? `${formatNumber(-days)} ago` : formatNumber(days);
  const finalWeek = days >= 0 && days <= FINAL_WEEK_DAYS;
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <span className={finalWeek ? 'text-base font-bold text-ink' : 'text-base text-ink'}>{label}</span>
      {finalWeek ? <Badge tone="caution">Final week</Badge> : null}
    </span>
  );
}

export function RosterTable({ rows, showCoach }: { rows: RosterRow[]; showCoach: boolean }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface shadow-card">
      <table className="w-full min-w-[720px] border-collapse text-left text-sm">
        <caption className="sr-only">
          Athletes you coach, nearest event first. Days to event count from today in each athlete&apos;s time
          zone.
        </caption>
        <thead>
          <tr className="border-b border-line bg-sunken/60 text-xs font-semibold tracking-wide text-ink-muted uppercase">
            <th scope="col" className="px-3 py-3">
              Athlete
            </th>
            <th scope="col" className="px-3 py-3">
              Goal
            </th>
            <th scope="col" className="px-3 py-3">
              Event
            </th>
            <th scope="col" className="px-3 py-3 text-right">
              Days to event
            </th>
            <th scope="col" className="px-3 py-3">
              Division
            </th>
            {showCoach ? (
              <th scope="col" className="px-3 py-3">
                Coach
              </th>
            ) : null}
            <th scope="col" className="px-3 py-3">
              Status
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((row) => {
            const status = STATUS[row.status];
            const hasEvent = row.eventType !== null && row.eventType !== 'none';
            return (
              <tr key={row.athleteId} className="align-top hover:bg-paper/70">
                <th scope="row" className="px-3 py-3 font-normal">
                  <Link to={paths.coachAthlete(row.athleteId)} className="block font-semibold">
                    {row.name}
                  </Link>
                  <span className="block text-xs text-ink-faint">{row.email}</span>
                </th>
                <td className="px-3 py-3 whitespace-nowrap text-ink">
                  {row.goal ? GOAL_LABELS[row.goal] : <Missing />}
                </td>
                <td className="px-3 py-3">
                  {hasEvent && row.eventType ? (
                    <>
                      <span className="block font-medium text-ink">
                        {row.eventName || EVENT_TYPE_LABELS[row.eventType]}
                      </span>
                      <span className="block text-xs whitespace-nowrap text-ink-faint tabular-nums">
                        {EVENT_TYPE_LABELS[row.eventType]}
                        {row.eventDate ? ` · ${formatDate(row.eventDate)}` : null}
                      </span>
                    </>
                  ) : row.eventType === 'none' ? (
                    <span className="text-ink-muted">No event</span>
                  ) : (
                    <Missing />
                  )}
                </td>
                <td className="px-3 py-3 text-right whitespace-nowrap tabular-nums">
                  <DaysToEvent days={hasEvent ? row.daysToEvent : null} />
                </td>
                <td className="px-3 py-3 text-ink">{row.division ?? <Missing />}</td>
                {showCoach ? (
                  <td className="px-3 py-3 whitespace-nowrap text-ink-muted">{row.coach.name}</td>
                ) : null}
                <td className="px-3 py-3">
                  <Badge tone={status.tone}>{status.label}</Badge>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function Missing() {
  return (
    <span className="text-ink-faint">
      <span aria-hidden="true">—</span>
      <span className="sr-only">not given</span>
    </span>
  );
}

/** Counts a coach reads at a glance above the table. */
export function RosterSummary({ rows }: { rows: RosterRow[] }) {
  const finalWeek = rows.filter(
    (r) =>
      r.eventType !== 'none' &&
      r.daysToEvent !== null &&
      r.daysToEvent >= 0 &&
      r.daysToEvent <= FINAL_WEEK_DAYS,
  ).length;
  const pending = rows.filter((r) => r.status === 'intake_pending').length;
  const items = [
    { label: rows.length === 1 ? 'athlete' : 'athletes', value: rows.length },
    { label: 'in the final week', value: finalWeek },
    { label: 'intake pending', value: pending },
  ];
  return (
    <dl className="mb-5 grid grid-cols-3 gap-3 sm:max-w-xl">
      {items.map((item) => (
        <div key={item.label} className="flex flex-col rounded-md border border-line bg-surface px-3 py-3">
          <dt className="text-xs text-ink-muted">{item.label}</dt>
          <dd className="order-first text-2xl font-bold text-ink tabular-nums">{formatNumber(item.value)}</dd>
        </div>
      ))}
    </dl>
  );
}
