import type { ResolvedTargets } from '@driftmark/shared';
import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';
import { formatNumber, NBSP } from '@/lib/format';
import * as fig from '../utils/figures';

export interface TargetsRow {
  id: string;
  /** The leading cells (date, day label, name …), one per `leadHeaders`; the first is the row header. */
  lead: ReactNode[];
  targets: ResolvedTargets | null;
  /** Greyed out, e.g. a countdown day already past. */
  muted?: boolean;
  /** Shown under the lead when muted ("already past, not changed"). */
  mutedNote?: string;
}

function Dash() {
  return (
    <span className="text-ink-faint" aria-label="no target">
      —
    </span>
  );
}

function macro(g: number | null, share: number | null) {
  if (g === null) return <Dash />;
  return (
    <>
      {formatNumber(g, 0)}
      {share !== null ? (
        <span className="block text-xs text-ink-faint">
          {formatNumber(share, 0)}
          {NBSP}%
        </span>
      ) : null}
    </>
  );
}

/** Resolved day targets side by side: energy, macros (g and share), water, sodium, cut-off, the rest. */
export function TargetsTable({
  caption,
  leadHeaders,
  rows,
}: {
  caption: string;
  leadHeaders: string[];
  rows: readonly TargetsRow[];
}) {
  const num = 'px-3 py-2 text-right align-top whitespace-nowrap tabular-nums';
  const head = 'px-3 py-2.5';
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface shadow-card">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-line bg-sunken text-xs font-semibold tracking-wide text-ink-muted uppercase">
            {leadHeaders.map((h) => (
              <th key={h} scope="col" className={head}>
                {h}
              </th>
            ))}
            <th scope="col" className={cn(head, 'text-right')}>
              Energy
            </th>
            <th scope="col" className={cn(head, 'text-right')}>
              Protein g
            </th>
            <th scope="col" className={cn(head, 'text-right')}>
              Carb. g
            </th>
            <th scope="col" className={cn(head, 'text-right')}>
              Fat g
            </th>
            <th scope="col" className={cn(head, 'text-right')}>
              Water
            </th>
            <th scope="col" className={cn(head, 'text-right')}>
              Sodium
            </th>
            <th scope="col" className={head}>
              Cut-off
            </th>
            <th scope="col" className={head}>
              Supplements and more
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((row) => {
            const r = row.targets;
            const [first, ...rest] = row.lead;
            const other = r
              ? [
                  r.steps !== null ? `${formatNumber(r.steps, 0)} steps` : null,
                  r.cardioMinutes !== null ? `${formatNumber(r.cardioMinutes, 0)} min cardio` : null,
                ].filter(Boolean)
              : [];
            return (
              <tr key={row.id} className={cn(row.muted && 'bg-paper/70 text-ink-faint')}>
                <th scope="row" className="px-3 py-2 align-top font-normal whitespace-nowrap">
                  <span
                    className={cn('font-semibold tabular-nums', row.muted ? 'text-ink-faint' : 'text-ink')}
                  >
                    {first}
                  </span>
                  {row.muted && row.mutedNote ? (
                    <span className="block text-xs text-ink-faint">{row.mutedNote}</span>
                  ) : null}
                </th>
                {rest.map((cell, i) => (
                  <td key={i} className="px-3 py-2 align-top">
                    {cell}
                  </td>
                ))}
                <td className={num}>{r?.energyKcal != null ? fig.kcal(r.energyKcal) : <Dash />}</td>
                <td className={num}>
                  {r ? macro(r.proteinG, r.proteinPct) : <Dash />}
                  {r?.basis.protein ? (
                    <span className="block min-w-40 text-xs whitespace-normal text-ink-faint">
                      {r.basis.protein}
                    </span>
                  ) : null}
                </td>
                <td className={num}>{r ? macro(r.carbohydrateG, r.carbohydratePct) : <Dash />}</td>
                <td className={num}>{r ? macro(r.fatG, r.fatPct) : <Dash />}</td>
                <td className={num}>
                  {r?.waterMl != null ? fig.ml(r.waterMl) : <Dash />}
                  {r?.basis.water ? (
                    <span className="block text-xs text-ink-faint">{r.basis.water}</span>
                  ) : null}
                </td>
                <td className={num}>{r?.sodiumMg != null ? fig.mg(r.sodiumMg) : <Dash />}</td>
                <td className="px-3 py-2 align-top whitespace-nowrap tabular-nums">
                  {r?.fluidCutoff ? (
                    <>
                      {r.fluidCutoff.time}
                      <span className="block text-xs text-ink-faint">
                        +{fig.ml(r.fluidCutoff.allowanceMl)} after
                      </span>
                    </>
                  ) : (
                    <Dash />
                  )}
                </td>
                <td className="min-w-56 px-3 py-2 align-top text-xs">
                  {r &&
                  (r.supplements.length > 0 || other.length > 0 || r.note || r.foodCutoff || r.fluidCap) ? (
                    <ul className="space-y-0.5">
                      {r.supplements.map((s) => (
                        <li key={s.id} className="tabular-nums">
                          {fig.supplementText(s)}
                        </li>
                      ))}
                      {fig.timingLines(r).map((l) => (
                        <li key={l} className="tabular-nums">
                          {l}
                        </li>
                      ))}
                      {other.length > 0 ? <li>{other.join(' · ')}</li> : null}
                      {r.note ? <li className="italic">“{r.note}”</li> : null}
                    </ul>
                  ) : (
                    <Dash />
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
