import { limitGap, limitGapSummary, type LimitGapView } from '@driftmark/shared';
import type { Athlete } from '../entities/athlete.entity.js';
import { projectTo, type WeighInPoint } from './analysis.js';

/**
 * The projection at the weigh-in (the trend page's projectTo: the 14-day line with its 80 %
 * interval) read against the class limit (shared rules/weight-cut.ts limitGap). Null unless the
 * athlete's event is a weigh-in ahead with a limit and there are enough weigh-ins to project.
 */
export function weighInGap(
  athlete: Pick<Athlete, 'eventType' | 'eventDate' | 'weighInLimitKg'>,
  points: readonly WeighInPoint[],
  currentKg: number | null,
  today: string,
): LimitGapView | null {
  const { eventDate, weighInLimitKg: limitKg } = athlete;
  if (athlete.eventType !== 'weigh_in' || eventDate === null || limitKg === null || currentKg === null)
    return null;
  const projection = projectTo(points, today, eventDate);
  if (!projection) return null;
  const gap = limitGap({ projection, limitKg, currentKg, today, weighInDate: eventDate });
  return {
    projectedKg: projection.kg,
    lowKg: projection.lowKg,
    highKg: projection.highKg,
    ...gap,
    summary: limitGapSummary(gap, limitKg),
  };
}
