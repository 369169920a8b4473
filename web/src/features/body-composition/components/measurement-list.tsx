import {
  BODY_COMPOSITION_METHOD_LABELS,
  SKINFOLD_SITE_LABELS,
  SKINFOLD_SITES,
  type BodyMeasurementView,
  type WeightUnit,
} from '@driftmark/shared';
import { Button } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { TrashIcon } from '@/components/ui/icons';
import { formatDate, formatNumber, formatWeight, NBSP } from '@/lib/format';
import type { LinkedKeys } from '../api/body-composition-cache';
import { useDeleteBodyMeasurement } from '../api/delete-body-measurement';

function figures(m: BodyMeasurementView): string {
  if (m.method === 'circumference') {
    return [
      m.neckCm !== null ? `neck ${formatNumber(m.neckCm, 1)}` : null,
      m.waistCm !== null ? `waist ${formatNumber(m.waistCm, 1)}` : null,
      m.hipCm !== null ? `hip ${formatNumber(m.hipCm, 1)}` : null,
      m.heightCm !== null ? `height ${formatNumber(m.heightCm, 1)}` : null,
    ]
      .filter(Boolean)
      .join(', ')
      .concat(`${NBSP}cm`);
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
                {BODY_COMPOSITION_METHOD_LABELS[m.method]}: {figures(m)}
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
