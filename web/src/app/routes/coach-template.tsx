import { Link, useNavigate, useParams } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ArrowLeftIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useTemplate } from '@/features/plans/api/get-template';
import { useTemplates } from '@/features/plans/api/get-templates';
import { TemplateEditor } from '@/features/plans/components/template-editor';
import { isApiError } from '@/lib/api-client';
import { NotFoundRoute } from './not-found';

function BackLink() {
  return (
    <Link
      to={paths.coachTemplates}
      className="mb-2 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
    >
      <ArrowLeftIcon /> Countdown templates
    </Link>
  );
}

function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading the template" className="max-w-5xl space-y-4">
      <Skeleton className="h-48" />
      <Skeleton className="h-32" />
      <Skeleton className="h-32" />
    </div>
  );
}

/** /coach/templates/new: a new template (owner and coaches). */
export function CoachTemplateNewRoute() {
  const navigate = useNavigate();
  const list = useTemplates();

  return (
    <>
      <title>New countdown template · Driftmark</title>
      <BackLink />
      <PageHeader title="New countdown template" />
      {list.isPending ? (
        <Loading />
      ) : list.isError ? (
        <Alert tone="error" title="Templates could not be loaded." className="max-w-2xl">
          {list.error.message}
        </Alert>
      ) : list.data.abilities.manage !== true ? (
        <Alert tone="info" title="Only the head coach and coaches write templates." className="max-w-2xl">
          You can read the team&apos;s templates and see them applied on the athletes shared with you.
        </Alert>
      ) : (
        <div className="max-w-5xl">
          <TemplateEditor
            template={null}
            canManage
            onCreated={(t) => void navigate(paths.coachTemplate(t.id), { replace: true })}
          />
        </div>
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}

/** /coach/templates/:templateId: one template, editable with abilities.manage. */
export function CoachTemplateRoute() {
  const { templateId = '' } = useParams();
  const navigate = useNavigate();
  const query = useTemplate(templateId);

  if (query.isError && isApiError(query.error) && query.error.status === 404) return <NotFoundRoute />;

  return (
    <>
      <title>{`${query.data?.data.name ?? 'Countdown template'} · Driftmark`}</title>
      <BackLink />
      <PageHeader title={query.data?.data.name ?? 'Countdown template'} eyebrow="Countdown template" />
      {query.isPending ? (
        <Loading />
      ) : query.isError ? (
        <Alert
          tone="error"
          title="This template could not be loaded."
          className="max-w-2xl"
          action={
            <Button variant="secondary" size="sm" onClick={() => void query.refetch()}>
              Try again
            </Button>
          }
        >
          {query.error.message}
        </Alert>
      ) : (
        <div className="max-w-5xl">
          <TemplateEditor
            // A fresh form per template; after a save the editor resets itself to the answer.
            key={query.data.data.id}
            template={query.data.data}
            canManage={query.data.abilities.manage === true}
            onDeleted={() => void navigate(paths.coachTemplates, { replace: true })}
          />
        </div>
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}
