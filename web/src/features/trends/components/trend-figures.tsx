import { WEIGHT_UNIT_LABELS, weightFromKg, type RateView, type TrendView } from '@driftmark/shared';
import type { ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { formatDate, formatEnergy, formatNumber, formatWeight, NBSP } from '@/lib/format';
import { signed } from '../utils/figures';
import type { ViewerUnits } from './metric-values';

/** "−0.8 %/week · guidance −1.0 to −0.5 %/week (Helms 2014)": the rate against its band in one line. */
export function rateLine(rate: RateView): string {
  const own = `${signed(rate.percentPerWeek)}${NBSP}%/week`;
  if (!rate.band) return own;
  const lo = Math.min(rate.band.minPct, rate.band.maxPct);
  const hi = Math.max(rate.band.minPct, rate.band.maxPct);
  return `${own} · guidance ${signed(lo)} to ${signed(hi)}${NBSP}%/week (${rate.band.source})`;
}

/** Flags listed before the rest fold away. */
const FLAGS_SHOWN = 4;

const PACE: Record<'inside' | 'faster' | 'slower' | 'outside', { text: string; tone: BadgeTone }> = {
  inside: { text: 'Inside the band', tone: 'on-plan' },
  faster: { text: 'Faster than the band', tone: 'off-plan' },
  slower: { text: 'Slower than the band', tone: 'drifting' },
  outside: { text: 'Outside the band', tone: 'drifting' },
};

function Figure({ label, value, children }: { label: string; value: ReactNode; children?: ReactNode }) {
  return (
    <div className="min-w-0 rounded-lg border border-line bg-surface p-4 shadow-card print:shadow-none">
      <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">{label}</p>
      <div className="mt-1 text-xl font-bold text-ink tabular-nums">{value}</div>
      {children ? <div className="mt-1 space-y-1 text-sm text-ink-muted">{children}</div> : null}
    </div>
  );
}

/** The coach's figures over the range: 14-day rate against the band, projection, maintenance, flags. */
export function TrendFigures({ view, units }: { view: TrendView; units: ViewerUnits }) {
  const { rate, projection, maintenance } = view;
  // The server's verdict on the rate against its band (null without a band).
  const pace = rate?.verdict?.pace ?? null;
  const unit = units.weight;
  return (
    <div className="space-y-3">
      <div className="grid gap-3 md:grid-cols-3">
        <Figure
          label="Rate, last 14 days"
          value={rate ? `${signed(rate.percentPerWeek)}${NBSP}%/week` : 'Not enough weigh-ins'}
        >
          {rate ? (
            <>
              {rate.band ? (
                <p data-testid="rate-line" className="tabular-nums">
                  {rateLine(rate)}
                </p>
              ) : (
                <p data-testid="rate-band-note">{rate.bandNote}</p>
              )}
              <p className="tabular-nums">
                {signed(weightFromKg(rate.kgPerWeek, unit), 2)}
                {NBSP}
                {WEIGHT_UNIT_LABELS[unit]}/week from {rate.points} weigh-ins, {formatDate(rate.from, 'short')}{' '}
                – {formatDate(rate.to, 'short')}
              </p>
              {pace ? <Badge tone={PACE[pace].tone}>{PACE[pace].text}</Badge> : null}
            </>
          ) : (
            <p>A rate needs at least 7 weigh-ins in the last 14 days.</p>
          )}
        </Figure>
        <Figure label="Projection" value={projection ? formatWeight(projection.kg, unit) : 'None'}>
          {projection ? (
            <p className="tabular-nums">
              on {formatDate(projection.date)} (event day), 80{NBSP}% range{' '}
              {formatWeight(projection.lowKg, unit)} – {formatWeight(projection.highKg, unit)}; the 14-day
              line carried forward.
            </p>
          ) : (
            <p>
              {view.eventDate
                ? 'Too few weigh-ins to project to the event.'
                : 'No event ahead to project to.'}
            </p>
          )}
        </Figure>
        <Figure
          label="Maintenance estimate"
          value={maintenance ? `About ${formatEnergy(maintenance.kcalPerDay)}/day` : 'Not yet'}
        >
          {maintenance ? (
            <>
              <p>
                A rule-of-thumb estimate, not a measurement: from {formatNumber(maintenance.days)} logged
                days, {formatDate(maintenance.from, 'short')} – {formatDate(maintenance.to, 'short')},
                countdown days left out.
              </p>
              <p className="text-xs text-ink-faint">{maintenance.note}</p>
            </>
          ) : (
            <p>A rule-of-thumb estimate needs more logged days (countdown days do not count).</p>
          )}
        </Figure>
      </div>
      {view.flags.length > 0 ? (
        <Alert
          tone="caution"
          title={
            view.flags.length === 1 ? '1 flag in this range' : `${view.flags.length} flags in this range`
          }
          live={false}
        >
          <FlagList flags={view.flags} />
        </Alert>
      ) : null}
    </div>
  );
}

/** Newest first; past the first few, the rest fold away so the charts stay near the top. */
function FlagList({ flags }: { flags: TrendView['flags'] }) {
  const sorted = [...flags].sort((a, b) => b.date.localeCompare(a.date));
  const item = (f: TrendView['flags'][number]) => (
    <li key={`${f.kind}-${f.date}`}>
      <span className="font-semibold text-ink tabular-nums">{formatDate(f.date, 'short')}</span>: {f.message}{' '}
      <span className="text-xs text-ink-faint">({f.source})</span>
    </li>
  );
  const first = sorted.slice(0, FLAGS_SHOWN);
  const rest = sorted.slice(FLAGS_SHOWN);
  return (
    <>
      <ul className="space-y-1">{first.map(item)}</ul>
      {rest.length > 0 ? (
        <details className="mt-1">
          <summary className="cursor-pointer font-semibold text-ink">
            {rest.length === 1 ? '1 earlier flag' : `${rest.length} earlier flags`}
          </summary>
          <ul className="mt-1 space-y-1">{rest.map(item)}</ul>
        </details>
      ) : null}
    </>
  );
}
