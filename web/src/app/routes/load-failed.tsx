import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { CenteredShell } from '@/components/ui/app-shell';

/** Driftmark could not be reached or answered with an error before the page could start. */
export function LoadFailedPage({ error, onRetry }: { error: Error; onRetry: () => void }) {
  return (
    <CenteredShell>
      <title>Could not load · Driftmark</title>
      <h1 className="mb-4 text-2xl font-bold text-ink">Driftmark could not load</h1>
      <Alert
        tone="error"
        title={error.message}
        action={
          <Button variant="secondary" onClick={onRetry}>
            Try again
          </Button>
        }
      >
        Nothing you typed is lost by trying again.
      </Alert>
    </CenteredShell>
  );
}
