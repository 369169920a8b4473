import { useId, useMemo, useState, type ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { controlClasses } from '@/components/ui/field';
import { CameraIcon, ChevronDownIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { daysBetween, formatDate, formatNumber } from '@/lib/format';
import { usePhotos } from '../api/get-photos';
import { usePoses } from '../api/get-poses';
import type { PhotoView } from '../api/types';
import { datesForPose, photoFor, posesWithPhotos } from '../utils/photo-sets';

type Mode = 'side' | 'overlay';
type OverlayStyle = 'wipe' | 'fade';

function PlainSelect({
  label,
  value,
  onChange,
  children,
  className,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  children: ReactNode;
  className?: string;
}) {
  const id = useId();
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1.5 block font-semibold text-ink">
        {label}
      </label>
      <div className="relative">
        <select
          id={id}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          className={cn(controlClasses, 'appearance-none border-line-strong pr-10 tabular-nums')}
        >
          {children}
        </select>
        <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-lg text-ink-muted" />
      </div>
    </div>
  );
}

/** A row of two or three equal choices as radio buttons (keyboard: arrows move between them). */
function Choice<T extends string>({
  legend,
  value,
  options,
  onChange,
}: {
  legend: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
}) {
  const name = useId();
  return (
    <fieldset>
      <legend className="mb-1.5 font-semibold text-ink">{legend}</legend>
      <div className="grid auto-cols-fr grid-flow-col gap-1.5">
        {options.map((o) => (
          <label key={o.value} className="relative block">
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="peer absolute inset-0 z-10 size-full cursor-pointer opacity-0"
            />
            <span
              className={cn(
                'flex min-h-touch items-center justify-center rounded-md border border-line-strong bg-surface px-2 text-center text-sm font-semibold text-ink',
                'peer-checked:border-accent peer-checked:bg-accent peer-checked:text-on-accent peer-hover:border-accent',
                'peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-accent',
              )}
            >
              {o.label}
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}

function Caption({ tag, photo }: { tag: string; photo: PhotoView }) {
  return (
    <figcaption className="px-1 pt-1.5 text-sm">
      <span className="font-semibold text-ink">{tag}</span>{' '}
      <span className="text-ink-muted tabular-nums">{formatDate(photo.date, 'short')}</span>
    </figcaption>
  );
}

function Overlay({ earlier, later, style }: { earlier: PhotoView; later: PhotoView; style: OverlayStyle }) {
  const [amount, setAmount] = useState(50);
  const sliderId = useId();
  const laterStyle =
    style === 'wipe' ? { clipPath: `inset(0 0 0 ${100 - amount}%)` } : { opacity: amount / 100 };
  return (
    <div className="space-y-3">
      <figure className="mx-auto max-w-md">
        <div
          className="relative overflow-hidden rounded-md border border-line bg-sunken"
          style={{ aspectRatio: `${earlier.width} / ${earlier.height}` }}
        >
          <img
            src={earlier.urls.display}
            alt={`Earlier: ${earlier.pose}, ${formatDate(earlier.date)}`}
            className="absolute inset-0 size-full object-contain"
          />
          <img
            src={later.urls.display}
            alt={`Later: ${later.pose}, ${formatDate(later.date)}`}
            className="absolute inset-0 size-full object-contain"
            style={laterStyle}
          />
          {style === 'wipe' ? (
            <span
              aria-hidden="true"
              className="pointer-events-none absolute inset-y-0 w-0.5 -translate-x-1/2 bg-surface shadow-[0_0_0_1px_rgb(27_36_49/0.35)]"
              style={{ left: `${100 - amount}%` }}
            />
          ) : null}
          <span className="absolute top-2 left-2 rounded-sm bg-ink/75 px-1.5 py-0.5 text-xs font-semibold text-surface tabular-nums">
            {formatDate(earlier.date, 'short')}
          </span>
          <span className="absolute top-2 right-2 rounded-sm bg-ink/75 px-1.5 py-0.5 text-xs font-semibold text-surface tabular-nums">
            {formatDate(later.date, 'short')}
          </span>
        </div>
      </figure>
      <div className="mx-auto max-w-md">
        <label
          htmlFor={sliderId}
          className="mb-1 flex items-baseline justify-between gap-3 font-semibold text-ink"
        >
          <span>{style === 'wipe' ? 'Wipe to the later photo' : 'Fade to the later photo'}</span>
          <span className="text-sm font-medium text-ink-muted tabular-nums">{formatNumber(amount)} %</span>
        </label>
        <input
          id={sliderId}
          type="range"
          min={0}
          max={100}
          step={1}
          value={amount}
          onChange={(e) => setAmount(Number(e.target.value))}
          aria-valuetext={`${amount} % of the later photo`}
          className="h-touch w-full cursor-pointer accent-accent"
        />
        <div className="flex justify-between text-xs text-ink-faint">
          <span>Earlier</span>
          <span>Later</span>
        </div>
      </div>
    </div>
  );
}

/** The same pose on two dates: side by side, or one over the other with a slider (wipe or fade). */
export function PhotoCompare({ athleteId, emptyAction }: { athleteId: string; emptyAction?: ReactNode }) {
  const photos = usePhotos(athleteId);
  const poses = usePoses();
  const all = useMemo(() => photos.data ?? [], [photos.data]);
  const poseChoices = useMemo(() => posesWithPhotos(all, poses.data ?? []), [all, poses.data]);

  const [chosenPose, setPose] = useState<string | null>(null);
  const pose = chosenPose !== null && poseChoices.includes(chosenPose) ? chosenPose : (poseChoices[0] ?? '');
  const dates = useMemo(() => datesForPose(all, pose), [all, pose]);
  const [chosen, setChosen] = useState<{ pose: string; earlier: string; later: string } | null>(null);
  const valid =
    chosen && chosen.pose === pose && dates.includes(chosen.earlier) && dates.includes(chosen.later);
  const earlierDate = valid ? chosen.earlier : (dates[dates.length - 1] ?? '');
  const laterDate = valid ? chosen.later : (dates[0] ?? '');
  const [mode, setMode] = useState<Mode>('side');
  const [overlayStyle, setOverlayStyle] = useState<OverlayStyle>('wipe');

  if (photos.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading photos" className="grid grid-cols-2 gap-3">
        <Skeleton className="aspect-[3/4]" />
        <Skeleton className="aspect-[3/4]" />
      </div>
    );
  }
  if (photos.isError) {
    return (
      <Alert
        tone="error"
        title="The photos could not be loaded."
        action={
          <Button variant="secondary" onClick={() => void photos.refetch()}>
            Try again
          </Button>
        }
      >
        {photos.error.message}
      </Alert>
    );
  }
  if (all.length === 0) {
    return (
      <EmptyState icon={<CameraIcon />} title="Nothing to compare yet" action={emptyAction}>
        Compare needs the same pose on two different days.
      </EmptyState>
    );
  }

  const earlier = photoFor(all, pose, earlierDate);
  const later = photoFor(all, pose, laterDate);
  const choose = (next: Partial<{ earlier: string; later: string }>) =>
    setChosen({ pose, earlier: next.earlier ?? earlierDate, later: next.later ?? laterDate });
  const gap = earlierDate && laterDate ? daysBetween(earlierDate, laterDate) : 0;

  return (
    <div className="space-y-5">
      <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
        <PlainSelect
          className="col-span-2 sm:col-span-1"
          label="Pose"
          value={pose}
          onChange={(next) => {
            setPose(next);
            setChosen(null);
          }}
        >
          {poseChoices.map((p) => (
            <option key={p} value={p}>
              {p}
            </option>
          ))}
        </PlainSelect>
        <PlainSelect label="Earlier date" value={earlierDate} onChange={(d) => choose({ earlier: d })}>
          {dates.map((d) => (
            <option key={d} value={d}>
              {formatDate(d, 'short')}
            </option>
          ))}
        </PlainSelect>
        <PlainSelect label="Later date" value={laterDate} onChange={(d) => choose({ later: d })}>
          {dates.map((d) => (
            <option key={d} value={d}>
              {formatDate(d, 'short')}
            </option>
          ))}
        </PlainSelect>
      </div>

      {dates.length < 2 ? (
        <Alert tone="info" title="Only one day so far">
          {pose} has photos on one day ({formatDate(dates[0] ?? '')}). Add another day of this pose to
          compare.
        </Alert>
      ) : null}

      <div className="grid gap-4 sm:grid-cols-2">
        <Choice
          legend="View"
          value={mode}
          onChange={setMode}
          options={[
            { value: 'side', label: 'Side by side' },
            { value: 'overlay', label: 'Overlay' },
          ]}
        />
        {mode === 'overlay' ? (
          <Choice
            legend="Overlay style"
            value={overlayStyle}
            onChange={setOverlayStyle}
            options={[
              { value: 'wipe', label: 'Wipe' },
              { value: 'fade', label: 'Fade' },
            ]}
          />
        ) : null}
      </div>

      {earlier && later ? (
        <section aria-label="Comparison" className="max-w-3xl space-y-2">
          <p className="text-sm text-ink-muted tabular-nums" aria-live="polite">
            {pose}: {formatDate(earlierDate, 'short')} → {formatDate(laterDate, 'short')}
            {gap !== 0
              ? ` (${formatNumber(Math.abs(gap))} ${Math.abs(gap) === 1 ? 'day' : 'days'} apart)`
              : ''}
          </p>
          {mode === 'side' ? (
            <div className="grid grid-cols-2 gap-2 sm:gap-4">
              {[
                { tag: 'Earlier', photo: earlier },
                { tag: 'Later', photo: later },
              ].map(({ tag, photo }) => (
                <figure key={tag} className="min-w-0">
                  <div className="overflow-hidden rounded-md border border-line bg-sunken">
                    <img
                      src={photo.urls.display}
                      alt={`${tag}: ${photo.pose}, ${formatDate(photo.date)}`}
                      width={photo.width}
                      height={photo.height}
                      className="aspect-[3/4] w-full object-contain"
                    />
                  </div>
                  <Caption tag={tag} photo={photo} />
                </figure>
              ))}
            </div>
          ) : (
            <Overlay key={`${earlier.id}-${later.id}`} earlier={earlier} later={later} style={overlayStyle} />
          )}
        </section>
      ) : null}
    </div>
  );
}
