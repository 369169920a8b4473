import { ButtonLink } from '@/components/ui/button';
import { CenteredShell } from '@/components/ui/app-shell';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  return (
    <CenteredShell>
      <title>Page not found · Driftmark</title>
      <p className="text-sm font-semibold text-accent tabular-nums">404</p>
      <h1 className="mt-1 text-2xl font-bold text-ink">There is no page here</h1>
      <p className="mt-3 text-ink-muted">The address may be mistyped, or the page has moved.</p>
      <ButtonLink to={paths.home} className="mt-6">
        Go to your home page
      </ButtonLink>
    </CenteredShell>
  );
}
