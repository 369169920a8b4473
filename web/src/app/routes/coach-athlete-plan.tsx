import type { AthleteProfile, PlanVersionView, PlanView } from '@driftmark/shared';
import { useState } from 'react';
import { Link, Outlet, useOutletContext, useParams } from 'react-router';
import { SafetyNote } from '@/components/safety-note';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ArrowLeftIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/spinner';
import { TabNav, TabNavLink } from '@/components/ui/tab-nav';
import { CoachAthleteTabs } from '../layouts/coach-athlete-tabs';
import { useCountdownLinkedKeys } from '../layouts/countdown-mismatch-banner';
import { paths } from '@/config/paths';
import { useAthlete, type AthleteAbilities } from '@/features/athletes/api/get-athlete';
import { usePlan } from '@/features/plans/api/get-plan';
import type { LinkedKeys } from '@/features/plans/api/plan-cache';
import { ApplyCountdown } from '@/features/plans/components/apply-countdown';
import { EventPanel } from '@/features/plans/components/event-panel';
import { PlanEditor } from '@/features/plans/components/plan-editor';
import { VersionDetail } from '@/features/plans/components/version-detail';
import { VersionHistory } from '@/features/plans/components/version-history';
import { WeekView } from '@/features/plans/components/week-view';
import { formatDate } from '@/lib/format';

interface PlanOutletContext {
  athleteId: string;
  profile: AthleteProfile;
  athleteAbilities: Partial<AthleteAbilities>;
  plan: PlanView;
  canEdit: boolean;
  linkedKeys: LinkedKeys;
}

function usePlanContext() {
  return useOutletContext<PlanOutletContext>();
}

/** The athlete tabs, shared by the athlete's days, photos and plan pages. */
function AthleteTabs({ athleteId }: { athleteId: string }) {
  return <CoachAthleteTabs athleteId={athleteId} className="mb-5" />;
}

/**
 * A coach's plan pages of one athlete: the event with its date change, then the week view and
 * editor, the countdown flow, or the version history (child routes).
 */
export function CoachAthletePlanLayout() {
  const { athleteId = '' } = useParams();
  const athlete = useAthlete(athleteId);
  const plan = usePlan(athleteId);
  const name = athlete.data?.data.name;
  const linkedKeys = useCountdownLinkedKeys(athleteId);
  const failed = athlete.isError ? athlete.error : plan.isError ? plan.error : null;

  return (
    <>
      <title>{name ? `${name} · Plan · Driftmark` : 'Plan · Driftmark'}</title>
      <Link
        to={paths.coachAthlete(athleteId)}
        className="mb-3 inline-flex min-h-touch items-center gap-1.5 text-sm font-semibold no-underline"
      >
        <ArrowLeftIcon /> {name ?? 'Athlete'}
      </Link>
      <PageHeader eyebrow="Plan" title={name ?? 'Athlete'} className="mb-4" />
      <AthleteTabs athleteId={athleteId} />
      {athlete.isPending || plan.isPending ? (
        <div aria-busy="true" aria-label="Loading the plan" className="space-y-4">
          <Skeleton className="h-16 max-w-3xl" />
          <Skeleton className="h-11 max-w-md" />
          <Skeleton className="h-64" />
        </div>
      ) : failed || !athlete.data || !plan.data ? (
        <Alert
          tone="error"
          title={failed?.status === 404 ? 'No such athlete on your roster.' : 'The plan could not be loaded.'}
          action={
            failed?.status === 404 ? undefined : (
              <Button
                variant="secondary"
                onClick={() => {
                  void athlete.refetch();
                  void plan.refetch();
                }}
              >
                Try again
              </Button>
            )
          }
        >
          {failed?.message}
        </Alert>
      ) : (
        <>
          <div className="mb-5">
            <EventPanel
              athleteId={athleteId}
              event={{
                type: athlete.data.data.eventType,
                name: athlete.data.data.eventName,
                date: athlete.data.data.eventDate,
              }}
              today={plan.data.data.today}
              mismatch={athlete.data.data.countdownMismatch}
              canChange={athlete.data.abilities.update === true}
              canEditPlan={plan.data.abilities.edit === true}
              linkedKeys={linkedKeys}
            />
          </div>
          <TabNav label="Plan" className="mb-5">
            <TabNavLink to={paths.coachAthletePlan(athleteId)} end>
              Week and editor
            </TabNavLink>
            {plan.data.abilities.edit ? (
              <TabNavLink to={paths.coachAthletePlanCountdown(athleteId)}>Apply countdown</TabNavLink>
            ) : null}
            <TabNavLink to={paths.coachAthletePlanHistory(athleteId)}>
              History ({plan.data.data.versions.length})
            </TabNavLink>
          </TabNav>
          <Outlet
            context={
              {
                athleteId,
                profile: athlete.data.data,
                athleteAbilities: athlete.data.abilities,
                plan: plan.data.data,
                canEdit: plan.data.abilities.edit === true,
                linkedKeys,
              } satisfies PlanOutletContext
            }
          />
        </>
      )}
      <SafetyNote className="mt-8 max-w-3xl" />
    </>
  );
}

/** /coach/athletes/:athleteId/plan: the week in force, the next 14 days, and the editor for a new version. */
export function CoachAthletePlanEditorRoute() {
  const { athleteId, plan, canEdit, linkedKeys } = usePlanContext();
  const [saved, setSaved] = useState<PlanVersionView | null>(null);
  return (
    <div className="space-y-6">
      {saved ? (
        <Alert
          tone="success"
          title={`Version ${saved.number} saved, in force from ${formatDate(saved.effectiveFrom)}.`}
          action={
            <ButtonLink variant="secondary" size="sm" to={paths.coachAthletePlanHistory(athleteId, saved.id)}>
              View version {saved.number}
            </ButtonLink>
          }
        >
          {saved.acknowledgements.length > 0
            ? `${saved.acknowledgements.length} acknowledged ${saved.acknowledgements.length === 1 ? 'warning is' : 'warnings are'} stored with it.`
            : null}
        </Alert>
      ) : null}
      <Card aria-labelledby="plan-week-heading">
        <h2 id="plan-week-heading" className="mb-4 text-xl font-bold text-ink">
          This week
        </h2>
        {plan.versions.length === 0 ? (
          <p className="text-ink-muted">
            No plan yet.{' '}
            {canEdit
              ? 'Start from the editor below (training days Monday to Saturday, a rest day on Sunday) or apply a countdown template.'
              : 'The coach has not set one.'}
          </p>
        ) : (
          <WeekView plan={plan} />
        )}
      </Card>
      {canEdit ? (
        <section aria-labelledby="plan-editor-heading">
          <div className="mb-3">
            <h2 id="plan-editor-heading" className="text-xl font-bold text-ink">
              {plan.latest
                ? `Edit: a new version after version ${plan.latest.number}`
                : 'Write the first version'}
            </h2>
            <p className="text-sm text-ink-muted">
              {plan.latest
                ? `Starts as a copy of version ${plan.latest.number}. Saving adds a version; earlier days keep the plan they had.`
                : 'Targets are optional per metric: leave one at “No target” to leave it out.'}
            </p>
          </div>
          <PlanEditor
            key={plan.latest?.id ?? 'starter'}
            athleteId={athleteId}
            plan={plan}
            linkedKeys={linkedKeys}
            onSaved={setSaved}
          />
        </section>
      ) : (
        <Alert tone="info" live={false}>
          You can read this plan; changes are made by the athlete&apos;s coach or shared staff.
        </Alert>
      )}
    </div>
  );
}

/** /coach/athletes/:athleteId/plan/countdown: apply a template with a preview. */
export function CoachAthletePlanCountdownRoute() {
  const { athleteId, plan, profile, canEdit, linkedKeys } = usePlanContext();
  if (!canEdit) {
    return (
      <Alert tone="info" live={false}>
        Countdowns are applied by the athlete&apos;s coach or shared staff.
      </Alert>
    );
  }
  return (
    <ApplyCountdown
      athleteId={athleteId}
      today={plan.today}
      eventDate={profile.eventDate}
      eventType={profile.eventType}
      linkedKeys={linkedKeys}
      planHref={paths.coachAthletePlan(athleteId)}
      versionHref={(id) => paths.coachAthletePlanHistory(athleteId, id)}
      templatesHref={paths.coachTemplates}
    />
  );
}

/** /coach/athletes/:athleteId/plan/history[/:versionId]: every version, and one read in full. */
export function CoachAthletePlanHistoryRoute() {
  const { athleteId, plan } = usePlanContext();
  const { versionId } = useParams();
  return (
    <div className="grid gap-6 xl:grid-cols-[24rem_minmax(0,1fr)]">
      <section aria-labelledby="history-heading" className="min-w-0">
        <h2 id="history-heading" className="mb-3 text-xl font-bold text-ink">
          Versions
        </h2>
        <VersionHistory
          plan={plan}
          versionHref={(id) => paths.coachAthletePlanHistory(athleteId, id)}
          selectedId={versionId}
        />
      </section>
      <section aria-label="The chosen version" className="min-w-0">
        {versionId ? (
          <VersionDetail athleteId={athleteId} versionId={versionId} />
        ) : plan.versions.length > 0 ? (
          <p className="rounded-lg border border-dashed border-line-strong/60 p-6 text-sm text-ink-muted">
            Choose a version to read its targets, the baseline they resolve against and the acknowledged
            warnings.
          </p>
        ) : null}
      </section>
    </div>
  );
}
