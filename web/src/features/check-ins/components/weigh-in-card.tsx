import {
  CYCLE_PHASES,
  WEIGH_IN_TAG_LABELS,
  WEIGH_IN_TAGS,
  WEIGHT_UNIT_LABELS,
  weighInRequest,
  type WeighInRequest,
} from '@driftmark/shared';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { CheckboxGroup } from '@/components/ui/checkbox-group';
import { Form, SubmitButton } from '@/components/ui/form';
import { ChevronDownIcon, ScaleIcon } from '@/components/ui/icons';
import { SegmentedField } from '@/components/ui/segmented-field';
import { TextField } from '@/components/ui/text-field';
import { useDeleteWeighIn } from '../api/delete-weigh-in';
import { useSaveWeighIn } from '../api/save-weigh-in';
import { toWeighInRequest, weighInFormValues, type WeighInFormValues } from '../utils/form-values';
import { createRequestResolver } from '@/lib/request-resolver';
import { displayWeight } from '../utils/units';
import { CheckInCard, HeaderFigure, NotLogged } from './check-in-card';
import type { DayCardProps } from './day-card-props';
import { ConfirmDelete } from './entry-row';
import { useFollowClock } from './use-follow-clock';

/** The protocol, in one line: it is also the checkbox's label. */
export const WEIGH_IN_PROTOCOL = 'After waking and voiding, before food and drink';

const CYCLE_PHASE_LABELS: Record<(typeof CYCLE_PHASES)[number], string> = {
  menstrual: 'Menstrual',
  follicular: 'Follicular',
  ovulation: 'Ovulation',
  luteal: 'Luteal',
};

export function WeighInCard({ athleteId, day, units, canEdit, now }: DayCardProps) {
  const weighIn = day.weighIn;
  const [editing, setEditing] = useState(false);
  const remove = useDeleteWeighIn(athleteId, day.date);
  const showForm = canEdit && (!weighIn || editing);

  return (
    <CheckInCard
      id="weigh-in"
      title="Morning weigh-in"
      icon={<ScaleIcon />}
      summary={
        weighIn ? (
          <HeaderFigure
            value={displayWeight(weighIn.weightKg, weighIn.entered, units.weight)}
            caption={`at ${weighIn.time}`}
          />
        ) : null
      }
    >
      {showForm ? (
        <WeighInForm
          key={weighIn?.updatedAt ?? 'new'}
          athleteId={athleteId}
          date={day.date}
          initial={weighInFormValues(weighIn, units.weight, now)}
          followClock={!weighIn}
          now={now}
          onDone={() => setEditing(false)}
          onCancel={weighIn ? () => setEditing(false) : undefined}
        />
      ) : weighIn ? (
        <div className="space-y-3">
          {weighIn.entered.unit !== units.weight ? (
            <p className="text-sm text-ink-muted tabular-nums">
              Typed as {displayWeight(weighIn.weightKg, weighIn.entered, weighIn.entered.unit)}
            </p>
          ) : null}
          {weighIn.tags.length > 0 ? (
            <ul aria-label="Noted with the weigh-in" className="flex flex-wrap gap-1.5">
              {weighIn.tags.map((tag) => (
                <li key={tag}>
                  <Badge tone="neutral">
                    {tag === 'cycle_phase' && weighIn.cyclePhase
                      ? `Cycle: ${CYCLE_PHASE_LABELS[weighIn.cyclePhase]}`
                      : WEIGH_IN_TAG_LABELS[tag]}
                  </Badge>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-sm text-ink-muted">Protocol confirmed: {WEIGH_IN_PROTOCOL.toLowerCase()}.</p>
          )}
          {canEdit ? (
            <div className="flex flex-wrap gap-2">
              <Button variant="secondary" onClick={() => setEditing(true)}>
                Edit weigh-in
              </Button>
              <ConfirmDelete what="this weigh-in" onDelete={() => remove.mutateAsync()} />
            </div>
          ) : null}
        </div>
      ) : (
        <NotLogged>No weigh-in this day.</NotLogged>
      )}
    </CheckInCard>
  );
}

interface WeighInFormProps {
  athleteId: string;
  date: string;
  initial: WeighInFormValues;
  followClock: boolean;
  now: string;
  onDone: () => void;
  onCancel?: () => void;
}

function WeighInForm({ athleteId, date, initial, followClock, now, onDone, onCancel }: WeighInFormProps) {
  const resolver = useMemo(() => createRequestResolver(weighInRequest, toWeighInRequest), []);
  const form = useForm<WeighInFormValues, unknown, WeighInRequest>({ resolver, defaultValues: initial });
  const save = useSaveWeighIn(athleteId, date, { onSuccess: onDone });
  useFollowClock(form, 'time', now, followClock);
  const [unit, tags] = useWatch({ control: form.control, name: ['unit', 'tags'] });
  const tracksCycle = Array.isArray(tags) && tags.includes('cycle_phase');

  return (
    <Form form={form} onSubmit={(body) => save.mutateAsync(body)} aria-label="Weigh-in" className="space-y-4">
      <div className="grid grid-cols-[minmax(0,1fr)_8.5rem] items-start gap-3">
        <TextField
          name="weight"
          label="Weight"
          suffix={WEIGHT_UNIT_LABELS[unit]}
          inputMode="decimal"
          autoComplete="off"
          enterKeyHint="done"
          required
          inputClassName="text-lg font-semibold tabular-nums"
        />
        <SegmentedField
          name="unit"
          legend="Unit"
          options={[
            { value: 'kg', label: 'kg' },
            { value: 'lb', label: 'lb' },
          ]}
        />
      </div>
      <TextField name="time" label="Weigh-in time" type="time" required inputClassName="tabular-nums" />
      <Checkbox name="protocolConfirmed" title="Protocol" label={WEIGH_IN_PROTOCOL} required />
      <details open={initial.tags.length > 0} className="group rounded-md border border-line bg-paper">
        <summary className="flex min-h-touch cursor-pointer list-none items-center justify-between gap-2 px-3 font-semibold text-ink [&::-webkit-details-marker]:hidden">
          <span>
            Anything that may move the number? <span className="font-normal text-ink-muted">(optional)</span>
          </span>
          <ChevronDownIcon
            aria-hidden="true"
            className="shrink-0 text-lg transition-transform group-open:rotate-180"
          />
        </summary>
        <div className="px-3 pb-3">
          <CheckboxGroup
            name="tags"
            legend="Noted with the weigh-in"
            options={WEIGH_IN_TAGS.map((t) => ({ value: t, label: WEIGH_IN_TAG_LABELS[t] }))}
            columns={2}
          />
        </div>
      </details>
      {tracksCycle ? (
        <SegmentedField
          name="cyclePhase"
          legend="Cycle phase"
          options={CYCLE_PHASES.map((p) => ({ value: p, label: CYCLE_PHASE_LABELS[p] }))}
          columns={2}
          hint="Only if you choose to track it."
        />
      ) : null}
      <div className="flex flex-wrap gap-2">
        <SubmitButton size="lg" className="flex-1" pendingLabel="Saving…">
          Save weigh-in
        </SubmitButton>
        {onCancel ? (
          <Button variant="ghost" size="lg" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </Form>
  );
}
