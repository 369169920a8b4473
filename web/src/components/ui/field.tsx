import { useId, type ReactNode } from 'react';
import { get, useFormContext, useFormState, type FieldError } from 'react-hook-form';
import { cn } from '@/lib/cn';

/** Ids for a control and the texts that describe it. */
export function useFieldIds(name: string) {
  const uid = useId();
  const base = `f${uid.replace(/[^a-zA-Z0-9_-]/g, '')}-${name.replace(/[^a-zA-Z0-9_-]/g, '-')}`;
  return { inputId: base, hintId: `${base}-hint`, errorId: `${base}-error` };
}

/** The current error of a field inside the surrounding <Form>. */
export function useFieldError(name: string): FieldError | undefined {
  const { control } = useFormContext();
  const { errors } = useFormState({ control, name });
  return get(errors, name) as FieldError | undefined;
}

export function describedBy(ids: { hintId: string; errorId: string }, hasHint: boolean, hasError: boolean) {
  const list = [hasError ? ids.errorId : null, hasHint ? ids.hintId : null].filter(Boolean);
  return list.length ? list.join(' ') : undefined;
}

/**
 * The "required" marker sits beside the label, not inside it: the control's own `required`
 * already tells assistive technology, and the label text stays exactly the field's name.
 */
export function RequiredMark() {
  return (
    <span aria-hidden="true" className="text-xs font-medium text-ink-faint">
      required
    </span>
  );
}

export function FieldLabel({
  htmlFor,
  required,
  children,
  className,
}: {
  htmlFor: string;
  required?: boolean;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div className={cn('mb-1.5 flex items-baseline gap-2', className)}>
      <label htmlFor={htmlFor} className="font-semibold text-ink">
        {children}
      </label>
      {required ? <RequiredMark /> : null}
    </div>
  );
}

export function FieldHint({ id, children }: { id: string; children?: ReactNode }) {
  if (!children) return null;
  return (
    <p id={id} className="mt-1.5 text-sm text-ink-faint">
      {children}
    </p>
  );
}

export function FieldErrorText({ id, error }: { id: string; error?: FieldError | { message?: string } }) {
  if (!error?.message) return null;
  return (
    <p id={id} className="mt-1.5 flex items-start gap-1.5 text-sm font-medium text-off-plan">
      <svg viewBox="0 0 16 16" className="mt-0.5 size-3.5 shrink-0" aria-hidden="true">
        <rect x="1" y="1" width="14" height="14" rx="3" fill="currentColor" />
        <path d="M8 4.5v4.5M8 11.2v.1" stroke="#fffcf5" strokeWidth="1.8" strokeLinecap="round" />
      </svg>
      <span>{error.message}</span>
    </p>
  );
}

export const controlClasses =
  'block w-full min-h-touch rounded-md border bg-surface px-3 py-2 text-base text-ink ' +
  'placeholder:text-ink-faint disabled:bg-sunken disabled:text-ink-muted ' +
  'aria-invalid:border-off-plan aria-invalid:ring-1 aria-invalid:ring-off-plan';
