import { useState, type ReactNode } from 'react';
import { Card, CardHeader } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/spinner';
import { Alert } from '@/components/ui/alert';
import type { VolumeUnit, WeightUnit } from '@driftmark/shared';
import { useCut } from '../api/get-cut';
import { LimitGap, PlanFigures } from './cut-figures';
import { CutPlanBuilder } from './cut-plan-builder';
import { RecoveryChecklist } from './recovery-checklist';
import { RehearsalRecord } from './rehearsal-record';
import { WeighInEventForm } from './weigh-in-event-form';

/** Making weight on the coach's athlete page: shown only when the athlete's event is a weigh-in. */
export function CutCoachPanel({
  athleteId,
  today,
  unit,
  volumeUnit,
}: {
  athleteId: string;
  today: string;
  unit: WeightUnit;
  volumeUnit: VolumeUnit;
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
      <RecoveryChecklist cut={view} volumeUnit={volumeUnit} />
      {view.plan ? (
        <PlanFigures cut={view} unit={unit} />
      ) : (
        <p className="text-sm text-ink-muted">No cut plan yet.</p>
      )}
      {view.rehearsal ? (
        <RehearsalRecord
          athleteId={athleteId}
          rehearsal={view.rehearsal}
          planned={
            view.figures && view.plan
              ? { kg: view.figures.acute.kg, pct: view.figures.acute.pct, days: view.plan.acuteDays }
              : null
          }
          plannedLabel={view.plan ? 'The plan in force, last days' : 'No plan in force yet'}
          unit={unit}
          canNote={cut.data.abilities.noteRehearsal === true}
          today={today}
        />
      ) : null}
      {cut.data.abilities.plan ? (
        <>
          <Details summary="Weigh-in details" open={false}>
            <WeighInEventForm athleteId={athleteId} weighIn={view.weighIn} unit={unit} />
          </Details>
          <Details summary={view.plan ? 'New cut plan' : 'Build a cut plan'} open={view.plan === null}>
            <CutPlanBuilder
              athleteId={athleteId}
              today={today}
              unit={unit}
              limitKg={view.weighIn.limitKg}
              rehearsal={view.rehearsal}
              canNote={cut.data.abilities.noteRehearsal === true}
            />
          </Details>
        </>
      ) : null}
      <p className="text-sm text-ink-muted">{view.caution}</p>
    </Card>
  );
}

/** Open or shut as it first rendered, then left as the coach sets it (a save's notice stays in view). */
function Details({ summary, open, children }: { summary: string; open: boolean; children: ReactNode }) {
  const [openAtFirst] = useState(open);
  return (
    <details className="rounded-md border border-line p-4" open={openAtFirst}>
      <summary className="cursor-pointer font-semibold text-ink">{summary}</summary>
      <div className="mt-4">{children}</div>
    </details>
  );
}
