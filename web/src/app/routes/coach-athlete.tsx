import {
  type AthleteProfile,
  EVENT_TYPE_LABELS,
  inFinalWeek,
  VOLUME_UNIT_LABELS,
  WEIGHT_UNIT_LABELS,
} from '@driftmark/shared';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ArrowLeftIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { CoachAthleteTabs } from '../layouts/coach-athlete-tabs';
import { CountdownMismatchBanner } from '../layouts/countdown-mismatch-banner';
import { paths } from '@/config/paths';
import { CutCoachPanel } from '@/features/cuts/components/cut-coach-panel';
import { EndCoachingPanel } from '@/features/athletes/components/end-coaching-panel';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { DayCheckIn } from '@/features/check-ins/components/day-check-in';
import { DayHistory } from '@/features/check-ins/components/day-history';
import { DayNav } from '@/features/check-ins/components/day-nav';
import { useClock, useToday } from '@/features/check-ins/components/use-clock';
import { isIsoDate } from '@/features/check-ins/utils/dates';
import { daysBetween, formatDate, formatWeight } from '@/lib/format';
import { useCurrentUser } from '../session';

/** Days at or under which the final-week countdown applies. */

/** Who the athlete is and how far off their event: the head of every tab of the athlete page. */
export function AthleteHeader({ profile, today }: { profile: AthleteProfile; today: string }) {
  const me = useCurrentUser();
  const clock = useClock(profile.timeZone);
  const hasEvent = profile.eventType !== null && profile.eventType !== 'none' && profile.eventDate !== null;
  const days = hasEvent && profile.eventDate ? daysBetween(today, profile.eventDate) : null;
  const finalWeek = inFinalWeek(days);
  const { units } = profile;
  const facts: Array<{ label: string; value: string }> = [
    { label: 'Division', value: profile.division ?? '—' },
    { label: 'Time zone', value: `${profile.timeZone.replaceAll('_', ' ')} (now ${clock})` },
    {
      label: 'Figures shown in',
      value: `${WEIGHT_UNIT_LABELS[me.units.weight]}, ${VOLUME_UNIT_LABELS[me.units.volume]}`,
    },
  ];
  facts.splice(2, 0, {
    label: 'Logs in',
    value: `${WEIGHT_UNIT_LABELS[units.weight]}, ${VOLUME_UNIT_LABELS[units.volume]}`,
  });
  if (profile.weighInLimitKg !== null) {
    facts.splice(1, 0, {
      label: 'Weigh-in limit',
      value: formatWeight(profile.weighInLimitKg, me.units.weight),
    });
  }

  return (
    <header className="mb-5 grid gap-5 lg:grid-cols-[minmax(0,1fr)_auto] lg:items-end">
      <div className="min-w-0">
        <p className="mb-1 text-sm font-semibold text-accent">Athlete · coached by {profile.coach.name}</p>
        <h1 className="text-2xl font-bold text-ink">{profile.name}</h1>
        <p className="mt-1 text-ink-muted">
          {hasEvent && profile.eventType && profile.eventDate ? (
            <>
              <span className="font-semibold text-ink">
                {profile.eventName || EVENT_TYPE_LABELS[profile.eventType]}
              </span>
              {' · '}
              {EVENT_TYPE_LABELS[profile.eventType]} on{' '}
              <span className="tabular-nums">{formatDate(profile.eventDate)}</span>
            </>
          ) : (
            'No event on the calendar'
          )}
        </p>
        <dl className="mt-3 flex flex-wrap gap-x-6 gap-y-1 text-sm">
          {facts.map((f) => (
            <div key={f.label} className="flex gap-1.5">
              <dt className="text-ink-faint">{f.label}</dt>
              <dd className="font-medium text-ink tabular-nums">{f.value}</dd>
            </div>
          ))}
        </dl>
      </div>
      {days !== null ? (
        <div className="flex items-center gap-4 rounded-lg bg-accent px-5 py-3 text-on-accent">
          {days === 0 ? (
            <span className="text-xl font-bold">Event day</span>
          ) : (
            <p className="flex items-baseline gap-2">
              <span className="text-3xl font-bold tabular-nums">{Math.abs(days)}</span>
              <span className="text-sm font-semibold">
                {days > 0 ? (days === 1 ? 'day to go' : 'days to go') : days === -1 ? 'day ago' : 'days ago'}
              </span>
            </p>
          )}
          {finalWeek ? <Badge tone="caution">Final week</Badge> : null}
        </div>
      ) : null}
    </header>
  );
}

/** A coach's page of one athlete: who they are, any day read in full, and the recent days. */
export function CoachAthleteRoute() {
  const me = useCurrentUser();
  const { athleteId = '' } = useParams();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const athlete = useAthlete(athleteId);
  const timeZone = athlete.data?.data.timeZone ?? me.timeZone;
  const today = useToday(timeZone);
  const asked = params.get('date');
  const date = isIsoDate(asked) && asked <= today ? asked : today;
  const dayHref = (d: string) => paths.coachAthlete(athleteId, d === today ? undefined : d);
  const name = athlete.data?.data.name;

  return (
    <>
      <title>{name ? `${name} · Driftmark` : 'Athlete · Driftmark'}</title>
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
          <div className="grid gap-4 lg:grid-cols-2">
            <Skeleton className="h-48" />
            <Skeleton className="h-48" />
          </div>
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
          <CutCoachPanel
            athleteId={athleteId}
            today={today}
            unit={me.units.weight}
            volumeUnit={me.units.volume}
          />
          <section aria-labelledby="day-heading" className="mb-8">
            <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
              <h2 id="day-heading" className="text-xl font-bold text-ink tabular-nums">
                {date === today ? `Today, ${formatDate(date)}` : formatDate(date)}
              </h2>
              <DayNav
                date={date}
                today={today}
                hrefFor={dayHref}
                onPick={(d) => void navigate(dayHref(d), { replace: true })}
              />
            </div>
            <DayCheckIn
              athleteId={athleteId}
              date={date}
              timeZone={timeZone}
              units={me.units}
              canEditFallback={athlete.data.abilities.log === true}
              layout="grid"
              photosHref={paths.coachAthletePhotos(athleteId)}
            />
          </section>
          <section aria-labelledby="recent-heading">
            <h2 id="recent-heading" className="mb-3 text-xl font-bold text-ink">
              Recent days
            </h2>
            <DayHistory
              athleteId={athleteId}
              today={today}
              units={me.units}
              dayHref={dayHref}
              variant="table"
              selectedDate={date}
              level={3}
            />
          </section>
          <EndCoachingPanel
            profile={athlete.data.data}
            canEnd={athlete.data.abilities.endCoaching === true}
          />
        </>
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}
