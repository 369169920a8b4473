import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAthlete } from '@/features/athletes/api/get-athlete';
import { IntakeForm } from '@/features/athletes/components/intake-form';
import { authKeys } from '@/features/auth/api/keys';
import { deviceTimeZone } from '@/lib/time-zones';
import { useCurrentUser } from '../session';

export function IntakeRoute() {
  const me = useCurrentUser();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const athleteId = me.athleteId ?? '';
  const athlete = useAthlete(athleteId);
  const editing = me.intakeComplete;

  return (
    <>
      <title>{editing ? 'Your details · Driftmark' : 'Intake · Driftmark'}</title>
      <PageHeader
        eyebrow={editing ? undefined : `Welcome to ${me.team.name}`}
        title={editing ? 'Your details' : 'Tell your coach about you'}
        description={
          editing
            ? 'Change what has changed and save; your coach sees the update.'
            : 'A few minutes now saves guesswork later. Your coach sees these answers and sets your targets from them.'
        }
      />
      {!me.athleteId ? (
        <Alert tone="error" title="Your athlete profile is missing.">
          Ask your coach to invite you again.
        </Alert>
      ) : athlete.isPending ? (
        <div aria-busy="true" aria-label="Loading your details" className="space-y-4">
          <Skeleton className="h-56" />
          <Skeleton className="h-72" />
          <Skeleton className="h-48" />
        </div>
      ) : athlete.isError ? (
        <Alert
          tone="error"
          title="Your details could not be loaded."
          action={
            <Button variant="secondary" onClick={() => void athlete.refetch()}>
              Try again
            </Button>
          }
        >
          {athlete.error.message}
        </Alert>
      ) : (
        <IntakeForm
          athleteId={athleteId}
          profile={athlete.data.data}
          defaults={{ weightUnit: me.units.weight, volumeUnit: me.units.volume, timeZone: deviceTimeZone() }}
          onSaved={async () => {
            // The intake changes who the user is to the app (intake complete, time zone, units).
            await queryClient.invalidateQueries({ queryKey: authKeys.me });
            void navigate(paths.athleteHome, { replace: true });
          }}
        />
      )}
    </>
  );
}
