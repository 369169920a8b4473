import { labelFoodRequest, LIMITS, type LabelFoodRequest, type LabelFoodResult } from '@driftmark/shared';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Form, SubmitButton } from '@/components/ui/form';
import { SegmentedField } from '@/components/ui/segmented-field';
import { TextField } from '@/components/ui/text-field';
import { createRequestResolver } from '@/lib/request-resolver';
import { useCreateLabelFood, type LabelFoodOwner } from '../api/create-label-food';
import type { LinkedKeys } from '../api/keys';
import { emptyLabelForm, toLabelRequest, type LabelFormValues } from '../utils/label-form';
import { LabelCheckNote } from './label-check-note';

const decimalInput = {
  inputMode: 'decimal' as const,
  autoComplete: 'off',
  enterKeyHint: 'next' as const,
  inputClassName: 'tabular-nums',
};

interface LabelFoodFormProps {
  owner: LabelFoodOwner;
  /** A name to start from (the product a barcode did not find, say). */
  initialName?: string;
  linkedKeys?: LinkedKeys;
}

/**
 * Copy a nutrition label: per 100 g or per serving (g or mL), energy in kcal or kJ as printed. The
 * server stores it per 100 g and answers its check of the printed energy, shown under the form.
 */
export function LabelFoodForm({ owner, initialName, linkedKeys }: LabelFoodFormProps) {
  const resolver = useMemo(
    () => createRequestResolver<LabelFormValues, LabelFoodRequest>(labelFoodRequest as never, toLabelRequest),
    [],
  );
  const form = useForm<LabelFormValues, unknown, LabelFoodRequest>({
    resolver,
    defaultValues: emptyLabelForm(initialName),
  });
  const [saved, setSaved] = useState<LabelFoodResult | null>(null);
  const create = useCreateLabelFood(owner, {
    linkedKeys,
    onSuccess: (result) => {
      setSaved(result);
      form.reset(emptyLabelForm());
    },
  });
  const basis = useWatch({ control: form.control, name: 'basis' });
  const servingUnit = useWatch({ control: form.control, name: 'servingUnit' });
  const perServing = basis === 'perServing';
  const column = perServing ? 'per serving' : 'per 100 g';

  return (
    <div className="space-y-5">
      {saved ? (
        <LabelCheckNote
          result={saved}
          title={owner.kind === 'team' ? 'Added to the team’s foods' : 'Added to your foods'}
        />
      ) : null}
      <Form
        form={form}
        onSubmit={(body) => create.mutateAsync(body)}
        className="space-y-5"
        aria-label="Food from a nutrition label"
      >
        <TextField
          name="name"
          label="Name"
          maxLength={LIMITS.foodName.max}
          autoComplete="off"
          required
          hint="As it should appear when you search."
        />
        <SegmentedField
          name="basis"
          legend="The label column you copy"
          options={[
            { value: 'per100g', label: 'Per 100 g' },
            { value: 'perServing', label: 'Per serving' },
          ]}
        />
        {perServing ? (
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            <TextField name="servingSize" label="Serving size" required {...decimalInput} />
            <SegmentedField
              name="servingUnit"
              legend="Unit"
              options={[
                { value: 'g', label: 'g' },
                { value: 'ml', label: 'mL' },
              ]}
            />
            {servingUnit === 'ml' ? (
              <TextField
                name="densityGPerMl"
                label="Density"
                suffix="g/mL"
                hint="Leave empty for 1 g/mL."
                {...decimalInput}
              />
            ) : null}
          </div>
        ) : null}
        <fieldset className="space-y-3">
          <legend className="mb-2 text-sm font-semibold text-ink">Figures {column}, as printed</legend>
          <div className="grid grid-cols-2 gap-3">
            <TextField name="energy" label="Energy" required {...decimalInput} />
            <SegmentedField
              name="energyUnit"
              legend="Energy unit"
              options={[
                { value: 'kcal', label: 'kcal' },
                { value: 'kJ', label: 'kJ' },
              ]}
            />
          </div>
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            <TextField name="proteinG" label="Protein" suffix="g" required {...decimalInput} />
            <TextField name="carbohydrateG" label="Carbohydrate" suffix="g" required {...decimalInput} />
            <TextField name="fatG" label="Fat" suffix="g" required {...decimalInput} />
            <TextField name="fibreG" label="Fibre" suffix="g" {...decimalInput} />
            <TextField name="alcoholG" label="Alcohol" suffix="g" {...decimalInput} />
            <TextField name="sodiumMg" label="Sodium" suffix="mg" {...decimalInput} />
          </div>
        </fieldset>
        <SubmitButton>Save food</SubmitButton>
      </Form>
    </div>
  );
}
