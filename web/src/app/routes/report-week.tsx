import {
  DRIFT_METRIC_LABELS,
  DRIFT_STATE_LABELS,
  weightFromKg,
  WEIGHT_UNIT_LABELS,
  type TrendDay,
} from '@driftmark/shared';
import { Link, useParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { useMarks } from '@/features/marks/api/list-marks';
import { useTrend } from '@/features/trends/api/get-trend';
import { DaysCsvLink } from '@/features/trends/components/days-csv-link';
import { useWeeklyWeek } from '@/features/weekly/api/get-weekly-week';
import { signed } from '@/features/trends/utils/figures';
import { formatInstant } from '@/lib/clock';
import { formatDate, formatEnergy, formatVolume, formatWeight, NBSP } from '@/lib/format';
import { useCurrentUser } from '../session';

const ISO = /^\d{4}-\d{2}-\d{2}$/;

/** A small SVG of the week's weigh-ins (dots) and trend (line); no chart library, prints crisply. */
function WeekSparkline({ days }: { days: readonly TrendDay[] }) {
  const values = days.flatMap((d) => [d.weightKg, d.trendKg]).filter((v): v is number => v !== null);
  if (values.length === 0) return <p className="text-sm text-ink-muted">No weigh-ins this week.</p>;
  const min = Math.min(...values) - 0.2;
  const max = Math.max(...values) + 0.2;
  const W = 420;
  const H = 110;
  const x = (i: number) => 16 + (i * (W - 32)) / Math.max(1, days.length - 1);
  const y = (kg: number) => H - 12 - ((kg - min) / (max - min)) * (H - 24);
  const trend = days
    .map((d, i) => (d.trendKg === null ? null : `${x(i).toFixed(1)},${y(d.trendKg).toFixed(1)}`))
    .filter(Boolean)
    .join(' ');
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className="h-28 w-full max-w-md"
      role="img"
      aria-label="Weight and trend this week"
    >
      <polyline points={trend} fill="none" stroke="currentColor" strokeWidth={2} className="text-accent" />
      {days.map((d, i) =>
        d.weightKg === null ? null : (
          <circle key={d.date} cx={x(i)} cy={y(d.weightKg)} r={3.5} className="fill-ink" />
        ),
      )}
    </svg>
  );
}

/**
 * A printable weekly report for one athlete: the week of the check-in due on the date, figures,
 * a compact day table with drift, the marks of the week with replies, the weekly check-in's answers
 * and the coach's reply. The week's range and figures (mean, change, the 14-day rate) are the
 * server's (GET …/weekly-check-ins/week/:dueDate), never worked out here. Print styles hide the
 * controls and keep sections off page breaks.
 */
export function ReportWeekRoute() {
  const me = useCurrentUser();
  const { athleteId = '', dueDate = '' } = useParams();
  const valid = ISO.test(dueDate);
  const athlete = useAthlete(athleteId);
  const week = useWeeklyWeek(athleteId, dueDate, { enabled: valid });
  const figures = week.data?.data.figures ?? null;
  const from = figures?.weekStart ?? '';
  const to = figures?.weekEnd ?? '';
  const trend = useTrend(athleteId, from, to, { enabled: figures !== null && athlete.isSuccess });
  const marks = useMarks(athleteId, { from, to }, { enabled: figures !== null });
  // The check-in stored for the week (id null: nothing was submitted).
  const checkIn = week.data?.data.id ? week.data.data : null;
  const rate = figures?.rate ?? null;
  const units = me.units;

  if (!valid) {
    return (
      <main className="mx-auto max-w-3xl p-6">
        <Alert tone="error" title="Not a week of this athlete.">
          The address needs a due date as YYYY-MM-DD.
        </Alert>
      </main>
    );
  }

  return (
    <main className="report mx-auto max-w-4xl bg-surface p-6 text-ink print:max-w-none print:p-0">
      <style>{`@media print { @page { size: A4; margin: 14mm; } .report section { break-inside: avoid; } body { background: #fff; } }`}</style>
      <title>
        {athlete.data
          ? `${athlete.data.data.name} · week to ${dueDate} · Driftmark`
          : 'Weekly report · Driftmark'}
      </title>
      <div className="mb-4 flex flex-wrap items-center gap-2 print:hidden">
        <Link to={paths.home} className="text-sm font-semibold">
          Driftmark
        </Link>
        <span className="flex-1" />
        <DaysCsvLink athleteId={athleteId} from={from} to={to} />
        <Button size="sm" onClick={() => window.print()}>
          Print
        </Button>
      </div>

      {/* Errors first: a week that cannot be loaded leaves the trend waiting for its range for good. */}
      {athlete.isError || week.isError || trend.isError ? (
        <Alert tone="error" title="The report could not be loaded.">
          {(athlete.error ?? week.error ?? trend.error)?.message}
        </Alert>
      ) : athlete.isPending || week.isPending || trend.isPending ? (
        <div aria-busy="true" aria-label="Loading the report" className="space-y-3">
          <Skeleton className="h-10 max-w-md" />
          <Skeleton className="h-40" />
        </div>
      ) : (
        <>
          <header className="mb-5 border-b border-line pb-3">
            <p className="text-sm font-semibold text-accent">Weekly report</p>
            <h1 className="text-2xl font-bold">{athlete.data.data.name}</h1>
            <p className="text-sm text-ink-muted tabular-nums">
              {formatDate(from)} – {formatDate(to)} · check-in due {formatDate(dueDate)} · coached by{' '}
              {athlete.data.data.coach.name}
            </p>
          </header>

          <section aria-labelledby="figures-heading" className="mb-5">
            <h2 id="figures-heading" className="mb-2 text-lg font-semibold">
              Figures
            </h2>
            <div className="grid gap-4 sm:grid-cols-[1fr_auto] print:grid-cols-[1fr_auto]">
              <WeekSparkline days={trend.data.days} />
              <dl className="grid grid-cols-[auto_auto] gap-x-4 gap-y-1 text-sm tabular-nums">
                <dt className="text-ink-faint">
                  14-day rate
                  {rate ? (
                    <span className="block text-xs">
                      {formatDate(rate.from, 'short')} – {formatDate(rate.to, 'short')}
                    </span>
                  ) : null}
                </dt>
                <dd>
                  {rate
                    ? `${signed(weightFromKg(rate.kgPerWeek, units.weight), 2)}${NBSP}${WEIGHT_UNIT_LABELS[units.weight]}/week (${signed(rate.percentPerWeek, 2)}${NBSP}%)`
                    : 'Too few weigh-ins'}
                </dd>
                <dt className="text-ink-faint">Week mean</dt>
                <dd>
                  {figures?.meanWeightKg != null
                    ? formatWeight(figures.meanWeightKg, units.weight)
                    : `Too few weigh-ins (${figures?.weighIns ?? 0} of 7)`}
                </dd>
                {figures?.changeKg != null ? (
                  <>
                    <dt className="text-ink-faint">Week-over-week change of the mean</dt>
                    <dd>{formatWeight(figures.changeKg, units.weight, 2)}</dd>
                  </>
                ) : null}
              </dl>
            </div>
          </section>

          <section aria-labelledby="days-heading" className="mb-5">
            <h2 id="days-heading" className="mb-2 text-lg font-semibold">
              Day by day
            </h2>
            <table className="w-full border-collapse text-sm tabular-nums">
              <thead>
                <tr className="border-b border-line text-left text-ink-faint">
                  <th className="py-1 pr-2 font-medium">Day</th>
                  <th className="py-1 pr-2 font-medium">Weight</th>
                  <th className="py-1 pr-2 font-medium">Trend</th>
                  <th className="py-1 pr-2 font-medium">Energy / target</th>
                  <th className="py-1 pr-2 font-medium">Fluids / target</th>
                  <th className="py-1 font-medium">Off or drifting</th>
                </tr>
              </thead>
              <tbody>
                {trend.data.days.map((d) => {
                  const off = d.drift.filter((e) => e.state === 'off_plan' || e.state === 'drifting');
                  return (
                    <tr key={d.date} className="border-b border-line align-top">
                      <td className="py-1 pr-2">{formatDate(d.date, 'short')}</td>
                      <td className="py-1 pr-2">
                        {d.weightKg === null ? '—' : formatWeight(d.weightKg, units.weight)}
                      </td>
                      <td className="py-1 pr-2">
                        {d.trendKg === null ? '—' : formatWeight(d.trendKg, units.weight)}
                      </td>
                      <td className="py-1 pr-2">
                        {d.actuals.energyKcal === null ? '—' : formatEnergy(d.actuals.energyKcal)}
                        {d.targets?.energyKcal != null ? ` / ${formatEnergy(d.targets.energyKcal)}` : ''}
                      </td>
                      <td className="py-1 pr-2">
                        {d.actuals.fluidMl === null ? '—' : formatVolume(d.actuals.fluidMl, units.volume)}
                        {d.targets?.waterMl != null
                          ? ` / ${formatVolume(d.targets.waterMl, units.volume)}`
                          : ''}
                      </td>
                      <td className="py-1">
                        {off.length === 0
                          ? d.drift.some((e) => e.state === 'in_progress')
                            ? DRIFT_STATE_LABELS.in_progress
                            : d.drift.length > 0 && d.drift.every((e) => e.state === 'not_logged')
                              ? DRIFT_STATE_LABELS.not_logged
                              : '—'
                          : off
                              .map(
                                (e) =>
                                  `${DRIFT_METRIC_LABELS[e.metric]} (${DRIFT_STATE_LABELS[e.state].toLowerCase()})`,
                              )
                              .join(', ')}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </section>

          <section aria-labelledby="marks-heading" className="mb-5">
            <h2 id="marks-heading" className="mb-2 text-lg font-semibold">
              Marks
            </h2>
            {marks.isPending ? (
              <Skeleton className="h-16" />
            ) : marks.isError ? (
              <p className="text-sm text-off-plan">The marks could not be loaded.</p>
            ) : marks.data.data.length === 0 ? (
              <p className="text-sm text-ink-muted">No marks this week.</p>
            ) : (
              <ul className="space-y-2 text-sm">
                {marks.data.data.map((m) => (
                  <li key={m.id}>
                    <p>
                      <span className="font-semibold tabular-nums">
                        {formatDate(m.fromDate, 'short')}
                        {m.toDate !== m.fromDate ? ` – ${formatDate(m.toDate, 'short')}` : ''}
                      </span>{' '}
                      · {m.author.name}: {m.note}
                    </p>
                    {m.replies.map((r) => (
                      <p key={r.id} className="ml-4 text-ink-muted">
                        ↳ {r.author.name}: {r.body}
                      </p>
                    ))}
                  </li>
                ))}
              </ul>
            )}
          </section>

          <section aria-labelledby="check-in-heading" className="mb-5">
            <h2 id="check-in-heading" className="mb-2 text-lg font-semibold">
              Weekly check-in
            </h2>
            {!checkIn ? (
              <p className="text-sm text-ink-muted">No check-in stored for this week.</p>
            ) : (
              <div className="space-y-2 text-sm">
                <dl className="space-y-1">
                  {checkIn.questions.map((q) => {
                    const answer = checkIn.answers.find((a) => a.questionId === q.id)?.value ?? null;
                    return (
                      <div key={q.id}>
                        <dt className="font-medium">{q.prompt}</dt>
                        <dd className="text-ink-muted">
                          {answer === null
                            ? '—'
                            : typeof answer === 'boolean'
                              ? answer
                                ? 'Yes'
                                : 'No'
                              : q.kind === 'scale'
                                ? `${answer} of 5`
                                : String(answer)}
                        </dd>
                      </div>
                    );
                  })}
                </dl>
                {checkIn.questionsForCoach ? (
                  <p>
                    <span className="font-medium">Questions for the coach:</span> {checkIn.questionsForCoach}
                  </p>
                ) : null}
                {checkIn.reply ? (
                  <div className="border-l-2 border-accent pl-3">
                    <p className="font-medium">
                      Reply from {checkIn.reply.by.name} ·{' '}
                      {formatInstant(checkIn.reply.at, { whose: 'viewer', timeZone: me.timeZone })}
                    </p>
                    <p className="whitespace-pre-wrap">{checkIn.reply.body}</p>
                  </div>
                ) : (
                  <p className="text-ink-muted">No reply yet.</p>
                )}
              </div>
            )}
          </section>
        </>
      )}
    </main>
  );
}
