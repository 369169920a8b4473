import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { CountdownIcon, PlusIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useTemplates } from '@/features/plans/api/get-templates';
import { TemplateList } from '@/features/plans/components/template-list';
import { useCurrentUser } from '../session';

/** The team's library of countdown templates. */
export function CoachTemplatesRoute() {
  const me = useCurrentUser();
  const templates = useTemplates();
  const canManage = templates.data?.abilities.manage === true;
  const newButton = canManage ? (
    <ButtonLink to={paths.coachTemplateNew} icon={<PlusIcon className="text-lg" />}>
      New template
    </ButtonLink>
  ) : null;

  return (
    <>
      <title>Countdown templates · Driftmark</title>
      <PageHeader
        eyebrow={me.team.name}
        title="Countdown templates"
        description="The final days before a show, a shoot or a weigh-in, counted from the event day. Apply one from an athlete's plan: it previews the dated targets for that athlete before anything is saved."
        actions={templates.data && templates.data.data.length > 0 ? newButton : null}
      />
      {templates.isPending ? (
        <div aria-busy="true" aria-label="Loading the templates" className="space-y-2">
          <Skeleton className="h-12" />
          {[0, 1, 2].map((i) => (
            <Skeleton key={i} className="h-16" />
          ))}
        </div>
      ) : templates.isError ? (
        <Alert
          tone="error"
          title="The templates could not be loaded."
          action={
            <Button variant="secondary" size="sm" onClick={() => void templates.refetch()}>
              Try again
            </Button>
          }
        >
          {templates.error.message}
        </Alert>
      ) : templates.data.data.length === 0 ? (
        <EmptyState icon={<CountdownIcon />} title="No countdown templates yet" action={newButton}>
          {canManage
            ? 'Write the days before an event once (E-7 to E+1, say), with targets relative to each athlete’s own figures, and apply them to any athlete.'
            : 'When the head coach or a coach writes a template, it appears here.'}
        </EmptyState>
      ) : (
        <TemplateList templates={templates.data.data} hrefFor={paths.coachTemplate} />
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}
