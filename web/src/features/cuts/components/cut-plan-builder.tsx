import {
  acuteShare,
  CUT_PATH_LABELS,
  CUT_PATHS,
  createCutPlanRequest,
  WEIGHT_UNIT_LABELS,
  type CreateCutPlanRequest,
  type CutWarningView,
  type RehearsalView,
  type WeightUnit,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import type { z } from 'zod';
import { useForm, useWatch } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { TextArea } from '@/components/ui/text-area';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { judgedWarnings } from '@/lib/judged-warnings';
import { useCreateCutPlan } from '../api/create-cut-plan';
import { readBoxNumber } from '@/lib/number-reader';
import { readWeightKg } from '../utils/plan-numbers';
import { CutWarningText } from './cut-warning-item';
import { RehearsalRecord } from './rehearsal-record';

/** A warning the server named in its 409: judged whole, or (an older body) only its key and words. */
type Named = Pick<CutWarningView, 'key' | 'message' | 'source' | 'stopSigns'> & {
  severity: CutWarningView['severity'] | null;
};
type Pending = { values: CreateCutPlanRequest; warnings: Named[] };

/** The 409's warnings through the shared schema; one it names only in `fields` keeps just its words. */
function namedWarnings(error: Parameters<typeof judgedWarnings>[0]): Named[] {
  const judged = new Map(
    judgedWarnings(error)
      .filter((w): w is CutWarningView => !('scope' in w))
      .map((w) => [w.key, w]),
  );
  return Object.entries(error.fields).map(
    ([key, message]) => judged.get(key) ?? { key, message, source: '', stopSigns: null, severity: null },
  );
}

/**
 * The coach builds the cut plan with the athlete: the chronic part (start, weight before the last
 * days, equal kg or equal %) and the acute days; weights are typed in the coach's unit and sent in kg. The server checks it; warnings it names come back
 * to be read and acknowledged one by one before the plan is saved.
 */
export function CutPlanBuilder({
  athleteId,
  today,
  unit,
  limitKg,
  rehearsal,
  canNote,
  onSaved,
}: {
  athleteId: string;
  today: string;
  /** The coach's weight unit: the weight boxes are typed in it. */
  unit: WeightUnit;
  /** The weigh-in's limit, kg: the last days' share is read against it as the coach types. */
  limitKg: number;
  /** The latest practice run, shown beside the plan being built. */
  rehearsal: RehearsalView | null;
  canNote: boolean;
  onSaved?: () => void;
}) {
  const [practice, setPractice] = useState(false);
  const [pending, setPending] = useState<Pending | null>(null);
  const [checked, setChecked] = useState<string[]>([]);
  const [saved, setSaved] = useState(false);
  const create = useCreateCutPlan(athleteId);
  const form = useForm<z.input<typeof createCutPlanRequest>, unknown, CreateCutPlanRequest>({
    resolver: zodResolver(createCutPlanRequest),
    defaultValues: {
      startDate: today,
      acuteDays: 3,
      path: 'linear',
      notes: null,
      acknowledgedKeys: [],
      practiceWeighInDate: null,
    },
  });
  const [preAcuteKg, acuteDays] = useWatch({ control: form.control, name: ['preAcuteKg', 'acuteDays'] });
  // The same shared rule the server uses for a plan's acute share (kg and %; the verdict stays the server's).
  const planned =
    typeof preAcuteKg === 'number' && Number.isFinite(preAcuteKg) && preAcuteKg > 0
      ? { ...acuteShare(preAcuteKg, limitKg), days: typeof acuteDays === 'number' ? acuteDays : 0 }
      : null;
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
        setPending({ values, warnings: namedWarnings(error) });
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
        onSubmit={(values) =>
          submit(
            {
              ...values,
              notes: values.notes || null,
              practiceWeighInDate: practice ? values.practiceWeighInDate : null,
            },
            [],
          )
        }
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
        <label className="flex items-start gap-2 text-sm sm:col-span-2">
          <input
            type="checkbox"
            className="mt-0.5 size-4 shrink-0"
            checked={practice}
            onChange={(e) => setPractice(e.target.checked)}
          />
          <span>
            <span className="font-semibold text-ink">Practice run (rehearsal)</span>{' '}
            <span className="text-ink-muted">
              aimed at a practice weigh-in before the real one; its record is shown beside the next plan
            </span>
          </span>
        </label>
        {practice ? (
          <TextField
            name="practiceWeighInDate"
            label="Practice weigh-in date"
            type="date"
            required
            registerOptions={{ setValueAs: (v: unknown) => (v ? v : null) }}
          />
        ) : null}
        <div className="sm:col-span-2">
          <SubmitButton pendingLabel="Checking…">Check and save</SubmitButton>
        </div>
      </Form>
      {rehearsal ? (
        <RehearsalRecord
          athleteId={athleteId}
          rehearsal={rehearsal}
          planned={planned ? { kg: planned.kg, pct: planned.pct, days: planned.days } : null}
          plannedLabel="This plan’s last days (as typed)"
          unit={unit}
          canNote={canNote}
          today={today}
          compact
        />
      ) : null}
      {pending ? (
        <Alert tone="caution" title="Read these with the athlete before saving">
          <ul className="mt-2 space-y-3">
            {pending.warnings.map((w) => (
              <li key={w.key}>
                <label className="flex items-start gap-2">
                  <input
                    type="checkbox"
                    className="mt-1 size-4 shrink-0"
                    checked={checked.includes(w.key)}
                    onChange={(e) =>
                      setChecked((c) => (e.target.checked ? [...c, w.key] : c.filter((k) => k !== w.key)))
                    }
                  />
                  <span className="min-w-0 flex-1 space-y-1">
                    {w.severity ? (
                      <CutWarningText warning={{ ...w, severity: w.severity }} />
                    ) : (
                      <span className="block text-sm text-ink">{w.message}</span>
                    )}
                    <span className="block font-semibold">
                      I have read this with the athlete and accept it.
                    </span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
          <Button
            className="mt-3"
            disabled={!pending.warnings.every((w) => checked.includes(w.key))}
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
