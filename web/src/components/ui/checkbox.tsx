import type { ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';
import { cn } from '@/lib/cn';
import { describedBy, FieldErrorText, FieldHint, RequiredMark, useFieldError, useFieldIds } from './field';

interface CheckboxProps {
  name: string;
  /** The statement being agreed to; it is the control's label. */
  label: ReactNode;
  /** A short heading above the box (e.g. "Photo consent"), not part of the label. */
  title?: ReactNode;
  hint?: ReactNode;
  required?: boolean;
  className?: string;
}

export function Checkbox({ name, label, title, hint, required, className }: CheckboxProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div className={className}>
      {title || required ? (
        <div className="mb-1.5 flex items-baseline gap-2">
          {title ? <p className="font-semibold text-ink">{title}</p> : null}
          {required ? <RequiredMark /> : null}
        </div>
      ) : null}
      <div
        className={cn(
          'flex min-h-touch items-start gap-3 rounded-md border bg-surface px-3 py-3',
          error ? 'border-off-plan ring-1 ring-off-plan' : 'border-line-strong',
        )}
      >
        <input
          id={ids.inputId}
          type="checkbox"
          required={required}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
          className="mt-0.5 size-5 shrink-0 accent-accent"
          {...register(name)}
        />
        <label htmlFor={ids.inputId} className="text-sm leading-relaxed text-ink">
          {label}
        </label>
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </div>
  );
}
