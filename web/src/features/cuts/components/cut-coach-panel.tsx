import { useState, type ReactNode } from 'react';
import { Card, CardHeader } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/spinner';
import { Alert } from '@/components/ui/alert';
import type { WeightUnit } from '@driftmark/shared';
import { useCut } from '../api/get-cut';
import { LimitGap, PlanFigures, RecoveryChecklist } from './cut-figures';
import { CutPlanBuilder } from './cut-plan-builder';

/** Making weight on the coach's athlete page: shown only when the athlete's event is a weigh-in. */
export function CutCoachPanel({
  athleteId,
  today,
  unit,
}: {
  athleteId: string;
  today: string;
  unit: WeightUnit;
}) {
  const cut = useCut(athleteId);
  if (cut.isPending) return <Skeleton className="mb-5 h-32" />;
  if (cut.isError)
    return (
      <Alert tone="error" className="mb-5">
        Making-weight figures could not be loaded.
      </Alert>
    );
  const view = cut.data.data;
  if (!view.weighIn) return null;
  return (
    <Card className="mb-5 space-y-4" aria-labelledby="cut-heading">
      <CardHeader id="cut-heading" title="Making weight" eyebrow="Weigh-in" />
      <LimitGap cut={view} unit={unit} />
      <RecoveryChecklist cut={view} />
      {view.plan ? (
        <PlanFigures cut={view} unit={unit} />
      ) : (
        <p className="text-sm text-ink-muted">No cut plan yet.</p>
      )}
      {cut.data.abilities.plan ? (
        <BuilderDetails hasPlan={view.plan !== null}>
          <CutPlanBuilder athleteId={athleteId} today={today} />
        </BuilderDetails>
      ) : null}
      <p className="text-sm text-ink-muted">{view.caution}</p>
    </Card>
  );
}

/** Open at first when there is no plan yet, and left as it is after a save (the notice stays in view). */
function BuilderDetails({ hasPlan, children }: { hasPlan: boolean; children: ReactNode }) {
  const [openAtFirst] = useState(!hasPlan);
  return (
    <details className="rounded-md border border-line p-4" open={openAtFirst}>
      <summary className="cursor-pointer font-semibold text-ink">
        {hasPlan ? 'New cut plan' : 'Build a cut plan'}
      </summary>
      <div className="mt-4">{children}</div>
    </details>
  );
}
