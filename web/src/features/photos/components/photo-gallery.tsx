import { useId, useMemo, useState, type ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { controlClasses } from '@/components/ui/field';
import { CameraIcon, ChevronDownIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { formatDate, formatNumber } from '@/lib/format';
import { usePhotos } from '../api/get-photos';
import { usePoses } from '../api/get-poses';
import type { PhotoView } from '../api/types';
import { groupByDate, posesWithPhotos } from '../utils/photo-sets';
import { PhotoViewer } from './photo-viewer';

interface PhotoGalleryProps {
  athleteId: string;
  /** The athlete may delete their own photos (from the server's abilities). */
  canDelete: boolean;
  /** Shown in the empty state, e.g. a button to the upload view. */
  emptyAction?: ReactNode;
}

/** An athlete's condition photos by day (newest first), filterable by pose; a tap opens the photo. */
export function PhotoGallery({ athleteId, canDelete, emptyAction }: PhotoGalleryProps) {
  const photos = usePhotos(athleteId);
  const poses = usePoses();
  const [pose, setPose] = useState('');
  const [open, setOpen] = useState<PhotoView | null>(null);
  const filterId = useId();

  const all = useMemo(() => photos.data ?? [], [photos.data]);
  const poseChoices = useMemo(() => posesWithPhotos(all, poses.data ?? []), [all, poses.data]);
  const groups = useMemo(() => groupByDate(pose ? all.filter((p) => p.pose === pose) : all), [all, pose]);

  if (photos.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading photos" className="grid grid-cols-3 gap-2 sm:grid-cols-5">
        {Array.from({ length: 6 }, (_, i) => (
          <Skeleton key={i} className="aspect-[3/4]" />
        ))}
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
      <EmptyState icon={<CameraIcon />} title="No photos yet" action={emptyAction}>
        Condition photos appear here by day and pose, ready to compare week by week.
      </EmptyState>
    );
  }

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="w-full sm:w-64">
          <label htmlFor={filterId} className="mb-1.5 block font-semibold text-ink">
            Pose
          </label>
          <div className="relative">
            <select
              id={filterId}
              value={pose}
              onChange={(e) => setPose(e.target.value)}
              className={cn(controlClasses, 'appearance-none border-line-strong pr-10')}
            >
              <option value="">All poses</option>
              {poseChoices.map((p) => (
                <option key={p} value={p}>
                  {p}
                </option>
              ))}
            </select>
            <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-lg text-ink-muted" />
          </div>
        </div>
        <p className="text-sm text-ink-muted tabular-nums" aria-live="polite">
          {formatNumber(groups.reduce((n, g) => n + g.photos.length, 0))} photos on{' '}
          {formatNumber(groups.length)} {groups.length === 1 ? 'day' : 'days'}
        </p>
      </div>

      {groups.map((group) => (
        <section
          key={group.date}
          aria-labelledby={`day-${group.date}`}
          className="sm:grid sm:grid-cols-[8.5rem_minmax(0,1fr)] sm:gap-4 sm:border-t sm:border-line sm:pt-4"
        >
          <h3 id={`day-${group.date}`} className="mb-2 text-sm font-semibold text-ink-muted tabular-nums">
            {formatDate(group.date)}
          </h3>
          <ul className="grid grid-cols-3 gap-2 sm:grid-cols-[repeat(auto-fill,minmax(7.5rem,1fr))]">
            {group.photos.map((photo) => (
              <li key={photo.id}>
                <button
                  type="button"
                  onClick={() => setOpen(photo)}
                  className="group block w-full overflow-hidden rounded-md border border-line bg-sunken text-left shadow-card hover:border-accent"
                >
                  <img
                    src={photo.urls.thumb}
                    alt={`${photo.pose}, ${formatDate(photo.date)}`}
                    loading="lazy"
                    width={photo.width}
                    height={photo.height}
                    className="aspect-[3/4] w-full object-cover"
                  />
                  <span className="block truncate bg-surface px-2 py-1.5 text-xs font-semibold text-ink group-hover:text-accent-strong">
                    {photo.pose}
                  </span>
                </button>
              </li>
            ))}
          </ul>
        </section>
      ))}
      <PhotoViewer athleteId={athleteId} photo={open} canDelete={canDelete} onClose={() => setOpen(null)} />
    </div>
  );
}
