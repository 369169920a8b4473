import {
  BODY_COMPOSITION_METHOD_LABELS,
  SKINFOLD_SITE_LABELS,
  LENGTH_UNIT_LABELS,
  lengthFromCm,
  lengthUnitFor,
  SKINFOLD_SITES,
  type BodyMeasurementView,
  type LengthUnit,
  type WeightUnit,
} from '@driftmark/shared';
import { Button } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { TrashIcon } from '@/components/ui/icons';
import { formatDate, formatNumber, formatWeight, NBSP } from '@/lib/format';
import type { LinkedKeys } from '../api/body-composition-cache';
import { useDeleteBodyMeasurement } from '../api/delete-body-measurement';

function figures(m: BodyMeasurementView, lengthUnit: LengthUnit): string {
  if (m.method === 'circumference') {
    const length = (cm: number) => formatNumber(lengthFromCm(cm, lengthUnit), 1);
    return [
      m.neckCm !== null ? `neck ${length(m.neckCm)}` : null,
      m.waistCm !== null ? `waist ${length(m.waistCm)}` : null,
      m.hipCm !== null ? `hip ${length(m.hipCm)}` : null,
      m.heightCm !== null ? `height ${length(m.heightCm)}` : null,
    ]
      .filter(Boolean)
      .join(', ')
      .concat(`${NBSP}${LENGTH_UNIT_LABELS[lengthUnit]}`);
  }
  const sites = SKINFOLD_SITES.flatMap((s) => {
    const v = m.skinfoldsMm[s];
    return v === undefined ? [] : [`${SKINFOLD_SITE_LABELS[s].toLowerCase()} ${formatNumber(v, 1)}`];
  });
  const sum = m.estimate?.sumMm != null ? ` (sum ${formatNumber(m.estimate.sumMm, 1)})` : '';
  return `${sites.join(', ')}${NBSP}mm${sum}`;
}

/** Every measurement, newest first, with its figures as taken and what the server made of them. */
export function MeasurementList({
  athleteId,
  measurements,
  unit,
  canRemove,
  linkedKeys,
}: {
  athleteId: string;
  measurements: readonly BodyMeasurementView[];
  unit: WeightUnit;
  canRemove: boolean;
  linkedKeys?: LinkedKeys;
}) {
  const remove = useDeleteBodyMeasurement(athleteId, { linkedKeys });
  if (measurements.length === 0) return null;
  return (
    <Card aria-labelledby="body-measurements">
      <CardHeader id="body-measurements" title="Measurements" />
      <ul className="divide-y divide-line">
        {[...measurements].reverse().map((m) => (
          <li key={m.id} className="flex flex-wrap items-start justify-between gap-2 py-3">
            <div className="min-w-0 flex-1">
              <p className="font-semibold text-ink tabular-nums">
                {formatDate(m.date)} ·{' '}
                {m.estimate ? `${formatNumber(m.estimate.fatPercent, 1, 1)}${NBSP}% fat` : 'no estimate'}
                {m.leanMassKg !== null ? ` · lean ${formatWeight(m.leanMassKg, unit)}` : ''}
              </p>
              <p className="text-sm text-ink-muted tabular-nums">
                {BODY_COMPOSITION_METHOD_LABELS[m.method]}: {figures(m, lengthUnitFor(unit))}
              </p>
              <p className="text-xs text-ink-faint">
                {m.estimate?.equation ? `${m.estimate.equation} · ` : ''}measured by {m.measuredBy}, entered
                by {m.enteredBy.name}
              </p>
            </div>
            {canRemove ? (
              <Button
                variant="ghost"
                size="sm"
                icon={<TrashIcon />}
                loading={remove.isPending && remove.variables === m.id}
                onClick={() => {
                  if (window.confirm(`Remove the measurement of ${formatDate(m.date)}?`)) remove.mutate(m.id);
                }}
              >
                Remove
              </Button>
            ) : null}
          </li>
        ))}
      </ul>
    </Card>
  );
}
