import type { ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';
import { cn } from '@/lib/cn';
import { describedBy, FieldErrorText, FieldHint, RequiredMark, useFieldError, useFieldIds } from './field';

export interface RadioOption {
  value: string;
  label: string;
  description?: string;
}

interface RadioGroupProps {
  name: string;
  legend: ReactNode;
  options: readonly RadioOption[];
  hint?: ReactNode;
  required?: boolean;
  /** "segmented" packs short choices (units, sex) into one row of equal buttons. */
  layout?: 'segmented' | 'stacked';
  className?: string;
}

export function RadioGroup({
  name,
  legend,
  options,
  hint,
  required,
  layout = 'segmented',
  className,
}: RadioGroupProps) {
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
      <div
        className={cn(
          layout === 'segmented' ? 'grid auto-cols-fr grid-flow-col gap-2' : 'flex flex-col gap-2',
        )}
      >
        {options.map((o) => {
          const id = `${ids.inputId}-${o.value}`;
          return (
            <div key={o.value} className="relative">
              <input
                id={id}
                type="radio"
                value={o.value}
                required={required}
                className="peer absolute top-1/2 left-3 size-4 -translate-y-1/2 accent-accent"
                {...register(name)}
              />
              <label
                htmlFor={id}
                className={cn(
                  'flex min-h-touch cursor-pointer flex-col justify-center rounded-md border bg-surface py-2 pr-3 pl-9',
                  'peer-checked:border-accent peer-checked:bg-accent-soft peer-checked:ring-1 peer-checked:ring-accent',
                  'peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-accent',
                  error ? 'border-off-plan' : 'border-line-strong',
                )}
              >
                <span className="font-medium text-ink">{o.label}</span>
                {o.description ? <span className="text-sm text-ink-muted">{o.description}</span> : null}
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
