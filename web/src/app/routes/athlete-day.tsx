import { Link, Navigate, useParams } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { EmptyState } from '@/components/ui/empty-state';
import { ArrowLeftIcon, ClockIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { DayCheckIn } from '@/features/check-ins/components/day-check-in';
import { DayNav } from '@/features/check-ins/components/day-nav';
import { useToday } from '@/features/check-ins/components/use-clock';
import { isIsoDate } from '@/features/check-ins/utils/dates';
import { formatDate } from '@/lib/format';
import { useCurrentUser } from '../session';
import { NotFoundRoute } from './not-found';

/** One of the athlete's own days, opened from History: the same cards as Today, for that date. */
export function AthleteDayRoute() {
  const { date = '' } = useParams();
  const me = useCurrentUser();
  const athleteId = me.athleteId ?? '';
  const athlete = useAthlete(athleteId);
  const timeZone = athlete.data?.data.timeZone ?? me.timeZone;
  const today = useToday(timeZone);

  if (!me.intakeComplete) return <Navigate to={paths.intake} replace />;
  if (!isIsoDate(date)) return <NotFoundRoute />;

  return (
    <>
      <title>{`${formatDate(date)} · Driftmark`}</title>
      <Link
        to={paths.athleteHistory}
        className="mb-2 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
      >
        <ArrowLeftIcon /> History
      </Link>
      <header className="mb-5 flex flex-wrap items-end justify-between gap-x-4 gap-y-3">
        <div>
          <p className="text-sm font-medium text-ink-muted">{date === today ? 'Today' : 'Your day'}</p>
          <h1 className="text-2xl font-bold text-ink tabular-nums">{formatDate(date)}</h1>
        </div>
        <DayNav date={date} today={today} hrefFor={paths.athleteDay} />
      </header>
      {date > today ? (
        <EmptyState icon={<ClockIcon />} title="This day has not come yet">
          Entries belong to the day they happen, in your own time zone. Today is {formatDate(today)}.
        </EmptyState>
      ) : (
        <div className="space-y-4">
          <DayCheckIn
            athleteId={athleteId}
            date={date}
            timeZone={timeZone}
            units={me.units}
            canEditFallback={athlete.data?.abilities.log ?? true}
            photosHref={paths.athletePhotos}
          />
          <SafetyNote />
        </div>
      )}
    </>
  );
}
