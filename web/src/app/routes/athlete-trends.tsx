import { useCallback, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { useToday } from '@/features/check-ins/components/use-clock';
import { useMarks } from '@/features/marks/api/list-marks';
import { MarkList } from '@/features/marks/components/mark-list';
import { usePlan } from '@/features/plans/api/get-plan';
import { useTrend } from '@/features/trends/api/get-trend';
import { DaysCsvLink } from '@/features/trends/components/days-csv-link';
import { RangePicker } from '@/features/trends/components/range-picker';
import { TrendInWords } from '@/features/trends/components/trend-in-words';
import { WeightChart } from '@/features/trends/components/weight-chart';
import { numberMarks } from '@/features/trends/utils/chart-data';
import { firstPlanDate, rangeDates, type TrendRange } from '@/features/trends/utils/range';
import { useCurrentUser } from '../session';

/**
 * Brings the thread of a mark tapped on the chart to the middle of the screen, clear of the sticky
 * header and the bottom bar (after the list has drawn it selected).
 */
function scrollToThread(markId: string) {
  window.setTimeout(() => {
    document
      .querySelector(`article[data-mark-id="${CSS.escape(markId)}"]`)
      ?.scrollIntoView({ block: 'center', behavior: 'smooth' });
  }, 0);
}

/** Brings the chart holding a mark's pin into view ("Show on chart" in the list). */
function scrollToPin(markId: string) {
  document
    .querySelector(`[data-pin-mark-id="${CSS.escape(markId)}"]`)
    ?.closest('figure')
    ?.scrollIntoView({ block: 'center', behavior: 'smooth' });
}

/**
 * The athlete's own trends, phone first: the weight chart with the coach's marks (a tap on a pin
 * opens its thread), the rate and adherence in plain words, and the marks with replies.
 */
export function AthleteTrendsRoute() {
  const me = useCurrentUser();
  const athleteId = me.athleteId ?? '';
  const athlete = useAthlete(athleteId);
  const timeZone = athlete.data?.data.timeZone ?? me.timeZone;
  const today = useToday(timeZone);
  const [range, setRange] = useState<TrendRange>('6w');
  const plan = usePlan(range === 'season' ? athleteId : '');
  const waitingForPlan = range === 'season' && plan.isPending;
  const { from, to } = rangeDates(range, today, firstPlanDate(plan.data?.data.versions));
  const trend = useTrend(athleteId, from, to, { enabled: !waitingForPlan && athlete.isSuccess });
  const marksQuery = useMarks(athleteId);
  const marks = useMemo(() => marksQuery.data?.data ?? [], [marksQuery.data]);
  const numbers = useMemo(() => numberMarks(marks, from, to), [marks, from, to]);
  // E-mails about a mark link here with ?mark=<id>: open on that mark.
  const [searchParams] = useSearchParams();
  const [selectedMarkId, setSelectedMarkId] = useState<string | null>(() => searchParams.get('mark'));
  const openMark = useCallback((id: string) => {
    setSelectedMarkId(id);
    scrollToThread(id);
  }, []);

  return (
    <>
      <title>Trends · Driftmark</title>
      <PageHeader
        title="Trends"
        description="Your weight trend against your plan, and notes from your coach."
        actions={
          <ButtonLink to={paths.athleteBody} variant="secondary" size="sm">
            Body composition
          </ButtonLink>
        }
        className="mb-4"
      />
      <RangePicker value={range} onChange={setRange} className="mb-4 flex w-full [&>button]:flex-1" />
      {athleteId ? (
        <DaysCsvLink
          athleteId={athleteId}
          from={from}
          to={to}
          size="md"
          className="mb-4 w-full print:hidden"
        />
      ) : null}

      {athlete.isError || trend.isError ? (
        <Alert
          tone="error"
          title="Your trends could not be loaded."
          action={
            <Button
              variant="secondary"
              onClick={() => void (athlete.isError ? athlete.refetch() : trend.refetch())}
            >
              Try again
            </Button>
          }
        >
          {(athlete.error ?? trend.error)?.message}
        </Alert>
      ) : trend.isPending || !athlete.data ? (
        <div aria-busy="true" aria-label="Loading your trends" className="space-y-4">
          <Skeleton className="h-72" />
          <Skeleton className="h-32" />
        </div>
      ) : (
        <div className="space-y-5">
          <WeightChart
            view={trend.data}
            units={me.units}
            weighInLimitKg={athlete.data.data.weighInLimitKg}
            marks={marks}
            onMarkClick={openMark}
            selectedMarkId={selectedMarkId}
            title="Your weight"
            level={2}
            height={250}
            compact
          />
          <Card padding="compact">
            <h2 className="mb-2 text-lg font-semibold text-ink">In plain words</h2>
            <TrendInWords view={trend.data} units={me.units} />
          </Card>
        </div>
      )}

      <section aria-labelledby="coach-marks-heading" className="mt-6">
        <h2 id="coach-marks-heading" className="mb-3 text-lg font-semibold text-ink">
          Notes from your coach
        </h2>
        <MarkList
          athleteId={athleteId}
          perspective="athlete"
          viewerUserId={me.id}
          timeZone={me.timeZone}
          selectedMarkId={selectedMarkId}
          onSelectMark={(id) => {
            setSelectedMarkId(id);
            if (id) scrollToPin(id);
          }}
          pinNumberOf={(id) => numbers.get(id)}
          label="Notes from your coach"
        />
      </section>
    </>
  );
}
