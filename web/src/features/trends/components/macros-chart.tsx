import { DRIFT_METRIC_LABELS, type MarkView, type TrendView } from '@driftmark/shared';
import { useMemo } from 'react';
import { barPoints, marksOnChart, type PinRequest } from '../utils/chart-data';
import { BarLegend } from './bar-legend';
import { ChartFrame } from './chart-frame';
import { ChartPatterns, useChartPatternIds } from './chart-patterns';
import type { ViewerUnits } from './metric-values';
import { TargetBarPlot } from './target-bar-plot';

const MACROS = ['protein', 'carbohydrate', 'fat'] as const;

interface MacrosChartProps {
  view: TrendView;
  units: ViewerUnits;
  marks?: readonly MarkView[];
  onPin?: (pin: PinRequest) => void;
  onMarkClick?: (markId: string) => void;
  /** The mark in focus (picked on the chart or in the list), drawn highlighted. */
  selectedMarkId?: string | null;
  level?: 2 | 3;
}

/** Protein, carbohydrate and fat against their targets: three small charts on one date axis. */
export function MacrosChart({
  view,
  units,
  marks = [],
  onPin,
  onMarkClick,
  selectedMarkId = null,
  level = 3,
}: MacrosChartProps) {
  const series = useMemo(
    () => MACROS.map((m) => ({ metric: m, points: barPoints(view.days, m) })),
    [view.days],
  );
  const chartMarks = useMemo(
    () => marksOnChart(marks, 'macros', view.from, view.to),
    [marks, view.from, view.to],
  );
  const ids = useChartPatternIds();
  return (
    <ChartFrame
      title="Macros"
      level={level}
      subtitle="Protein, carbohydrate and fat logged against their targets, in g"
      onPinButton={onPin ? () => onPin({ metric: 'macros', fromDate: view.to, toDate: view.to }) : undefined}
      marks={chartMarks}
      onMarkClick={onMarkClick}
      selectedMarkId={selectedMarkId}
      legend={<BarLegend ids={ids} />}
    >
      <ChartPatterns ids={ids} />
      <div className="grid gap-3 lg:grid-cols-3">
        {series.map(({ metric, points }) => (
          <div key={metric} className="min-w-0">
            <p className="text-xs font-semibold tracking-wide text-ink-muted uppercase">
              {DRIFT_METRIC_LABELS[metric]}
            </p>
            <TargetBarPlot
              name={`${DRIFT_METRIC_LABELS[metric]} chart`}
              points={points}
              days={view.days}
              from={view.from}
              to={view.to}
              units={units}
              unitLabel="g"
              tooltipMetrics={MACROS}
              pinMetric="macros"
              ids={ids}
              chartMarks={chartMarks}
              onPin={onPin}
              onMarkClick={onMarkClick}
              selectedMarkId={selectedMarkId}
              height={170}
            />
          </div>
        ))}
      </div>
    </ChartFrame>
  );
}
