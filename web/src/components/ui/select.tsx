import type { ReactNode, SelectHTMLAttributes } from 'react';
import { useFormContext, type RegisterOptions } from 'react-hook-form';
import { cn } from '@/lib/cn';
import {
  controlClasses,
  describedBy,
  FieldErrorText,
  FieldHint,
  FieldLabel,
  useFieldError,
  useFieldIds,
} from './field';
import { ChevronDownIcon } from './icons';

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'name' | 'id'> {
  name: string;
  label: ReactNode;
  options: readonly SelectOption[];
  /** A first, empty choice such as "Choose…" (value ""). */
  placeholder?: string;
  hint?: ReactNode;
  registerOptions?: RegisterOptions;
  className?: string;
}

export function Select({
  name,
  label,
  options,
  placeholder,
  hint,
  required,
  registerOptions,
  className,
  ...props
}: SelectProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div className={className}>
      <FieldLabel htmlFor={ids.inputId} required={required}>
        {label}
      </FieldLabel>
      <div className="relative">
        <select
          id={ids.inputId}
          required={required}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
          className={cn(
            controlClasses,
            'appearance-none pr-10',
            error ? 'border-off-plan' : 'border-line-strong',
          )}
          {...props}
          {...register(name, registerOptions)}
        >
          {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-lg text-ink-muted" />
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </div>
  );
}
