import { useState } from 'react';
import { Button, buttonClasses } from '@/components/ui/button';
import { DownloadIcon, TrashIcon } from '@/components/ui/icons';
import { isApiError } from '@/lib/api-client';
import { useRequestDeletion } from '../api/request-deletion';

/** The archive of everything the athlete logged (GET /api/me/export, a zip). */
export const MY_DATA_URL = '/api/me/export';

/**
 * The athlete's data rights in Settings: download everything as a zip, and delete the account in
 * two steps (a confirm here, then the e-mailed link).
 */
export function MyDataCard() {
  const request = useRequestDeletion();
  const [confirming, setConfirming] = useState(false);

  return (
    <div className="space-y-5">
      <div>
        <p className="mb-3 text-sm text-ink-muted">
          A zip with your days, plans, marks and replies, weekly check-ins (as JSON) and your photos.
        </p>
        <a href={MY_DATA_URL} download className={buttonClasses('secondary', 'md')}>
          <DownloadIcon />
          Download my data
        </a>
      </div>
      <div className="border-t border-line pt-5">
        <h3 className="font-semibold text-ink">Delete my account</h3>
        <p className="mt-1 mb-3 text-sm text-ink-muted">
          Removes your account, your days, plans, marks, replies, check-ins and photos for good. Your team
          keeps its other data. Download your data first if you want a copy.
        </p>
        {request.isSuccess ? (
          <p role="status" className="text-sm font-medium text-on-plan">
            We sent a confirm link to {request.data.sentTo}. It works for {request.data.expiresInMinutes}{' '}
            minutes; nothing is deleted until you open it.
          </p>
        ) : confirming ? (
          <div role="group" aria-label="Delete your account?" className="flex flex-wrap items-center gap-2">
            <span className="text-sm font-medium text-ink">
              Send the confirm link to delete your account?
            </span>
            <Button variant="danger" loading={request.isPending} onClick={() => request.mutate()}>
              Yes, e-mail me the link
            </Button>
            <Button variant="ghost" onClick={() => setConfirming(false)}>
              Keep my account
            </Button>
          </div>
        ) : (
          <Button variant="danger" icon={<TrashIcon />} onClick={() => setConfirming(true)}>
            Delete my account…
          </Button>
        )}
        {request.error ? (
          <p role="alert" className="mt-2 text-sm font-medium text-off-plan">
            {isApiError(request.error) ? request.error.message : 'That did not work. Please try again.'}
          </p>
        ) : null}
      </div>
    </div>
  );
}
