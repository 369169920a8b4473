import {
  WEIGHT_UNIT_LABELS,
  weightFromKg,
  type BodyMeasurementView,
  type WeightUnit,
} from '@driftmark/shared';
import { useId, useMemo } from 'react';
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { DISPLAY_LOCALE, formatDate, formatNumber, formatWeight } from '@/lib/format';

const dayMonth = new Intl.DateTimeFormat(DISPLAY_LOCALE, { day: 'numeric', month: 'short', timeZone: 'UTC' });
const tickDate = (value: unknown) => {
  if (typeof value !== 'string') return '';
  const [y, m, d] = value.split('-').map(Number);
  return y && m && d ? dayMonth.format(new Date(Date.UTC(y, m - 1, d))) : value;
};

const METRICS = {
  lean: { title: 'Lean mass', key: 'leanMassKg', stroke: 'var(--color-accent)', dash: undefined },
  fat: { title: 'Fat mass', key: 'fatMassKg', stroke: 'var(--color-caution)', dash: '5 3' },
} as const;

interface MassChartProps {
  metric: keyof typeof METRICS;
  measurements: readonly BodyMeasurementView[];
  unit: WeightUnit;
  height?: number;
}

/**
 * Lean or fat mass over time, one point per measurement with a mass (the server's figures, in the
 * viewer's weight unit). The list under the chart says the same in words.
 */
export function MassChart({ metric, measurements, unit, height = 200 }: MassChartProps) {
  const m = METRICS[metric];
  const titleId = useId();
  const points = useMemo(
    () =>
      measurements.flatMap((x) => {
        const kg = x[m.key];
        return kg === null ? [] : [{ date: x.date, value: weightFromKg(kg, unit), kg }];
      }),
    [measurements, m.key, unit],
  );
  if (points.length === 0) return null;
  const values = points.map((p) => p.value);
  const pad = Math.max(1, (Math.max(...values) - Math.min(...values)) * 0.2);
  const domain = [Math.floor(Math.min(...values) - pad), Math.ceil(Math.max(...values) + pad)];

  return (
    <figure
      aria-labelledby={titleId}
      className="min-w-0 rounded-lg border border-line bg-surface p-4 shadow-card print:break-inside-avoid"
    >
      <h3 id={titleId} className="text-base font-semibold text-ink">
        {m.title}
      </h3>
      <p className="mb-2 text-xs text-ink-muted">
        {WEIGHT_UNIT_LABELS[unit]}, from each measurement and that day&apos;s trend weight
      </p>
      <div style={{ height }} aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={points} margin={{ top: 12, right: 12, bottom: 0, left: 0 }}>
            <CartesianGrid stroke="var(--color-line)" vertical={false} />
            <XAxis
              dataKey="date"
              tickFormatter={tickDate}
              tick={{ fontSize: 11, fill: 'var(--color-ink-muted)' }}
              stroke="var(--color-line-strong)"
              minTickGap={16}
            />
            <YAxis
              domain={domain}
              width={40}
              tickFormatter={(v: number) => formatNumber(v, 0)}
              tick={{ fontSize: 11, fill: 'var(--color-ink-muted)' }}
              stroke="var(--color-line-strong)"
            />
            <Tooltip
              formatter={(_v, _n, item) => [formatWeight((item.payload as { kg: number }).kg, unit), m.title]}
              labelFormatter={(label) => (typeof label === 'string' ? formatDate(label) : '')}
            />
            <Line
              type="monotone"
              dataKey="value"
              stroke={m.stroke}
              strokeWidth={2}
              strokeDasharray={m.dash}
              dot={{ r: 4, fill: m.stroke }}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">
        {points.map((p) => `${formatDate(p.date)}: ${formatWeight(p.kg, unit)}`).join('; ')}
      </figcaption>
    </figure>
  );
}
