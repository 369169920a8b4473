import {
  DRIFT_METRIC_UNITS,
  VOLUME_UNIT_LABELS,
  volumeFromMl,
  type DriftMetric,
  type VolumeUnit,
  type WeightUnit,
} from '@driftmark/shared';
import { formatNumber, NBSP } from '@/lib/format';

/** The viewer's units (the signed-in user's preference). */
export interface ViewerUnits {
  weight: WeightUnit;
  volume: VolumeUnit;
}

/** A metric's unit as the viewer reads it (fluids in mL or fl oz). */
export function metricUnit(metric: DriftMetric, units: Pick<ViewerUnits, 'volume'>): string {
  return metric === 'water' ? VOLUME_UNIT_LABELS[units.volume] : DRIFT_METRIC_UNITS[metric];
}

/** A bare figure of a metric (API units in, viewer units out), without its unit. */
export function metricFigure(metric: DriftMetric, value: number, units: Pick<ViewerUnits, 'volume'>): string {
  if (metric === 'water')
    return formatNumber(volumeFromMl(value, units.volume), units.volume === 'ml' ? 0 : 1);
  return formatNumber(value, 0);
}

export function metricValue(metric: DriftMetric, value: number, units: Pick<ViewerUnits, 'volume'>): string {
  return `${metricFigure(metric, value, units)}${NBSP}${metricUnit(metric, units)}`;
}

/** "2,310 / 2,400 kcal", or "— / 2,400 kcal" when nothing was logged. */
export function actualOverTarget(
  metric: DriftMetric,
  actual: number | null,
  target: number | null,
  units: Pick<ViewerUnits, 'volume'>,
): string {
  const a = actual === null ? '—' : metricFigure(metric, actual, units);
  const t = target === null ? '—' : metricFigure(metric, target, units);
  return `${a} / ${t}${NBSP}${metricUnit(metric, units)}`;
}
