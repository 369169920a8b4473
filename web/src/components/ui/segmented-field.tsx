import type { ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';
import { cn } from '@/lib/cn';
import { describedBy, FieldErrorText, FieldHint, RequiredMark, useFieldError, useFieldIds } from './field';

export interface SegmentedOption {
  value: string;
  label: ReactNode;
  /** Spoken instead of `label` when the label is a glyph or a bare number. */
  ariaLabel?: string;
}

interface SegmentedFieldProps {
  name: string;
  legend: ReactNode;
  options: readonly SegmentedOption[];
  hint?: ReactNode;
  required?: boolean;
  /** "lg" for thumb-sized choices such as the 1–5 ratings. */
  size?: 'md' | 'lg';
  /** Hide the legend visually (a heading nearby already says it); it still names the group. */
  legendHidden?: boolean;
  disabled?: boolean;
  /** Segments per row (default: all in one row). */
  columns?: number;
  className?: string;
}

const heights = { md: 'min-h-touch', lg: 'min-h-12' } as const;

/**
 * A row of equal, large radio buttons: short choices (units, kinds, 1–5 ratings) tapped with one
 * thumb. Each input covers its whole segment, so a tap anywhere on it chooses it.
 */
export function SegmentedField({
  name,
  legend,
  options,
  hint,
  required,
  size = 'md',
  legendHidden,
  disabled,
  columns,
  className,
}: SegmentedFieldProps) {
  const { register } = useFormContext();
  const ids = useFieldIds(name);
  const error = useFieldError(name);
  return (
    <fieldset
      className={className}
      disabled={disabled}
      aria-describedby={describedBy(ids, Boolean(hint), Boolean(error))}
      aria-invalid={error ? true : undefined}
    >
      <legend className={cn('mb-1.5 flex items-baseline gap-2', legendHidden && 'sr-only')}>
        <span className="font-semibold text-ink">{legend}</span>
        {required ? <RequiredMark /> : null}
      </legend>
      <div
        className="grid gap-1.5"
        style={{ gridTemplateColumns: `repeat(${columns ?? options.length}, minmax(0, 1fr))` }}
      >
        {options.map((o) => (
          <label key={o.value} className="relative block">
            <input
              type="radio"
              value={o.value}
              aria-label={o.ariaLabel}
              className="peer absolute inset-0 z-10 size-full cursor-pointer opacity-0 disabled:cursor-not-allowed"
              {...register(name)}
            />
            <span
              className={cn(
                'flex items-center justify-center rounded-md border bg-surface px-2 py-1.5 text-center text-sm font-semibold text-ink tabular-nums',
                'peer-checked:border-accent peer-checked:bg-accent peer-checked:text-on-accent',
                'peer-hover:border-accent peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-accent',
                'peer-disabled:opacity-60',
                heights[size],
                size === 'lg' && 'text-base',
                error ? 'border-off-plan' : 'border-line-strong',
              )}
            >
              {o.label}
            </span>
          </label>
        ))}
      </div>
      <FieldErrorText id={ids.errorId} error={error} />
      <FieldHint id={ids.hintId}>{hint}</FieldHint>
    </fieldset>
  );
}
