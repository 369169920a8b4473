import { useState, type ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';
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

interface PasswordFieldProps {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  required?: boolean;
  autoComplete: 'current-password' | 'new-password';
  className?: string;
}

/** A password box with a show/hide switch (long passphrases are easier to type when seen). */
export function PasswordField({ name, label, hint, required, autoComplete, className }: PasswordFieldProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  const [visible, setVisible] = useState(false);
  return (
    <div className={className}>
      <FieldLabel htmlFor={ids.inputId} required={required}>
        {label}
      </FieldLabel>
      <div className="relative">
        <input
          id={ids.inputId}
          type={visible ? 'text' : 'password'}
          autoComplete={autoComplete}
          required={required}
          spellCheck={false}
          autoCapitalize="none"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
          className={cn(controlClasses, 'pr-20', error ? 'border-off-plan' : 'border-line-strong')}
          {...register(name)}
        />
        <button
          type="button"
          aria-controls={ids.inputId}
          aria-pressed={visible}
          onClick={() => setVisible((v) => !v)}
          className="absolute inset-y-0 right-0 min-w-16 rounded-r-md px-3 text-sm font-semibold text-accent hover:bg-accent-soft"
        >
          {visible ? 'Hide' : 'Show'}
          <span className="sr-only"> password</span>
        </button>
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </div>
  );
}
