import type { WeightUnit } from '@driftmark/shared';
import { Card, CardHeader } from '@/components/ui/card';
import { useCut } from '../api/get-cut';
import { LimitGap, PlanFigures, RecoveryChecklist } from './cut-figures';

/** The athlete's Today: the weight to stay on the cut plan, the projection, the cautions. */
export function CutTodayCard({ athleteId, unit }: { athleteId: string; unit: WeightUnit }) {
  const cut = useCut(athleteId);
  if (!cut.isSuccess) return null;
  const view = cut.data.data;
  if (!view.weighIn || (!view.plan && !view.gap && !view.recovery)) return null;
  return (
    <Card className="space-y-4" aria-labelledby="cut-today-heading">
      <CardHeader id="cut-today-heading" title="Making weight" eyebrow="Your cut plan" />
      <RecoveryChecklist cut={view} />
      <PlanFigures cut={view} unit={unit} />
      <LimitGap cut={view} unit={unit} />
      <p className="text-sm text-ink-muted">{view.caution}</p>
    </Card>
  );
}
