import { supplementEntryRequest, type DayView, type SupplementEntryRequest } from '@driftmark/shared';
import { useMemo, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { CapsuleIcon, CheckIcon } from '@/components/ui/icons';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { formatNumber } from '@/lib/format';
import { useCreateSupplement } from '../api/create-supplement';
import { useDeleteSupplement } from '../api/delete-supplement';
import { useUpdateSupplement } from '../api/update-supplement';
import { createClientIdKeeper } from '../utils/client-id';
import {
  supplementFormValues,
  toSupplementRequest,
  withoutClientId,
  type SupplementFormValues,
} from '../utils/form-values';
import { createRequestResolver } from '@/lib/request-resolver';
import { CheckInCard, HeaderFigure, NotLogged } from './check-in-card';
import type { DayCardProps } from './day-card-props';
import { AddEntry, ConfirmDelete, EditableEntries } from './entry-row';
import { useFollowClock } from './use-follow-clock';

type Supplement = DayView['supplements'][number];

const DOSE_UNITS = ['g', 'mg', 'mcg', 'IU', 'mL', 'capsule', 'tablet', 'scoop'];

export function supplementLabel(s: Pick<Supplement, 'name' | 'dose' | 'doseUnit'>): string {
  if (s.dose === null) return s.name;
  return `${s.name} ${formatNumber(s.dose, 3)}${s.doseUnit ? ` ${s.doseUnit}` : ''}`;
}

/**
 * Supplements taken the day before and not yet ticked on this day: one tap each, until plans
 * bring a real schedule.
 */
export function supplementSuggestions(previous: Supplement[] | undefined, taken: Supplement[]): Supplement[] {
  if (!previous) return [];
  const seen = new Set(taken.map((s) => s.name.trim().toLowerCase()));
  const out: Supplement[] = [];
  for (const s of previous) {
    const key = s.name.trim().toLowerCase();
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(s);
  }
  return out;
}

interface SupplementsCardProps extends DayCardProps {
  /** The supplements of the day before, offered as ticks. */
  previous?: Supplement[];
}

export function SupplementsCard({ athleteId, day, canEdit, now, previous }: SupplementsCardProps) {
  const [adding, setAdding] = useState(false);
  const remove = useDeleteSupplement(athleteId, day.date);
  // What the plan schedules today is ticked under the day's targets, not offered again here.
  const scheduled = new Set((day.targets?.targets.supplements ?? []).map((s) => s.item.trim().toLowerCase()));
  const suggestions = canEdit
    ? supplementSuggestions(previous, day.supplements).filter(
        (s) => !scheduled.has(s.name.trim().toLowerCase()),
      )
    : [];

  return (
    <CheckInCard
      id="supplements"
      title="Supplements"
      icon={<CapsuleIcon />}
      subtitle={canEdit ? 'Tick what you take, when you take it.' : undefined}
      summary={
        day.supplements.length > 0 ? (
          <HeaderFigure value={formatNumber(day.supplements.length)} caption="taken" />
        ) : null
      }
    >
      {suggestions.length > 0 ? (
        <SuggestedTicks athleteId={athleteId} date={day.date} now={now} suggestions={suggestions} />
      ) : null}

      {day.supplements.length > 0 ? (
        <EditableEntries
          label="Supplements taken"
          entries={day.supplements}
          canEdit={canEdit}
          describe={(s) => `${supplementLabel(s)} at ${s.time}`}
          form={(s, done) => (
            <SupplementForm
              athleteId={athleteId}
              date={day.date}
              entry={s}
              onDelete={() => remove.mutateAsync(s.id)}
              now={now}
              onDone={done}
            />
          )}
          lead={() => (
            <span className="mt-0.5 flex size-5 shrink-0 items-center justify-center rounded-sm bg-on-plan text-sm text-on-accent">
              <CheckIcon />
            </span>
          )}
        >
          {(s) => (
            <>
              <span className="font-semibold">{s.name}</span>
              {s.dose !== null ? (
                <span className="text-ink-muted tabular-nums">
                  {' '}
                  {formatNumber(s.dose, 3)} {s.doseUnit ?? ''}
                </span>
              ) : null}
            </>
          )}
        </EditableEntries>
      ) : !canEdit ? (
        <NotLogged>No supplements logged this day.</NotLogged>
      ) : null}

      {canEdit ? (
        <AddEntry label="Add a supplement" open={adding} onOpen={() => setAdding(true)} divided={true}>
          <SupplementForm
            athleteId={athleteId}
            date={day.date}
            entry={null}
            now={now}
            onDone={() => setAdding(false)}
          />
        </AddEntry>
      ) : null}
    </CheckInCard>
  );
}

function SuggestedTicks({
  athleteId,
  date,
  now,
  suggestions,
}: {
  athleteId: string;
  date: string;
  now: string;
  suggestions: Supplement[];
}) {
  const create = useCreateSupplement(athleteId, date);
  const keeper = useRef(createClientIdKeeper()).current;
  const [pending, setPending] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function tick(s: Supplement) {
    const body: SupplementEntryRequest = {
      clientId: keeper.take(`tick:${s.name}`),
      time: now,
      name: s.name,
      dose: s.dose,
      doseUnit: s.doseUnit,
    };
    setPending(s.id);
    setError(null);
    try {
      await create.mutateAsync(body);
      keeper.settle(body.clientId);
    } catch (e) {
      setError(isApiError(e) ? e.message : 'That could not be saved. Tick it again to retry.');
    } finally {
      setPending(null);
    }
  }

  return (
    <fieldset className="mb-4">
      <legend className="mb-1.5 text-sm font-semibold text-ink">Taken yesterday</legend>
      <div className="grid gap-2">
        {suggestions.map((s) => {
          const id = `tick-${s.id}`;
          return (
            <div
              key={s.id}
              className="flex min-h-touch items-center gap-3 rounded-md border border-line-strong bg-surface px-3 py-2"
            >
              <input
                id={id}
                type="checkbox"
                checked={pending === s.id}
                disabled={pending !== null}
                onChange={(e) => {
                  if (e.target.checked) void tick(s);
                }}
                className="size-5 shrink-0 accent-accent"
              />
              <label htmlFor={id} className="flex-1 cursor-pointer text-sm font-medium text-ink tabular-nums">
                {supplementLabel(s)}
              </label>
              <span className="text-xs text-ink-faint tabular-nums">yesterday {s.time}</span>
            </div>
          );
        })}
      </div>
      {error ? (
        <p role="alert" className="mt-1.5 text-sm font-medium text-off-plan">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}

function SupplementForm({
  athleteId,
  date,
  entry,
  now,
  onDone,
  onDelete,
}: {
  athleteId: string;
  date: string;
  entry: Supplement | null;
  now: string;
  onDone: () => void;
  /** Set when editing an entry that exists. */
  onDelete?: () => Promise<unknown>;
}) {
  const resolver = useMemo(() => createRequestResolver(supplementEntryRequest, toSupplementRequest), []);
  const form = useForm<SupplementFormValues, unknown, SupplementEntryRequest>({
    resolver,
    defaultValues: supplementFormValues(entry, now),
  });
  useFollowClock(form, 'time', now, entry === null);
  const keeper = useRef(createClientIdKeeper()).current;
  const create = useCreateSupplement(athleteId, date);
  const update = useUpdateSupplement(athleteId, date);

  return (
    <Form
      form={form}
      onSubmit={async (body) => {
        if (entry) {
          await update.mutateAsync({ entryId: entry.id, body: withoutClientId(body) });
        } else {
          const clientId = keeper.take();
          await create.mutateAsync({ ...body, clientId });
          keeper.settle(clientId);
        }
        onDone();
      }}
      aria-label={entry ? `Edit ${entry.name}` : 'Add a supplement'}
      className="space-y-4"
    >
      <TextField
        name="name"
        label="Supplement"
        autoComplete="off"
        maxLength={80}
        placeholder="Creatine monohydrate"
        required
      />
      <div className="grid grid-cols-2 gap-3">
        <TextField
          name="dose"
          label="Dose"
          hint="Optional"
          inputMode="decimal"
          autoComplete="off"
          inputClassName="tabular-nums"
        />
        <TextField
          name="doseUnit"
          label="Dose unit"
          list="dose-units"
          autoComplete="off"
          maxLength={16}
          placeholder="g"
        />
      </div>
      <TextField name="time" label="Time taken" type="time" required inputClassName="tabular-nums" />
      <datalist id="dose-units">
        {DOSE_UNITS.map((u) => (
          <option key={u} value={u} />
        ))}
      </datalist>
      <div className="flex flex-wrap gap-2">
        <SubmitButton size="lg" className="flex-1" pendingLabel="Saving…">
          {entry ? 'Save supplement' : 'Tick as taken'}
        </SubmitButton>
        <Button variant="ghost" size="lg" onClick={onDone}>
          Cancel
        </Button>
        {onDelete ? <ConfirmDelete what="this supplement" onDelete={onDelete} /> : null}
      </div>
    </Form>
  );
}
