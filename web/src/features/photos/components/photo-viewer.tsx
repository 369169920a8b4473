import { useEffect, useRef, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TrashIcon } from '@/components/ui/icons';
import { formatDate } from '@/lib/format';
import { useDeletePhoto } from '../api/delete-photo';
import type { PhotoView } from '../api/types';

interface PhotoViewerProps {
  athleteId: string;
  photo: PhotoView | null;
  canDelete: boolean;
  onClose: () => void;
}

/** One photo at display size in a modal dialog (focus kept inside, Esc closes), with delete for the athlete. */
export function PhotoViewer({ athleteId, photo, canDelete, onClose }: PhotoViewerProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const [confirming, setConfirming] = useState(false);
  const remove = useDeletePhoto(athleteId, { onSuccess: onClose });

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (photo && !dialog.open) dialog.showModal();
    if (!photo && dialog.open) dialog.close();
  }, [photo]);

  const close = () => {
    setConfirming(false);
    remove.reset();
    onClose();
  };

  return (
    <dialog
      ref={ref}
      onClose={close}
      aria-labelledby="photo-viewer-title"
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(100vw-2rem,56rem)] overflow-y-auto rounded-lg border border-line bg-surface p-0 text-ink shadow-card backdrop:bg-ink/60"
    >
      {photo ? (
        <div className="flex flex-col">
          <div className="flex items-start justify-between gap-3 border-b border-line px-4 py-3">
            <div>
              <h2 id="photo-viewer-title" className="text-lg font-semibold">
                {photo.pose}
              </h2>
              <p className="text-sm text-ink-muted tabular-nums">{formatDate(photo.date)}</p>
            </div>
            <Button variant="secondary" onClick={close}>
              Close
            </Button>
          </div>
          <div className="bg-sunken">
            <img
              src={photo.urls.display}
              alt={`${photo.pose}, ${formatDate(photo.date)}`}
              width={photo.width}
              height={photo.height}
              className="mx-auto max-h-[70dvh] w-auto object-contain"
            />
          </div>
          <div className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
            <a href={photo.urls.display} target="_blank" rel="noreferrer" className="text-sm font-semibold">
              Open full size
            </a>
            {canDelete ? (
              confirming ? (
                <div className="flex flex-wrap items-center gap-2">
                  <span className="text-sm font-medium">Delete this photo for good?</span>
                  <Button variant="danger" loading={remove.isPending} onClick={() => remove.mutate(photo.id)}>
                    Delete
                  </Button>
                  <Button variant="ghost" onClick={() => setConfirming(false)}>
                    Keep it
                  </Button>
                </div>
              ) : (
                <Button variant="danger" icon={<TrashIcon />} onClick={() => setConfirming(true)}>
                  Delete photo
                </Button>
              )
            ) : null}
          </div>
          {remove.isError ? (
            <div className="px-4 pb-4">
              <Alert tone="error">{remove.error.message}</Alert>
            </div>
          ) : null}
        </div>
      ) : null}
    </dialog>
  );
}
