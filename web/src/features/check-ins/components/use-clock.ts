import { useEffect, useState } from 'react';
import {
  useFormState,
  type FieldValues,
  type Path,
  type PathValue,
  type UseFormReturn,
} from 'react-hook-form';
import { todayIn } from '@/lib/format';
import { clockIn } from '../utils/dates';

const TICK_MS = 20_000;

/** Re-renders the caller every TICK_MS, so values read from the clock stay current. */
function useTick(): number {
  const [tick, setTick] = useState(0);
  useEffect(() => {
    const id = window.setInterval(() => setTick((n) => n + 1), TICK_MS);
    return () => window.clearInterval(id);
  }, []);
  return tick;
}

/** The clock ("HH:MM") in the athlete's time zone, kept current while the screen is open. */
export function useClock(timeZone: string): string {
  useTick();
  return clockIn(timeZone);
}

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

/** Today's date (YYYY-MM-DD) in the athlete's time zone, moving on at their midnight. */
export function useToday(timeZone: string): string {
  useTick();
  return todayIn(timeZone);
}
