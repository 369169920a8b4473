import type { AcknowledgementView, DayCaution, PlanContent } from '../schemas/plans.js';
import { inReaderUnits, possessive, type Reader } from '../reader.js';
import { countdownDayLabel, dayEntryFor } from './resolve.js';

/** Peak-week practices rest on little evidence; water and electrolyte manipulation may do harm. */
const COUNTDOWN_SOURCE =
  'Escalante et al. 2021, BMC Sports Sci Med Rehabil 13:68; Homer, Cross & Helms 2024, Sports Med Open, ' +
  'doi:10.1186/s40798-024-00674-z';

/**
 * The cautions the athlete sees on `date` under a version: the standing countdown caution on a
 * countdown day, and every acknowledged warning whose scope covers the day (plan-wide; the day's
 * day type when the day follows the pattern; the date itself), worded for `reader` ("your
 * countdown" to the athlete, "Mateo's countdown" to staff) and in the reader's units.
 */
export function cautionsForDay(input: {
  content: PlanContent;
  date: string;
  acknowledgements: readonly Pick<
    AcknowledgementView,
    'code' | 'severity' | 'scope' | 'message' | 'source' | 'at'
  >[];
  reader: Reader;
}): DayCaution[] {
  const { content, date } = input;
  const entry = dayEntryFor(content, date);
  const cautions: DayCaution[] = [];

  if (entry.kind === 'date' && entry.override.countdownOffset != null) {
    cautions.push({
      code: 'countdown',
      severity: 'strong',
      message:
        `${countdownDayLabel(entry.override.countdownOffset)} of ${possessive(input.reader)} countdown: ` +
        'water, sodium and energy ' +
        'change day by day.',
      source: COUNTDOWN_SOURCE,
      acknowledgedAt: null,
    });
  }

  for (const a of input.acknowledgements) {
    const covers =
      a.scope.kind === 'plan' ||
      (a.scope.kind === 'date' && a.scope.date === date) ||
      (a.scope.kind === 'day_type' && entry.kind === 'pattern' && entry.dayType.key === a.scope.key);
    if (covers) {
      cautions.push({
        code: a.code,
        severity: a.severity,
        message: inReaderUnits(a.message, input.reader.units),
        source: a.source,
        acknowledgedAt: a.at,
      });
    }
  }

  // Strong ones first, the countdown caution leading.
  return cautions
    .map((c, i) => ({ c, i }))
    .sort((x, y) => rank(x.c) - rank(y.c) || x.i - y.i)
    .map(({ c }) => c);
}

function rank(c: DayCaution): number {
  if (c.code === 'countdown') return 0;
  return c.severity === 'strong' ? 1 : 2;
}
