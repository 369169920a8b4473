import { useEffect, useState } from 'react';
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

/** Today's date (YYYY-MM-DD) in the athlete's time zone, moving on at their midnight. */
export function useToday(timeZone: string): string {
  useTick();
  return todayIn(timeZone);
}
