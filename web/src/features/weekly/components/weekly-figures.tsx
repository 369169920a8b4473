import type { WeeklyFigures, WeightUnit } from '@driftmark/shared';
import { formatDate, formatNumber, formatWeight, NBSP } from '@/lib/format';
import { metricLabel, percent, ratingLabel } from '../utils/weekly';

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex items-baseline justify-between gap-4 border-b border-line py-2 last:border-b-0">
      <dt className="text-sm text-ink-muted">{label}</dt>
      <dd className="text-right text-sm font-semibold text-ink tabular-nums">{children}</dd>
    </div>
  );
}

function weightChange(changeKg: number, unit: WeightUnit): string {
  if (Math.abs(changeKg) < 0.05) return 'about the same as the week before';
  const amount = formatWeight(Math.abs(changeKg), unit);
  return changeKg < 0 ? `${amount} lighter than the week before` : `${amount} heavier than the week before`;
}

/** The week's figures, read-only and in plain words (athlete and coach alike). */
export function WeeklyFiguresList({
  figures,
  weightUnit,
}: {
  figures: WeeklyFigures;
  weightUnit: WeightUnit;
}) {
  const ratings = Object.entries(figures.ratings).filter(([, v]) => v !== null) as Array<[string, number]>;
  const adherence = figures.adherence.filter((a) => a.adherence !== null || a.loggedShare !== null);
  return (
    <div className="space-y-4">
      <p className="text-sm text-ink-muted tabular-nums">
        {formatDate(figures.weekStart, 'short')} – {formatDate(figures.weekEnd, 'short')}
      </p>
      <dl aria-label="Weight">
        <Row label="Mean weight">
          {figures.meanWeightKg !== null
            ? formatWeight(figures.meanWeightKg, weightUnit)
            : figures.weighIns === 0
              ? 'No weigh-ins'
              : 'Too few weigh-ins for a mean'}
        </Row>
        {figures.changeKg !== null ? (
          <Row label="Change of the week’s mean">{weightChange(figures.changeKg, weightUnit)}</Row>
        ) : null}
        <Row label="Weigh-ins">{`${figures.weighIns} of 7 days`}</Row>
        {figures.rate ? (
          <Row label="14-day rate">
            {`${figures.rate.percentPerWeek < 0 ? '\u2212' : '+'}${formatNumber(Math.abs(figures.rate.percentPerWeek), 1, 1)}${NBSP}% a week`}
            <span className="block text-xs font-normal text-ink-faint">
              {formatDate(figures.rate.from, 'short')} – {formatDate(figures.rate.to, 'short')}
            </span>
          </Row>
        ) : null}
      </dl>
      {adherence.length > 0 ? (
        <div>
          <h3 className="mb-1 text-sm font-semibold text-ink">On plan</h3>
          <dl aria-label="On plan">
            {adherence.map((a) => (
              <Row key={a.metric} label={metricLabel(a.metric)}>
                {a.adherence === null ? 'Not logged' : `${percent(a.adherence)} of logged days`}
                {a.loggedShare !== null ? (
                  <span className="block text-xs font-normal text-ink-faint">
                    logged on {percent(a.loggedShare)} of days
                  </span>
                ) : null}
              </Row>
            ))}
          </dl>
        </div>
      ) : null}
      <div>
        <h3 className="mb-1 text-sm font-semibold text-ink">Evenings and activity</h3>
        <dl aria-label="Evenings and activity">
          {ratings.map(([key, value]) => (
            <Row key={key} label={ratingLabel(key)}>{`${formatNumber(value, 1, 1)} of 5`}</Row>
          ))}
          <Row label="Steps a day">
            {figures.stepsMean === null ? 'Not logged' : formatNumber(figures.stepsMean)}
          </Row>
          <Row label="Sleep a night">
            {figures.sleepHoursMean === null
              ? 'Not logged'
              : `${formatNumber(figures.sleepHoursMean, 1, 1)} h`}
          </Row>
        </dl>
      </div>
      {figures.photoIds.length > 0 ? (
        <div>
          <h3 className="mb-2 text-sm font-semibold text-ink">Photos</h3>
          <ul className="grid grid-cols-4 gap-2" aria-label="Photos of the week">
            {figures.photoIds.map((id) => (
              <li key={id}>
                <img
                  src={`/api/photos/${encodeURIComponent(id)}/thumb`}
                  alt="Condition photo"
                  loading="lazy"
                  className="aspect-square w-full rounded-md border border-line object-cover"
                />
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
