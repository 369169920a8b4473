import {
  CUT_PATH_LABELS,
  CUT_PATHS,
  createCutPlanRequest,
  WEIGHT_UNIT_LABELS,
  type CreateCutPlanRequest,
  type WeightUnit,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import type { z } from 'zod';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { TextArea } from '@/components/ui/text-area';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { useCreateCutPlan } from '../api/create-cut-plan';
import { readBoxNumber } from '@/lib/number-reader';
import { readWeightKg } from '../utils/plan-numbers';

type Pending = { values: CreateCutPlanRequest; warnings: [string, string][] };

/**
 * The coach builds the cut plan with the athlete: the chronic part (start, weight before the last
 * days, equal kg or equal %) and the acute days; weights are typed in the coach's unit and sent in kg. The server checks it; warnings it names come back
 * to be read and acknowledged one by one before the plan is saved.
 */
export function CutPlanBuilder({
  athleteId,
  today,
  unit,
  onSaved,
}: {
  athleteId: string;
  today: string;
  /** The coach's weight unit: the weight boxes are typed in it. */
  unit: WeightUnit;
  onSaved?: () => void;
}) {
  const [pending, setPending] = useState<Pending | null>(null);
  const [checked, setChecked] = useState<string[]>([]);
  const [saved, setSaved] = useState(false);
  const create = useCreateCutPlan(athleteId);
  const form = useForm<z.input<typeof createCutPlanRequest>, unknown, CreateCutPlanRequest>({
    resolver: zodResolver(createCutPlanRequest),
    defaultValues: { startDate: today, acuteDays: 3, path: 'linear', notes: null, acknowledgedKeys: [] },
  });
  const number = { setValueAs: readBoxNumber };
  const weight = { setValueAs: readWeightKg(unit) };

  async function submit(values: CreateCutPlanRequest, keys: string[]) {
    setSaved(false);
    try {
      await create.mutateAsync({ ...values, acknowledgedKeys: keys });
      setPending(null);
      setChecked([]);
      setSaved(true);
      onSaved?.();
    } catch (error) {
      if (isApiError(error) && error.code === 'guardrails_unacknowledged') {
        setPending({ values, warnings: Object.entries(error.fields) });
        setChecked(keys);
        return;
      }
      throw error;
    }
  }

  return (
    <div className="space-y-4">
      {saved ? (
        <Alert tone="success">Cut plan saved. The athlete sees today’s weight to stay on it.</Alert>
      ) : null}
      <Form
        form={form}
        onSubmit={(values) => submit({ ...values, notes: values.notes || null }, [])}
        aria-label="Cut plan"
        className="grid gap-4 sm:grid-cols-2"
      >
        <TextField name="startDate" label="Start of the chronic part" type="date" required />
        <TextField
          name="startKg"
          label="Weight at the start"
          suffix={WEIGHT_UNIT_LABELS[unit]}
          inputMode="decimal"
          autoComplete="off"
          required
          registerOptions={weight}
          inputClassName="tabular-nums"
        />
        <TextField
          name="preAcuteKg"
          label="Weight before the last days"
          suffix={WEIGHT_UNIT_LABELS[unit]}
          inputMode="decimal"
          autoComplete="off"
          required
          registerOptions={weight}
          inputClassName="tabular-nums"
        />
        <TextField
          name="acuteDays"
          label="Last days (acute part)"
          inputMode="numeric"
          autoComplete="off"
          required
          registerOptions={number}
          inputClassName="tabular-nums"
        />
        <Select
          name="path"
          label="How the weight comes down"
          options={CUT_PATHS.map((p) => ({ value: p, label: CUT_PATH_LABELS[p] }))}
        />
        <TextArea name="notes" label="What the last days involve" className="sm:col-span-2" />
        <div className="sm:col-span-2">
          <SubmitButton pendingLabel="Checking…">Check and save</SubmitButton>
        </div>
      </Form>
      {pending ? (
        <Alert tone="caution" title="Read these with the athlete before saving">
          <ul className="mt-2 space-y-3">
            {pending.warnings.map(([key, message]) => (
              <li key={key}>
                <label className="flex items-start gap-2">
                  <input
                    type="checkbox"
                    className="mt-1 size-4 shrink-0"
                    checked={checked.includes(key)}
                    onChange={(e) =>
                      setChecked((c) => (e.target.checked ? [...c, key] : c.filter((k) => k !== key)))
                    }
                  />
                  <span>
                    {message}{' '}
                    <span className="font-semibold">I have read this with the athlete and accept it.</span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
          <Button
            className="mt-3"
            disabled={!pending.warnings.every(([k]) => checked.includes(k))}
            loading={create.isPending}
            onClick={() => void submit(pending.values, checked)}
          >
            Acknowledge and save
          </Button>
        </Alert>
      ) : null}
    </div>
  );
}
