import { countdownDayLabel, type TemplateRequest } from '@driftmark/shared';
import { useWatch, type Control } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { ChevronDownIcon, CopyIcon, ErrorIcon, TrashIcon } from '@/components/ui/icons';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { cn } from '@/lib/cn';
import { liveDayTargets, type DayTargetsFormValues } from '../utils/day-targets-form';
import { describeTargets, OFFSET_OPTIONS, type TemplateFormValues } from '../utils/template-form';
import { DayTargetsFields } from './day-targets-fields';

interface TemplateDayCardProps {
  index: number;
  control: Control<TemplateFormValues, unknown, TemplateRequest>;
  /** validateTemplate's live messages for this day: relative to its targets, plus the offset's. */
  issues: Record<string, string>;
  offsetIssue?: string;
  open: boolean;
  onToggle: () => void;
  /** Null when the reader cannot change templates, or the action is not available. */
  onDuplicate: (() => void) | null;
  onRemove: (() => void) | null;
  readOnly: boolean;
}

function summaryOf(targets: DayTargetsFormValues | undefined): string {
  if (!targets) return '';
  try {
    const words = describeTargets(liveDayTargets(targets));
    return words.length ? words.join(' · ') : 'No targets yet';
  } catch {
    return '';
  }
}

/**
 * One day of a countdown template: which day it is (E-3), its label and its targets through the
 * shared DayTargets section, without a baseline (relative targets read as expressions).
 */
export function TemplateDayCard({
  index,
  control,
  issues,
  offsetIssue,
  open,
  onToggle,
  onDuplicate,
  onRemove,
  readOnly,
}: TemplateDayCardProps) {
  const day = useWatch({ control, name: `days.${index}` });
  const offset = Number(day?.offset);
  const tag = Number.isFinite(offset) ? countdownDayLabel(offset) : 'E?';
  const title = day?.label?.trim() ? `${tag} · ${day.label.trim()}` : tag;
  const headingId = `template-day-${index}-heading`;
  const bodyId = `template-day-${index}-body`;
  // One message can sit on several boxes (shares that do not add up name all three macros).
  const issueCount = new Set([...Object.values(issues), ...(offsetIssue ? [offsetIssue] : [])]).size;

  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-line bg-surface shadow-card">
      <div className="flex flex-wrap items-end gap-x-4 gap-y-3 px-5 pt-4 pb-3">
        <h3
          id={headingId}
          className="w-20 shrink-0 self-center text-2xl font-bold tracking-tight text-caution tabular-nums"
        >
          <span className="sr-only">Day {index + 1}: </span>
          <span aria-hidden="true">{tag}</span>
          <span className="sr-only">{title.slice(tag.length)}</span>
        </h3>
        <Select
          name={`days.${index}.offset`}
          label="Day"
          options={OFFSET_OPTIONS}
          disabled={readOnly}
          className="w-56"
        />
        <TextField
          name={`days.${index}.label`}
          label="Label"
          placeholder="Water load"
          maxLength={60}
          autoComplete="off"
          disabled={readOnly}
          className="min-w-48 flex-1"
        />
        <div className="flex gap-1">
          {onDuplicate ? (
            <Button
              variant="ghost"
              size="sm"
              icon={<CopyIcon />}
              onClick={onDuplicate}
              aria-label={`Duplicate ${title}`}
            >
              Duplicate
            </Button>
          ) : null}
          {onRemove ? (
            <Button
              variant="ghost"
              size="sm"
              icon={<TrashIcon />}
              onClick={onRemove}
              aria-label={`Remove ${title}`}
            >
              Remove
            </Button>
          ) : null}
        </div>
      </div>
      {offsetIssue ? (
        <p className="flex items-center gap-1.5 px-5 pb-2 text-sm font-medium text-off-plan">
          <ErrorIcon className="shrink-0" /> {offsetIssue}
        </p>
      ) : null}
      <button
        type="button"
        aria-expanded={open}
        aria-controls={bodyId}
        onClick={onToggle}
        className="flex min-h-touch w-full items-center gap-3 border-t border-line px-5 py-2 text-left text-sm hover:bg-paper"
      >
        <ChevronDownIcon
          aria-hidden="true"
          className={cn('shrink-0 text-lg text-ink-muted transition-transform', open ? 'rotate-180' : '')}
        />
        <span className="min-w-0 flex-1 text-ink-muted tabular-nums">
          <span className="font-semibold text-ink">{open ? 'Hide targets' : 'Targets'}</span>
          {open ? null : <> · {summaryOf(day?.targets)}</>}
        </span>
        {issueCount > 0 ? (
          <span className="flex shrink-0 items-center gap-1 text-sm font-semibold text-off-plan">
            <ErrorIcon /> {issueCount === 1 ? '1 problem' : `${issueCount} problems`}
          </span>
        ) : null}
      </button>
      <div id={bodyId} hidden={!open} className="border-t border-line px-5 py-4">
        {open ? (
          <DayTargetsFields
            name={`days.${index}.targets`}
            // The section reads and writes form values only; the resolver's output type is not its concern.
            control={control as unknown as Control<TemplateFormValues>}
            issues={issues}
            disabled={readOnly}
            label={`Targets for ${title}`}
            eventTimes
          />
        ) : null}
      </div>
    </section>
  );
}
