import { Alert } from '@/components/ui/alert';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { useOpenApi } from '@/features/api-reference/api/get-openapi';
import { ApiReference } from '@/features/api-reference/components/api-reference';
import { useCurrentUser } from '../session';

/** The API reference for staff: the server's own OpenAPI description, readable. */
export function CoachApiReferenceRoute() {
  const me = useCurrentUser();
  const description = useOpenApi();
  return (
    <>
      <title>API reference · Driftmark</title>
      <PageHeader
        eyebrow={me.team.name}
        title="API reference"
        description="Every route of the Driftmark API with what it takes and what it answers, for the other tools your team connects. Tools sign in as a staff member and send the session cookie."
        actions={
          <a href="/api/openapi.json" download="driftmark-openapi.json" className="text-sm font-semibold">
            Download OpenAPI 3.1 (JSON)
          </a>
        }
      />
      {description.isPending ? (
        <div className="space-y-3" aria-busy="true">
          <span className="sr-only">Loading the API description…</span>
          {[0, 1, 2, 3, 4].map((i) => (
            <Skeleton key={i} className="h-12 w-full" />
          ))}
        </div>
      ) : description.isError ? (
        <Alert tone="error" title="The API description could not be loaded.">
          {description.error.message}
        </Alert>
      ) : (
        <>
          <p className="mb-4 text-sm text-ink-muted">
            {description.data.info.title} {description.data.info.version} · OpenAPI {description.data.openapi}
          </p>
          <ApiReference doc={description.data} />
        </>
      )}
    </>
  );
}
