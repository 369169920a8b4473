import type { VolumeUnit, WeightUnit } from '@driftmark/shared';
import { Card, CardHeader } from '@/components/ui/card';
import { useCut } from '../api/get-cut';
import { LimitGap, PlanFigures } from './cut-figures';
import { RecoveryChecklist, type RecoveryToggle } from './recovery-checklist';

/**
 * The athlete's Today: the weight to stay on the cut plan, the projection, the cautions, and on
 * the weigh-in day the recovery checklist, ticked through `onToggle` (the app logs the entry).
 */
export function CutTodayCard({
  athleteId,
  unit,
  volumeUnit,
  now,
  onToggle,
}: {
  athleteId: string;
  unit: WeightUnit;
  volumeUnit: VolumeUnit;
  /** The athlete's clock now, HH:MM. */
  now: string;
  onToggle: RecoveryToggle;
}) {
  const cut = useCut(athleteId);
  if (!cut.isSuccess) return null;
  const view = cut.data.data;
  if (!view.weighIn || (!view.plan && !view.gap && !view.recovery)) return null;
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
      <p className="text-sm text-ink-muted">{view.caution}</p>
    </Card>
  );
}
