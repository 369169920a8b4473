import { WEIGHT_UNIT_LABELS, weightFromKg, type MarkView, type TrendView } from '@driftmark/shared';
import { useMemo } from 'react';
import {
  Area,
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceArea,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
  type DotItemDotProps,
} from 'recharts';
import { cn } from '@/lib/cn';
import { formatDate, formatWeight } from '@/lib/format';
import {
  countdownRuns,
  marksOnChart,
  weightAxis,
  weightPoints,
  type PinRequest,
  type WeightPoint,
} from '../utils/chart-data';
import { dayDiff } from '../utils/dates';
import { AXIS_STROKE, AXIS_TICK, CHART_MARGIN, GRID_STROKE, tickDate, tickNumber } from './axis';
import { ChartFrame, LegendItem } from './chart-frame';
import { markLayers, selectionLayer } from './chart-layers';
import { ChartPatterns, useChartPatternIds } from './chart-patterns';
import { DayTooltip } from './day-tooltip';
import type { ViewerUnits } from './metric-values';
import { usePinDrag } from './use-pin-drag';

interface WeightChartProps {
  view: TrendView;
  units: ViewerUnits;
  /** Drawn as a reference line for athletes who make weight. */
  weighInLimitKg?: number | null;
  marks?: readonly MarkView[];
  /** Given only to viewers who may annotate: click a day or drag across days to pin a mark. */
  onPin?: (pin: PinRequest) => void;
  /** Opens a mark (its pin on the chart or its line under it). */
  onMarkClick?: (markId: string) => void;
  /** The mark in focus (picked on the chart or in the list), drawn highlighted. */
  selectedMarkId?: string | null;
  title?: string;
  level?: 2 | 3;
  height?: number;
  /** A shorter legend for the phone screen. */
  compact?: boolean;
}

function WeighInDot(props: DotItemDotProps) {
  const { cx, cy, payload } = props;
  const p = payload as WeightPoint;
  if (p.weight === null || typeof cx !== 'number' || typeof cy !== 'number') return null;
  return (
    <circle
      cx={cx}
      cy={cy}
      r={3}
      fill="var(--color-ink-muted)"
      stroke="var(--color-surface)"
      strokeWidth={1}
    />
  );
}

/**
 * Weight over the range: each morning weigh-in as a point, the smoothed trend as a line (Walker,
 * The Hacker's Diet), the guidance band as a wedge from the first trend value, countdown days
 * shaded, the weigh-in limit, the projection to a near event with its 80 % interval, and the marks.
 */
export function WeightChart({
  view,
  units,
  weighInLimitKg = null,
  marks = [],
  onPin,
  onMarkClick,
  selectedMarkId = null,
  title = 'Weight',
  level = 3,
  height = 300,
  compact = false,
}: WeightChartProps) {
  const unit = units.weight;
  const points = useMemo(() => weightPoints(view, unit), [view, unit]);
  const limit = weighInLimitKg !== null ? Math.round(weightFromKg(weighInLimitKg, unit) * 100) / 100 : null;
  const axis = weightAxis(points, limit);
  const domain = axis.domain;
  const byDate = useMemo(() => new Map(view.days.map((d) => [d.date, d])), [view.days]);
  const runs = useMemo(() => countdownRuns(view.days), [view.days]);
  const chartMarks = useMemo(
    () => marksOnChart(marks, 'weight', view.from, view.to),
    [marks, view.from, view.to],
  );
  const ids = useChartPatternIds();
  const pin = usePinDrag({ metric: 'weight', from: view.from, to: view.to, onPin });
  const lastDate = points[points.length - 1]?.date;
  const eventShown =
    view.eventDate !== null &&
    lastDate !== undefined &&
    view.eventDate <= lastDate &&
    view.eventDate >= view.from;
  const projected = points.find((p) => p.date === view.projection?.date && p.projection !== null);
  const hasWeights = view.days.some((d) => d.weightKg !== null);
  const band = view.rate?.band ?? null;
  const unitLabel = WEIGHT_UNIT_LABELS[unit];
  const layers = markLayers(chartMarks, domain[1], onMarkClick, selectedMarkId);

  return (
    <ChartFrame
      title={title}
      level={level}
      subtitle={`Morning weigh-ins and the trend, in ${unitLabel}`}
      onPinButton={onPin ? () => onPin({ metric: 'weight', fromDate: view.to, toDate: view.to }) : undefined}
      marks={chartMarks}
      onMarkClick={onMarkClick}
      selectedMarkId={selectedMarkId}
      legend={
        <>
          <LegendItem swatch={<circle cx="9" cy="6" r="3" fill="var(--color-ink-muted)" />}>
            Weigh-in
          </LegendItem>
          <LegendItem swatch={<path d="M1 6h16" stroke="var(--color-accent)" strokeWidth="2.5" />}>
            Trend
          </LegendItem>
          {band ? (
            <LegendItem
              swatch={
                <rect
                  x="1"
                  y="2"
                  width="16"
                  height="8"
                  fill="var(--color-accent-soft)"
                  stroke="var(--color-accent)"
                  strokeDasharray="3 2"
                />
              }
            >
              Guidance {band.source ? `(${band.source})` : ''}
            </LegendItem>
          ) : view.rate?.paused ? (
            <span data-testid="weight-chart-band-note" className="text-ink-muted">
              {view.rate.bandNote}
            </span>
          ) : null}
          {projected ? (
            <LegendItem
              swatch={<path d="M1 6h16" stroke="var(--color-accent)" strokeWidth="2" strokeDasharray="4 3" />}
            >
              Projection, 80 % range
            </LegendItem>
          ) : null}
          {limit !== null ? (
            <LegendItem
              swatch={
                <path d="M1 6h16" stroke="var(--color-off-plan)" strokeWidth="1.5" strokeDasharray="5 3" />
              }
            >
              Weigh-in limit
            </LegendItem>
          ) : null}
          {runs.length > 0 && !compact ? (
            <LegendItem
              swatch={
                <rect
                  x="1"
                  y="1"
                  width="16"
                  height="10"
                  fill={`url(#${ids.countdown})`}
                  stroke="var(--color-caution)"
                  strokeWidth="0.5"
                />
              }
            >
              Countdown days
            </LegendItem>
          ) : null}
          {chartMarks.length > 0 ? (
            <LegendItem
              swatch={<circle cx="9" cy="6" r="5" fill="var(--color-mark)" stroke="var(--color-ink)" />}
            >
              Mark
            </LegendItem>
          ) : null}
        </>
      }
    >
      <ChartPatterns ids={ids} />
      {!hasWeights ? <p className="mb-1 text-sm text-ink-muted">No weigh-ins in this range yet.</p> : null}
      <div className={cn('select-none', onPin && 'cursor-crosshair')} style={{ height }} data-chart="weight">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart
            data={points}
            margin={CHART_MARGIN}
            title={`${title} chart`}
            desc={`Weigh-ins and trend from ${formatDate(view.from)} to ${formatDate(view.to)}, in ${unitLabel}.`}
            throttledEvents={onPin ? [] : undefined}
            {...pin.handlers}
          >
            <CartesianGrid stroke={GRID_STROKE} vertical={false} />
            {runs.map((r) => (
              <ReferenceArea
                key={r.from}
                x1={r.from}
                x2={r.to}
                fill={`url(#${ids.countdown})`}
                ifOverflow="hidden"
                label={
                  // Named in the chart only where the shading is wide enough; the legend and tooltip say it too.
                  !compact && dayDiff(r.from, r.to) + 1 >= points.length / 5
                    ? {
                        value: 'Countdown',
                        position: 'insideTopLeft',
                        fontSize: 11,
                        fill: 'var(--color-caution)',
                      }
                    : undefined
                }
              />
            ))}
            <XAxis
              dataKey="date"
              tickFormatter={tickDate}
              minTickGap={28}
              tick={AXIS_TICK}
              stroke={AXIS_STROKE}
              tickLine={false}
            />
            <YAxis
              domain={domain}
              ticks={axis.ticks}
              allowDataOverflow
              tickFormatter={tickNumber(1)}
              tick={AXIS_TICK}
              stroke={AXIS_STROKE}
              tickLine={false}
              width={44}
              label={{
                value: unitLabel,
                position: 'insideTopLeft',
                offset: 0,
                dy: -18,
                fontSize: 11,
                fill: 'var(--color-ink-muted)',
              }}
            />
            {band ? (
              <Area
                dataKey="band"
                type="linear"
                name="Guidance band"
                stroke="var(--color-accent)"
                strokeWidth={1}
                strokeDasharray="4 3"
                fill="var(--color-accent-soft)"
                fillOpacity={0.75}
                activeDot={false}
                isAnimationActive={false}
                tooltipType="none"
              />
            ) : null}
            {projected ? (
              <Area
                dataKey="cone"
                type="linear"
                name="Projection range"
                stroke="var(--color-ink-faint)"
                strokeWidth={1}
                strokeDasharray="2 2"
                fill="var(--color-sunken)"
                fillOpacity={0.8}
                activeDot={false}
                isAnimationActive={false}
                tooltipType="none"
              />
            ) : null}
            {limit !== null ? (
              <ReferenceLine
                y={limit}
                stroke="var(--color-off-plan)"
                strokeWidth={1.5}
                strokeDasharray="6 3"
                ifOverflow="extendDomain"
                label={{
                  value: `Weigh-in limit ${formatWeight(weighInLimitKg!, unit)}`,
                  position: 'insideBottomLeft',
                  fontSize: 11,
                  fill: 'var(--color-off-plan)',
                }}
              />
            ) : null}
            {eventShown ? (
              <ReferenceLine
                x={view.eventDate!}
                stroke="var(--color-ink)"
                strokeWidth={1}
                label={{ value: 'Event', position: 'insideTopRight', fontSize: 11, fill: 'var(--color-ink)' }}
              />
            ) : null}
            {layers.extents}
            <Line
              dataKey="trend"
              name="Trend"
              type="monotone"
              stroke="var(--color-accent)"
              strokeWidth={2.5}
              dot={false}
              connectNulls
              isAnimationActive={false}
            />
            {projected ? (
              <Line
                dataKey="projection"
                name="Projection"
                type="linear"
                stroke="var(--color-accent)"
                strokeWidth={2}
                strokeDasharray="5 4"
                dot={false}
                activeDot={false}
                isAnimationActive={false}
              />
            ) : null}
            <Line
              dataKey="weight"
              name="Weigh-in"
              stroke="none"
              dot={WeighInDot}
              activeDot={{ r: 5, fill: 'var(--color-ink)', stroke: 'var(--color-surface)' }}
              isAnimationActive={false}
            />
            {projected && view.projection ? (
              <ReferenceDot
                x={projected.date}
                y={projected.projection!}
                r={5}
                fill="var(--color-surface)"
                stroke="var(--color-accent)"
                strokeWidth={2}
                ifOverflow="visible"
                label={{
                  value: `${formatWeight(view.projection.kg, unit)}`,
                  position: 'left',
                  fontSize: 11,
                  fill: 'var(--color-accent-strong)',
                }}
              />
            ) : null}
            {selectionLayer(pin.selection)}
            {layers.pins}
            <Tooltip
              isAnimationActive={false}
              cursor={{ stroke: 'var(--color-ink-faint)', strokeDasharray: '3 3' }}
              content={({ active, label }) =>
                active && typeof label === 'string' ? (
                  <DayTooltip
                    day={byDate.get(label)}
                    date={label}
                    units={units}
                    weight
                    extra={
                      view.projection && label === view.projection.date ? (
                        <p className="mt-2 border-t border-line pt-2 text-ink-muted tabular-nums">
                          Projected {formatWeight(view.projection.kg, unit)} (80 % range{' '}
                          {formatWeight(view.projection.lowKg, unit)} –{' '}
                          {formatWeight(view.projection.highKg, unit)})
                        </p>
                      ) : null
                    }
                  />
                ) : null
              }
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
    </ChartFrame>
  );
}
