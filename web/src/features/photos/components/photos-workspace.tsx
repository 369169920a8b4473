import type { ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { PlusIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import { PhotoCompare } from './photo-compare';
import { PhotoGallery } from './photo-gallery';
import { PhotoUploadForm } from './photo-upload-form';
import { PoseListEditor } from './pose-list-editor';

export type PhotosView = 'gallery' | 'compare' | 'upload' | 'poses';

interface PhotosWorkspaceProps {
  athleteId: string;
  /** The athlete's own today (YYYY-MM-DD). */
  today: string;
  /** The signed-in user may upload and delete (the server's `log` ability: the athlete only). */
  canUpload: boolean;
  /** The athlete agreed to photo storage; without it uploads are refused. */
  photoConsent: boolean;
  /** Where the athlete can give photo consent (shown when it is missing). */
  consentAction?: ReactNode;
  /** The signed-in user may edit the team's pose list (owner or coach). */
  canEditPoses?: boolean;
  /** Called after an upload (e.g. to refresh the day view, which lists the day's photos). */
  onUploaded?: () => void;
}

const LABELS: Record<PhotosView, string> = {
  gallery: 'Gallery',
  compare: 'Compare',
  upload: 'Upload',
  poses: 'Poses',
};

/**
 * Upload, gallery and compare for one athlete, for the athlete and for the coach alike. The view
 * is in the address (`?view=compare`) so Back and shared links keep it.
 */
export function PhotosWorkspace({
  athleteId,
  today,
  canUpload,
  photoConsent,
  consentAction,
  canEditPoses = false,
  onUploaded,
}: PhotosWorkspaceProps) {
  const [params, setParams] = useSearchParams();
  const views: PhotosView[] = ['gallery', 'compare'];
  if (canUpload) views.push('upload');
  if (canEditPoses) views.push('poses');
  const asked = params.get('view') as PhotosView | null;
  const view: PhotosView = asked && views.includes(asked) ? asked : 'gallery';

  const hrefFor = (next: PhotosView) => {
    const copy = new URLSearchParams(params);
    if (next === 'gallery') copy.delete('view');
    else copy.set('view', next);
    const query = copy.toString();
    return query ? `?${query}` : '?';
  };
  const show = (next: PhotosView) => setParams(new URLSearchParams(hrefFor(next).slice(1)));

  const uploadButton = canUpload ? (
    <Button icon={<PlusIcon />} onClick={() => show('upload')}>
      Add photos
    </Button>
  ) : undefined;

  return (
    <div className="space-y-5">
      <nav aria-label="Photo views">
        <ul className="inline-flex max-w-full gap-1 overflow-x-auto rounded-md bg-sunken p-1">
          {views.map((v) => (
            <li key={v}>
              <Link
                to={hrefFor(v)}
                replace
                aria-current={view === v ? 'page' : undefined}
                className={cn(
                  'flex min-h-10 items-center rounded-sm px-4 text-sm font-semibold whitespace-nowrap text-ink-muted no-underline',
                  'hover:text-ink aria-[current=page]:bg-surface aria-[current=page]:text-accent-strong aria-[current=page]:shadow-card',
                )}
              >
                {LABELS[v]}
              </Link>
            </li>
          ))}
        </ul>
      </nav>

      {view === 'gallery' ? (
        <PhotoGallery athleteId={athleteId} canDelete={canUpload} emptyAction={uploadButton} />
      ) : null}
      {view === 'compare' ? <PhotoCompare athleteId={athleteId} emptyAction={uploadButton} /> : null}
      {view === 'upload' ? (
        photoConsent ? (
          <Card>
            <PhotoUploadForm
              athleteId={athleteId}
              today={today}
              onUploaded={onUploaded}
              onShowGallery={() => show('gallery')}
            />
          </Card>
        ) : (
          <Alert tone="info" title="Photo uploads are off" action={consentAction}>
            Photos are stored only with your photo consent. You can give it in your profile; your coaching
            team then sees the photos you upload.
          </Alert>
        )
      ) : null}
      {view === 'poses' ? (
        <Card className="max-w-2xl">
          <h2 className="mb-1 text-lg font-semibold text-ink">Team poses</h2>
          <p className="mb-4 text-sm text-ink-muted">The poses athletes choose from when they upload.</p>
          <PoseListEditor />
        </Card>
      ) : null}
    </div>
  );
}
