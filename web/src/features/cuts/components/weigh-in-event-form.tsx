import {
  WEIGH_IN_TIMING_LABELS,
  WEIGH_IN_TIMINGS,
  WEIGHT_UNIT_LABELS,
  weighInEventRequest,
  type WeighInEventRequest,
  type WeighInEventView,
  type WeightUnit,
} from '@driftmark/shared';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { createRequestResolver } from '@/lib/request-resolver';
import { useSaveWeighInEvent } from '../api/save-weigh-in-event';
import {
  toWeighInEventRequest,
  weighInEventFormValues,
  type WeighInEventFormValues,
} from '../utils/weigh-in-form';

const weightInput = { inputMode: 'decimal' as const, autoComplete: 'off', inputClassName: 'tabular-nums' };

/**
 * The coach enters the weigh-in's record: the class limit, day-before or same-day, both clock times
 * on the venue's clock, the usual weight and the classes either side. Weights are typed in the
 * coach's unit and sent in kg; the server answers with the refreshed making-weight figures.
 */
export function WeighInEventForm({
  athleteId,
  weighIn,
  unit,
}: {
  athleteId: string;
  weighIn: WeighInEventView;
  unit: WeightUnit;
}) {
  const [saved, setSaved] = useState(false);
  // Remounted with each saved record, so the boxes and the "unchanged box keeps its kg" rule follow it.
  const key = JSON.stringify(weighIn);
  return (
    <div className="space-y-4">
      {saved ? <Alert tone="success">Weigh-in details saved.</Alert> : null}
      <EventForm
        key={key}
        athleteId={athleteId}
        weighIn={weighIn}
        unit={unit}
        onSaving={() => setSaved(false)}
        onSaved={() => setSaved(true)}
      />
    </div>
  );
}

function EventForm({
  athleteId,
  weighIn,
  unit,
  onSaving,
  onSaved,
}: {
  athleteId: string;
  weighIn: WeighInEventView;
  unit: WeightUnit;
  onSaving: () => void;
  onSaved: () => void;
}) {
  const resolver = useMemo(
    () =>
      createRequestResolver<WeighInEventFormValues, WeighInEventRequest>(
        weighInEventRequest as never,
        toWeighInEventRequest(unit, weighIn),
      ),
    [unit, weighIn],
  );
  const form = useForm<WeighInEventFormValues, unknown, WeighInEventRequest>({
    resolver,
    defaultValues: weighInEventFormValues(weighIn, unit),
  });
  const save = useSaveWeighInEvent(athleteId, { onSuccess: onSaved });
  const suffix = WEIGHT_UNIT_LABELS[unit];

  return (
    <Form
      form={form}
      onSubmit={async (body) => {
        onSaving();
        await save.mutateAsync(body);
      }}
      aria-label="Weigh-in details"
      className="grid gap-4 sm:grid-cols-2"
    >
      <TextField name="weighInLimitKg" label="Class limit" suffix={suffix} required {...weightInput} />
      <Select
        name="weighInTiming"
        label="Weigh-in"
        placeholder="Choose…"
        required
        options={WEIGH_IN_TIMINGS.map((t) => ({ value: t, label: WEIGH_IN_TIMING_LABELS[t] }))}
      />
      <TextField
        name="weighInTime"
        label="Weigh-in time"
        hint={`On the venue’s clock (${weighIn.timeZone ?? 'its time zone'}).`}
        type="time"
        required
        inputClassName="tabular-nums"
      />
      <TextField
        name="competitionTime"
        label="Competition time"
        hint="On the venue’s clock."
        type="time"
        required
        inputClassName="tabular-nums"
      />
      <TextField name="usualWeightKg" label="Usual weight" suffix={suffix} {...weightInput} />
      <TextField name="classBelowKg" label="Class below" suffix={suffix} {...weightInput} />
      <TextField name="classAboveKg" label="Class above" suffix={suffix} {...weightInput} />
      <div className="sm:col-span-2">
        <SubmitButton pendingLabel="Saving…">Save weigh-in details</SubmitButton>
      </div>
    </Form>
  );
}
