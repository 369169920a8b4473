import type { DayView, VolumeUnit, WeightUnit } from '@driftmark/shared';
import { lazy, Suspense, useEffect, useRef, useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { CameraIcon, CautionIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { useDay } from '../api/get-day';
import { addDays } from '../utils/dates';
import { dayHasUrgentSymptom } from '../utils/symptoms';
import { DayCautionCard } from './countdown-caution';
import { DayTargetsCard } from './day-targets';
import { UrgentSymptomAlert } from './urgent-symptom-alert';
import { useClock } from './use-clock';
import { clockCaption, formatInstant } from '@/lib/clock';

// Every screen that shows a day draws its forms: their code starts loading with this module, at the
// same time as the day's data, not after the first render.
const entryCards = import('./day-entry-cards');
const DayEntryCards = lazy(() => entryCards.then((m) => ({ default: m.DayEntryCards })));

/** Placeholders of the cards' usual heights while their chunk loads (below the fold on a phone). */
const CARD_PLACEHOLDERS = ['h-64', 'h-48', 'h-32', 'h-56', 'h-32', 'h-32'];

interface DayCheckInProps {
  athleteId: string;
  /** The athlete's local date, YYYY-MM-DD. */
  date: string;
  /** The athlete's time zone (the clock new entries default to). */
  timeZone: string;
  /** The reader's units. */
  units: { weight: WeightUnit; volume: VolumeUnit };
  /** Used when the day's answer carries no `abilities` (the athlete profile's `log`). */
  canEditFallback: boolean;
  /** Two columns of cards on wide screens (the coach's page). */
  layout?: 'stack' | 'grid';
  /** Shown above the cards once the day has loaded (the event countdown). */
  before?: ReactNode;
  /** Where this day's condition photos are shown in full. */
  photosHref?: string;
}

/** Whether the server lets the reader log on this day; falls back to the athlete profile's answer. */
export function canLogOn(abilities: Record<string, boolean>, fallback: boolean): boolean {
  if ('log' in abilities) return abilities.log === true;
  if ('update' in abilities) return abilities.update === true;
  return fallback;
}

/**
 * A whole day in the order it is lived: the day's caution (countdown days, acknowledged warnings)
 * and targets first, then weigh-in, fluids, meals, supplements, evening, symptoms.
 */
export function DayCheckIn({
  athleteId,
  date,
  timeZone,
  units,
  canEditFallback,
  layout = 'stack',
  before,
  photosHref,
}: DayCheckInProps) {
  const query = useDay(athleteId, date);
  const now = useClock(timeZone);
  const canEdit = query.data ? canLogOn(query.data.abilities, canEditFallback) : false;
  const previous = useDay(athleteId, addDays(date, -1), { enabled: canEdit });
  const [urgentShown, setUrgentShown] = useState<{ date: string; message?: string } | null>(null);
  const alertRef = useRef<HTMLDivElement>(null);
  const [focusAlert, setFocusAlert] = useState(0);

  useEffect(() => {
    if (focusAlert === 0) return;
    alertRef.current?.scrollIntoView({ block: 'start', behavior: 'smooth' });
    alertRef.current?.focus({ preventScroll: true });
  }, [focusAlert]);

  if (query.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the day" className="space-y-4">
        {before}
        {['h-40', 'h-64', 'h-48', 'h-32', 'h-56', 'h-32'].map((h, i) => (
          <Skeleton key={i} className={h} />
        ))}
      </div>
    );
  }
  if (query.isError) {
    return (
      <div className="space-y-4">
        {before}
        <Alert
          tone="error"
          title="This day could not be loaded."
          action={
            <Button variant="secondary" onClick={() => void query.refetch()}>
              Try again
            </Button>
          }
        >
          {query.error.message}
        </Alert>
      </div>
    );
  }

  const day = query.data.data;
  const urgent = dayHasUrgentSymptom(day) || urgentShown?.date === date;
  const props = { athleteId, day, units, canEdit, now };

  return (
    <div className="space-y-4">
      {canEdit && urgent && (day.isToday || urgentShown?.date === date) ? (
        <UrgentSymptomAlert
          ref={alertRef}
          message={urgentShown?.date === date ? urgentShown.message : undefined}
        />
      ) : canEdit && urgent ? (
        <Alert tone="caution" live={false} title="You reported an urgent symptom this day">
          If dizziness, fainting, palpitations or confusion come back, stop any fluid or food restriction and
          seek medical care.
        </Alert>
      ) : null}
      <p className="text-xs text-ink-faint">
        {clockCaption({ whose: 'athlete', timeZone: day.timeZone }, canEdit)}
      </p>
      {!canEdit ? <StaffFlags day={day} /> : null}
      <DayCautionCard day={day} />
      {before}
      <DayTargetsCard {...props} />
      <Suspense
        fallback={
          <div aria-busy="true" aria-label="Loading the day's forms" className="space-y-4">
            {CARD_PLACEHOLDERS.map((h, i) => (
              <Skeleton key={i} className={h} />
            ))}
          </div>
        }
      >
        <DayEntryCards
          {...props}
          layout={layout}
          previous={previous.data?.data.supplements}
          onUrgent={(message) => {
            setUrgentShown((prev) => ({ date, message: message ?? prev?.message }));
            setFocusAlert((n) => n + 1);
          }}
        />
      </Suspense>
      {day.photos.length > 0 ? <DayPhotos day={day} href={photosHref} /> : null}
    </div>
  );
}

/** For the coach: safety flags of the day and urgent symptom reports, highlighted above the cards. */
function StaffFlags({ day }: { day: DayView }) {
  const urgentReports = day.symptoms.filter((r) => r.urgent);
  if (day.flags.length === 0 && urgentReports.length === 0) return null;
  return (
    <section
      aria-label="Safety flags"
      className="rounded-lg border-2 border-off-plan/70 bg-off-plan-soft px-4 py-3"
    >
      <p className="flex items-center gap-2 font-bold text-off-plan">
        <CautionIcon className="text-xl" />
        {urgentReports.length > 0 ? 'Urgent symptom reported' : 'Safety flag'}
      </p>
      <ul className="mt-1 space-y-1 text-sm text-ink">
        {day.flags.map((f) => (
          <li key={f.id}>
            {f.message}{' '}
            <span className="text-ink-muted tabular-nums">
              · {formatInstant(f.createdAt, { whose: 'athlete', timeZone: day.timeZone })}
            </span>
          </li>
        ))}
      </ul>
      {urgentReports.length > 0 ? (
        <p className="mt-1 text-sm text-ink-muted">
          The athlete was told to stop any fluid or food restriction and seek medical care.
        </p>
      ) : null}
    </section>
  );
}

function DayPhotos({ day, href }: { day: DayView; href?: string }) {
  return (
    <section
      aria-labelledby="day-photos-heading"
      className="rounded-lg border border-line bg-surface p-4 shadow-card"
    >
      <div className="mb-3 flex items-center justify-between gap-3">
        <h2 id="day-photos-heading" className="flex items-center gap-2 text-lg font-semibold text-ink">
          <CameraIcon className="text-accent" /> Condition photos
        </h2>
        {href ? <Link to={href}>Open photos</Link> : null}
      </div>
      <ul className="flex gap-2 overflow-x-auto pb-1">
        {day.photos.map((p) => (
          <li key={p.id} className="shrink-0">
            <figure>
              <img
                src={p.urls.thumb}
                alt={`${p.pose}, ${day.date}`}
                loading="lazy"
                className="h-28 w-auto rounded-md border border-line bg-sunken object-cover"
              />
              <figcaption className="mt-1 max-w-28 truncate text-xs text-ink-muted">{p.pose}</figcaption>
            </figure>
          </li>
        ))}
      </ul>
    </section>
  );
}
