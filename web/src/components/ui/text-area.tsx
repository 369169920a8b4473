import type { ReactNode, TextareaHTMLAttributes } from 'react';
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

interface TextAreaProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'name' | 'id'> {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  className?: string;
}

export function TextArea({ name, label, hint, required, rows = 3, className, ...props }: TextAreaProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <div className={className}>
      <FieldLabel htmlFor={ids.inputId} required={required}>
        {label}
      </FieldLabel>
      <textarea
        id={ids.inputId}
        rows={rows}
        required={required}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
        className={cn(controlClasses, 'resize-y', error ? 'border-off-plan' : 'border-line-strong')}
        {...props}
        {...register(name)}
      />
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </div>
  );
}
