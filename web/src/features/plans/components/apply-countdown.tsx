import {
  countdownDayLabel,
  EVENT_TYPE_LABELS,
  type CountdownPreview,
  type EVENT_TYPES,
  type PlanVersionView,
  type TemplateView,
} from '@driftmark/shared';
import { useId, useState } from 'react';
import { Link } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { controlClasses, FieldErrorText } from '@/components/ui/field';
import { FlagIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import { useApplyCountdown, usePreviewCountdown } from '../api/apply-countdown';
import { useTemplates } from '../api/get-templates';
import type { LinkedKeys } from '../api/plan-cache';
import { isIsoDate } from '../utils/dates';
import { CountdownReview } from './countdown-review';

type EventType = (typeof EVENT_TYPES)[number];

interface ApplyCountdownProps {
  athleteId: string;
  /** The athlete's today (past countdown days are not applied). */
  today: string;
  /** The athlete's event, to prefill the date and put matching templates first. */
  eventDate: string | null;
  eventType: EventType | null;
  linkedKeys: LinkedKeys;
  /** Where the updated plan is shown. */
  planHref: string;
  versionHref: (versionId: string) => string;
  /** The template library (to make one when there is none). */
  templatesHref: string;
}

function offsetsText(t: TemplateView): string {
  const offsets = t.days.map((d) => d.offset).sort((a, b) => a - b);
  const first = offsets[0];
  const last = offsets[offsets.length - 1];
  if (first === undefined || last === undefined) return 'no days';
  return `${t.days.length} ${t.days.length === 1 ? 'day' : 'days'}, ${countdownDayLabel(first)} to ${countdownDayLabel(last)}`;
}

/** Choose a template and the event day, preview the dated targets, acknowledge each warning, apply. */
export function ApplyCountdown({
  athleteId,
  today,
  eventDate,
  eventType,
  linkedKeys,
  planHref,
  versionHref,
  templatesHref,
}: ApplyCountdownProps) {
  const id = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const templates = useTemplates();
  const [templateId, setTemplateId] = useState('');
  const [date, setDate] = useState(eventDate ?? '');
  const [errors, setErrors] = useState<{ templateId?: string; eventDate?: string; form?: string }>({});
  const [preview, setPreview] = useState<CountdownPreview | null>(null);
  const [applied, setApplied] = useState<PlanVersionView | null>(null);
  const previewing = usePreviewCountdown(athleteId);
  const apply = useApplyCountdown(athleteId, { linkedKeys, onSuccess: setApplied });

  const list = [...(templates.data?.data ?? [])].sort(
    (a, b) =>
      Number(b.eventType === eventType) - Number(a.eventType === eventType) || a.name.localeCompare(b.name),
  );
  const chosen = list.find((t) => t.id === templateId) ?? null;
  const defaultReason = chosen ? `Countdown "${chosen.name}" for ${date}` : 'Countdown';

  async function showPreview() {
    const next: typeof errors = {};
    if (!templateId) next.templateId = 'Choose a template';
    if (!isIsoDate(date)) next.eventDate = 'Event date: enter a date';
    setErrors(next);
    if (Object.keys(next).length > 0) return;
    try {
      setPreview(await previewing.mutateAsync({ templateId, eventDate: date }));
    } catch (e) {
      if (isApiError(e) && Object.keys(e.fields).length > 0) {
        setErrors({
          templateId: e.fields.templateId,
          eventDate: e.fields.eventDate,
          form:
            Object.entries(e.fields)
              .filter(([k]) => k !== 'templateId' && k !== 'eventDate')
              .map(([, m]) => m)
              .join(' ') || undefined,
        });
      } else {
        setErrors({ form: isApiError(e) ? e.message : 'The preview could not be made. Try again.' });
      }
    }
  }

  if (applied) {
    return (
      <Alert
        tone="success"
        title={`Countdown applied as version ${applied.number}, in force from ${formatDate(applied.effectiveFrom)}.`}
        action={
          <div className="flex flex-wrap gap-2">
            <ButtonLink to={planHref}>See the updated plan</ButtonLink>
            <ButtonLink to={versionHref(applied.id)} variant="secondary">
              View version {applied.number}
            </ButtonLink>
            <Button
              variant="ghost"
              onClick={() => {
                setApplied(null);
                setPreview(null);
              }}
            >
              Apply another
            </Button>
          </div>
        }
      >
        {applied.acknowledgements.length > 0
          ? `${applied.acknowledgements.length} acknowledged ${applied.acknowledgements.length === 1 ? 'warning is' : 'warnings are'} stored with the version; the athlete sees the caution on each countdown day.`
          : 'The athlete sees the countdown caution on each countdown day.'}
      </Alert>
    );
  }

  if (preview && chosen) {
    return (
      <Card>
        <div className="mb-4">
          <p className="text-sm font-semibold text-accent">Preview · nothing is saved yet</p>
          <h3 className="text-xl font-bold text-ink">
            {chosen.name} for {formatDate(preview.eventDate)}
          </h3>
        </div>
        <CountdownReview
          preview={preview}
          confirmLabel="Apply countdown"
          defaultReason={defaultReason}
          pending={apply.isPending}
          onCancel={() => setPreview(null)}
          onConfirm={({ acknowledgedKeys, reason }) =>
            apply.mutateAsync({
              templateId: chosen.id,
              eventDate: preview.eventDate,
              acknowledgedKeys,
              reason,
            })
          }
        />
      </Card>
    );
  }

  return (
    <Card>
      <h3 className="mb-1 text-lg font-semibold text-ink">Apply a countdown template</h3>
      <p className="mb-4 text-sm text-ink-muted">
        The template&apos;s days are placed before the event day and computed from this athlete&apos;s own
        baseline. You see every dated target and warning before anything is saved.
      </p>
      {errors.form ? (
        <Alert tone="error" className="mb-4">
          {errors.form}
        </Alert>
      ) : null}
      {templates.isPending ? (
        <div aria-busy="true" aria-label="Loading templates" className="space-y-2">
          <Skeleton className="h-16" />
          <Skeleton className="h-16" />
        </div>
      ) : templates.isError ? (
        <Alert
          tone="error"
          title="The templates could not be loaded."
          action={
            <Button variant="secondary" onClick={() => void templates.refetch()}>
              Try again
            </Button>
          }
        >
          {templates.error.message}
        </Alert>
      ) : list.length === 0 ? (
        <EmptyState
          icon={<FlagIcon />}
          title="No countdown templates yet"
          level={3}
          action={<ButtonLink to={templatesHref}>Open the template library</ButtonLink>}
        >
          A template describes the final days before an event; write one in the library first.
        </EmptyState>
      ) : (
        <div className="space-y-5">
          <fieldset aria-describedby={errors.templateId ? `${id}-template-error` : undefined}>
            <legend className="mb-2 font-semibold text-ink">Template</legend>
            <div className="grid gap-2 lg:grid-cols-2">
              {list.map((t) => (
                <label
                  key={t.id}
                  className={cn(
                    'flex cursor-pointer items-start gap-3 rounded-md border bg-surface px-3 py-3',
                    'has-checked:border-accent has-checked:bg-accent-soft has-checked:ring-1 has-checked:ring-accent',
                    errors.templateId ? 'border-off-plan' : 'border-line-strong',
                  )}
                >
                  <input
                    type="radio"
                    name={`${id}-template`}
                    value={t.id}
                    checked={templateId === t.id}
                    onChange={() => setTemplateId(t.id)}
                    className="mt-1 size-4 shrink-0 accent-accent"
                  />
                  <span className="min-w-0">
                    <span className="flex flex-wrap items-center gap-2">
                      <span className="font-semibold text-ink">{t.name}</span>
                      <Badge tone={t.eventType === eventType ? 'accent' : 'neutral'}>
                        {EVENT_TYPE_LABELS[t.eventType]}
                      </Badge>
                    </span>
                    <span className="block text-sm text-ink-muted tabular-nums">{offsetsText(t)}</span>
                    {t.description ? (
                      <span className="mt-0.5 line-clamp-2 block text-sm text-ink-faint">
                        {t.description}
                      </span>
                    ) : null}
                  </span>
                </label>
              ))}
            </div>
            <FieldErrorText
              id={`${id}-template-error`}
              error={errors.templateId ? { message: errors.templateId } : undefined}
            />
            <p className="mt-2 text-sm text-ink-faint">
              Templates are written in the <Link to={templatesHref}>template library</Link>.
            </p>
          </fieldset>

          <div className="flex flex-wrap items-end gap-3">
            <div>
              <label htmlFor={`${id}-date`} className="mb-1.5 block font-semibold text-ink">
                Event date (E-0)
              </label>
              <input
                id={`${id}-date`}
                type="date"
                value={date}
                onChange={(e) => setDate(e.target.value)}
                aria-invalid={errors.eventDate ? true : undefined}
                aria-describedby={`${id}-date-hint${errors.eventDate ? ` ${id}-date-error` : ''}`}
                className={cn(
                  controlClasses,
                  'w-48 tabular-nums',
                  errors.eventDate ? 'border-off-plan' : 'border-line-strong',
                )}
              />
            </div>
            <Button onClick={() => void showPreview()} loading={previewing.isPending}>
              Preview the countdown
            </Button>
          </div>
          <FieldErrorText
            id={`${id}-date-error`}
            error={errors.eventDate ? { message: errors.eventDate } : undefined}
          />
          <p id={`${id}-date-hint`} className="text-sm text-ink-faint">
            {eventDate
              ? date && date !== eventDate
                ? `The athlete's event is on ${formatDate(eventDate)}; this countdown would count back from ${isIsoDate(date) ? formatDate(date) : 'another day'}.`
                : `The athlete's event date. Days before today (${formatDate(today)}) are shown but not changed.`
              : `The athlete has no event date on file. Days before today (${formatDate(today)}) are not changed.`}
          </p>
        </div>
      )}
    </Card>
  );
}
