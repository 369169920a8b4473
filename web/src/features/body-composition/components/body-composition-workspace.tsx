import { lengthUnitFor, type WeightUnit } from '@driftmark/shared';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/spinner';
import type { LinkedKeys } from '../api/body-composition-cache';
import { useBodyComposition } from '../api/get-body-composition';
import { BodyCompositionSummary } from './body-composition-summary';
import { MassChart } from './mass-chart';
import { MeasurementForm } from './measurement-form';
import { MeasurementList } from './measurement-list';

interface BodyCompositionWorkspaceProps {
  athleteId: string;
  athlete: { sex: 'female' | 'male' | null; heightCm: number | null };
  /** The athlete's own today. */
  today: string;
  /** The viewer's weight unit. */
  unit: WeightUnit;
  /** Pre-filled "Measured by". */
  measuredBy: string;
  linkedKeys?: LinkedKeys;
}

/** One athlete's body composition: the latest estimate, lean and fat mass charts, entry and list. */
export function BodyCompositionWorkspace({
  athleteId,
  athlete,
  today,
  unit,
  measuredBy,
  linkedKeys,
}: BodyCompositionWorkspaceProps) {
  const body = useBodyComposition(athleteId);
  if (body.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading body composition" className="space-y-4">
        <Skeleton className="h-40" />
        <Skeleton className="h-64" />
      </div>
    );
  }
  if (body.isError) {
    return (
      <Alert
        tone="error"
        title="Body composition could not be loaded."
        action={
          <Button variant="secondary" onClick={() => void body.refetch()}>
            Try again
          </Button>
        }
      >
        {body.error.message}
      </Alert>
    );
  }
  const view = body.data.data;
  const canMeasure = body.data.abilities.measure === true;
  const withMasses = view.measurements.filter((m) => m.leanMassKg !== null);

  return (
    <div className="space-y-5">
      <BodyCompositionSummary view={view} unit={unit} />
      {withMasses.length > 0 ? (
        <div className="grid gap-4 lg:grid-cols-2">
          <MassChart metric="lean" measurements={view.measurements} unit={unit} />
          <MassChart metric="fat" measurements={view.measurements} unit={unit} />
        </div>
      ) : null}
      {canMeasure ? (
        <Card aria-labelledby="body-new">
          <CardHeader id="body-new" title="New measurement" />
          {athlete.sex ? (
            <MeasurementForm
              athleteId={athleteId}
              sex={athlete.sex}
              today={today}
              heightCm={athlete.heightCm}
              lengthUnit={lengthUnitFor(unit)}
              measuredBy={measuredBy}
              linkedKeys={linkedKeys}
            />
          ) : (
            <p className="text-sm text-ink-muted">
              The equations need the athlete&apos;s sex and birth date: measurements open once the intake is
              complete.
            </p>
          )}
        </Card>
      ) : null}
      <MeasurementList
        athleteId={athleteId}
        measurements={view.measurements}
        unit={unit}
        canRemove={canMeasure}
        linkedKeys={linkedKeys}
      />
    </div>
  );
}
