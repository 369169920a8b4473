import type { InputHTMLAttributes, ReactNode } from 'react';
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

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name' | 'id'> {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  /** A unit shown inside the box after the value (kg, mL, kcal). */
  suffix?: string;
  /** Extra register options (e.g. setValueAs); validation stays in the schema. */
  registerOptions?: RegisterOptions;
  className?: string;
  inputClassName?: string;
}

export function TextField({
  name,
  label,
  hint,
  suffix,
  required,
  registerOptions,
  className,
  inputClassName,
  type = 'text',
  ...inputProps
}: TextFieldProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div className={className}>
      <FieldLabel htmlFor={ids.inputId} required={required}>
        {label}
      </FieldLabel>
      <div className="relative">
        <input
          id={ids.inputId}
          type={type}
          required={required}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
          className={cn(
            controlClasses,
            error ? 'border-off-plan' : 'border-line-strong',
            suffix ? 'pr-16' : undefined,
            inputClassName,
          )}
          {...inputProps}
          {...register(name, registerOptions)}
        />
        {suffix ? (
          <span
            aria-hidden="true"
            className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm font-medium text-ink-faint"
          >
            {suffix}
          </span>
        ) : null}
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </div>
  );
}
