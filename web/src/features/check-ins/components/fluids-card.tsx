import {
  FLUID_KIND_LABELS,
  FLUID_KINDS,
  fluidEntryRequest,
  VOLUME_UNIT_LABELS,
  type DayView,
  type FluidEntryRequest,
  type VolumeUnit,
} from '@driftmark/shared';
import { useMemo, useRef, useState } from 'react';
import { useForm, useFormState, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { DropIcon } from '@/components/ui/icons';
import { SegmentedField } from '@/components/ui/segmented-field';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { formatNumber, NBSP } from '@/lib/format';
import { useCreateFluid } from '../api/create-fluid';
import { useDeleteFluid } from '../api/delete-fluid';
import { useUpdateFluid } from '../api/update-fluid';
import { createClientIdKeeper } from '../utils/client-id';
import { fluidFormValues, toFluidRequest, withoutClientId, type FluidFormValues } from '../utils/form-values';
import { createRequestResolver } from '@/lib/request-resolver';
import { displayVolume, quickVolumeLabel, quickVolumes } from '../utils/units';
import { CheckInCard, HeaderFigure, NotLogged } from './check-in-card';
import type { DayCardProps } from './day-card-props';
import { ConfirmDelete, EditableEntries } from './entry-row';
import { showServerError } from './server-errors';
import { useFollowClock } from './use-follow-clock';

const KIND_OPTIONS = FLUID_KINDS.map((k) => ({ value: k, label: FLUID_KIND_LABELS[k] }));

export function FluidsCard({ athleteId, day, units, canEdit, now }: DayCardProps) {
  const remove = useDeleteFluid(athleteId, day.date);
  const total = displayVolume(day.fluidTotalMl, null, units.volume);

  return (
    <CheckInCard
      id="fluids"
      title="Fluids"
      icon={<DropIcon />}
      summary={
        <HeaderFigure
          value={<span data-testid="fluid-total">{total}</span>}
          caption={day.isToday ? 'so far today' : 'that day'}
        />
      }
    >
      {canEdit ? (
        <AddFluidForm
          athleteId={athleteId}
          date={day.date}
          isToday={day.isToday}
          unit={units.volume}
          now={now}
        />
      ) : null}
      {day.fluids.length > 0 ? (
        <div className={canEdit ? 'mt-5 border-t border-line pt-3' : undefined}>
          <EditableEntries
            label="Drinks logged"
            entries={day.fluids}
            canEdit={canEdit}
            describe={(f) =>
              `${displayVolume(f.volumeMl, f.entered, units.volume)} ${FLUID_KIND_LABELS[f.kind].toLowerCase()} at ${f.time}`
            }
            formClassName="py-3"
            form={(f, done) => (
              <EditFluidForm
                athleteId={athleteId}
                date={day.date}
                entry={f}
                onDone={done}
                onDelete={() => remove.mutateAsync(f.id)}
              />
            )}
          >
            {(f) => (
              <>
                <span className="font-semibold tabular-nums">
                  {displayVolume(f.volumeMl, f.entered, units.volume)}
                </span>{' '}
                <span className="text-ink-muted">
                  {FLUID_KIND_LABELS[f.kind]}
                  {f.sodiumMg !== null ? ` · ${formatNumber(f.sodiumMg)}${NBSP}mg sodium` : null}
                </span>
              </>
            )}
          </EditableEntries>
        </div>
      ) : canEdit ? null : (
        <NotLogged>No fluids logged this day.</NotLogged>
      )}
    </CheckInCard>
  );
}

function AddFluidForm({
  athleteId,
  date,
  isToday,
  unit,
  now,
}: {
  athleteId: string;
  date: string;
  isToday: boolean;
  unit: VolumeUnit;
  now: string;
}) {
  const resolver = useMemo(() => createRequestResolver(fluidEntryRequest, toFluidRequest), []);
  const form = useForm<FluidFormValues, unknown, FluidEntryRequest>({
    resolver,
    defaultValues: fluidFormValues(null, unit, now),
  });
  useFollowClock(form, 'time', now);
  const keeper = useRef(createClientIdKeeper()).current;
  const create = useCreateFluid(athleteId, date);
  const [added, setAdded] = useState<string | null>(null);
  const [quickPending, setQuickPending] = useState<number | null>(null);
  const { isSubmitting } = useFormState({ control: form.control });
  const kind = useWatch({ control: form.control, name: 'kind' });
  const busy = isSubmitting || quickPending !== null;
  const unitLabel = VOLUME_UNIT_LABELS[unit];

  async function send(body: FluidEntryRequest, key: string) {
    const clientId = keeper.take(key);
    setAdded(null);
    const day = await create.mutateAsync({ ...body, clientId });
    keeper.settle(clientId);
    setAdded(
      `Added ${displayVolume(0, { value: body.volume, unit: body.unit }, body.unit)} ${FLUID_KIND_LABELS[body.kind].toLowerCase()} at ${body.time}.`,
    );
    return day;
  }

  async function quickAdd(volume: number) {
    form.clearErrors('root.server' as never);
    if (!(await form.trigger(['time', 'kind']))) return;
    const { time, kind: chosen } = form.getValues();
    setQuickPending(volume);
    try {
      await send({ clientId: '', time, volume, unit, kind: chosen }, `quick:${volume}:${unit}:${chosen}`);
    } catch (error) {
      showServerError(form, error, ['time', 'kind']);
      if (isApiError(error) && error.code === 'network_error') {
        form.setError('root.server' as never, {
          type: 'server',
          message: `${error.message} Press +${volume} again to retry; it is not counted twice.`,
        });
      }
    } finally {
      setQuickPending(null);
    }
  }

  return (
    <Form
      form={form}
      onSubmit={async (body) => {
        await send(body, 'custom');
        form.reset({ ...fluidFormValues(null, unit, now), kind: body.kind });
      }}
      aria-label="Add a drink"
      className="space-y-4"
    >
      <SegmentedField name="kind" legend="Kind" options={KIND_OPTIONS} />
      <div>
        <p id="quick-add-label" className="mb-1.5 font-semibold text-ink">
          Quick add{' '}
          <span className="font-normal text-ink-muted">({FLUID_KIND_LABELS[kind].toLowerCase()})</span>
        </p>
        <div role="group" aria-labelledby="quick-add-label" className="grid grid-cols-3 gap-2">
          {quickVolumes(unit).map((v) => (
            <Button
              key={v}
              variant="secondary"
              size="lg"
              className="px-2 whitespace-nowrap tabular-nums"
              disabled={busy}
              loading={quickPending === v}
              onClick={() => void quickAdd(v)}
            >
              {quickVolumeLabel(v, unit)}
            </Button>
          ))}
        </div>
      </div>
      <div className="grid grid-cols-[minmax(0,1fr)_auto] items-end gap-2">
        <TextField
          name="volume"
          label={`Custom amount (${unitLabel})`}
          suffix={unitLabel}
          inputMode="decimal"
          autoComplete="off"
          enterKeyHint="done"
          inputClassName="tabular-nums"
        />
        <SubmitButton variant="primary" className="self-end" pendingLabel="Adding…">
          Add drink
        </SubmitButton>
      </div>
      <FluidTimeField followsClock={isToday} />
      <p role="status" className="text-sm font-medium text-on-plan empty:-mt-4">
        {added}
      </p>
    </Form>
  );
}

/** Kept below the buttons: it rarely changes (it follows the clock), so it stays out of the thumb's way. */
function FluidTimeField({ followsClock }: { followsClock: boolean }) {
  return (
    <TextField
      name="time"
      label="Drink time"
      type="time"
      required
      hint={followsClock ? 'Follows the clock until you change it.' : undefined}
      inputClassName="tabular-nums"
    />
  );
}

function EditFluidForm({
  athleteId,
  date,
  entry,
  onDone,
  onDelete,
}: {
  athleteId: string;
  date: string;
  entry: DayView['fluids'][number];
  onDone: () => void;
  onDelete: () => Promise<unknown>;
}) {
  const resolver = useMemo(() => createRequestResolver(fluidEntryRequest, toFluidRequest), []);
  const initial = fluidFormValues(entry, entry.entered.unit, entry.time);
  const form = useForm<FluidFormValues, unknown, FluidEntryRequest>({ resolver, defaultValues: initial });
  const update = useUpdateFluid(athleteId, date, { onSuccess: onDone });
  const unitLabel = VOLUME_UNIT_LABELS[initial.unit];
  return (
    <Form
      form={form}
      onSubmit={(body) => update.mutateAsync({ entryId: entry.id, body: withoutClientId(body) })}
      aria-label={`Edit drink at ${entry.time}`}
      className="space-y-3 rounded-md bg-paper p-3"
    >
      <div className="grid grid-cols-2 gap-3">
        <TextField
          name="volume"
          label={`Amount (${unitLabel})`}
          suffix={unitLabel}
          inputMode="decimal"
          autoComplete="off"
          inputClassName="tabular-nums"
        />
        <TextField name="time" label="Drink time" type="time" inputClassName="tabular-nums" />
      </div>
      <SegmentedField name="kind" legend="Kind" options={KIND_OPTIONS} />
      <div className="flex flex-wrap gap-2">
        <SubmitButton pendingLabel="Saving…">Save drink</SubmitButton>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <ConfirmDelete what="this drink" onDelete={onDelete} className="ml-auto" />
      </div>
    </Form>
  );
}
