import type { MarkView, TrendView } from '@driftmark/shared';
import { useMemo } from 'react';
import { barPoints, marksOnChart, type PinRequest } from '../utils/chart-data';
import { BarLegend } from './bar-legend';
import { ChartFrame } from './chart-frame';
import { ChartPatterns, useChartPatternIds } from './chart-patterns';
import type { ViewerUnits } from './metric-values';
import { TargetBarPlot } from './target-bar-plot';

interface EnergyChartProps {
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

/** The day's energy intake against the energy target. */
export function EnergyChart({
  view,
  units,
  marks = [],
  onPin,
  onMarkClick,
  selectedMarkId = null,
  level = 3,
  height,
}: EnergyChartProps) {
  const points = useMemo(() => barPoints(view.days, 'energy'), [view.days]);
  const chartMarks = useMemo(
    () => marksOnChart(marks, 'energy', view.from, view.to),
    [marks, view.from, view.to],
  );
  const ids = useChartPatternIds();
  return (
    <ChartFrame
      title="Energy"
      level={level}
      subtitle="Energy logged against the target, in kcal"
      onPinButton={onPin ? () => onPin({ metric: 'energy', fromDate: view.to, toDate: view.to }) : undefined}
      marks={chartMarks}
      onMarkClick={onMarkClick}
      selectedMarkId={selectedMarkId}
      legend={<BarLegend ids={ids} />}
    >
      <ChartPatterns ids={ids} />
      <TargetBarPlot
        name="Energy chart"
        points={points}
        days={view.days}
        from={view.from}
        to={view.to}
        units={units}
        unitLabel="kcal"
        tooltipMetrics={['energy']}
        pinMetric="energy"
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
