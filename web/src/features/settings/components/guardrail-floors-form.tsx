import { GUARDRAIL_DEFAULTS, guardrailFloors, SEXES, type GuardrailFloors } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { Skeleton } from '@/components/ui/spinner';
import { TextField } from '@/components/ui/text-field';
import { formatNumber, NBSP } from '@/lib/format';
import { readBoxNumber } from '@/lib/number-reader';
import { useGuardrails } from '../api/get-guardrails';
import { useUpdateGuardrails } from '../api/update-guardrails';

const SEX_LABELS: Record<(typeof SEXES)[number], string> = { female: 'Women', male: 'Men' };

const kcal = (n: number) => `${formatNumber(n)}${NBSP}kcal`;
const ml = (n: number) => `${formatNumber(n)}${NBSP}mL`;

/** Where the default floors come from, in plain words (the sources are named in GUARDRAIL_DEFAULTS). */
export function GuardrailDefaultsNote() {
  const d = GUARDRAIL_DEFAULTS;
  return (
    <div className="space-y-2 text-sm text-ink-muted">
      <p>
        <span className="font-semibold text-ink">Where the defaults come from.</span> Energy{' '}
        <span className="tabular-nums">{kcal(d.energyKcal.female)}</span> for women and{' '}
        <span className="tabular-nums">{kcal(d.energyKcal.male)}</span> for men a day is a floor in common
        coaching practice, without a single published source. Water{' '}
        <span className="tabular-nums">{formatNumber(d.waterMl.female / 1000, 1, 1)}</span> and{' '}
        <span className="tabular-nums">{formatNumber(d.waterMl.male / 1000, 1, 1)}&nbsp;L</span> a day to
        drink is the EFSA (2010) adequate intake of total water, 2.0&nbsp;L for women and 2.5&nbsp;L for men,
        less the roughly one fifth that usually comes from food (an approximate share).
      </p>
      <p>
        A floor is where a warning starts, not a safe target: a plan below it needs the coach to acknowledge
        the warning before it is saved, and the athlete sees a caution on those days. Plans near these figures
        belong with a licensed physician or registered dietitian.
      </p>
    </div>
  );
}

/**
 * The team's guardrail floors: the owner edits them, other staff read them. Every plan save and
 * countdown is checked against them.
 */
export function GuardrailFloorsForm({
  canEdit,
  onSaved,
}: {
  canEdit: boolean;
  /** After a save (the app refreshes what carries the floors elsewhere, e.g. plan pages). */
  onSaved?: () => void;
}) {
  const query = useGuardrails();

  if (query.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the floors" className="space-y-3">
        <Skeleton className="h-16" />
        <Skeleton className="h-16" />
      </div>
    );
  }
  if (query.isError) {
    return (
      <Alert
        tone="error"
        title="The floors could not be loaded."
        action={
          <Button variant="secondary" size="sm" onClick={() => void query.refetch()}>
            Try again
          </Button>
        }
      >
        {query.error.message}
      </Alert>
    );
  }

  const floors = query.data.data;
  // The answer's abilities win when it carries them; otherwise the signed-in user's team rights.
  const editable = 'manage' in query.data.abilities ? query.data.abilities.manage === true : canEdit;
  return editable ? <FloorsEditor floors={floors} onSaved={onSaved} /> : <FloorsTable floors={floors} />;
}

function FloorsTable({ floors }: { floors: GuardrailFloors }) {
  return (
    <div className="space-y-4">
      <table className="w-full max-w-md border-collapse text-left text-sm">
        <caption className="sr-only">Guardrail floors per day</caption>
        <thead>
          <tr className="border-b border-line text-xs font-semibold tracking-wide text-ink-muted uppercase">
            <th scope="col" className="py-2 pr-3">
              Floor
            </th>
            {SEXES.map((s) => (
              <th key={s} scope="col" className="py-2 pr-3 text-right">
                {SEX_LABELS[s]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-line tabular-nums">
          <tr>
            <th scope="row" className="py-2 pr-3 font-medium text-ink">
              Energy
            </th>
            {SEXES.map((s) => (
              <td key={s} className="py-2 pr-3 text-right">
                {kcal(floors.energyKcal[s])}
              </td>
            ))}
          </tr>
          <tr>
            <th scope="row" className="py-2 pr-3 font-medium text-ink">
              Water to drink
            </th>
            {SEXES.map((s) => (
              <td key={s} className="py-2 pr-3 text-right">
                {ml(floors.waterMl[s])}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
      <p className="text-sm text-ink-muted">Only the head coach can change the floors.</p>
      <GuardrailDefaultsNote />
    </div>
  );
}

function FloorsEditor({ floors, onSaved }: { floors: GuardrailFloors; onSaved?: () => void }) {
  const [saved, setSaved] = useState(false);
  const form = useForm<GuardrailFloors>({
    resolver: zodResolver(guardrailFloors),
    defaultValues: floors,
  });
  const update = useUpdateGuardrails({
    onSuccess: (next) => {
      setSaved(true);
      form.reset(next);
      onSaved?.();
    },
  });
  const number = { setValueAs: readBoxNumber };

  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setSaved(false);
        return update.mutateAsync(values);
      }}
      aria-label="Guardrail floors"
      className="space-y-5"
    >
      {saved ? <Alert tone="success">Floors saved. New checks use them from now on.</Alert> : null}
      <fieldset>
        <legend className="mb-2 font-semibold text-ink">Energy floor, per day</legend>
        <div className="grid grid-cols-2 gap-3">
          {SEXES.map((s) => (
            <TextField
              key={s}
              name={`energyKcal.${s}`}
              label={SEX_LABELS[s]}
              suffix="kcal"
              inputMode="numeric"
              autoComplete="off"
              required
              registerOptions={number}
              inputClassName="tabular-nums"
            />
          ))}
        </div>
      </fieldset>
      <fieldset>
        <legend className="mb-2 font-semibold text-ink">Water floor to drink, per day</legend>
        <div className="grid grid-cols-2 gap-3">
          {SEXES.map((s) => (
            <TextField
              key={s}
              name={`waterMl.${s}`}
              label={SEX_LABELS[s]}
              suffix="mL"
              inputMode="numeric"
              autoComplete="off"
              required
              registerOptions={number}
              inputClassName="tabular-nums"
            />
          ))}
        </div>
      </fieldset>
      <GuardrailDefaultsNote />
      <div className="flex flex-wrap gap-2">
        <SubmitButton pendingLabel="Saving…">Save floors</SubmitButton>
        <Button
          variant="ghost"
          onClick={() => {
            setSaved(false);
            form.reset(GUARDRAIL_DEFAULTS, { keepDefaultValues: true });
          }}
        >
          Use the defaults
        </Button>
      </div>
    </Form>
  );
}
