import {
  SYMPTOM_LABELS,
  SYMPTOMS,
  symptomReportRequest,
  URGENT_SYMPTOMS,
  type DayView,
  type Symptom,
  type SymptomReportRequest,
} from '@driftmark/shared';
import { useMemo, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { CheckboxGroup } from '@/components/ui/checkbox-group';
import { Form, SubmitButton } from '@/components/ui/form';
import { PulseIcon } from '@/components/ui/icons';
import { TextArea } from '@/components/ui/text-area';
import { TextField } from '@/components/ui/text-field';
import { formatNumber } from '@/lib/format';
import { useCreateSymptomReport } from '../api/create-symptom-report';
import { useDeleteSymptomReport } from '../api/delete-symptom-report';
import { useUpdateSymptomReport } from '../api/update-symptom-report';
import { createClientIdKeeper } from '../utils/client-id';
import {
  symptomFormValues,
  toSymptomRequest,
  withoutClientId,
  type SymptomFormValues,
} from '../utils/form-values';
import { createRequestResolver } from '@/lib/request-resolver';
import { hasUrgentSymptom } from '../utils/symptoms';
import { CheckInCard, HeaderFigure, NotLogged } from './check-in-card';
import type { DayCardProps } from './day-card-props';
import { AddEntry, ConfirmDelete, EditableEntries } from './entry-row';
import { useFollowClock } from './use-follow-clock';

const URGENT = new Set<Symptom>(URGENT_SYMPTOMS);

interface SymptomsCardProps extends DayCardProps {
  /** Called the moment an urgent report is sent (before the answer) and again with the server's message. */
  onUrgent: (message?: string) => void;
}

export function SymptomsCard({ athleteId, day, canEdit, now, onUrgent }: SymptomsCardProps) {
  const [adding, setAdding] = useState(false);
  const remove = useDeleteSymptomReport(athleteId, day.date);

  return (
    <CheckInCard
      id="symptoms"
      title="Symptoms"
      icon={<PulseIcon />}
      subtitle={canEdit ? 'Tell your coach as soon as something feels wrong.' : undefined}
      summary={
        day.symptoms.length > 0 ? (
          <HeaderFigure
            value={formatNumber(day.symptoms.length)}
            caption={day.symptoms.length === 1 ? 'report' : 'reports'}
          />
        ) : null
      }
    >
      {day.symptoms.length > 0 ? (
        <EditableEntries
          label="Symptoms reported"
          entries={day.symptoms}
          canEdit={canEdit}
          describe={(r) => `symptom report at ${r.time}`}
          form={(r, done) => (
            <SymptomForm
              athleteId={athleteId}
              date={day.date}
              entry={r}
              onDelete={() => remove.mutateAsync(r.id)}
              now={now}
              onUrgent={onUrgent}
              onDone={done}
            />
          )}
        >
          {(r) => (
            <>
              <ul className="flex flex-wrap gap-1.5" aria-label={`Symptoms at ${r.time}`}>
                {r.symptoms.map((s) => (
                  <li key={s}>
                    <Badge tone={URGENT.has(s) ? 'off-plan' : 'caution'}>{SYMPTOM_LABELS[s]}</Badge>
                  </li>
                ))}
              </ul>
              {r.note ? <p className="mt-1 text-ink-muted">{r.note}</p> : null}
            </>
          )}
        </EditableEntries>
      ) : !canEdit ? (
        <NotLogged>No symptoms reported this day.</NotLogged>
      ) : null}

      {canEdit ? (
        <AddEntry
          label="Report a symptom"
          open={adding}
          onOpen={() => setAdding(true)}
          divided={day.symptoms.length > 0}
        >
          <SymptomForm
            athleteId={athleteId}
            date={day.date}
            entry={null}
            now={now}
            onUrgent={onUrgent}
            onDone={() => setAdding(false)}
          />
        </AddEntry>
      ) : null}
    </CheckInCard>
  );
}

function SymptomForm({
  athleteId,
  date,
  entry,
  now,
  onUrgent,
  onDone,
  onDelete,
}: {
  athleteId: string;
  date: string;
  entry: DayView['symptoms'][number] | null;
  now: string;
  onUrgent: (message?: string) => void;
  onDone: () => void;
  /** Set when editing an entry that exists. */
  onDelete?: () => Promise<unknown>;
}) {
  const resolver = useMemo(() => createRequestResolver(symptomReportRequest, toSymptomRequest), []);
  const form = useForm<SymptomFormValues, unknown, SymptomReportRequest>({
    resolver,
    defaultValues: symptomFormValues(entry, now),
  });
  useFollowClock(form, 'time', now, entry === null);
  const keeper = useRef(createClientIdKeeper()).current;
  const create = useCreateSymptomReport(athleteId, date);
  const update = useUpdateSymptomReport(athleteId, date);
  const chosen = useWatch({ control: form.control, name: 'symptoms' });
  const urgentChosen = Array.isArray(chosen) && hasUrgentSymptom(chosen);

  return (
    <Form
      form={form}
      onSubmit={async (body) => {
        // The message must not wait for the network: show it as the report leaves.
        if (hasUrgentSymptom(body.symptoms)) onUrgent();
        if (entry) {
          await update.mutateAsync({ entryId: entry.id, body: withoutClientId(body) });
        } else {
          const clientId = keeper.take();
          const result = await create.mutateAsync({ ...body, clientId });
          keeper.settle(clientId);
          if (result.urgentMessage) onUrgent(result.urgentMessage);
        }
        onDone();
      }}
      aria-label={entry ? `Edit symptom report at ${entry.time}` : 'Report a symptom'}
      className="space-y-4"
    >
      <CheckboxGroup
        name="symptoms"
        legend="What do you notice?"
        options={SYMPTOMS.map((s) => ({ value: s, label: SYMPTOM_LABELS[s] }))}
        columns={2}
        required
      />
      <TextField name="time" label="Time noticed" type="time" required inputClassName="tabular-nums" />
      <TextArea name="note" label="Anything else (optional)" rows={2} />
      {urgentChosen ? (
        <p className="rounded-md border border-off-plan/40 bg-off-plan-soft px-3 py-2 text-sm font-medium text-ink">
          Sending this tells your coach at once.
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <SubmitButton size="lg" className="flex-1" pendingLabel="Sending…">
          {entry ? 'Save report' : 'Send report'}
        </SubmitButton>
        <Button variant="ghost" size="lg" onClick={onDone}>
          Cancel
        </Button>
        {onDelete ? <ConfirmDelete what="this report" onDelete={onDelete} /> : null}
      </div>
    </Form>
  );
}
