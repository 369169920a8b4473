import { EVENT_TYPE_LABELS, PLAN_LIMITS, type TemplateRequest, type TemplateView } from '@driftmark/shared';
import { useMemo, useState } from 'react';
import { useFieldArray, useForm, useFormState, useWatch } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { Form, SubmitButton } from '@/components/ui/form';
import { PlusIcon, TrashIcon } from '@/components/ui/icons';
import { Select } from '@/components/ui/select';
import { TextArea } from '@/components/ui/text-area';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { formatInstantDate } from '@/lib/format';
import { useCreateTemplate } from '../api/create-template';
import { useDeleteTemplate } from '../api/delete-template';
import { useUpdateTemplate } from '../api/update-template';
import { emptyDayTargetsFormValues } from '../utils/day-targets-form';
import {
  dayIssues,
  liveTemplateIssues,
  nextOffset,
  TEMPLATE_EVENT_TYPES,
  TEMPLATE_MESSAGE_FIELD,
  templateFormPath,
  templateFormResolver,
  templateFormValues,
  type TemplateFormValues,
} from '../utils/template-form';
import { TemplateDayCard } from './template-day-card';

const EVENT_OPTIONS = TEMPLATE_EVENT_TYPES.map((t) => ({ value: t, label: EVENT_TYPE_LABELS[t] }));

interface TemplateEditorProps {
  /** Null for a new template. */
  template: TemplateView | null;
  /** From the server's abilities: owner and coaches manage templates; others read them. */
  canManage: boolean;
  onCreated?: (template: TemplateView) => void;
  onDeleted?: () => void;
}

/**
 * A countdown template: name, event type, description and its days counted from the event
 * (E-14 … E+3), each with a label and targets that may be relative to the athlete's own figures.
 * validateTemplate's refusals show live; the server's field messages land beside their boxes.
 */
export function TemplateEditor({ template, canManage, onCreated, onDeleted }: TemplateEditorProps) {
  const resolver = useMemo(() => templateFormResolver(), []);
  const form = useForm<TemplateFormValues, unknown, TemplateRequest>({
    resolver,
    defaultValues: templateFormValues(template),
  });
  const days = useFieldArray({ control: form.control, name: 'days' });
  const values = useWatch({ control: form.control }) as TemplateFormValues;
  // A reader who cannot change the template is not asked to fix it.
  const issues = useMemo(() => (canManage ? liveTemplateIssues(values) : {}), [values, canManage]);
  const { errors } = useFormState({ control: form.control });
  const [open, setOpen] = useState<Set<string>>(() =>
    template ? new Set() : new Set(days.fields[0] ? [days.fields[0].id] : []),
  );
  const [saved, setSaved] = useState(false);
  const readOnly = !canManage;

  const create = useCreateTemplate({ onSuccess: (t) => onCreated?.(t) });
  const update = useUpdateTemplate(template?.id ?? '', {
    onSuccess: (t) => {
      setSaved(true);
      form.reset(templateFormValues(t));
      setOpen(new Set());
    },
  });

  const offsets = (values.days ?? []).map((d) => Number(d.offset)).filter(Number.isFinite);
  const full = days.fields.length >= PLAN_LIMITS.templateDays;
  const inOrder = offsets.every((o, i) => i === 0 || offsets[i - 1]! <= o);
  const summaryError = (errors as Record<string, { message?: string } | undefined>)[TEMPLATE_MESSAGE_FIELD]
    ?.message;
  const daysError = errors.days?.root?.message ?? errors.days?.message;

  const toggle = (id: string) =>
    setOpen((prev) => {
      const next = new Set(prev);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  function addDay() {
    days.append({ offset: String(nextOffset(offsets)), label: '', targets: emptyDayTargetsFormValues() });
  }

  function duplicateDay(index: number) {
    const copy = structuredClone(form.getValues(`days.${index}`));
    days.insert(index + 1, { ...copy, offset: String(nextOffset(offsets)) });
  }

  function sortDays() {
    const sorted = [...form.getValues('days')].sort((a, b) => Number(a.offset) - Number(b.offset));
    days.replace(sorted);
    setOpen(new Set());
  }

  return (
    <Form
      form={form}
      onSubmit={async (body) => {
        setSaved(false);
        if (template) await update.mutateAsync(body);
        else await create.mutateAsync(body);
      }}
      mapServerField={(path) => {
        const target = templateFormPath(path);
        return target === TEMPLATE_MESSAGE_FIELD ? null : target;
      }}
      aria-label={template ? `Edit ${template.name}` : 'New countdown template'}
      className="space-y-6"
    >
      {saved ? <Alert tone="success">Template saved. Countdowns applied from now on use it.</Alert> : null}

      <Card aria-labelledby="template-about-heading">
        <CardHeader id="template-about-heading" title="About this template" />
        <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_16rem]">
          <TextField
            name="name"
            label="Name"
            maxLength={80}
            required
            autoComplete="off"
            disabled={readOnly}
          />
          <Select
            name="eventType"
            label="Event type"
            options={EVENT_OPTIONS}
            placeholder="Choose…"
            required
            disabled={readOnly}
          />
          <TextArea
            name="description"
            label="Description"
            hint="What it is for and how it was rehearsed; coaches read it before applying it."
            maxLength={1000}
            rows={3}
            disabled={readOnly}
            className="md:col-span-2"
          />
        </div>
        {template ? (
          <p className="mt-4 text-sm text-ink-muted tabular-nums">
            Made by {template.createdBy.name} · updated {formatInstantDate(template.updatedAt)}
          </p>
        ) : null}
      </Card>

      <section aria-labelledby="template-days-heading" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div>
            <h2 id="template-days-heading" className="text-lg font-semibold text-ink">
              Days
            </h2>
            <p className="max-w-prose text-sm text-ink-muted">
              Counted from the event day: E-0 is the show, the shoot or the weigh-in, E-1 the day before, E+1
              the day after. Relative targets (× usual, usual ± mL, g per kg) become numbers for each athlete
              when the template is applied, with a preview and the guardrail checks.
            </p>
          </div>
          <div className="flex flex-wrap gap-2">
            {!inOrder ? (
              <Button variant="secondary" size="sm" onClick={sortDays}>
                Put in day order
              </Button>
            ) : null}
            <Button
              variant="secondary"
              size="sm"
              onClick={() =>
                setOpen((prev) =>
                  prev.size === days.fields.length ? new Set() : new Set(days.fields.map((f) => f.id)),
                )
              }
            >
              {open.size === days.fields.length ? 'Hide all targets' : 'Show all targets'}
            </Button>
          </div>
        </div>

        {summaryError || daysError ? <Alert tone="error">{summaryError ?? daysError}</Alert> : null}

        {days.fields.map((field, i) => {
          const offsetIssue = errors.days?.[i]?.offset ? undefined : issues[`days.${i}.offset`];
          const hasErrors = Boolean(errors.days?.[i]?.targets);
          return (
            <TemplateDayCard
              key={field.id}
              index={i}
              control={form.control}
              issues={dayIssues(issues, i)}
              offsetIssue={offsetIssue}
              open={open.has(field.id) || hasErrors}
              onToggle={() => toggle(field.id)}
              onDuplicate={readOnly || full ? null : () => duplicateDay(i)}
              onRemove={readOnly || days.fields.length <= 1 ? null : () => days.remove(i)}
              readOnly={readOnly}
            />
          );
        })}

        {!readOnly ? (
          <Button variant="secondary" icon={<PlusIcon />} onClick={addDay} disabled={full} className="w-full">
            {full ? `At most ${PLAN_LIMITS.templateDays} days` : 'Add a day'}
          </Button>
        ) : null}
      </section>

      {!readOnly ? (
        <div className="flex flex-wrap items-center justify-between gap-3 border-t border-line pt-5">
          <SubmitButton size="lg" pendingLabel="Saving…">
            {template ? 'Save template' : 'Create template'}
          </SubmitButton>
          {template ? <DeleteTemplate template={template} onDeleted={onDeleted} /> : null}
        </div>
      ) : (
        <p className="text-sm text-ink-muted">Only the head coach and coaches can change templates.</p>
      )}
    </Form>
  );
}

function DeleteTemplate({ template, onDeleted }: { template: TemplateView; onDeleted?: () => void }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteTemplate({ onSuccess: onDeleted });
  const error = remove.error
    ? isApiError(remove.error)
      ? remove.error.message
      : 'It could not be deleted.'
    : null;

  if (!confirming) {
    return (
      <Button variant="danger" icon={<TrashIcon />} onClick={() => setConfirming(true)}>
        Delete template
      </Button>
    );
  }
  return (
    <div role="group" aria-label="Confirm deletion" className="w-full max-w-xl">
      <Alert
        tone="caution"
        live
        title={`Delete “${template.name}”?`}
        action={
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" loading={remove.isPending} onClick={() => remove.mutate(template.id)}>
              Delete it
            </Button>
            <Button variant="ghost" onClick={() => setConfirming(false)} disabled={remove.isPending}>
              Keep it
            </Button>
          </div>
        }
      >
        Plans that already used it keep their countdown days. This cannot be undone.
        {error ? <p className="mt-1 font-semibold text-off-plan">{error}</p> : null}
      </Alert>
    </div>
  );
}
