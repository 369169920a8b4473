/**
 * Time zones: only IANA names both this runtime (Intl) and PostgreSQL know. Intl alone accepts
 * abbreviations ("SST", "EST") and retired names ("US/Pacific-New") that PostgreSQL refuses, so a
 * name must also be an `Area/Location` of the IANA regions below (or `UTC`). The integration test
 * `time-zones` compares what this accepts with PostgreSQL's `pg_timezone_names`.
 */

/** The IANA regions a zone name starts with (tzdata's region files, plus `Etc`). */
const AREAS = new Set([
  'Africa',
  'America',
  'Antarctica',
  'Arctic',
  'Asia',
  'Atlantic',
  'Australia',
  'Europe',
  'Indian',
  'Pacific',
  'Etc',
]);

const NAME = /^([A-Z][a-z]+)\/[A-Za-z0-9_+-]+(\/[A-Za-z0-9_+-]+)?$/;

/** True when Intl knows `tz` (any name ICU resolves, aliases included). */
function intlKnows(tz: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

/** True when `tz` is an IANA time zone from the list Intl and PostgreSQL both know (e.g. `Pacific/Auckland`). */
export function isValidTimeZone(tz: string): boolean {
  if (typeof tz !== 'string' || !tz || tz.length > 64) return false;
  if (tz === 'UTC') return true;
  const m = NAME.exec(tz);
  if (!m || !AREAS.has(m[1] ?? '')) return false;
  return intlKnows(tz);
}

/** The runtime's list of IANA time zones (with `UTC`), for pickers; each passes `isValidTimeZone`. */
export function listTimeZones(): string[] {
  const intl = Intl as unknown as { supportedValuesOf?: (key: string) => string[] };
  const all = intl.supportedValuesOf ? intl.supportedValuesOf('timeZone') : [];
  return ['UTC', ...all.filter((tz) => tz !== 'UTC' && isValidTimeZone(tz))];
}
