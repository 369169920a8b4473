import {
  eveningRequest,
  LIMITS,
  RATING_KEYS,
  RATING_LABELS,
  type DayView,
  type EveningRequest,
} from '@driftmark/shared';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { MoonIcon } from '@/components/ui/icons';
import { SegmentedField } from '@/components/ui/segmented-field';
import { TextArea } from '@/components/ui/text-area';
import { TextField } from '@/components/ui/text-field';
import { formatNumber } from '@/lib/format';
import { useSaveEvening } from '../api/save-evening';
import { eveningFormValues, toEveningRequest, type EveningFormValues } from '../utils/form-values';
import { createRequestResolver } from '@/lib/request-resolver';
import { CheckInCard, NotLogged } from './check-in-card';
import type { DayCardProps } from './day-card-props';

const RATING_OPTIONS = [1, 2, 3, 4, 5].map((n) => ({ value: String(n), label: String(n) }));

/** What 1 and 5 mean for each rating (stress and hunger run the other way from energy and mood). */
const RATING_ENDS: Record<(typeof RATING_KEYS)[number], [string, string]> = {
  energy: ['very low', 'very high'],
  hunger: ['not hungry', 'very hungry'],
  mood: ['very low', 'very good'],
  sleepQuality: ['very poor', 'very good'],
  digestion: ['very poor', 'very good'],
  stress: ['very calm', 'very stressed'],
};

export function EveningCard({ athleteId, day, canEdit }: DayCardProps) {
  const evening = day.evening;
  const [editing, setEditing] = useState(false);
  const showForm = canEdit && (!evening || editing);

  return (
    <CheckInCard
      id="evening"
      title="Evening"
      icon={<MoonIcon />}
      subtitle={showForm ? 'Steps, sleep, training and how you feel. Fill in what you know.' : undefined}
    >
      {showForm ? (
        <EveningForm
          athleteId={athleteId}
          date={day.date}
          evening={evening}
          onDone={() => setEditing(false)}
          onCancel={evening ? () => setEditing(false) : undefined}
        />
      ) : evening ? (
        <>
          <EveningSummary evening={evening} />
          {canEdit ? (
            <Button variant="secondary" className="mt-4" onClick={() => setEditing(true)}>
              Edit evening
            </Button>
          ) : null}
        </>
      ) : (
        <NotLogged>No evening check-in this day.</NotLogged>
      )}
    </CheckInCard>
  );
}

function EveningSummary({ evening }: { evening: NonNullable<DayView['evening']> }) {
  const figures = [
    { label: 'Steps', value: evening.steps === null ? null : formatNumber(evening.steps) },
    {
      label: 'Sleep',
      value: evening.sleepHours === null ? null : `${formatNumber(evening.sleepHours, 1)} h`,
    },
    {
      label: 'Cardio',
      value: evening.cardioMinutes === null ? null : `${formatNumber(evening.cardioMinutes)} min`,
    },
  ];
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-3 gap-2 text-center">
        {figures.map((f) => (
          <div key={f.label} className="flex flex-col rounded-md bg-paper px-2 py-2">
            <dt className="text-xs text-ink-muted">{f.label}</dt>
            <dd className="order-first font-bold text-ink tabular-nums">{f.value ?? '—'}</dd>
          </div>
        ))}
      </dl>
      <p className="text-sm text-ink">
        <span className="font-semibold">Training: </span>
        {evening.trainingDone === null ? '—' : evening.trainingDone ? 'done' : 'not done'}
        {evening.trainingNote ? <span className="text-ink-muted"> · {evening.trainingNote}</span> : null}
      </p>
      <dl aria-label="How they felt (1–5)" className="grid grid-cols-3 gap-2 text-center">
        {RATING_KEYS.map((k) => {
          const r = evening.ratings[k];
          return (
            <div key={k} className="flex flex-col items-center rounded-md bg-paper px-2 py-2">
              <dt className="text-xs text-ink-muted">{RATING_LABELS[k]}</dt>
              <dd className="order-first flex flex-col items-center gap-1">
                <span className="font-bold text-ink tabular-nums">
                  {typeof r === 'number' ? (
                    <>
                      {r}
                      <span className="text-xs font-normal text-ink-faint">/5</span>
                    </>
                  ) : (
                    '—'
                  )}
                </span>
                <RatingDots value={typeof r === 'number' ? r : null} />
              </dd>
            </div>
          );
        })}
      </dl>
      {evening.note ? (
        <p className="rounded-md bg-paper px-3 py-2 text-sm whitespace-pre-line text-ink">{evening.note}</p>
      ) : null}
    </div>
  );
}

function RatingDots({ value }: { value: number | null }) {
  return (
    <span aria-hidden="true" className="flex gap-0.5">
      {[1, 2, 3, 4, 5].map((n) => (
        <span
          key={n}
          className={`size-1.5 rounded-pill ${value !== null && n <= value ? 'bg-accent' : 'bg-line'}`}
        />
      ))}
    </span>
  );
}

function EveningForm({
  athleteId,
  date,
  evening,
  onDone,
  onCancel,
}: {
  athleteId: string;
  date: string;
  evening: DayView['evening'];
  onDone: () => void;
  onCancel?: () => void;
}) {
  const resolver = useMemo(() => createRequestResolver(eveningRequest, toEveningRequest), []);
  const form = useForm<EveningFormValues, unknown, EveningRequest>({
    resolver,
    defaultValues: eveningFormValues(evening),
  });
  const save = useSaveEvening(athleteId, date, { onSuccess: onDone });

  return (
    <Form form={form} onSubmit={(body) => save.mutateAsync(body)} aria-label="Evening" className="space-y-5">
      <div className="grid grid-cols-3 items-end gap-2">
        <TextField
          name="steps"
          label="Steps"
          inputMode="numeric"
          autoComplete="off"
          inputClassName="tabular-nums"
        />
        <TextField
          name="sleepHours"
          label="Sleep (h)"
          inputMode="decimal"
          autoComplete="off"
          inputClassName="tabular-nums"
        />
        <TextField
          name="cardioMinutes"
          label="Cardio (min)"
          inputMode="numeric"
          autoComplete="off"
          inputClassName="tabular-nums"
        />
      </div>
      <div className="grid grid-cols-[8.5rem_minmax(0,1fr)] items-start gap-3">
        <SegmentedField
          name="trainingDone"
          legend="Training done"
          options={[
            { value: 'yes', label: 'Yes' },
            { value: 'no', label: 'No' },
          ]}
        />
        <TextField
          name="trainingNote"
          label="In a word"
          autoComplete="off"
          maxLength={LIMITS.trainingNote.max}
          placeholder="legs, rest…"
        />
      </div>
      <div className="space-y-4">
        <p className="font-semibold text-ink">How you feel (1–5)</p>
        {RATING_KEYS.map((k) => (
          <SegmentedField
            key={k}
            name={`ratings.${k}`}
            legend={RATING_LABELS[k]}
            options={RATING_OPTIONS}
            size="lg"
            hint={
              <span className="flex justify-between">
                <span>1 {RATING_ENDS[k][0]}</span>
                <span>5 {RATING_ENDS[k][1]}</span>
              </span>
            }
          />
        ))}
      </div>
      <TextArea name="note" label="Note for your coach" maxLength={LIMITS.note.max} rows={3} />
      <div className="flex gap-2">
        <SubmitButton size="lg" className="flex-1" pendingLabel="Saving…">
          Save evening
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
