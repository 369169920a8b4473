import {
  CONSENTS,
  EVENT_TYPE_LABELS,
  EVENT_TYPES,
  GOAL_LABELS,
  GOALS,
  LIMITS,
  VOLUME_UNIT_LABELS,
  WEIGHT_UNIT_LABELS,
  type AthleteProfile,
  type IntakeRequest,
} from '@driftmark/shared';
import { useEffect, useMemo, useRef, type ReactNode } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Checkbox } from '@/components/ui/checkbox';
import { Form, SubmitButton } from '@/components/ui/form';
import { RadioGroup } from '@/components/ui/radio-group';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { todayIn } from '@/lib/format';
import { timeZoneOptions } from '@/lib/time-zones';
import { useSubmitIntake } from '../api/submit-intake';
import { createIntakeResolver } from '../utils/intake-resolver';
import {
  convertForUnitChange,
  eventHasWeighIn,
  formFieldFor,
  heightInFeet,
  initialIntakeValues,
  type IntakeFormValues,
} from '../utils/intake-values';

interface IntakeFormProps {
  athleteId: string;
  profile: AthleteProfile | undefined;
  defaults: IntakeFormDefaults;
  onSaved: (profile: AthleteProfile) => void;
}

export interface IntakeFormDefaults {
  weightUnit: IntakeFormValues['weightUnit'];
  volumeUnit: IntakeFormValues['volumeUnit'];
  timeZone: string;
}

function Section({
  title,
  description,
  children,
}: {
  title: string;
  description?: ReactNode;
  children: ReactNode;
}) {
  return (
    <fieldset className="rounded-lg border border-line bg-surface p-5 shadow-card">
      <legend className="float-left mb-1 w-full text-lg font-semibold text-ink">{title}</legend>
      {description ? <p className="clear-both mb-4 text-sm text-ink-muted">{description}</p> : null}
      <div className="clear-both space-y-5">{children}</div>
    </fieldset>
  );
}

const decimalInput = { inputMode: 'decimal' as const, autoComplete: 'off', enterKeyHint: 'next' as const };

export function IntakeForm({ athleteId, profile, defaults, onSaved }: IntakeFormProps) {
  const resolver = useMemo(() => createIntakeResolver(), []);
  const form = useForm<IntakeFormValues, unknown, IntakeRequest>({
    resolver,
    defaultValues: initialIntakeValues(profile, defaults),
  });
  const submit = useSubmitIntake(athleteId, { onSuccess: onSaved });

  const [weightUnit, volumeUnit, eventType, timeZone, eventTimeZone] = useWatch({
    control: form.control,
    name: ['weightUnit', 'volumeUnit', 'eventType', 'timeZone', 'eventTimeZone'],
  });

  // Switching units rewrites what was typed so it keeps its meaning (178 cm → 5 ft 10.1 in).
  const units = useRef({ weightUnit, volumeUnit });
  useEffect(() => {
    const before = units.current;
    if (before.weightUnit === weightUnit && before.volumeUnit === volumeUnit) return;
    const current = form.getValues();
    const patch = convertForUnitChange({ ...current, ...before }, { weightUnit, volumeUnit });
    for (const [key, value] of Object.entries(patch)) {
      form.setValue(key as keyof IntakeFormValues, value as never, { shouldDirty: true });
    }
    units.current = { weightUnit, volumeUnit };
  }, [form, weightUnit, volumeUnit]);

  const zones = useMemo(() => timeZoneOptions(timeZone, eventTimeZone), [timeZone, eventTimeZone]);
  const today = todayIn(timeZone || 'UTC');
  const hasEvent = Boolean(eventType) && eventType !== 'none';
  const feet = heightInFeet(weightUnit);
  const weightLabel = WEIGHT_UNIT_LABELS[weightUnit];
  const firstIntake = !profile?.intakeCompletedAt;
  const volumeLabel = VOLUME_UNIT_LABELS[volumeUnit];

  return (
    <Form
      form={form}
      onSubmit={(values) => submit.mutateAsync(values)}
      mapServerField={(path) => formFieldFor(path, form.getValues('weightUnit'))}
      aria-label="Intake"
      className="space-y-5"
    >
      <Section
        title="Units and time zone"
        description="Choose these first: the boxes below follow them. You can change them later in settings."
      >
        <RadioGroup
          name="weightUnit"
          legend="Body weight and height"
          options={[
            { value: 'kg', label: 'kg and cm' },
            { value: 'lb', label: 'lb and ft/in' },
          ]}
          required
        />
        <RadioGroup
          name="volumeUnit"
          legend="Fluids"
          options={[
            { value: 'ml', label: 'mL' },
            { value: 'floz', label: 'US fl oz' },
          ]}
          required
        />
        <Select
          name="timeZone"
          label="Your time zone"
          options={zones}
          hint={
            firstIntake
              ? 'Decides which day a weigh-in or a meal belongs to. Filled in from this device.'
              : 'Decides which day a weigh-in or a meal belongs to.'
          }
          required
        />
      </Section>

      <Section title="About you" description="Used for energy estimates and to set sensible targets.">
        <RadioGroup
          name="sex"
          legend="Sex"
          options={[
            { value: 'female', label: 'Female' },
            { value: 'male', label: 'Male' },
          ]}
          hint="As used in energy and body-composition equations."
          required
        />
        <TextField
          name="birthDate"
          label="Birth date"
          type="date"
          max={today}
          autoComplete="bday"
          required
          inputClassName="tabular-nums"
        />
        {feet ? (
          <fieldset>
            <legend className="mb-1.5 font-semibold text-ink">Height</legend>
            <div className="grid grid-cols-2 gap-3">
              <TextField
                name="heightFt"
                label="Height (ft)"
                suffix="ft"
                required
                {...decimalInput}
                inputClassName="tabular-nums"
              />
              <TextField
                name="heightIn"
                label="Height (in)"
                suffix="in"
                {...decimalInput}
                inputClassName="tabular-nums"
              />
            </div>
          </fieldset>
        ) : (
          <TextField
            name="heightCm"
            label="Height (cm)"
            suffix="cm"
            required
            {...decimalInput}
            inputClassName="tabular-nums"
          />
        )}
        <TextField
          name="currentWeight"
          label={`Current weight (${weightLabel})`}
          suffix={weightLabel}
          hint="Today's weight on your usual scale; your plan uses it until your first weigh-in."
          required
          {...decimalInput}
          inputClassName="tabular-nums"
        />
        <TextField
          name="usualWater"
          label={`Usual daily water (${volumeLabel})`}
          suffix={volumeLabel}
          hint="Everything you drink on an ordinary day, not only water."
          required
          {...decimalInput}
          inputClassName="tabular-nums"
        />
        <TextField
          name="usualEnergyKcal"
          label="Usual daily energy (kcal)"
          suffix="kcal"
          hint="A rough figure is fine; your coach refines it from your logs."
          required
          inputMode="numeric"
          autoComplete="off"
          inputClassName="tabular-nums"
        />
      </Section>

      <Section title="Goal and event">
        <Select
          name="goal"
          label="Goal"
          placeholder="Choose…"
          options={GOALS.map((g) => ({ value: g, label: GOAL_LABELS[g] }))}
          required
        />
        <Select
          name="eventType"
          label="Event type"
          placeholder="Choose…"
          options={EVENT_TYPES.map((t) => ({ value: t, label: EVENT_TYPE_LABELS[t] }))}
          hint="The dated event you are preparing for: a show, a photo shoot or a weigh-in."
          required
        />
        {hasEvent ? (
          <>
            <TextField name="eventName" label="Event name" maxLength={100} autoComplete="off" />
            <div className="grid gap-5 sm:grid-cols-2 sm:gap-3">
              <TextField
                name="eventDate"
                label="Event date"
                type="date"
                min={today}
                required
                inputClassName="tabular-nums"
              />
              <TextField
                name="eventTime"
                label="Event time"
                type="time"
                hint="Local time at the event; leave empty if not known yet."
                inputClassName="tabular-nums"
              />
            </div>
            <Select
              name="eventTimeZone"
              label="Time zone of the event"
              options={zones}
              hint="Where the event is held, if you travel for it."
              required
            />
            <TextField
              name="division"
              label="Division or weight class"
              maxLength={LIMITS.division.max}
              autoComplete="off"
              hint={eventType === 'weigh_in' ? 'e.g. −63 kg, lightweight' : 'e.g. figure, classic physique'}
            />
            {eventHasWeighIn(eventType) ? (
              <TextField
                name="weighInLimit"
                label={`Weigh-in limit (${weightLabel})`}
                suffix={weightLabel}
                required={eventType === 'weigh_in'}
                hint={
                  eventType === 'weigh_in'
                    ? 'The most you may weigh at the weigh-in.'
                    : 'Only if your class has a weight limit.'
                }
                {...decimalInput}
                inputClassName="tabular-nums"
              />
            ) : null}
          </>
        ) : null}
      </Section>

      <Section title="Photo consent">
        <Checkbox
          name="photoConsent"
          label={CONSENTS.photo_consent.text}
          hint="Optional. Without it you can still log everything else."
        />
      </Section>

      <Section title="Before you start">
        <Alert tone="caution" live={false}>
          Final-week water, sodium and energy changes and rapid weight cuts carry real risk. Read this and
          tick it to continue.
        </Alert>
        <Checkbox
          name="safetyAcknowledged"
          title="Acknowledgement"
          label={CONSENTS.safety_acknowledgement.text}
          required
        />
      </Section>

      <div className="pb-2">
        <SubmitButton size="lg" className="w-full" pendingLabel="Saving…">
          {firstIntake ? 'Save and continue' : 'Save changes'}
        </SubmitButton>
      </div>
    </Form>
  );
}
