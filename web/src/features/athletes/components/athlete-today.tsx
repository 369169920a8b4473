import { type AthleteProfile, EVENT_TYPE_LABELS, inFinalWeek, type WeightUnit } from '@driftmark/shared';
import { Badge } from '@/components/ui/badge';
import { ButtonLink } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ClockIcon, FlagIcon, PersonIcon } from '@/components/ui/icons';
import { daysBetween, formatDate, formatWeight } from '@/lib/format';

/** Days at or under which the final-week countdown applies. */

interface EventCountdownProps {
  profile: AthleteProfile;
  /** Today's date in the athlete's own time zone. */
  today: string;
  weightUnit: WeightUnit;
  /** Where the athlete can set an event when there is none. */
  editHref: string;
}

export function EventCountdownCard({ profile, today, weightUnit, editHref }: EventCountdownProps) {
  if (!profile.eventType || profile.eventType === 'none' || !profile.eventDate) {
    return (
      <EmptyState
        icon={<FlagIcon />}
        title="No event on the calendar"
        action={
          <ButtonLink to={editHref} variant="secondary">
            Add an event
          </ButtonLink>
        }
      >
        When you prepare for a show, a shoot or a weigh-in, add it here and the countdown starts.
      </EmptyState>
    );
  }

  const days = daysBetween(today, profile.eventDate);
  const finalWeek = inFinalWeek(days);
  const title = profile.eventName || EVENT_TYPE_LABELS[profile.eventType];
  // Three-digit countdowns (a long prep) step down a size so the figure fits its block.
  const figureSize = Math.abs(days) >= 100 ? 'text-3xl' : 'text-figure';

  return (
    <Card aria-labelledby="countdown-title" padding="none">
      <div className="flex items-stretch">
        <div className="flex w-28 shrink-0 flex-col items-center justify-center bg-accent px-3 py-5 text-on-accent">
          {days > 0 ? (
            <>
              <span className={`${figureSize} font-bold tracking-tight tabular-nums`}>{days}</span>
              <span className="mt-1 text-sm font-semibold">{days === 1 ? 'day to go' : 'days to go'}</span>
            </>
          ) : days === 0 ? (
            <span className="text-center text-xl font-bold">Today</span>
          ) : (
            <>
              <span className={`${figureSize} font-bold tracking-tight tabular-nums`}>{-days}</span>
              <span className="mt-1 text-sm font-semibold">{days === -1 ? 'day ago' : 'days ago'}</span>
            </>
          )}
        </div>
        <div className="min-w-0 flex-1 px-4 py-4">
          <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">
            {EVENT_TYPE_LABELS[profile.eventType]}
          </p>
          <h2 id="countdown-title" className="mt-0.5 text-xl font-bold text-ink">
            {title}
          </h2>
          <p className="mt-1 text-sm text-ink tabular-nums">
            {formatDate(profile.eventDate)}
            {profile.eventTime ? ` · ${profile.eventTime}` : null}
          </p>
          {profile.eventTimeZone && profile.eventTimeZone !== profile.timeZone ? (
            <p className="text-xs text-ink-faint">
              Local time in {profile.eventTimeZone.replaceAll('_', ' ')}
            </p>
          ) : null}
          <div className="mt-3 flex flex-wrap gap-2">
            {profile.division ? <Badge tone="neutral">{profile.division}</Badge> : null}
            {profile.weighInLimitKg !== null ? (
              <Badge tone="neutral">
                <span className="tabular-nums">Limit {formatWeight(profile.weighInLimitKg, weightUnit)}</span>
              </Badge>
            ) : null}
            {finalWeek ? <Badge tone="caution">Final week</Badge> : null}
          </div>
        </div>
      </div>
    </Card>
  );
}

const CHECK_IN_PARTS = [
  { when: 'Morning', what: 'Weight after waking, before food and drink' },
  { when: 'Through the day', what: 'Fluids with the clock time, meals and their macros, supplements' },
  { when: 'Evening', what: 'Steps, sleep, how you feel (1–5) and any symptoms' },
];

/** What a daily check-in will hold, ahead of the release that opens it. */
export function CheckInPreviewCard() {
  return (
    <Card aria-labelledby="check-in-title">
      <CardHeader id="check-in-title" title="Today's check-in" eyebrow="What you will log" />
      <ol className="space-y-3">
        {CHECK_IN_PARTS.map((part, i) => (
          <li key={part.when} className="flex gap-3">
            <span
              aria-hidden="true"
              className="flex size-7 shrink-0 items-center justify-center rounded-pill bg-accent-soft text-sm font-bold text-accent-strong tabular-nums"
            >
              {i + 1}
            </span>
            <p className="text-sm">
              <span className="font-semibold text-ink">{part.when}: </span>
              <span className="text-ink-muted">{part.what}</span>
            </p>
          </li>
        ))}
      </ol>
      <div className="mt-5 flex items-center gap-3 rounded-md border border-dashed border-line-strong/60 bg-paper px-4 py-3">
        <ClockIcon className="shrink-0 text-xl text-not-logged" />
        <p className="text-sm font-medium text-ink-muted">Check-in opens with the next release.</p>
      </div>
    </Card>
  );
}

export function CoachCard({ coachName, teamName }: { coachName: string; teamName: string }) {
  return (
    <Card padding="compact" aria-label="Your coach" className="flex items-center gap-3">
      <span className="flex size-11 shrink-0 items-center justify-center rounded-pill bg-sunken text-xl text-ink-muted">
        <PersonIcon />
      </span>
      <div className="min-w-0">
        <p className="text-xs text-ink-faint">Your coach</p>
        <p className="truncate font-semibold text-ink">{coachName}</p>
        <p className="truncate text-xs text-ink-muted">{teamName}</p>
      </div>
    </Card>
  );
}
