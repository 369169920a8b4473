import { VOLUME_UNIT_LABELS, type MarkView, type TrendView } from '@driftmark/shared';
import { useMemo } from 'react';
import { formatVolume } from '@/lib/format';
import { fluidPoints, marksOnChart, type PinRequest } from '../utils/chart-data';
import { BarLegend } from './bar-legend';
import { ChartFrame, markDates } from './chart-frame';
import { ChartPatterns, useChartPatternIds } from './chart-patterns';
import type { ViewerUnits } from './metric-values';
import { TargetBarPlot } from './target-bar-plot';

interface FluidsChartProps {
  view: TrendView;
  units: ViewerUnits;
  marks?: readonly MarkView[];
  onPin?: (pin: PinRequest) => void;
  onMarkClick?: (markId: string) => void;
  /** The mark in focus (picked on the chart or in the list), drawn highlighted. */
  selectedMarkId?: string | null;
  level?: 2 | 3;
  height?: number;
}

/** The day's fluids against the water target, with cut-off breaches marked and listed. */
export function FluidsChart({
  view,
  units,
  marks = [],
  onPin,
  onMarkClick,
  selectedMarkId = null,
  level = 3,
  height,
}: FluidsChartProps) {
  const points = useMemo(() => fluidPoints(view.days, units.volume), [view.days, units.volume]);
  const chartMarks = useMemo(
    () => marksOnChart(marks, 'fluids', view.from, view.to),
    [marks, view.from, view.to],
  );
  const ids = useChartPatternIds();
  const breaches = view.days.filter((d) => d.breach && d.breach.excessMl > 0);
  return (
    <ChartFrame
      title="Fluids"
      level={level}
      subtitle={`Fluids logged against the water target, in ${VOLUME_UNIT_LABELS[units.volume]}`}
      onPinButton={onPin ? () => onPin({ metric: 'fluids', fromDate: view.to, toDate: view.to }) : undefined}
      marks={chartMarks}
      onMarkClick={onMarkClick}
      selectedMarkId={selectedMarkId}
      legend={<BarLegend ids={ids} breaches={breaches.length > 0} />}
      footer={
        breaches.length > 0 ? (
          <details className="mt-2 text-xs text-ink-muted">
            <summary className="cursor-pointer font-semibold text-caution">
              {breaches.length === 1 ? '1 day' : `${breaches.length} days`} over the allowance after the
              cut-off
            </summary>
            <ul className="mt-1 space-y-0.5 tabular-nums">
              {breaches.map((d) => (
                <li key={d.date}>
                  {markDates(d.date, d.date)}: {formatVolume(d.breach!.afterCutoffMl, units.volume)} after{' '}
                  {d.breach!.cutoff} (allowance {formatVolume(d.breach!.allowanceMl, units.volume)})
                </li>
              ))}
            </ul>
          </details>
        ) : null
      }
    >
      <ChartPatterns ids={ids} />
      <TargetBarPlot
        name="Fluids chart"
        points={points}
        days={view.days}
        from={view.from}
        to={view.to}
        units={units}
        unitLabel={VOLUME_UNIT_LABELS[units.volume]}
        tooltipMetrics={['water']}
        pinMetric="fluids"
        ids={ids}
        chartMarks={chartMarks}
        onPin={onPin}
        onMarkClick={onMarkClick}
        selectedMarkId={selectedMarkId}
        height={height}
      />
    </ChartFrame>
  );
}
