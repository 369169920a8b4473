import {
  BODY_COMPOSITION_METHOD_LABELS,
  BODY_COMPOSITION_METHODS,
  createBodyMeasurementRequest,
  DENSITY_EQUATION_LABELS,
  DENSITY_EQUATIONS,
  LENGTH_UNIT_LABELS,
  LIMITS,
  SKINFOLD_SITE_LABELS,
  skinfoldSites,
  type CreateBodyMeasurementRequest,
  type LengthUnit,
  type SkinfoldSite,
} from '@driftmark/shared';
import { useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { createRequestResolver } from '@/lib/request-resolver';
import { useCreateBodyMeasurement } from '../api/create-body-measurement';
import type { LinkedKeys } from '../api/body-composition-cache';
import {
  emptyMeasurementForm,
  measurementMessage,
  toMeasurementRequest,
  type MeasurementFormValues,
} from '../utils/measurement-form';

const decimalInput = { inputMode: 'decimal' as const, autoComplete: 'off', enterKeyHint: 'next' as const };

interface MeasurementFormProps {
  athleteId: string;
  /** The athlete's sex decides the sites (Jackson & Pollock men, Jackson, Pollock & Ward women). */
  sex: 'female' | 'male';
  /** The athlete's today (their own date), the latest date a measurement may carry. */
  today: string;
  heightCm: number | null;
  /** Circumferences and height in cm, or inches for those who weigh in pounds; skinfolds stay mm. */
  lengthUnit: LengthUnit;
  /** Pre-filled "Measured by" (the signed-in user's name). */
  measuredBy: string;
  linkedKeys?: LinkedKeys;
  onSaved?: () => void;
}

/** Enter one measurement session: skinfolds (3 or 7 sites) or circumferences, with who took it. */
export function MeasurementForm({
  athleteId,
  sex,
  today,
  heightCm,
  lengthUnit,
  measuredBy,
  linkedKeys,
  onSaved,
}: MeasurementFormProps) {
  const resolver = useMemo(
    () =>
      createRequestResolver<MeasurementFormValues, CreateBodyMeasurementRequest>(
        createBodyMeasurementRequest as never,
        (v) => toMeasurementRequest(v, lengthUnit, heightCm),
        (field, error) => measurementMessage(field, error, lengthUnit),
      ),
    [lengthUnit, heightCm],
  );
  const lengthSuffix = LENGTH_UNIT_LABELS[lengthUnit];
  const defaults = { ...emptyMeasurementForm(today, heightCm, lengthUnit), measuredBy };
  const form = useForm<MeasurementFormValues, unknown, CreateBodyMeasurementRequest>({
    resolver,
    defaultValues: defaults,
  });
  const method = useWatch({ control: form.control, name: 'method' });
  const create = useCreateBodyMeasurement(athleteId, {
    linkedKeys,
    onSuccess: () => {
      form.reset({ ...defaults, method, densityEquation: form.getValues('densityEquation') });
      onSaved?.();
    },
  });
  const sites: readonly SkinfoldSite[] = method === 'circumference' ? [] : skinfoldSites(sex, method);

  return (
    <Form form={form} onSubmit={(body) => create.mutateAsync(body)} className="space-y-5">
      <div className="grid gap-5 sm:grid-cols-2 sm:gap-3">
        <TextField name="date" label="Date" type="date" max={today} required inputClassName="tabular-nums" />
        <TextField
          name="measuredBy"
          label="Measured by"
          maxLength={LIMITS.measuredBy.max}
          autoComplete="off"
          required
          hint="Who held the calipers or the tape."
        />
      </div>
      <div className="grid gap-5 sm:grid-cols-2 sm:gap-3">
        <Select
          name="method"
          label="Method"
          options={BODY_COMPOSITION_METHODS.map((m) => ({
            value: m,
            label: BODY_COMPOSITION_METHOD_LABELS[m],
          }))}
        />
        {method === 'circumference' ? null : (
          <Select
            name="densityEquation"
            label="Density to % fat"
            options={DENSITY_EQUATIONS.map((e) => ({ value: e, label: DENSITY_EQUATION_LABELS[e] }))}
            hint="Siri (1961) or Brozek (1963)."
          />
        )}
      </div>
      {method === 'circumference' ? (
        <fieldset className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <legend className="mb-2 text-sm font-semibold text-ink">Circumferences ({lengthSuffix})</legend>
          <TextField
            name="neckCm"
            label="Neck"
            suffix={lengthSuffix}
            required
            {...decimalInput}
            inputClassName="tabular-nums"
          />
          <TextField
            name="waistCm"
            label="Waist"
            suffix={lengthSuffix}
            required
            {...decimalInput}
            inputClassName="tabular-nums"
          />
          {sex === 'female' ? (
            <TextField
              name="hipCm"
              label="Hip"
              suffix={lengthSuffix}
              required
              {...decimalInput}
              inputClassName="tabular-nums"
            />
          ) : null}
          <TextField
            name="heightCm"
            label="Height"
            suffix={lengthSuffix}
            required
            {...decimalInput}
            inputClassName="tabular-nums"
          />
        </fieldset>
      ) : (
        <fieldset className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <legend className="mb-2 text-sm font-semibold text-ink">
            Skinfolds (mm), {sex === 'male' ? 'Jackson & Pollock' : 'Jackson, Pollock & Ward'}
          </legend>
          {sites.map((s) => (
            <TextField
              key={s}
              name={`skinfoldsMm.${s}`}
              label={SKINFOLD_SITE_LABELS[s]}
              suffix="mm"
              required
              {...decimalInput}
              inputClassName="tabular-nums"
            />
          ))}
        </fieldset>
      )}
      <SubmitButton pendingLabel="Saving…">Save measurement</SubmitButton>
    </Form>
  );
}
