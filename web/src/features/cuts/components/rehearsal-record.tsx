import type { RehearsalView, WeightUnit } from '@driftmark/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { formatDate, formatNumber, formatWeight, NBSP } from '@/lib/format';
import { useSaveRehearsalNote } from '../api/save-rehearsal-note';

const pct = (n: number) => `${formatNumber(n, 1, 1)}${NBSP}%`;

const STAGE_LABELS: Record<RehearsalView['days'][number]['stage'], string> = {
  start: 'Start',
  acute: 'Last days',
  weigh_in: 'Practice weigh-in',
  after: 'Morning after',
};

/** What the next plan sets for the last days, to read against the rehearsal. */
export interface PlannedAcute {
  kg: number;
  pct: number;
  days: number;
}

/**
 * The latest practice run beside a cut plan: the planned last days next to what the rehearsal
 * achieved and what came with it (the server's record), then each day with its weight, loss, what
 * was done and the symptoms logged.
 */
export function RehearsalRecord({
  athleteId,
  rehearsal,
  planned,
  plannedLabel,
  unit,
  canNote,
  today,
  compact = false,
}: {
  athleteId: string;
  rehearsal: RehearsalView;
  /** Null while the plan beside it has no figures yet. */
  planned: PlannedAcute | null;
  plannedLabel: string;
  unit: WeightUnit;
  canNote: boolean;
  today: string;
  /** Only the comparison (the builder): the days and their notes are the panel's. */
  compact?: boolean;
}) {
  const r = rehearsal;
  const symptoms = r.days.flatMap((d) => d.symptoms.map((s) => ({ date: d.date, ...s })));
  const nextMorning = r.regained[0];
  return (
    <section
      aria-labelledby={`rehearsal-${r.planId}`}
      className="space-y-3 rounded-md border border-line p-4"
    >
      <h3 id={`rehearsal-${r.planId}`} className="font-semibold text-ink">
        Practice run: weigh-in {formatDate(r.weighInDate)}
      </h3>
      <dl className="grid gap-3 text-sm sm:grid-cols-2" aria-label="Planned beside the rehearsal">
        <div className="rounded-md bg-sunken px-3 py-2">
          <dt className="text-ink-faint">{plannedLabel}</dt>
          <dd className="font-medium tabular-nums" data-testid="rehearsal-planned">
            {planned
              ? `${formatWeight(planned.kg, unit)} · ${pct(planned.pct)} of body mass over ${planned.days} days`
              : '—'}
          </dd>
        </div>
        <div className="rounded-md bg-sunken px-3 py-2">
          <dt className="text-ink-faint">The rehearsal achieved</dt>
          <dd className="font-medium tabular-nums" data-testid="rehearsal-achieved">
            {r.achieved
              ? `${formatWeight(r.achieved.kg, unit)} · ${pct(r.achieved.pct)} over ${r.planned.acuteDays} days ` +
                `(${formatWeight(r.achieved.fromKg, unit)} → ${formatWeight(r.achieved.toKg, unit)})`
              : 'Not known: it needs a weigh-in on the first day and on the practice weigh-in'}
          </dd>
          <dd className="text-ink-muted tabular-nums">
            Planned then: {formatWeight(r.planned.acuteKg, unit)} · {pct(r.planned.acutePct)}
          </dd>
        </div>
        <div className="rounded-md bg-sunken px-3 py-2">
          <dt className="text-ink-faint">Regained by the next morning</dt>
          <dd className="font-medium tabular-nums">
            {nextMorning
              ? `${formatWeight(nextMorning.kg, unit)} · ${pct(nextMorning.pct)}` +
                (nextMorning.shareOfLossPct !== null
                  ? ` (${formatNumber(nextMorning.shareOfLossPct)}${NBSP}% of the loss)`
                  : '')
              : 'No weigh-in the morning after'}
          </dd>
          {r.regained.slice(1).map((g) => (
            <dd key={g.date} className="text-ink-muted tabular-nums">
              {formatDate(g.date, 'short')}: {formatWeight(g.kg, unit)} · {pct(g.pct)}
            </dd>
          ))}
        </div>
        <div className="rounded-md bg-sunken px-3 py-2">
          <dt className="text-ink-faint">Symptoms those days</dt>
          <dd className="font-medium" data-testid="rehearsal-symptoms">
            {symptoms.length === 0
              ? 'None logged'
              : symptoms
                  .map((s) => `${s.labels.join(', ')} (${formatDate(s.date, 'short')} ${s.time.slice(0, 5)})`)
                  .join('; ')}
          </dd>
        </div>
      </dl>
      {compact ? null : (
        <RehearsalDays athleteId={athleteId} rehearsal={r} unit={unit} canNote={canNote} today={today} />
      )}
    </section>
  );
}

/** Each day of the practice run: weight, loss, what was done, symptoms; and the note form. */
function RehearsalDays({
  athleteId,
  rehearsal: r,
  unit,
  canNote,
  today,
}: {
  athleteId: string;
  rehearsal: RehearsalView;
  unit: WeightUnit;
  canNote: boolean;
  today: string;
}) {
  return (
    <>
      {r.planned.steps ? (
        <p className="text-sm">
          <span className="text-ink-faint">What the plan set for the last days: </span>
          {r.planned.steps}
        </p>
      ) : null}
      <div>
        <div
          aria-hidden="true"
          className="hidden gap-x-3 border-b border-line pb-1 text-sm text-ink-faint sm:grid sm:grid-cols-[8rem_5.5rem_8.5rem_1fr]"
        >
          <span>Day</span>
          <span>Weight</span>
          <span>Lost that day</span>
          <span>What was done · symptoms</span>
        </div>
        <ol aria-label="Each day of the practice run" className="divide-y divide-line text-sm">
          {r.days.map((d) => (
            <li
              key={d.date}
              className="grid grid-cols-[7rem_1fr] gap-x-3 gap-y-1 py-2 sm:grid-cols-[8rem_5.5rem_8.5rem_1fr]"
            >
              <span className="font-medium">
                {formatDate(d.date, 'short')}
                <span className="block text-xs font-normal text-ink-muted">{STAGE_LABELS[d.stage]}</span>
              </span>
              <span className="tabular-nums">
                {d.kg === null ? 'No weigh-in' : formatWeight(d.kg, unit)}
                {d.lostKg !== null && d.lostPct !== null ? (
                  <span className="block text-ink-muted sm:hidden">
                    lost {formatWeight(d.lostKg, unit)} · {pct(d.lostPct)}
                  </span>
                ) : null}
              </span>
              <span className="hidden tabular-nums sm:block">
                {d.lostKg === null || d.lostPct === null
                  ? '—'
                  : `${formatWeight(d.lostKg, unit)} · ${pct(d.lostPct)}`}
              </span>
              <span className="col-span-2 min-w-0 sm:col-span-1">
                {d.note ? (
                  <span className="block">
                    {d.note.text} <span className="text-xs text-ink-muted">({d.note.by})</span>
                  </span>
                ) : null}
                {d.symptoms.map((s) => (
                  <span
                    key={s.time}
                    className={s.urgent ? 'block font-semibold text-off-plan' : 'block text-caution'}
                  >
                    {s.labels.join(', ')} at {s.time.slice(0, 5)}
                  </span>
                ))}
              </span>
            </li>
          ))}
        </ol>
      </div>
      {canNote ? <DayNoteForm athleteId={athleteId} rehearsal={r} today={today} /> : null}
    </>
  );
}

/** Write what was done on one rehearsal day (the server keeps one note a day, the latest writer's). */
function DayNoteForm({
  athleteId,
  rehearsal,
  today,
}: {
  athleteId: string;
  rehearsal: RehearsalView;
  today: string;
}) {
  const days = rehearsal.days.filter((d) => d.date <= today);
  // The latest day so far: the one most likely being written about.
  const latest = days[days.length - 1];
  const [date, setDate] = useState(latest?.date ?? '');
  const [text, setText] = useState(latest?.note?.text ?? '');
  const [saved, setSaved] = useState(false);
  const save = useSaveRehearsalNote(athleteId, rehearsal.planId);
  if (days.length === 0) return null;
  const fieldError = (name: string) =>
    isApiError(save.error)
      ? (save.error.fields[name] ?? null)
      : save.error
        ? 'Could not save the note.'
        : null;
  return (
    <form
      className="grid gap-2 sm:grid-cols-[auto_1fr_auto] sm:items-end"
      aria-label="Rehearsal day note"
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(false);
        save.mutate({ date, note: text.trim() || null }, { onSuccess: () => setSaved(true) });
      }}
    >
      <label className="grid gap-1 text-sm">
        <span className="font-medium text-ink">Day</span>
        <select
          className="rounded-md border border-line-strong bg-surface px-2 py-2"
          value={date}
          onChange={(e) => {
            setDate(e.target.value);
            setText(rehearsal.days.find((d) => d.date === e.target.value)?.note?.text ?? '');
          }}
        >
          {days.map((d) => (
            <option key={d.date} value={d.date}>
              {formatDate(d.date, 'short')} · {STAGE_LABELS[d.stage]}
            </option>
          ))}
        </select>
      </label>
      <label className="grid gap-1 text-sm">
        <span className="font-medium text-ink">What was done that day</span>
        <input
          className="rounded-md border border-line-strong bg-surface px-2 py-2"
          value={text}
          onChange={(e) => setText(e.target.value)}
          aria-invalid={fieldError('note') ? true : undefined}
        />
      </label>
      <Button type="submit" loading={save.isPending}>
        Save note
      </Button>
      {fieldError('date') || fieldError('note') ? (
        <Alert tone="error" className="sm:col-span-3">
          {fieldError('date') ?? fieldError('note')}
        </Alert>
      ) : saved ? (
        <p className="text-sm text-on-plan sm:col-span-3">Note saved.</p>
      ) : null}
    </form>
  );
}
