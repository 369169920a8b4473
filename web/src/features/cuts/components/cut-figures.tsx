import { kgToLb, type CutView, type WeightUnit } from '@driftmark/shared';
import { Alert } from '@/components/ui/alert';
import { formatNumber, formatWeight, NBSP } from '@/lib/format';
import { CUT_SEVERITY_LABELS } from './cut-warning-item';

/** A limit in both units, whichever the reader uses: "63.0 kg (138.9 lb)". */
export function bothUnits(kg: number): string {
  return `${formatNumber(kg, 1, 1)}${NBSP}kg (${formatNumber(kgToLb(kg), 1, 1)}${NBSP}lb)`;
}

const pct = (n: number) => `${formatNumber(n, 1, 1)}${NBSP}%`;

/** The projection at the weigh-in against the limit, as the server judged it. */
export function LimitGap({ cut, unit }: { cut: CutView; unit: WeightUnit }) {
  const { gap, weighIn } = cut;
  if (!weighIn) return null;
  if (!gap) {
    return (
      <p className="text-sm text-ink-muted">
        Limit {bothUnits(weighIn.limitKg)}. No projection yet: it needs 7 weigh-ins in the last 14 days.
      </p>
    );
  }
  return (
    <Alert
      tone={gap.over ? 'caution' : 'success'}
      title={gap.over ? 'Projected over the limit' : 'Projected under the limit'}
      live={false}
    >
      <p>{gap.summary}.</p>
      <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 sm:grid-cols-4">
        <div>
          <dt className="text-ink-faint">Limit</dt>
          <dd className="font-medium tabular-nums">{bothUnits(weighIn.limitKg)}</dd>
        </div>
        <div>
          <dt className="text-ink-faint">Projected</dt>
          <dd className="font-medium tabular-nums">
            {formatWeight(gap.projectedKg, unit)} ({formatWeight(gap.lowKg, unit)}–
            {formatWeight(gap.highKg, unit)}, 80{NBSP}%)
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">Gap</dt>
          <dd className="font-medium tabular-nums">
            {formatWeight(gap.overKg, unit)} · {pct(gap.overPct)}
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">Days left</dt>
          <dd className="font-medium tabular-nums">{gap.daysLeft}</dd>
        </div>
      </dl>
    </Alert>
  );
}

/** Today's figures of the plan in force: the weight to stay on plan, the weekly rate, the acute share. */
export function PlanFigures({ cut, unit }: { cut: CutView; unit: WeightUnit }) {
  const f = cut.figures;
  const plan = cut.plan;
  if (!f || !plan) return null;
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-2 gap-x-6 gap-y-2 text-sm sm:grid-cols-3">
        <div>
          <dt className="text-ink-faint">Today’s weight to stay on plan</dt>
          <dd className="text-lg font-bold text-ink tabular-nums" data-testid="cut-today-kg">
            {formatWeight(f.todayKg, unit)}
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">Chronic part, a week</dt>
          <dd className="font-medium tabular-nums">
            {f.chronic
              ? `${formatWeight(f.chronic.kgPerWeek, unit, 2)} · up to ${pct(f.chronic.pctPerWeek)}`
              : '—'}
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">Acute part (last {plan.acuteDays} days)</dt>
          <dd className="font-medium tabular-nums">
            {formatWeight(f.acute.kg, unit)} · {pct(f.acute.pct)} of body mass
          </dd>
        </div>
      </dl>
      {f.warnings.map((w) => (
        <Alert key={w.key} tone="caution" title={CUT_SEVERITY_LABELS[w.severity]} live={false}>
          <p>{w.message}</p>
          <p className="mt-1 text-xs text-ink-muted">Source: {w.source}</p>
        </Alert>
      ))}
      {f.stopSigns ? (
        <Alert tone="error" title="Stop and seek care" live={false}>
          {f.stopSigns}
        </Alert>
      ) : null}
    </div>
  );
}
