import type { VolumeUnit, WeightUnit } from '@driftmark/shared';
import { lazy, Suspense } from 'react';
import { Card, CardHeader } from '@/components/ui/card';
import { useCut } from '../api/get-cut';
import { LimitGap, PlanFigures } from './cut-figures';
import { RecoveryChecklist, type RecoveryToggle } from './recovery-checklist';

// Loaded only while a practice run is under way, so Today's first load stays within its budget.
const RehearsalRecord = lazy(() =>
  import('./rehearsal-record').then((m) => ({ default: m.RehearsalRecord })),
);

/**
 * The athlete's Today: the weight to stay on the cut plan, the projection, the cautions; on the
 * weigh-in day the recovery checklist, ticked through `onToggle` (the app logs the entry); during a
 * practice run, its record so far and the day's note.
 */
export function CutTodayCard({
  athleteId,
  unit,
  volumeUnit,
  now,
  onToggle,
  today,
}: {
  athleteId: string;
  unit: WeightUnit;
  volumeUnit: VolumeUnit;
  /** The athlete's clock now, HH:MM. */
  now: string;
  onToggle: RecoveryToggle;
  today: string;
}) {
  const cut = useCut(athleteId);
  if (!cut.isSuccess) return null;
  const view = cut.data.data;
  const rehearsal = view.rehearsal?.underWay ? view.rehearsal : null;
  if (!view.weighIn || (!view.plan && !view.gap && !view.recovery && !rehearsal)) return null;
  return (
    <Card className="space-y-4" aria-labelledby="cut-today-heading">
      <CardHeader id="cut-today-heading" title="Making weight" eyebrow="Your cut plan" />
      <RecoveryChecklist
        cut={view}
        volumeUnit={volumeUnit}
        now={now}
        onToggle={cut.data.abilities.log ? onToggle : undefined}
      />
      <PlanFigures cut={view} unit={unit} />
      <LimitGap cut={view} unit={unit} />
      {rehearsal ? (
        <Suspense fallback={null}>
          <RehearsalRecord
            athleteId={athleteId}
            rehearsal={rehearsal}
            planned={{
              kg: rehearsal.planned.acuteKg,
              pct: rehearsal.planned.acutePct,
              days: rehearsal.planned.acuteDays,
            }}
            plannedLabel="Planned for this practice run"
            unit={unit}
            canNote={cut.data.abilities.noteRehearsal === true}
            today={today}
          />
        </Suspense>
      ) : null}
      <p className="text-sm text-ink-muted">{view.caution}</p>
    </Card>
  );
}
