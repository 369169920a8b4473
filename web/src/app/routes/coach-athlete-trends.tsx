import { useCallback, useMemo, useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { ArrowLeftIcon, CameraIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { CoachAthleteTabs } from '../layouts/coach-athlete-tabs';
import { CountdownMismatchBanner } from '../layouts/countdown-mismatch-banner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { useToday } from '@/features/check-ins/components/use-clock';
import { useMarks } from '@/features/marks/api/list-marks';
import { MarkComposerDialog } from '@/features/marks/components/mark-composer';
import { MarkList } from '@/features/marks/components/mark-list';
import { usePlan } from '@/features/plans/api/get-plan';
import { reviewKeys } from '@/features/review/api/keys';
import { useTrend } from '@/features/trends/api/get-trend';
import { AdherenceTable } from '@/features/trends/components/adherence-table';
import { DayTable } from '@/features/trends/components/day-table';
import { EnergyChart } from '@/features/trends/components/energy-chart';
import { FluidsChart } from '@/features/trends/components/fluids-chart';
import { MacrosChart } from '@/features/trends/components/macros-chart';
import { DaysCsvLink } from '@/features/trends/components/days-csv-link';
import { RangePicker } from '@/features/trends/components/range-picker';
import { TrendFigures } from '@/features/trends/components/trend-figures';
import { WeightChart } from '@/features/trends/components/weight-chart';
import { numberMarks, type PinRequest } from '@/features/trends/utils/chart-data';
import { firstPlanDate, isTrendRange, rangeDates, type TrendRange } from '@/features/trends/utils/range';
import { formatDate } from '@/lib/format';
import { useCurrentUser } from '../session';
import { AthleteHeader } from './coach-athlete';

/** Mark writes also change what the review queue says (replies, reviews). */
const LINKED_KEYS = [reviewKeys.all] as const;

/** Brings a mark's pin on a chart into view (after "Show on chart" in the thread list). */
function scrollToPin(markId: string) {
  const pin = document.querySelector(`[data-pin-mark-id="${CSS.escape(markId)}"]`);
  pin?.closest('figure')?.scrollIntoView({ block: 'center', behavior: 'smooth' });
}

/**
 * A coach's trends of one athlete: range, rate against the band, projection and maintenance, the
 * weight, fluids, energy and macros charts with the marks, weekly adherence and the day table. A
 * click or drag on a chart opens the mark composer with the days filled in.
 */
export function CoachAthleteTrendsRoute() {
  const me = useCurrentUser();
  const { athleteId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const athlete = useAthlete(athleteId);
  const timeZone = athlete.data?.data.timeZone ?? me.timeZone;
  const today = useToday(timeZone);
  const asked = params.get('range');
  const range: TrendRange = isTrendRange(asked) ? asked : '6w';

  // The season starts at the first plan version; the plan is only asked for when it matters.
  const plan = usePlan(range === 'season' ? athleteId : '');
  const waitingForPlan = range === 'season' && plan.isPending;
  const { from, to } = rangeDates(range, today, firstPlanDate(plan.data?.data.versions));
  const trend = useTrend(athleteId, from, to, { enabled: !waitingForPlan && athlete.isSuccess });

  const marksQuery = useMarks(athleteId);
  const marks = useMemo(() => marksQuery.data?.data ?? [], [marksQuery.data]);
  const canAnnotate = marksQuery.data?.abilities.create === true;
  const numbers = useMemo(() => numberMarks(marks, from, to), [marks, from, to]);
  const [pin, setPin] = useState<PinRequest | null>(null);
  // E-mails about a mark link here with ?mark=<id>: open on that mark.
  const [selectedMarkId, setSelectedMarkId] = useState<string | null>(() => params.get('mark'));
  const onPin = canAnnotate ? setPin : undefined;
  const selectFromChart = useCallback(
    (id: string) => setSelectedMarkId((cur) => (cur === id ? null : id)),
    [],
  );
  const name = athlete.data?.data.name;

  const setRange = (next: TrendRange) =>
    setParams(
      (prev) => {
        const out = new URLSearchParams(prev);
        if (next === '6w') out.delete('range');
        else out.set('range', next);
        return out;
      },
      { replace: true },
    );

  return (
    <>
      <title>{name ? `${name} · Trends · Driftmark` : 'Trends · Driftmark'}</title>
      <Link
        to={paths.coachRoster}
        className="mb-3 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
      >
        <ArrowLeftIcon /> Roster
      </Link>
      {athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading the athlete" className="space-y-4">
          <Skeleton className="h-24 max-w-2xl" />
          <Skeleton className="h-11 max-w-md" />
          <Skeleton className="h-80" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title={
            athlete.error.status === 404
              ? 'No such athlete on your roster.'
              : 'The athlete could not be loaded.'
          }
          action={
            athlete.error.status === 404 ? undefined : (
              <Button variant="secondary" onClick={() => void athlete.refetch()}>
                Try again
              </Button>
            )
          }
        >
          {athlete.error.message}
        </Alert>
      ) : (
        <>
          <AthleteHeader profile={athlete.data.data} today={today} />
          <CoachAthleteTabs athleteId={athleteId} className="mb-5" />
          <CountdownMismatchBanner
            athlete={athlete.data.data}
            abilities={athlete.data.abilities}
            className="mb-5"
          />

          <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
            <div>
              <h2 className="text-xl font-bold text-ink">Trends</h2>
              <p className="text-sm text-ink-muted tabular-nums">
                {formatDate(from)} – {formatDate(to)}
                {canAnnotate ? ' · click a day or drag across days on a chart to pin a mark' : ''}
              </p>
            </div>
            <div className="flex flex-wrap items-center gap-2 print:hidden">
              <RangePicker value={range} onChange={setRange} />
              <DaysCsvLink athleteId={athleteId} from={from} to={to} />
              <ButtonLink to={paths.reportWeek(athleteId, today)} variant="secondary" size="sm">
                Weekly report
              </ButtonLink>
              <ButtonLink
                to={paths.coachAthletePhotos(athleteId)}
                variant="secondary"
                size="sm"
                icon={<CameraIcon />}
              >
                Compare photos
              </ButtonLink>
            </div>
          </div>

          {trend.isPending ? (
            <div aria-busy="true" aria-label="Loading the trends" className="space-y-4">
              <div className="grid gap-3 md:grid-cols-3">
                <Skeleton className="h-32" />
                <Skeleton className="h-32" />
                <Skeleton className="h-32" />
              </div>
              <Skeleton className="h-80" />
              <Skeleton className="h-64" />
            </div>
          ) : trend.isError ? (
            <Alert
              tone="error"
              title="The trends could not be loaded."
              action={
                <Button variant="secondary" onClick={() => void trend.refetch()}>
                  Try again
                </Button>
              }
            >
              {trend.error.message}
            </Alert>
          ) : (
            <div
              className="space-y-6 transition-opacity aria-busy:opacity-60"
              aria-busy={trend.isPlaceholderData || undefined}
            >
              <TrendFigures view={trend.data} units={me.units} />
              <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_22rem]">
                <WeightChart
                  view={trend.data}
                  units={me.units}
                  weighInLimitKg={athlete.data.data.weighInLimitKg}
                  marks={marks}
                  onPin={onPin}
                  onMarkClick={selectFromChart}
                  selectedMarkId={selectedMarkId}
                  height={320}
                />
                <section
                  aria-labelledby="marks-heading"
                  className="min-w-0 xl:max-h-[34rem] xl:overflow-y-auto xl:pr-1"
                >
                  <h3 id="marks-heading" className="mb-2 text-base font-semibold text-ink">
                    Marks and replies
                  </h3>
                  <MarkList
                    athleteId={athleteId}
                    perspective="coach"
                    viewerUserId={me.id}
                    athleteName={athlete.data.data.name}
                    timeZone={me.timeZone}
                    selectedMarkId={selectedMarkId}
                    onSelectMark={(id) => {
                      setSelectedMarkId(id);
                      if (id) scrollToPin(id);
                    }}
                    pinNumberOf={(id) => numbers.get(id)}
                    linkedKeys={LINKED_KEYS}
                    headingLevel={4}
                    label="Marks on this athlete"
                  />
                </section>
              </div>
              <div className="grid gap-4 lg:grid-cols-2">
                <FluidsChart
                  view={trend.data}
                  units={me.units}
                  marks={marks}
                  onPin={onPin}
                  onMarkClick={selectFromChart}
                  selectedMarkId={selectedMarkId}
                />
                <EnergyChart
                  view={trend.data}
                  units={me.units}
                  marks={marks}
                  onPin={onPin}
                  onMarkClick={selectFromChart}
                  selectedMarkId={selectedMarkId}
                />
              </div>
              <MacrosChart
                view={trend.data}
                units={me.units}
                marks={marks}
                onPin={onPin}
                onMarkClick={selectFromChart}
                selectedMarkId={selectedMarkId}
              />
              <section aria-labelledby="adherence-heading">
                <h3 id="adherence-heading" className="mb-1 text-base font-semibold text-ink">
                  Weekly adherence
                </h3>
                <p className="mb-2 text-sm text-ink-muted">
                  Share of logged days on plan, week by week; a day not logged never counts as on plan.
                </p>
                <AdherenceTable adherence={trend.data.adherence} />
              </section>
              <section aria-labelledby="days-heading">
                <h3 id="days-heading" className="mb-2 text-base font-semibold text-ink">
                  Day by day
                </h3>
                <DayTable
                  days={trend.data.days}
                  units={me.units}
                  dayHref={(d) => paths.coachAthlete(athleteId, d === today ? undefined : d)}
                />
              </section>
            </div>
          )}

          <MarkComposerDialog
            open={pin !== null}
            athleteId={athleteId}
            fromDate={pin?.fromDate ?? to}
            toDate={pin?.toDate}
            metric={pin?.metric}
            maxDate={today}
            linkedKeys={LINKED_KEYS}
            onSaved={(mark) => setSelectedMarkId(mark.id)}
            onClose={() => setPin(null)}
          />
        </>
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}
