import { useEffect } from 'react';
import {
  useFormState,
  type FieldValues,
  type Path,
  type PathValue,
  type UseFormReturn,
} from 'react-hook-form';

/**
 * A new entry's time box shows "now" and keeps following the clock until the athlete changes it,
 * so a screen left open since breakfast does not log lunch at 07:30.
 */
export function useFollowClock<V extends FieldValues>(
  form: UseFormReturn<V, unknown, unknown>,
  field: Path<V>,
  now: string,
  active = true,
) {
  const { dirtyFields } = useFormState({ control: form.control, name: field });
  const dirty = Boolean((dirtyFields as Record<string, unknown>)[field]);
  useEffect(() => {
    if (!active || dirty) return;
    if (form.getValues(field) !== now) form.resetField(field, { defaultValue: now as PathValue<V, Path<V>> });
  }, [form, field, now, active, dirty]);
}
