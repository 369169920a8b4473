import type { DriftMetric, TrendDay } from '@driftmark/shared';
import { useMemo } from 'react';
import {
  Bar,
  CartesianGrid,
  ComposedChart,
  Line,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
  type BarShapeProps,
  type DotItemDotProps,
} from 'recharts';
import { cn } from '@/lib/cn';
import { formatNumber } from '@/lib/format';
import { barAxis, type BarPoint, type ChartMark, type PinRequest } from '../utils/chart-data';
import { AXIS_STROKE, AXIS_TICK, CHART_MARGIN, GRID_STROKE, tickDate, tickNumber } from './axis';
import { markLayers, selectionLayer } from './chart-layers';
import { barPaint, type ChartPatternIds } from './chart-patterns';
import { DayTooltip } from './day-tooltip';
import { ChartGlyph } from './drift-glyph';
import type { ViewerUnits } from './metric-values';
import { usePinDrag } from './use-pin-drag';

interface TargetBarPlotProps {
  /** Names the drawing for screen readers ("Energy chart"). */
  name: string;
  points: BarPoint[];
  days: TrendDay[];
  from: string;
  to: string;
  units: ViewerUnits;
  unitLabel: string;
  /** The metrics the tooltip lists. */
  tooltipMetrics: readonly DriftMetric[];
  pinMetric: PinRequest['metric'];
  ids: ChartPatternIds;
  chartMarks: ChartMark[];
  onPin?: (pin: PinRequest) => void;
  onMarkClick?: (markId: string) => void;
  selectedMarkId?: string | null;
  height?: number;
  /** Decimal places of the value axis. */
  digits?: number;
}

/** Breach markers carry their excess in words only while the bars are wide enough to read it. */
const BREACH_LABEL_MAX_DAYS = 21;

/**
 * One metric's days as bars against its target (a step line), each bar painted and topped with its
 * drift state's texture and shape; fluids add a triangle for a cut-off breach.
 */
export function TargetBarPlot({
  name,
  points,
  days,
  from,
  to,
  units,
  unitLabel,
  tooltipMetrics,
  pinMetric,
  ids,
  chartMarks,
  onPin,
  onMarkClick,
  selectedMarkId = null,
  height = 220,
  digits = 0,
}: TargetBarPlotProps) {
  const axis = barAxis(points);
  const domain = axis.domain;
  const byDate = useMemo(() => new Map(days.map((d) => [d.date, d])), [days]);
  const pin = usePinDrag({ metric: pinMetric, from, to, onPin });
  const layers = markLayers(chartMarks, domain[1], onMarkClick, selectedMarkId);
  const hasBreaches = points.some((p) => p.breachMl !== null);
  const labelBreaches = points.length <= BREACH_LABEL_MAX_DAYS;

  const shape = (props: BarShapeProps) => {
    const p = props.payload as BarPoint | undefined;
    if (!p || p.actual === null || !(props.height > 0)) return <g />;
    const paint = barPaint(p.state, ids);
    return (
      <rect
        x={props.x}
        y={props.y}
        width={props.width}
        height={props.height}
        fill={paint.fill}
        stroke={paint.stroke}
        strokeWidth={1.2}
        strokeDasharray={paint.dash}
      />
    );
  };

  const glyph = (props: DotItemDotProps) => {
    const p = props.payload as BarPoint;
    if (p.state === null || typeof props.cx !== 'number' || typeof props.cy !== 'number') return null;
    return <ChartGlyph key={p.date} state={p.state} cx={props.cx} cy={props.cy - 7} r={3.5} />;
  };

  const breach = (props: DotItemDotProps) => {
    const p = props.payload as BarPoint;
    if (p.breachMl === null || typeof props.cx !== 'number' || typeof props.cy !== 'number') return null;
    const { cx } = props;
    const cy = props.cy - 19;
    return (
      <g key={p.date}>
        <path
          d={`M${cx} ${cy - 5}L${cx + 5} ${cy + 4}L${cx - 5} ${cy + 4}Z`}
          fill="var(--color-caution)"
          stroke="var(--color-surface)"
          strokeWidth={1}
        />
        {labelBreaches ? (
          <text
            x={cx}
            y={cy - 8}
            textAnchor="middle"
            fontSize={10}
            fontWeight={600}
            fill="var(--color-caution)"
          >
            +{formatNumber(p.breachMl)}
          </text>
        ) : null}
      </g>
    );
  };

  return (
    <div className={cn('select-none', onPin && 'cursor-crosshair')} style={{ height }}>
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart
          data={points}
          margin={{ ...CHART_MARGIN, top: hasBreaches && labelBreaches ? 34 : CHART_MARGIN.top }}
          title={name}
          barCategoryGap="18%"
          throttledEvents={onPin ? [] : undefined}
          {...pin.handlers}
        >
          <CartesianGrid stroke={GRID_STROKE} vertical={false} />
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
            tickFormatter={tickNumber(digits)}
            tick={AXIS_TICK}
            stroke={AXIS_STROKE}
            tickLine={false}
            width={48}
            label={{
              value: unitLabel,
              position: 'insideTopLeft',
              offset: 0,
              dy: -18,
              fontSize: 11,
              fill: 'var(--color-ink-muted)',
            }}
          />
          {layers.extents}
          <Bar dataKey="actual" name="Logged" shape={shape} isAnimationActive={false} maxBarSize={28} />
          <Line
            dataKey="target"
            name="Target"
            type="step"
            stroke="var(--color-ink)"
            strokeWidth={2}
            dot={false}
            activeDot={false}
            isAnimationActive={false}
          />
          <Line
            dataKey="glyphY"
            name="Drift"
            stroke="none"
            dot={glyph}
            activeDot={false}
            isAnimationActive={false}
            tooltipType="none"
          />
          {hasBreaches ? (
            <Line
              dataKey="breachY"
              name="Cut-off breach"
              stroke="none"
              dot={breach}
              activeDot={false}
              isAnimationActive={false}
              tooltipType="none"
            />
          ) : null}
          {selectionLayer(pin.selection)}
          {layers.pins}
          <Tooltip
            isAnimationActive={false}
            cursor={{ fill: 'var(--color-sunken)', fillOpacity: 0.6 }}
            content={({ active, label }) =>
              active && typeof label === 'string' ? (
                <DayTooltip day={byDate.get(label)} date={label} units={units} metrics={tooltipMetrics} />
              ) : null
            }
          />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
