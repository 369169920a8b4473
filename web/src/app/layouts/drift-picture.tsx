/**
 * The picture beside the signed-out forms: a made-up weight trend drifting through its target band
 * towards an event, with one pinned mark. Decoration only; the words beside it carry the meaning.
 */
export function DriftPicture() {
  // Invented points (kg) for 28 days, and the exponentially smoothed trend through them.
  const points = [
    74.6, 74.8, 74.2, 74.5, 74.0, 74.5, 74.0, 73.8, 74.3, 73.8, 73.9, 73.5, 73.9, 73.3, 73.6, 73.4, 73.7,
    73.1, 73.4, 72.9, 73.5, 72.9, 72.6, 73.1, 72.6, 72.8, 72.4, 72.6,
  ];
  const trend: number[] = [];
  points.forEach((w, i) => trend.push(i === 0 ? w : trend[i - 1]! + 0.1 * (w - trend[i - 1]!)));
  const x = (i: number) => 30 + i * 13;
  const y = (kg: number) => 40 + (75.0 - kg) * (200 / 2.8);
  // The plan: a straight descent to the event, ± 0.45 kg.
  const band = (i: number) => 74.6 - (i * 1.8) / 27;
  const bandPath =
    `M ${x(0)} ${y(band(0) + 0.45)} ` +
    points.map((_, i) => `L ${x(i)} ${y(band(i) + 0.45)}`).join(' ') +
    ` L ${x(points.length - 1)} ${y(band(points.length - 1) - 0.45)} ` +
    points
      .map((_, i) => points.length - 1 - i)
      .map((i) => `L ${x(i)} ${y(band(i) - 0.45)}`)
      .join(' ') +
    ' Z';
  const trendPath = trend
    .map((t, i) => `${i === 0 ? 'M' : 'L'} ${x(i).toFixed(1)} ${y(t).toFixed(1)}`)
    .join(' ');

  return (
    <div className="flex h-full flex-col justify-center px-12 py-16">
      <p className="max-w-md text-2xl font-bold tracking-tight text-ink">
        Plans, daily check-ins and countdowns, for athletes and the coaches who prepare them.
      </p>
      <p className="mt-3 max-w-md text-ink-muted">
        Each day is read against the targets in force that day, so drift shows early and calmly.
      </p>
      <svg viewBox="0 0 400 270" className="mt-10 w-full max-w-lg" aria-hidden="true">
        <path d={bandPath} fill="var(--color-accent-soft)" />
        {[0, 1, 2, 3, 4].map((i) => (
          <line
            key={i}
            x1="30"
            x2="381"
            y1={40 + i * 50}
            y2={40 + i * 50}
            stroke="var(--color-line)"
            strokeWidth="1"
          />
        ))}
        <path
          d={trendPath}
          fill="none"
          stroke="var(--color-accent)"
          strokeWidth="2.5"
          strokeLinecap="round"
        />
        {points.map((w, i) => {
          const off = Math.abs(w - band(i)) > 0.45;
          return (
            <circle
              key={i}
              cx={x(i)}
              cy={y(w)}
              r="3.2"
              fill={off ? 'var(--color-surface)' : 'var(--color-ink-muted)'}
              stroke={off ? 'var(--color-drifting)' : 'none'}
              strokeWidth="1.6"
            />
          );
        })}
        <line
          x1={x(13)}
          x2={x(13)}
          y1="30"
          y2="244"
          stroke="var(--color-mark)"
          strokeWidth="1.5"
          strokeDasharray="3 3"
        />
        <circle cx={x(13)} cy="30" r="5" fill="var(--color-mark)" />
        <line x1="381" x2="381" y1="30" y2="244" stroke="var(--color-ink-faint)" strokeWidth="1" />
        <text
          x="376"
          y="260"
          textAnchor="end"
          fontSize="11"
          fill="var(--color-ink-faint)"
          fontFamily="inherit"
        >
          event
        </text>
      </svg>
    </div>
  );
}
