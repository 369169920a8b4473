import type { CutView, RecoveryItemKind, VolumeUnit } from '@driftmark/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { ApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { formatNumber, formatVolume, NBSP } from '@/lib/format';

export type RecoverySlot = NonNullable<CutView['recovery']>['slots'][number];

/** Ticks or unticks one item at a clock time; the caller logs or removes the entry (app/ composes it). */
export type RecoveryToggle = (input: {
  slot: RecoverySlot;
  kind: RecoveryItemKind;
  time: string;
}) => Promise<unknown>;

/** Slots shown before "Show all": a long window (16 h: 16 slots) would bury the rest of the screen. */
const FIRST_SLOTS = 6;

const litres = (l: number) => `${formatNumber(l, 2)}${NBSP}L`;
const band = (g: { min: number; max: number }) => `${formatNumber(g.min)}–${formatNumber(g.max)}${NBSP}g`;

/**
 * The timed checklist after the weigh-in, as the server computed it, with what is ticked (an
 * entry logged with the item's client id). With `onToggle` (the athlete) each item is a box that
 * logs its drink or carbohydrate at the time shown (now, or as edited); without it (the coach)
 * the ticks are read only.
 */
export function RecoveryChecklist({
  cut,
  volumeUnit,
  now,
  onToggle,
}: {
  cut: CutView;
  volumeUnit: VolumeUnit;
  /** The athlete's clock now, HH:MM: ticks log at it unless the time is edited. */
  now?: string;
  onToggle?: RecoveryToggle;
}) {
  const r = cut.recovery;
  const timeId = useId();
  const [edited, setEdited] = useState<string | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [showAll, setShowAll] = useState(false);
  if (!r) return null;
  const folded = !showAll && r.slots.length > FIRST_SLOTS + 1;
  const slots = folded ? r.slots.slice(0, FIRST_SLOTS) : r.slots;
  const time = edited ?? now ?? '';
  const done = r.slots.reduce((n, s) => n + (s.fluid.logged ? 1 : 0) + (s.carbohydrate.logged ? 1 : 0), 0);

  const toggle = async (slot: RecoverySlot, kind: RecoveryItemKind) => {
    if (!onToggle || busy) return;
    const item = slot[kind];
    setBusy(item.clientId);
    setError(null);
    try {
      await onToggle({ slot, kind, time });
    } catch (e) {
      const fields = e instanceof ApiError ? Object.values(e.fields) : [];
      setError(fields[0] ?? (e instanceof Error ? e.message : 'Not saved'));
    } finally {
      setBusy(null);
    }
  };

  return (
    <section aria-labelledby="recovery-heading" className="space-y-3">
      <h3 id="recovery-heading" className="font-semibold text-ink">
        After the weigh-in: recovery checklist
      </h3>
      <p className="text-sm text-ink-muted">
        About {formatNumber(r.kgLost, 1, 1)}
        {NBSP}kg lost at the scale (
        {r.basis === 'plan' ? 'from the plan’s weight before the last days' : 'from the usual weight'}
        ), {formatNumber(r.windowHours, 1)}
        {NBSP}h to the competition: {litres(r.fluidL)} of fluid with sodium and {band(r.carbohydrateG)}{' '}
        carbohydrate in all.{' '}
        {onToggle
          ? 'Tick an item when you have had it: it is logged on your day like any drink or meal.'
          : 'Ticked items are logged on the athlete’s day.'}
      </p>
      {onToggle ? (
        <div className="flex flex-wrap items-end gap-3">
          <div>
            <label htmlFor={timeId} className="mb-1 block text-sm font-medium text-ink">
              Log ticks at
            </label>
            <input
              id={timeId}
              type="time"
              value={time}
              onChange={(e) => setEdited(e.target.value || null)}
              // The field's look without ui/field (react-hook-form stays off the Today route's first load).
              className="block min-h-touch w-36 rounded-md border border-line-strong bg-surface px-3 py-2 text-base text-ink tabular-nums"
            />
          </div>
          {edited ? (
            <button
              type="button"
              className="min-h-touch text-sm font-semibold text-accent underline"
              onClick={() => setEdited(null)}
            >
              Use the time now
            </button>
          ) : null}
        </div>
      ) : null}
      <p className="text-sm text-ink-muted" aria-live="polite">
        {done} of {r.slots.length * 2} ticked
      </p>
      {error ? (
        <Alert tone="error" title="Not logged">
          {error}
        </Alert>
      ) : null}
      <ol
        aria-label="Recovery checklist"
        className="divide-y divide-line rounded-md border border-line text-sm"
      >
        {slots.map((s) => (
          <li
            key={`${s.date} ${s.time}`}
            className="grid grid-cols-1 gap-1 px-3 py-2 sm:grid-cols-[4rem_1fr_1fr] sm:items-center sm:gap-3"
          >
            <span className="font-semibold text-ink tabular-nums">{s.time}</span>
            <Item
              slot={s}
              kind="fluid"
              label={`${formatVolume(s.fluid.volumeMl, volumeUnit)} fluid with ${formatNumber(s.fluid.sodiumMg)}${NBSP}mg sodium`}
              busy={busy === s.fluid.clientId}
              onToggle={onToggle ? () => void toggle(s, 'fluid') : undefined}
            />
            <Item
              slot={s}
              kind="carbohydrate"
              label={`${formatNumber(s.carbohydrate.carbohydrateG)}${NBSP}g carbohydrate (${band(s.carbohydrateG)})`}
              busy={busy === s.carbohydrate.clientId}
              onToggle={onToggle ? () => void toggle(s, 'carbohydrate') : undefined}
            />
          </li>
        ))}
      </ol>
      {r.slots.length > FIRST_SLOTS + 1 ? (
        <button
          type="button"
          aria-expanded={!folded}
          className="min-h-touch text-sm font-semibold text-accent underline"
          onClick={() => setShowAll(folded)}
        >
          {folded
            ? `Show the other ${r.slots.length - FIRST_SLOTS} slots, to ${r.slots.at(-1)!.time}`
            : `Show the first ${FIRST_SLOTS} slots only`}
        </button>
      ) : null}
      <p className="text-xs text-ink-muted">Source: {r.source}</p>
    </section>
  );
}

function Item({
  slot,
  kind,
  label,
  busy,
  onToggle,
}: {
  slot: RecoverySlot;
  kind: RecoveryItemKind;
  label: string;
  busy: boolean;
  onToggle?: () => void;
}) {
  const id = useId();
  const logged = slot[kind].logged;
  const note = logged ? `logged ${logged.time}` : null;
  if (!onToggle) {
    return (
      <span className={cn('tabular-nums', logged ? 'text-ink' : 'text-ink-muted')}>
        <span aria-hidden="true">{logged ? '✓ ' : '○ '}</span>
        {label}
        <span className="sr-only">{logged ? ', ticked' : ', not ticked'}</span>
        {note ? <span className="text-ink-muted"> · {note}</span> : null}
      </span>
    );
  }
  return (
    <div className="flex min-h-touch items-center gap-3">
      <input
        id={id}
        type="checkbox"
        checked={logged !== null}
        disabled={busy}
        onChange={onToggle}
        className="size-5 shrink-0 accent-accent"
      />
      <label htmlFor={id} className="tabular-nums text-ink">
        {label} <span className="sr-only">at {slot.time}</span>
        {note ? <span className="text-ink-muted"> · {note}</span> : null}
      </label>
    </div>
  );
}
