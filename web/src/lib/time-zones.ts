import { isValidTimeZone, listTimeZones } from '@driftmark/shared';

/** The device's IANA time zone, or UTC when the runtime cannot tell. */
export function deviceTimeZone(): string {
  try {
    const tz = Intl.DateTimeFormat().resolvedOptions().timeZone;
    return tz && isValidTimeZone(tz) ? tz : 'UTC';
  } catch {
    return 'UTC';
  }
}

let cached: string[] | null = null;

/**
 * Options for a time-zone picker: the runtime's list, plus any zone in use that the list leaves
 * out (some runtimes omit "UTC" or old aliases), so a saved value always shows as chosen.
 */
export function timeZoneOptions(
  ...inUse: Array<string | null | undefined>
): Array<{ value: string; label: string }> {
  cached ??= listTimeZones();
  const zones = new Set(cached);
  for (const tz of inUse) if (tz && isValidTimeZone(tz)) zones.add(tz);
  return [...zones]
    .sort()
    .map((tz) => ({ value: tz, label: tz.replaceAll('_', ' ').replaceAll('/', ' / ') }));
}
