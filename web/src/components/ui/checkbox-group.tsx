import type { ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';
import { cn } from '@/lib/cn';
import { describedBy, FieldErrorText, FieldHint, RequiredMark, useFieldError, useFieldIds } from './field';

export interface CheckboxOption {
  value: string;
  label: ReactNode;
  /** A quieter second line under the label. */
  description?: ReactNode;
}

interface CheckboxGroupProps {
  name: string;
  legend: ReactNode;
  options: readonly CheckboxOption[];
  hint?: ReactNode;
  required?: boolean;
  /** Two columns from the small breakpoint up. */
  columns?: 1 | 2;
  className?: string;
}

/** Several boxes under one name: the form value is the array of ticked values. */
export function CheckboxGroup({
  name,
  legend,
  options,
  hint,
  required,
  columns = 1,
  className,
}: CheckboxGroupProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <fieldset
      className={className}
      aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
      aria-invalid={error ? true : undefined}
    >
      <legend className="mb-1.5 flex items-baseline gap-2">
        <span className="font-semibold text-ink">{legend}</span>
        {required ? <RequiredMark /> : null}
      </legend>
      <div className={cn('grid gap-2', columns === 2 && 'sm:grid-cols-2')}>
        {options.map((o) => {
          const id = `${ids.inputId}-${o.value}`;
          return (
            <div
              key={o.value}
              className={cn(
                'flex min-h-touch items-start gap-3 rounded-md border bg-surface px-3 py-2.5',
                'has-checked:border-accent has-checked:bg-accent-soft',
                error ? 'border-off-plan' : 'border-line-strong',
              )}
            >
              <input
                id={id}
                type="checkbox"
                value={o.value}
                className="mt-0.5 size-5 shrink-0 accent-accent"
                {...register(name)}
              />
              <label htmlFor={id} className="flex-1 cursor-pointer text-sm leading-snug text-ink">
                <span className="font-medium">{o.label}</span>
                {o.description ? (
                  <span className="mt-0.5 block text-xs text-ink-muted">{o.description}</span>
                ) : null}
              </label>
            </div>
          );
        })}
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </fieldset>
  );
}
