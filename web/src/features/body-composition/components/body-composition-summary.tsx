import {
  BODY_COMPOSITION_METHOD_LABELS,
  type BodyCompositionView,
  type BodyMeasurementView,
  type WeightUnit,
} from '@driftmark/shared';
import { Alert } from '@/components/ui/alert';
import { Card, CardHeader } from '@/components/ui/card';
import { formatDate, formatNumber, formatWeight, NBSP } from '@/lib/format';

/** The newest measurement with an estimate: % fat, lean and fat mass, and the method error. */
export function BodyCompositionSummary({ view, unit }: { view: BodyCompositionView; unit: WeightUnit }) {
  const latest: BodyMeasurementView | undefined = [...view.measurements].reverse().find((m) => m.estimate);
  return (
    <Card aria-labelledby="body-latest">
      <CardHeader id="body-latest" title="Latest estimate" />
      {latest?.estimate ? (
        <>
          <dl className="grid grid-cols-2 gap-4 sm:grid-cols-4">
            <Figure label="Body fat" value={`${formatNumber(latest.estimate.fatPercent, 1, 1)}${NBSP}%`} />
            <Figure
              label="Lean mass"
              value={latest.leanMassKg !== null ? formatWeight(latest.leanMassKg, unit) : '—'}
            />
            <Figure
              label="Fat mass"
              value={latest.fatMassKg !== null ? formatWeight(latest.fatMassKg, unit) : '—'}
            />
            <Figure
              label="Trend weight that day"
              value={latest.trendWeightKg !== null ? formatWeight(latest.trendWeightKg, unit) : '—'}
            />
          </dl>
          <p className="mt-3 text-sm text-ink-muted">
            {formatDate(latest.date)} · {BODY_COMPOSITION_METHOD_LABELS[latest.method]} ·{' '}
            {latest.estimate.equation} · measured by {latest.measuredBy}
          </p>
          {latest.trendWeightKg === null ? (
            <p className="mt-1 text-sm text-ink-muted">
              No weigh-in on or before that day yet, so no lean or fat mass.
            </p>
          ) : null}
        </>
      ) : (
        <p className="text-sm text-ink-muted">No measurement yet. Enter skinfolds or circumferences below.</p>
      )}
      <Alert tone="caution" live={false} className="mt-4">
        {view.caution}
      </Alert>
    </Card>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-xs font-semibold tracking-wide text-ink-faint uppercase">{label}</dt>
      <dd className="text-xl font-semibold text-ink tabular-nums">{value}</dd>
    </div>
  );
}
