import type { AthleteProfile } from '@driftmark/shared';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { useEndCoaching } from '../api/end-coaching';

/**
 * Ending the coaching, with a confirm step. The athlete keeps their sign-in and can still read and
 * export their history; nobody logs new days after it. Shown only when the server allows it.
 */
export function EndCoachingPanel({ profile, canEnd }: { profile: AthleteProfile; canEnd: boolean }) {
  const end = useEndCoaching(profile.id);
  const [confirming, setConfirming] = useState(false);

  if (profile.status === 'ended') {
    return (
      <section aria-labelledby="coaching-heading" className="mt-8 max-w-2xl print:hidden">
        <h2 id="coaching-heading" className="mb-1 text-base font-semibold text-ink">
          Coaching
        </h2>
        <p role="status" className="text-sm text-ink-muted">
          The coaching has ended. {profile.name} can still sign in, read and export their history, but no new
          days are logged.
        </p>
      </section>
    );
  }
  if (!canEnd) return null;

  return (
    <section aria-labelledby="coaching-heading" className="mt-8 max-w-2xl print:hidden">
      <h2 id="coaching-heading" className="mb-1 text-base font-semibold text-ink">
        Coaching
      </h2>
      <p className="mb-3 text-sm text-ink-muted">
        Ending the coaching stops new logging. {profile.name} keeps their sign-in and can still read and
        download their history.
      </p>
      {confirming ? (
        <div
          role="group"
          aria-label={`End the coaching of ${profile.name}?`}
          className="flex flex-wrap items-center gap-2"
        >
          <span className="text-sm font-medium text-ink">End the coaching of {profile.name}?</span>
          <Button variant="danger" size="sm" loading={end.isPending} onClick={() => end.mutate()}>
            Yes, end coaching
          </Button>
          <Button variant="ghost" size="sm" onClick={() => setConfirming(false)}>
            Keep coaching
          </Button>
        </div>
      ) : (
        <Button variant="danger" size="sm" onClick={() => setConfirming(true)}>
          End coaching…
        </Button>
      )}
      {end.error ? (
        <p role="alert" className="mt-2 text-sm font-medium text-off-plan">
          {isApiError(end.error) ? end.error.message : 'That did not work. Please try again.'}
        </p>
      ) : null}
    </section>
  );
}
