import { isRouteErrorResponse, useRouteError } from 'react-router';
import { CenteredShell } from '@/components/ui/app-shell';
import { Alert } from '@/components/ui/alert';
import { NotFoundRoute } from './not-found';

/** Last line of defence: an error thrown while rendering a route. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundRoute />;
  const message = error instanceof Error ? error.message : 'An unexpected error stopped this page.';
  return (
    <CenteredShell>
      <title>Something went wrong · Driftmark</title>
      <h1 className="mb-4 text-2xl font-bold text-ink">Something went wrong</h1>
      <Alert tone="error" title={message}>
        Reload the page to try again. If it keeps happening, tell us what you were doing.
      </Alert>
      <p className="mt-5">
        <a href="/">Reload Driftmark</a>
      </p>
    </CenteredShell>
  );
}
